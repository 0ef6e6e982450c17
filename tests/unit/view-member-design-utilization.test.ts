import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { forceSourceOptions } from "@/components/editor/nodes/member-design/force-source-options";
import { memberDesignSummary } from "@/components/editor/nodes/member-design/member-design-summary";
import { stepsByMember } from "@/components/editor/nodes/member-design/member-steps";
import { MemberWorking } from "@/components/editor/nodes/member-design/member-working";
import { PassMark } from "@/components/editor/nodes/member-design/pass-mark";
import { UtilizationBar } from "@/components/editor/nodes/member-design/utilization-bar";
import { UtilizationTable } from "@/components/editor/nodes/member-design/utilization-table";
import { trussValueOf } from "@/components/editor/nodes/combinations/truss-choices";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import type { MemberDesignView as MemberDesignViewData } from "@/lib/calcs/member-design/member-design-view";
import { demoCalcs, resultOf } from "./calcs-fixtures";

function evaluateDemo(shrink = false) {
  const calcs = demoCalcs();
  if (shrink) {
    const m = calcs.find((c) => c.label === "M1");
    // A slender tube in the top chord: it must fail in compression.
    const inputs = m?.inputs as { members: { member: string; section: unknown }[] };
    inputs.members[1].section = { shape: "chs", D: 48.3, t: 3 };
  }
  const evaluation = evaluateCalcs({ calcs });
  const m1 = resultOf(evaluation, "M1");
  return { evaluation, m1, view: m1.view as MemberDesignViewData };
}

describe("UtilizationTable", () => {
  it("has one row per member with its utilization value, marked for tests", () => {
    const { view } = evaluateDemo();
    const html = renderToStaticMarkup(createElement(UtilizationTable, { rows: view.rows, force: "kN", slenderness: "KL/r" }));
    expect(html.match(/data-testid="utilization"/g)?.length).toBe(9);
    expect(html).toMatch(/data-member="U2U3"[\s\S]*?data-testid="utilization-value" data-value="0\.547\d+">0\.548</);
  });

  it("says PASS or FAIL in words and with a mark, with the clause and the combination", () => {
    const { view } = evaluateDemo(true);
    const html = renderToStaticMarkup(createElement(UtilizationTable, { rows: view.rows, force: "kN", slenderness: "KL/r" }));
    const failing = html.slice(html.indexOf('data-member="U2U3"'), html.indexOf("</tr>", html.indexOf('data-member="U2U3"')));
    expect(failing).toContain('data-pass="false"');
    expect(failing).toMatch(/FAIL <span aria-hidden="true">✕<\/span>/);
    expect(failing).toContain("compression");
    expect(failing).toContain("EN 1993-1-1 §6.3.1.1");
    expect(failing).toContain("by (6.10) 1.35G + 1.5Q");
    expect(html).toMatch(/PASS <span aria-hidden="true">✓<\/span>/);
  });

  it("sums up the verdict and names the failing and the most utilized members", () => {
    expect(memberDesignSummary(evaluateDemo().view)).toBe("All 9 members PASS ✓; most utilized U2U3 at 0.548");
    expect(memberDesignSummary(evaluateDemo(true).view)).toMatch(/^1 of 9 FAIL ✕ \(U2U3\); most utilized U2U3 at \d+\.\d{3}$/);
  });
});

describe("marks", () => {
  it("draws an overstressed bar full, hatched and with an overflow arrow", () => {
    const over = renderToStaticMarkup(createElement(UtilizationBar, { utilization: 1.4 }));
    expect(over).toContain("width:100%");
    expect(over).toContain("repeating-linear-gradient");
    expect(over).toContain("▸");
    expect(renderToStaticMarkup(createElement(UtilizationBar, { utilization: 0.25 }))).toContain("width:25%");
  });

  it("frames a failure more heavily than a pass", () => {
    expect(renderToStaticMarkup(createElement(PassMark, { pass: false }))).toContain("border-2");
    expect(renderToStaticMarkup(createElement(PassMark, { pass: true }))).not.toContain("border-2");
  });
});

describe("working per member", () => {
  it("gives each member its own steps, starting with its header", () => {
    const { m1, view } = evaluateDemo();
    const by = stepsByMember(m1.steps, view.rows.map((r) => r.member));
    expect([...by.keys()]).toEqual(view.rows.map((r) => r.member));
    for (const [id, steps] of by) expect(steps[0].text).toMatch(new RegExp(`^Member ${id}, `));
    expect([...by.values()].reduce((n, s) => n + s.length, 0)).toBe(m1.steps.length);
  });

  it("does not let a short id claim a longer one's steps", () => {
    const steps = [{ latex: "a", text: "Member U1U2, length 4" }, { latex: "b" }, { latex: "c", text: "Member U1, length 3" }, { latex: "d" }];
    const by = stepsByMember(steps, ["U1", "U1U2"]);
    expect(by.get("U1U2")?.map((s) => s.latex)).toEqual(["a", "b"]);
    expect(by.get("U1")?.map((s) => s.latex)).toEqual(["c", "d"]);
  });

  it("collapses each member's working to its result until opened", () => {
    const { m1, view } = evaluateDemo();
    const html = renderToStaticMarkup(createElement(MemberWorking, { steps: m1.steps, rows: view.rows }));
    expect(html.match(/data-step-list=""/g)?.length).toBe(9);
    expect(html).toContain('aria-expanded="false"');
    expect(html).toContain("Show working");
  });
});

describe("where the forces come from", () => {
  it("offers the governing combinations of a Combinations calc of the same truss, then its cases", () => {
    const { evaluation } = evaluateDemo();
    const options = forceSourceOptions(evaluation.results, "T1", trussValueOf(evaluation.results, "T1"), "C1");
    expect(options.map((o) => o.value)).toEqual(["C1", "", "G", "Q"]);
    expect(options[0].label).toBe("C1: governing of every combination");
  });
});
