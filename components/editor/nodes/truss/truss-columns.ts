import type { InputColumn } from "@/components/editor/input-table/input-column";
import type { JointRow, LoadRow, MemberRow } from "./truss-draft";
import type { LineLoadRow } from "./line-load-rows";
import type { SupportRow } from "./support-rows";
import type { TrussUnitText } from "./truss-unit-text";

/** The columns of each Truss input table, with the truss's unit on every value. */
export function trussColumns(u: TrussUnitText) {
  const joints: InputColumn<JointRow>[] = [
    { key: "id", label: "Label", kind: "text", width: "6rem", required: true, aliases: ["name", "joint", "id"] },
    { key: "x", label: "x", unit: u.length, kind: "number" },
    { key: "y", label: "y", unit: u.length, kind: "number" },
  ];
  const members: InputColumn<MemberRow>[] = [
    { key: "id", label: "Label", kind: "text", width: "6rem", required: true, aliases: ["name", "member", "id"] },
    { key: "start", label: "Start", kind: "text", width: "5rem", aliases: ["from", "i", "start joint"] },
    { key: "end", label: "End", kind: "text", width: "5rem", aliases: ["to", "j", "end joint"] },
    { key: "A", label: "A", unit: u.area, kind: "number", aliases: ["area"] },
    { key: "E", label: "E", unit: u.modulus, kind: "number", aliases: ["modulus"] },
  ];
  const supports: InputColumn<SupportRow>[] = [
    { key: "joint", label: "Joint", kind: "text", width: "6rem" },
    { key: "type", label: "Type", kind: "select", options: [{ value: "pin", label: "Pin" }, { value: "roller", label: "Roller" }], width: "7rem" },
    // A roller's reaction line; left blank it is vertical, the common case.
    { key: "dx", label: "Reaction line x", kind: "number" },
    { key: "dy", label: "Reaction line y", kind: "number" },
  ];
  const loads: InputColumn<LoadRow>[] = [
    { key: "joint", label: "Joint", kind: "text", width: "6rem" },
    { key: "fx", label: "fx", unit: u.force, kind: "number" },
    { key: "fy", label: "fy", unit: u.force, kind: "number" },
  ];
  const cases: InputColumn<{ id: string; kind: string }>[] = [
    { key: "id", label: "Case", kind: "text", width: "7rem" },
    { key: "kind", label: "Kind", kind: "text" },
  ];
  const lineLoads: InputColumn<LineLoadRow>[] = [
    { key: "case", label: "Case", kind: "text", width: "5rem" },
    { key: "chord", label: "Chord joints, in order", kind: "text" },
    { key: "w", label: "w", unit: u.lineLoad, kind: "number", width: "7rem" },
    { key: "projected", label: "Measured", kind: "select", options: [{ value: "projected", label: "On plan" }, { value: "along", label: "Along the chord" }], width: "9rem" },
  ];
  return { joints, members, supports, loads, cases, lineLoads };
}
