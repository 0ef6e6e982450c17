import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { propertyDefaults, propertyFields } from "@/components/editor/nodes/member-design/material-choices";
import { memberFormPaths } from "@/components/editor/nodes/member-design/member-form-paths";
import { MemberRowEditor, type MemberRowEditorProps } from "@/components/editor/nodes/member-design/member-row-editor";
import { changeMaterial, newMemberRow, readMemberDesignInputs, toMemberDesignInputs, withShape } from "@/components/editor/nodes/member-design/member-rows";
import { sectionFields, shapesFor, switchShape } from "@/components/editor/nodes/member-design/section-shapes";
import { evaluateCalcs } from "@/lib/calcs/evaluate-calcs";
import { demoCalc, demoCalcs, resultOf } from "./calcs-fixtures";

const m1 = () => readMemberDesignInputs(demoCalc("M1").inputs);

describe("member rows", () => {
  it("round-trip the stored inputs unchanged", () => {
    expect(toMemberDesignInputs(m1())).toEqual(demoCalc("M1").inputs);
  });

  it("leave a blank optional field out, so the core applies its default", () => {
    const form = m1();
    form.members[0].props.gammaM0 = undefined;
    form.members[0].section.cornerRadius = undefined;
    const stored = toMemberDesignInputs(form).members as Record<string, unknown>[];
    expect(stored[0]).not.toHaveProperty("gammaM0");
    expect(stored[0].section).toEqual({ shape: "rhs", b: 120, h: 120, t: 6.3 });
  });

  it("on a change of standard keep member, section and K and take the new standard's strengths", () => {
    const next = changeMaterial(m1(), "steel-aisc360", "N-mm");
    expect(next.members[0]).toEqual({ member: "U1U2", section: { shape: "rhs", b: 120, h: 120, t: 6.3 }, props: { K: 1, Fy: 345, Fu: 450, E: 200000 } });
  });

  it("moving to timber replaces a steel hollow section by sawn lumber", () => {
    const next = changeMaterial(m1(), "timber-nds", "lb-in");
    expect(next.members[0].section).toEqual({ shape: "timber", b: 1.5, d: 7.25, product: "sawn" });
    expect(next.members[0].props).toMatchObject({ FcStar: 1500, FtPrime: 675, EminPrime: 620000, c: "sawn" });
  });

  it("a new row copies the last one for the first truss member not yet listed", () => {
    const row = newMemberRow(m1(), ["U1U2", "U2U3", "U3U4"], "N-mm");
    expect(row.member).toBe("U3U4");
    expect(row.section).toEqual({ shape: "chs", D: 76.1, t: 4 });
    expect(row.props.fy).toBe(355);
  });

  it("a first row starts from the standard's defaults", () => {
    const row = newMemberRow({ truss: "T1", source: "", material: "steel-en1993", members: [] }, ["L0L1"], "N-mm");
    expect(row).toEqual({ member: "L0L1", section: { shape: "rhs", b: 100, h: 100, t: 5 }, props: { K: 1, ...propertyDefaults("steel-en1993", "N-mm") } });
  });

  it("a new shape keeps the dimensions it shares with the old one", () => {
    const angle = { member: "X", section: { shape: "angle", d: 90, b: 60, t: 8 }, props: {} };
    expect(withShape(angle, "double-angle", "N-mm").section).toEqual({ shape: "double-angle", d: 90, b: 60, t: 8, gap: 10 });
    expect(switchShape({ shape: "rhs", b: 1, h: 2, t: 0.1 }, "chs", "in")).toEqual({ shape: "chs", D: 3.5, t: 0.1 });
  });

  it("changed inputs still evaluate: every member checked to the new standard", () => {
    const calcs = demoCalcs();
    const m = calcs.find((c) => c.label === "M1");
    if (!m) throw new Error("no M1");
    m.inputs = toMemberDesignInputs(changeMaterial(readMemberDesignInputs(m.inputs), "steel-aisc360", "N-mm"));
    const result = resultOf(evaluateCalcs({ calcs }), "M1");
    expect(result.status).toBe("ok");
    expect((result.view as { rows: { governs: string }[] }).rows[0].governs).toMatch(/AISC 360-16/);
  });
});

describe("shapes and properties offered", () => {
  it("offers steel shapes for steel and solid timber sections for timber, each with A and r as an option", () => {
    expect(shapesFor("steel-en1993").map((o) => o.value)).toEqual(["angle", "double-angle", "channel", "chs", "rhs", "round", "rectangle", "properties"]);
    expect(shapesFor("timber-nds").map((o) => o.value)).toEqual(["timber", "rectangle", "round", "properties"]);
    expect(sectionFields("properties").map((f) => f.key)).toEqual(["A", "rmin", "d"]);
    expect(sectionFields("channel").map((f) => f.key)).toEqual(["d", "bf", "tf", "tw"]);
  });

  it("asks each standard for its own properties", () => {
    expect(propertyFields("steel-aisc360").map((f) => f.key)).toEqual(["Fy", "Fu", "E", "method", "An", "U"]);
    expect(propertyFields("steel-en1993").map((f) => f.key)).toContain("curve");
    expect(propertyFields("timber-nds").map((f) => f.key)).toEqual(["FcStar", "FtPrime", "EminPrime", "c", "An"]);
  });

  it("knows every field path it shows, so only the rest are listed apart", () => {
    const paths = memberFormPaths(m1());
    expect(paths.has("members[0].section.t")).toBe(true);
    expect(paths.has("members[5].section.D")).toBe(true);
    expect(paths.has("members[0].gammaM1")).toBe(true);
    expect(paths.has("members[0].colour")).toBe(false);
  });
});

describe("MemberRowEditor", () => {
  const props = (over: Partial<MemberRowEditorProps> = {}): MemberRowEditorProps => ({
    row: m1().members[0],
    index: 0,
    material: "steel-en1993",
    system: "N-mm",
    units: { length: "mm", stress: "MPa" },
    memberOptions: [{ value: "U1U2", label: "U1U2" }],
    errors: [],
    readOnly: false,
    onChange: () => undefined,
    onRemove: () => undefined,
    ...over,
  });

  it("labels every field with its name, unit and member", () => {
    const html = renderToStaticMarkup(createElement(MemberRowEditor, props()));
    expect(html).toContain('aria-label="yield strength fy (MPa), member U1U2"');
    expect(html).toContain('aria-label="wall t (mm), member U1U2"');
    expect(html).toContain('aria-label="effective length factor K, member U1U2"');
    expect(html).toContain("blank: 1.25");
  });

  it("shows the calc's problem on the field that has it", () => {
    const html = renderToStaticMarkup(createElement(MemberRowEditor, props({ errors: [{ path: "members[0].section.t", message: "two walls must be thinner than both b and h" }] })));
    expect(html).toMatch(/aria-label="wall t \(mm\), member U1U2" aria-invalid="true"/);
    expect(html).toContain("two walls must be thinner than both b and h");
  });

  it("read-only, shows the same fields as values without controls", () => {
    const html = renderToStaticMarkup(createElement(MemberRowEditor, props({ readOnly: true })));
    expect(html).not.toContain("<input");
    expect(html).not.toContain("<select");
    expect(html).not.toContain("Remove");
    expect(html).toContain("Rectangular hollow (RHS, SHS)");
    expect(html).toContain(">6.3<");
  });
});
