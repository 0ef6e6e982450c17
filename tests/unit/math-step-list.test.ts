import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { StepList } from "@/components/math/step-list";
import { visibleSteps, workingToggleLabel } from "@/components/math/visible-steps";
import type { Step } from "@/lib/solve";

const steps: Step[] = [
  { latex: "\\sum M_A = 0", text: "Moments about A." },
  { latex: "R_B \\cdot 4 - 10 \\cdot 2 = 0" },
  { latex: "R_B = 5\\,\\mathrm{kN}", text: "Reaction at B, upward." },
];

describe("visibleSteps", () => {
  it("shows every step when expanded", () => {
    expect(visibleSteps(steps, false)).toEqual({ shown: steps.map((step, index) => ({ step, index })), hidden: 0 });
  });

  it("keeps only the result, numbered as the last step, when collapsed", () => {
    expect(visibleSteps(steps, true)).toEqual({ shown: [{ step: steps[2], index: 2 }], hidden: 2 });
  });

  it("has nothing to hide in a one-step or empty list", () => {
    expect(visibleSteps(steps.slice(0, 1), true).hidden).toBe(0);
    expect(visibleSteps([], true)).toEqual({ shown: [], hidden: 0 });
  });
});

describe("workingToggleLabel", () => {
  it("counts the hidden steps of working", () => {
    expect(workingToggleLabel(3, true)).toBe("Show working (2 steps)");
    expect(workingToggleLabel(2, true)).toBe("Show working (1 step)");
    expect(workingToggleLabel(3, false)).toBe("Hide working");
  });
});

describe("StepList", () => {
  const render = (props: Parameters<typeof StepList>[0]) => renderToStaticMarkup(createElement(StepList, props));

  it("lists every step with its math and its words, and offers to hide the working", () => {
    const html = render({ steps });
    expect(html.match(/data-step="/g)?.length).toBe(3);
    expect(html).toContain("Moments about A.");
    expect(html).toContain('aria-expanded="true"');
    expect(html).toContain("Hide working");
  });

  it("collapsed, shows only the result numbered 3 and a button naming what it reveals", () => {
    const html = render({ steps, collapsed: true, onToggle: () => undefined });
    expect(html.match(/data-step="/g)?.length).toBe(1);
    expect(html).toContain('data-step="3"');
    expect(html).toContain('start="3"');
    expect(html).toContain("Show working (2 steps)");
    expect(html).toContain('aria-expanded="false"');
    expect(html).not.toContain("Moments about A.");
  });

  it("points the button at the list it controls", () => {
    const html = render({ steps });
    const controls = html.match(/aria-controls="([^"]+)"/)?.[1];
    expect(controls).toBeTruthy();
    expect(html).toContain(`<ol id="${controls}"`);
  });

  it("has no button for a single step and renders nothing for none", () => {
    expect(render({ steps: steps.slice(2) })).not.toContain("<button");
    expect(render({ steps: [] })).toBe("");
  });

  it("starts collapsed when asked and uncontrolled", () => {
    expect(render({ steps, defaultCollapsed: true })).toContain("Show working (2 steps)");
  });
});
