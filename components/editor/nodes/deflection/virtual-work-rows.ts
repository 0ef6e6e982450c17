import type { DeflectionView } from "@/lib/calcs/deflection/deflection-view";
import { trussUnits } from "@/lib/calcs/truss/truss-units";
import type { TrussModel } from "@/lib/solve";

/** One line of the virtual-work table with the section as the engineer entered it (mm², GPa or in², ksi). */
export type VirtualWorkRow = { member: string; N: number; n: number; L: number; A?: number; E?: number; contribution: number };

export type VirtualWorkTable = {
  rows: VirtualWorkRow[];
  /** Σ N·n·L/(A·E), in the deflection unit. */
  sum: number;
  units: { force: string; length: string; area: string; modulus: string; deflection: string };
};

/**
 * The calc's terms joined with each member's A and E from the truss. The
 * truss hands them over in consistent units (m², kN/m²); they are shown in
 * the units they were typed in, so the table can be checked against the
 * truss's member table by eye.
 */
export function virtualWorkTable(view: DeflectionView, model: TrussModel | null): VirtualWorkTable {
  const length = model?.units?.length === "ft" ? "ft" : "m";
  const force = model?.units?.force === "kip" ? "kip" : "kN";
  const u = trussUnits({ length, force });
  const members = new Map((model?.members ?? []).map((m) => [m.id, m]));
  const rows = view.terms.map((t): VirtualWorkRow => {
    const m = members.get(t.member);
    return {
      ...t,
      ...(m?.A === undefined ? {} : { A: m.A / u.areaToModel }),
      ...(m?.E === undefined ? {} : { E: m.E / u.modulusToModel }),
    };
  });
  return {
    rows,
    sum: rows.reduce((s, r) => s + r.contribution, 0),
    units: { force: view.units.force, length: view.units.length, area: u.area.replace("^2", "²"), modulus: u.modulus, deflection: view.units.deflection },
  };
}
