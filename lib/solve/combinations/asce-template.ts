import type { AsceKind } from "./types";

/**
 * One ASCE/SEI 7 combination as printed: a sum of terms, each term a choice
 * among alternatives (`0.5(Lr or S or R)` has three), each alternative a set
 * of kind → factor.
 */
export type AsceTemplate = {
  /** Number of the combination in its section. */
  label: string;
  /** The combination as printed in the standard. */
  expression: string;
  terms: Array<Array<Partial<Record<AsceKind, number>>>>;
  /** Set when a factor is recalled rather than checked against the printed standard. */
  fromMemory?: string;
};

/** A published set: its title, clause, combinations, and what is left out. */
export type AsceTable = {
  title: string;
  clause: string;
  templates: AsceTemplate[];
  omitted: string;
};
