import { describe, expect, it } from "vitest";
import { addLoadCase, generateTruss, lineLoadToPanelLoads } from "@/lib/solve/generators";
import { solveTruss } from "@/lib/solve/truss";

// Closed form (method of sections): a cut through one panel of a parallel-chord
// truss leaves a chord force F = M / h, with M the simple-beam bending moment at
// the joint where the other two cut members meet and h the depth between chords.
// Source: R. C. Hibbeler, Structural Analysis, ch. 3, "The Method of Sections"
// (common practice in any structural analysis text). Panel-point loads lumped by
// tributary length give the same panel-point moments as the uniform load, so
// M(x) = w·x·(L − x) / 2 (AISC Steel Construction Manual, Table 3-23, case 1).

const L = 24; // m, span (Alder Creek demo footbridge)
const h = 3; // m, depth
const n = 6; // panels of 4 m
const w = 10; // kN/m on the bottom chord
const p = L / n;
const moment = (x: number) => (w * x * (L - x)) / 2;

function solveUnderLineLoad(shape: "pratt" | "howe") {
  const { model, chords } = generateTruss({ shape, span: L, panels: n, depth: h });
  const loaded = addLoadCase(model, "D", lineLoadToPanelLoads({ model, chord: chords.bottom, w }));
  return solveTruss(loaded).cases.D;
}

describe("parallel-chord Pratt and Howe under panel loads, by the method of sections", () => {
  it("gives the Pratt's midspan top chord −M(L/2)/h = −wL²/(8h) = −240 kN", () => {
    // Cut through panel U2U3 / U2L3 / L2L3: moment centre for U2U3 is L3 at midspan.
    const { forces } = solveUnderLineLoad("pratt");
    expect(moment(L / 2)).toBe(720); // wL²/8 = 10 × 24² / 8 kN·m
    expect(forces.U2U3).toBeCloseTo(-moment(L / 2) / h, 9);
    expect(forces.U2U3).toBeCloseTo(-240, 9);
  });

  it("gives the Pratt's centre-panel bottom chord M(L/2 − p)/h = 640/3 = 213.33 kN", () => {
    // The Pratt diagonal U2L3 meets the top chord at U2, one panel short of midspan.
    const { forces } = solveUnderLineLoad("pratt");
    expect(forces.L2L3).toBeCloseTo(moment(L / 2 - p) / h, 9);
    expect(forces.L2L3).toBeCloseTo(640 / 3, 9);
  });

  it("gives the Howe's midspan bottom chord M(L/2)/h = wL²/(8h) = 240 kN", () => {
    // The Howe diagonal L2U3 meets the top chord at U3, over midspan.
    const { forces } = solveUnderLineLoad("howe");
    expect(forces.L2L3).toBeCloseTo(moment(L / 2) / h, 9);
    expect(forces.L2L3).toBeCloseTo(240, 9);
  });

  it("gives every Pratt bottom chord bay M/h about the top joint over its left end (left half)", () => {
    const { forces } = solveUnderLineLoad("pratt");
    for (let i = 0; i < n / 2; i++) expect(forces[`L${i}L${i + 1}`]).toBeCloseTo(moment(i * p) / h, 9);
  });
});
