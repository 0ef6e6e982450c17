import { calcDefaults } from "@/lib/calcs/calc-defaults";
import type { CalcKind } from "@/lib/calcs/calc-types";
import { nextCalcLabel } from "@/lib/calcs/next-calc-label";

/** Attributes of a freshly inserted calc: a stable id, the next free label, starting inputs. */
export function newCalcAttrs(kind: CalcKind, labels: string[]): { id: string; label: string; inputs: unknown } {
  return { id: crypto.randomUUID(), label: nextCalcLabel(kind, labels), inputs: calcDefaults(kind) };
}
