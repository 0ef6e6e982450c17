import type { CalcKind, CalcResult } from "@/lib/calcs/calc-types";

/** One side of a comparison: a document, its calcs' results (frozen for a revision, recomputed for a draft) and what to call it. */
export type Snapshot = { document: unknown; results: Record<string, CalcResult>; label: string };

export type Quantity = { value: number; unit: string };

/** One exported quantity that differs between the two sides; null where a side does not export it. */
export type ValueChange = { name: string; old: Quantity | null; new: Quantity | null };

export type CalcChange = {
  calcId: string;
  label: string;
  kind: CalcKind;
  /** `inputsChanged` wins over `resultsChanged` when both hold; `resultsChanged` alone means an upstream calc moved it. */
  change: "added" | "removed" | "inputsChanged" | "resultsChanged";
  inputsChanged: boolean;
  resultsChanged: boolean;
  /** The exported quantities that moved (added and removed calcs list all theirs). */
  values: ValueChange[];
  /** Top-level block index in the newer document (null for a removed calc), for change bars. */
  newIndex: number | null;
};

export type BlockKind = "heading" | "paragraph" | "list" | "table" | "blockquote" | "figure" | "other";

export type TextChange = {
  change: "added" | "removed" | "changed";
  kind: BlockKind;
  before: string | null;
  after: string | null;
  /** Top-level block index in the older document (null when added). */
  oldIndex: number | null;
  /** Top-level block index in the newer document; for a removed block, the index of the block it stood before. */
  newIndex: number;
};

export type SnapshotComparison = { from: string; to: string; calcs: CalcChange[]; text: TextChange[] };
