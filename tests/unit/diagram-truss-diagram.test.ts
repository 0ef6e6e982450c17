import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ForceLegend } from "@/components/diagrams/force-legend";
import { TrussDiagram, type TrussDiagramProps } from "@/components/diagrams/truss-diagram";
import { solveTruss, type TrussModel } from "@/lib/solve";

function seedTriangle(): TrussModel {
  return {
    units: { length: "m", force: "kN" },
    joints: [{ id: "A", x: 0, y: 0 }, { id: "B", x: 4, y: 0 }, { id: "C", x: 2, y: 3 }],
    members: [{ id: "AB", start: "A", end: "B" }, { id: "BC", start: "B", end: "C" }, { id: "CA", start: "C", end: "A" }],
    supports: [{ joint: "A", type: "pin" }, { joint: "B", type: "roller" }],
    loadCases: [{ id: "D", loads: [{ joint: "C", fy: -10 }] }],
  };
}

const render = (props: TrussDiagramProps) => renderToStaticMarkup(createElement(TrussDiagram, props));

describe("TrussDiagram", () => {
  it("is an image with a title and a description in words", () => {
    const html = render({ model: seedTriangle(), title: "Roof truss T1" });
    expect(html).toContain('role="img"');
    expect(html).toMatch(/<title id="[^"]+">Roof truss T1<\/title>/);
    expect(html).toContain("Truss with 3 joints, 3 members and 2 supports; loads of case D.");
  });

  it("draws supports of both kinds, joint labels and the load with its unit", () => {
    const html = render({ model: seedTriangle() });
    expect(html).toContain('data-support="A" data-type="pin"');
    expect(html).toContain('data-support="B" data-type="roller"');
    expect(html).toContain("Pin support at A");
    expect(html).toMatch(/data-arrow="load" data-joint="C"/);
    expect(html).toContain("10 kN");
    expect(html).toContain("1 m");
  });

  it("after solving draws members by sense, states T or C, and adds the legend", () => {
    const model = seedTriangle();
    const html = render({ model, result: solveTruss(model).cases.D });
    expect(html).toContain('data-member="AB" data-sense="tension"');
    expect(html).toContain('data-member="BC" data-sense="compression"');
    expect(html).toMatch(/Largest tension [\d.]+ kN in AB/);
    expect(html).toContain("Tension (T), solid line");
    expect(html).toContain("Compression (C), double line");
    expect(html).not.toContain("Zero force, dotted");
    expect(html).toMatch(/>[\d.]+ T<\/tspan>/);
  });

  it("makes members keyboard-focusable buttons when they can be picked", () => {
    const html = render({ model: seedTriangle(), onMemberClick: () => undefined, highlightMembers: ["AB"] });
    expect(html).toContain('role="group"');
    expect(html).toContain('role="button" tabindex="0" aria-label="Member AB, A to B, selected" aria-pressed="true"');
    expect(html).toContain('aria-label="Member BC, B to C" aria-pressed="false"');
    expect(html).toContain('pointer-events="stroke"');
  });

  it("marks invalid input with a shape as well as the caution colour", () => {
    const html = render({ model: seedTriangle(), invalidMembers: ["CA"], invalidJoints: ["B"], result: solveTruss(seedTriangle()).cases.D });
    expect(html.match(/data-invalid-marker/g)?.length).toBe(2);
    expect(html).toContain("B !");
    expect(html).toContain("Input error (!)");
  });

  it("draws a section line and the faded rest in free-body mode", () => {
    const html = render({ model: seedTriangle(), cutMembers: ["AB", "BC"], keptJoints: ["B"] });
    expect(html).toContain("data-section-line");
    expect(html).toContain('data-cut-force="AB"');
    expect(html).toContain('opacity="0.22"');
  });

  it("draws an empty model as a message, and degenerate ones without NaN", () => {
    expect(render({ model: { joints: [], members: [], supports: [], loadCases: [] } })).toContain("No joints to draw yet");
    const one: TrussModel = { joints: [{ id: "A", x: 0, y: 0 }], members: [{ id: "M", start: "A", end: "Z" }], supports: [{ joint: "A", type: "pin" }], loadCases: [] };
    const same: TrussModel = { joints: [{ id: "A", x: 1, y: 1 }, { id: "B", x: 1, y: 1 }], members: [{ id: "AB", start: "A", end: "B" }], supports: [], loadCases: [{ id: "D", loads: [{ joint: "B", fx: 2 }] }] };
    for (const model of [one, same]) {
      const html = render({ model });
      expect(html).not.toContain("NaN");
      expect(html).not.toContain("Infinity");
    }
    expect(render({ model: one })).toContain("Not drawn (joint missing or both ends at one point): M.");
  });

  it("draws no loads for loadCaseId null, and a combination's loads when given", () => {
    expect(render({ model: seedTriangle(), loadCaseId: null })).not.toContain('data-arrow="load"');
    expect(render({ model: seedTriangle(), loads: [{ joint: "A", fx: 3 }] })).toContain("3 kN");
  });
});

describe("ForceLegend", () => {
  it("names each sense in words and states the widest force", () => {
    const html = renderToStaticMarkup(createElement(ForceLegend, { maxForce: 42.31, unit: "kN", showReactions: true }));
    expect(html).toContain('aria-label="Diagram legend"');
    expect(html).toContain("Tension (T), solid line");
    expect(html).toContain("Zero force, dotted");
    expect(html).toContain("42.3 kN");
    expect(html).toContain("Reaction");
    expect(html).toContain('aria-hidden="true"');
  });
});
