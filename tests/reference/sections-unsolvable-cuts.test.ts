/**
 * Sections that the method of sections cannot solve, on the 4-panel Pratt
 * (a = 3 m, h = 4 m, 10 kN at L1–L3). The rules are the usual ones: a
 * section must divide the truss into two free bodies, cut every member it
 * names, and leave no more than three unknowns that one equation each can
 * separate.
 */
import { describe, expect, it } from "vitest";
import { SolveError } from "@/lib/solve/errors";
import { cutSection } from "@/lib/solve/sections";
import { pratt4 } from "@/tests/unit/sections-trusses";

function failure(members: string[], keep = "L0"): SolveError {
  try {
    cutSection(pratt4(), { loadCase: "D", members, keep });
  } catch (e) {
    if (e instanceof SolveError) return e;
    throw e;
  }
  throw new Error("expected the cut to be refused");
}

describe("cuts the method of sections cannot solve", () => {
  it("refuses a cut that leaves the truss in one piece", () => {
    // common practice: the diagonal U1L2 still joins the two sides, so there is no free body
    const e = failure(["U1U2", "L1L2"]);
    expect(e.code).toBe("UNSOLVABLE_CUT");
    expect(e.message).toMatch(/one piece/);
  });

  it("refuses more than three cut members", () => {
    // common practice: three equilibrium equations per free body, so at most three unknowns
    const e = failure(["U1U2", "U1L2", "L1L2", "U2L2"]);
    expect(e.code).toBe("UNSOLVABLE_CUT");
    expect(e.message).toMatch(/more than the three unknowns/);
  });

  it("refuses a named member whose ends are both on one side", () => {
    // common practice: U1L1 is not crossed by a section that only frees joint L0
    const e = failure(["L0L1", "L0U1", "U1L1"]);
    expect(e.code).toBe("UNSOLVABLE_CUT");
    expect(e.message).toMatch(/U1L1 has both ends on the same side/);
  });

  it("refuses three cut members that meet at one point", () => {
    // common practice: L0L1, L1L2 and U1L1 all meet at L1, so no moment point separates them
    const e = failure(["L0L1", "L1L2", "U1L1"], "L1");
    expect(e.code).toBe("UNSOLVABLE_CUT");
    expect(e.message).toMatch(/meet at one point/);
  });

  it("refuses a cut of a single member", () => {
    // common practice: a section cuts two or three members
    expect(failure(["U1U2"]).code).toBe("UNSOLVABLE_CUT");
  });
});
