import type { TrussModel } from "../types";
import { buildFan } from "./build-fan";
import { buildFink } from "./build-fink";
import { buildK } from "./build-k";
import { buildMonoPitch } from "./build-mono-pitch";
import { buildPitched } from "./build-pitched";
import { buildPrattHowe } from "./build-pratt-howe";
import { buildWarren } from "./build-warren";
import type { GenerateTrussOptions } from "./generate-truss-options";
import { generateTrussSchema } from "./generate-truss-schema";
import { invalidFromZod } from "./invalid-from-zod";
import { resolveRise } from "./resolve-rise";
import type { ShapeLayout } from "./shape-layout";

/** A generated truss: the model plus the joint lists a line load or a diagram needs. */
export type GeneratedTruss = {
  /** Joints, members (bottom chord, top chord, webs), pin at the left end, vertical roller at the right; no load cases. */
  model: TrussModel;
  /** Joint ids of each chord, left to right; pitched top chords start and end at the shared heels. */
  chords: { top: string[]; bottom: string[] };
  /** Joint ids of the loaded chord (`loadedChord`), left to right: where panel loads usually go. */
  panelPoints: string[];
  /** The chord a deck or roof usually bears on: bottom for parallel-chord shapes, top for roof shapes. */
  loadedChord: "top" | "bottom";
};

/**
 * Lays out a common truss shape from span, depth or rise, and panel count.
 * Every shape is statically determinate and stable on its supports
 * (m + r = 2j). Throws SolveError "INVALID" with `path` naming the bad option.
 * The label convention per shape is documented beside each layout (build-*.ts).
 */
export function generateTruss(options: GenerateTrussOptions): GeneratedTruss {
  const parsed = generateTrussSchema.safeParse(options);
  if (!parsed.success) throw invalidFromZod(parsed.error, "truss generator");
  const o = parsed.data;
  const layout = lay(o);
  const bottom = layout.bottom;
  const model = layout.builder.build({ A: o.A, E: o.E, units: o.units, pin: bottom[0], roller: bottom[bottom.length - 1] });
  return {
    model,
    chords: { top: layout.top, bottom },
    panelPoints: layout.loadedChord === "top" ? layout.top : bottom,
    loadedChord: layout.loadedChord,
  };
}

function lay(o: GenerateTrussOptions): ShapeLayout {
  const grid = { span: o.span, panels: o.panels };
  switch (o.shape) {
    case "pratt":
    case "howe":
      return buildPrattHowe({ ...grid, web: o.shape, depth: o.depth, ends: o.ends ?? "vertical" });
    case "warren":
    case "warren-verticals":
      return buildWarren({ ...grid, depth: o.depth, verticals: o.shape === "warren-verticals" });
    case "k":
      return buildK({ ...grid, depth: o.depth });
    case "parallel-chord": {
      const web = o.web ?? "pratt";
      if (web === "pratt" || web === "howe") return buildPrattHowe({ ...grid, web, depth: o.depth, ends: o.ends ?? "vertical" });
      if (web === "k") return buildK({ ...grid, depth: o.depth });
      return buildWarren({ ...grid, depth: o.depth, verticals: web === "warren-verticals" });
    }
    case "pratt-pitched":
    case "howe-pitched":
      return buildPitched({ ...grid, web: o.shape === "pratt-pitched" ? "pratt" : "howe", rise: resolveRise(o, o.span / 2), bottomRise: 0 });
    case "scissors": {
      const rise = resolveRise(o, o.span / 2);
      // Common practice: the bottom chord pitched at about half the top chord's.
      const bottomRise = resolveRise({ rise: o.bottomRise, pitch: o.bottomPitch }, o.span / 2, rise / 2);
      return buildPitched({ ...grid, web: "pratt", rise, bottomRise });
    }
    case "fink":
      return buildFink({ ...grid, rise: resolveRise(o, o.span / 2) });
    case "fan":
      return buildFan({ ...grid, rise: resolveRise(o, o.span / 2) });
    case "mono-pitch":
      return buildMonoPitch({ ...grid, rise: resolveRise(o, o.span) });
  }
}
