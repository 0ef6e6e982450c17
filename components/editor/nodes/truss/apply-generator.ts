import { generateTruss, isSolveError, type GenerateTrussOptions } from "@/lib/solve";
import { hasEndPosts, usesDepth, type GeneratorForm } from "./generator-form";
import type { TrussDraft } from "./truss-draft";

export type AppliedGenerator =
  | { ok: true; draft: TrussDraft; joints: number; members: number; section: { A?: number; E?: number } }
  | { ok: false; field: "span" | "height" | "panels" | "shape"; message: string };

/**
 * A new geometry from the generator: joints, members and supports replaced;
 * every member takes the first member's section (the usual start for a
 * uniform truss); load cases are kept, and each line load moves to the new
 * loaded chord (the deck or roof chord of the shape). A bad option comes back
 * on the field to fix.
 */
export function applyGenerator(draft: TrussDraft, form: GeneratorForm): AppliedGenerator {
  if (form.span === undefined) return { ok: false, field: "span", message: "Give the span." };
  if (form.height === undefined) return { ok: false, field: "height", message: usesDepth(form.shape) ? "Give the depth." : "Give the rise." };
  if (form.panels === undefined) return { ok: false, field: "panels", message: "Give the number of panels." };
  const options = toOptions(form, form.span, form.height, form.panels);
  let generated;
  try {
    generated = generateTruss(options);
  } catch (e) {
    if (!isSolveError(e)) throw e;
    const field = e.path === "depth" || e.path === "rise" ? "height" : e.path === "span" || e.path === "panels" ? e.path : "shape";
    return { ok: false, field, message: e.message.replace(/^truss generator: (?:[\w.[\]]+: )?/, "") };
  }
  const { model, panelPoints } = generated;
  const section = { A: draft.members[0]?.A, E: draft.members[0]?.E };
  const next: TrussDraft = {
    ...draft,
    joints: model.joints.map((j) => ({ id: j.id, x: j.x, y: j.y })),
    members: model.members.map((m) => ({ id: m.id, start: m.start, end: m.end, ...section })),
    supports: model.supports.map((s) => ({ joint: s.joint, type: s.type })),
    generator: {
      shape: form.shape,
      span: form.span,
      panels: form.panels,
      ...(usesDepth(form.shape) ? { depth: form.height } : { rise: form.height }),
      ...(hasEndPosts(form.shape) ? { ends: form.ends } : {}),
    },
  };
  if (draft.lineLoads) next.lineLoads = draft.lineLoads.map((l) => ({ ...l, chord: [...panelPoints] }));
  return { ok: true, draft: next, joints: model.joints.length, members: model.members.length, section };
}

function toOptions(form: GeneratorForm, span: number, height: number, panels: number): GenerateTrussOptions {
  const base = { span, panels };
  switch (form.shape) {
    case "pratt":
    case "howe":
    case "parallel-chord":
      return { ...base, shape: form.shape, depth: height, ends: form.ends };
    case "warren":
    case "warren-verticals":
    case "k":
      return { ...base, shape: form.shape, depth: height };
    default:
      return { ...base, shape: form.shape, rise: height };
  }
}
