import { describe, expect, it } from "vitest";
import { cutSection, proposeCuts } from "@/lib/solve/sections";
import { pratt, pratt4, trapezoid } from "./sections-trusses";
import { thrown } from "../support/solve-assertions";

describe("proposeCuts", () => {
  it("proposes the straight section through a panel: top chord, diagonal, bottom chord", () => {
    const [first] = proposeCuts(pratt4(), { panel: 1 });
    expect([...first.members].sort()).toEqual(["L1L2", "U1L2", "U1U2"]);
    expect(first.straight).toBe(true);
    expect(first.offTrussPivots).toBe(0);
    expect(first.sides[0]).toEqual(["L0", "L1", "U1"]);
    expect(first.keep).toBe("L0");
  });

  it("numbers panels from 0 at the left and accepts the panel's bottom-chord member instead", () => {
    expect(proposeCuts(pratt4(), { panel: "L1L2" })).toEqual(proposeCuts(pratt4(), { panel: 1 }));
    expect(proposeCuts(pratt4(), { panel: 0 })[0].members).toContain("L0L1");
  });

  it("only proposes cuts whose members all cross the panel", () => {
    // Panel 2 of a 6-panel Pratt spans x = 6…9 m; the verticals at its edges do not cross it.
    const cuts = proposeCuts(pratt({ panels: 6, a: 3, h: 4, loads: [1, 1, 1, 1, 1] }), { panel: 2 });
    expect(cuts.map((c) => [...c.members].sort())).toEqual([["L2L3", "U2L3", "U2U3"]]);
  });

  it("contains the given member in every proposal", () => {
    const cuts = proposeCuts(pratt4(), { member: "U1L1" });
    expect(cuts.length).toBeGreaterThan(0);
    for (const c of cuts) expect(c.members).toContain("U1L1");
  });

  it("proposes only cuts that cutSection solves and that agree with the stiffness solution", () => {
    for (const model of [pratt4(), trapezoid()]) {
      for (const c of proposeCuts(model, {})) {
        const r = cutSection(model, { loadCase: "D", members: c.members, keep: c.keep });
        expect(r.agrees).toBe(true);
        expect(r.keptJoints).toEqual(c.sides[0]);
      }
    }
  });

  it("proposes nothing for the midspan vertical of a Pratt, which no section frees", () => {
    // Both diagonals meet at L2, so any cut through U2L2 leaves the truss in one piece or cuts four members.
    expect(proposeCuts(pratt4(), { member: "U2L2" })).toEqual([]);
  });

  it("lists sections with a moment point off the truss after those without", () => {
    const cuts = proposeCuts(trapezoid(), {});
    const off = cuts.map((c) => c.offTrussPivots);
    const straight = cuts.map((c) => c.straight);
    for (let i = 1; i < cuts.length; i++) {
      if (straight[i] === straight[i - 1]) expect(off[i]).toBeGreaterThanOrEqual(off[i - 1]);
      else expect(straight[i - 1]).toBe(true);
    }
    expect(cuts.some((c) => c.offTrussPivots > 0)).toBe(true);
  });

  it("describes each proposal in words", () => {
    const [first] = proposeCuts(pratt4(), { panel: 1 });
    expect(first.description).toMatch(/^Cut .* and keep the side with L0, L1, U1: .*by moments about joint U1.*by a force sum/);
  });

  it("rejects an unknown member at path `member` and a panel that does not exist at path `panel`", () => {
    const m = thrown(() => proposeCuts(pratt4(), { member: "Q" }));
    expect([m.code, m.path]).toEqual(["INVALID", "member"]);
    const p = thrown(() => proposeCuts(pratt4(), { panel: 4 }));
    expect([p.code, p.path]).toEqual(["INVALID", "panel"]);
    const notChord = thrown(() => proposeCuts(pratt4(), { panel: "U1U2" }));
    expect([notChord.code, notChord.path]).toEqual(["INVALID", "panel"]);
  });
});
