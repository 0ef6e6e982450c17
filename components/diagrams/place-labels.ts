import type { LabelPosition } from "./member-label-position";

/** An axis-aligned box in SVG coordinates. */
export type Box = { x0: number; y0: number; x1: number; y1: number };

export type LabelRequest = {
  key: string;
  /** Positions to try, best first. */
  candidates: LabelPosition[];
  width: number;
  height: number;
};

/** A rough width of a line of text: good enough to keep labels apart without measuring fonts. */
export function estimateTextWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.6;
}

/** The box a label occupies at a position, for a vertically centred baseline. */
export function labelBox(p: LabelPosition, width: number, height: number): Box {
  const x0 = p.anchor === "start" ? p.x : p.anchor === "end" ? p.x - width : p.x - width / 2;
  return { x0, y0: p.y - height / 2, x1: x0 + width, y1: p.y + height / 2 };
}

function overlaps(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/**
 * Greedy label placement: each label takes its first candidate that overlaps
 * neither an obstacle nor a label already placed; if none is free, the first
 * candidate (the conventional spot) is kept, so a crowded drawing stays
 * predictable rather than scattering labels.
 */
export function placeLabels(requests: LabelRequest[], obstacles: Box[] = []): Map<string, LabelPosition> {
  const taken = [...obstacles];
  const out = new Map<string, LabelPosition>();
  for (const r of requests) {
    if (r.candidates.length === 0) continue;
    const free = r.candidates.find((c) => {
      const box = labelBox(c, r.width, r.height);
      return !taken.some((t) => overlaps(box, t));
    });
    const chosen = free ?? r.candidates[0];
    taken.push(labelBox(chosen, r.width, r.height));
    out.set(r.key, chosen);
  }
  return out;
}
