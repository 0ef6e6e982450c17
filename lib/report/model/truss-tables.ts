import type { TrussInputs } from "../../calcs/truss/truss-inputs";
import type { TrussView } from "../../calcs/truss/truss-view";
import type { ReportTable } from "../report-model";
import { fixed, printUnit, senseMark, sig } from "./format-quantity";
import { parameters, table } from "./table";

/** The Truss calc's inputs as tables: units and stability, joints, members, supports, loads. */
export function trussInputTables(inputs: TrussInputs, view: TrussView | null): ReportTable[] {
  const u = view?.units;
  const len = inputs.units.length;
  const force = inputs.units.force;
  const area = printUnit(u?.area ?? (len === "m" ? "mm^2" : "in^2"));
  const modulus = u?.modulus ?? (force === "kN" ? "GPa" : "ksi");
  const gen = inputs.generator;
  const out: ReportTable[] = [
    parameters("Model", [
      ["Units", `${len}, ${force}`],
      ["Generated as", gen ? `${gen.shape}, span ${sig(gen.span)} ${len}, ${gen.panels} panels${gen.depth ? `, depth ${sig(gen.depth)} ${len}` : ""}` : null],
      ["Joints, members, reactions", view ? `j = ${view.counts.j}, m = ${view.counts.m}, r = ${view.counts.r}` : null],
      ["Determinacy and stability", view?.stability],
    ]),
    table("Joints", ["Joint", `x (${len})`, `y (${len})`], inputs.joints.map((j) => [j.id, fixed(j.x, 3), fixed(j.y, 3)])),
    table(
      "Members",
      ["Member", "Start", "End", `A (${area})`, `E (${modulus})`],
      inputs.members.map((m) => [m.id, m.start, m.end, m.A === undefined ? "—" : sig(m.A), m.E === undefined ? "—" : sig(m.E)]),
    ),
    table("Supports", ["Joint", "Type", "Direction"], inputs.supports.map((s) => [s.joint, s.type, s.direction ? `(${sig(s.direction[0])}, ${sig(s.direction[1])})` : s.type === "pin" ? "x and y" : "y"])),
  ];
  const loads: string[][] = [];
  for (const c of inputs.loadCases) {
    for (const l of c.loads) loads.push([c.id, c.kind, `Joint ${l.joint}`, `Fx = ${fixed(l.fx ?? 0, 2)}, Fy = ${fixed(l.fy ?? 0, 2)} ${force}`]);
    for (const l of inputs.lineLoads ?? []) {
      if (l.case !== c.id) continue;
      const along = l.projected === false ? "along the chord" : "on plan";
      loads.push([c.id, c.kind, `Chord ${l.chord[0]}–${l.chord[l.chord.length - 1]}`, `w = ${fixed(l.w, 2)} ${force}/${len} ${along}`]);
    }
    if (!loads.some((r) => r[0] === c.id)) loads.push([c.id, c.kind, "—", "no load"]);
  }
  out.push({ caption: "Load cases", header: ["Case", "Kind", "Applied to", "Load"], rows: loads, align: ["left", "left", "left", "left"] });
  return out;
}

/** One case's member forces, reactions and displacements, for the appendix. */
export function trussCaseTables(view: TrussView, title: string): ReportTable[] {
  const u = view.units;
  const out: ReportTable[] = [];
  for (const c of view.cases) {
    out.push(table(`${title}, ${c.id}: member forces (tension positive)`, ["Member", `N (${u.force})`, "Sense"], c.forces.map((f) => [f.member, fixed(f.force, 2), senseMark(f.sense)])));
    out.push(table(`${title}, ${c.id}: reactions`, ["Joint", `Rx (${u.force})`, `Ry (${u.force})`], c.reactions.map((r) => [r.joint, fixed(r.rx, 2), fixed(r.ry, 2)])));
    if (c.displacements) {
      out.push(table(`${title}, ${c.id}: joint displacements`, ["Joint", `ux (${u.displacement})`, `uy (${u.displacement})`], c.displacements.map((d) => [d.joint, fixed(d.ux, 2), fixed(d.uy, 2)])));
    }
  }
  return out;
}
