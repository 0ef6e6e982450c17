import type { CalcNode, CalcResult } from "../../calcs/calc-types";
import type { MemberDesignView } from "../../calcs/member-design/member-design-view";
import type { DesignCriteria } from "../report-model";
import { sig } from "./format-quantity";

type Row = Record<string, unknown>;

/** Materials named by member-design rows (strengths) and truss members (moduli), with the calcs that use each. */
export function calcMaterials(calcs: CalcNode[], results: Record<string, CalcResult>): DesignCriteria["materials"] {
  const found = new Map<string, { name: string; properties: string; usedBy: string[] }>();
  const add = (name: string, properties: string, label: string) => {
    const key = `${name}\u0000${properties}`;
    const entry = found.get(key) ?? { name, properties, usedBy: [] };
    if (!entry.usedBy.includes(label)) entry.usedBy.push(label);
    found.set(key, entry);
  };
  for (const calc of calcs) {
    const inputs = (calc.inputs ?? {}) as { material?: string; members?: Row[]; units?: { force?: string } };
    if (calc.kind === "memberDesign" && Array.isArray(inputs.members)) {
      const view = results[calc.id]?.view as MemberDesignView | undefined;
      const stress = view?.units?.design?.stress ?? (inputs.material === "timber-nds" ? "psi" : "MPa");
      for (const m of inputs.members) add(materialName(inputs.material), properties(m, stress), calc.label);
    }
    if (calc.kind === "truss" && Array.isArray(inputs.members)) {
      const modulus = inputs.units?.force === "kip" ? "ksi" : "GPa";
      for (const m of inputs.members) if (typeof m.E === "number") add("Truss members (analysis)", `E = ${sig(m.E)} ${modulus}`, calc.label);
    }
  }
  return [...found.values()];
}

function materialName(material: string | undefined): string {
  if (material === "steel-aisc360") return "Structural steel (AISC 360-16)";
  if (material === "steel-en1993") return "Structural steel (EN 1993-1-1)";
  return "Timber (NDS 2018)";
}

function properties(m: Row, stress: string): string {
  const v = (k: string) => sig(m[k] as number);
  if (typeof m.fy === "number") return `fy = ${v("fy")} ${stress}, fu = ${v("fu")} ${stress}, E = ${v("E")} ${stress}, buckling curve ${String(m.curve)}`;
  if (typeof m.Fy === "number") return `Fy = ${v("Fy")} ${stress}, Fu = ${v("Fu")} ${stress}, E = ${v("E")} ${stress}`;
  return `Fc* = ${v("FcStar")} ${stress}, F't = ${v("FtPrime")} ${stress}, E'min = ${v("EminPrime")} ${stress}`;
}
