/** A point in either model or SVG coordinates (the type does not say which; the variable name does). */
export type Point = { x: number; y: number };

export type Margins = { top: number; right: number; bottom: number; left: number };

export type FitViewBoxOptions = {
  /** Model points (y up). Non-finite points are ignored, so a half-typed joint cannot break the drawing. */
  points: Point[];
  /** Width of the drawing in SVG units; the SVG itself scales to its container. */
  width?: number;
  /** The tallest the drawing may get; tall towers are scaled down to fit it. */
  maxHeight?: number;
  /** The shortest the drawing may get, so a flat or single-joint model still has room for its symbols. */
  minHeight?: number;
  /** Room around the model for supports, arrows and labels, in SVG units. */
  margin?: number | Margins;
};

export type ViewBox = {
  width: number;
  height: number;
  /** SVG units per model length unit; the same in x and y, so the drawing is to scale. */
  scale: number;
  /** The `viewBox` attribute value. */
  viewBox: string;
  /** Model point (y up) to SVG point (y down). */
  toSvg: (p: Point) => Point;
};

/**
 * Fits model points into a fixed-width drawing with one uniform scale, y flipped.
 * Symbol sizes stay in SVG units, so a 60 m bridge and a 3 m canopy get the same
 * size of text and arrows; only the geometry is scaled.
 */
export function fitViewBox({ points, width = 720, maxHeight = 420, minHeight = 160, margin = 64 }: FitViewBoxOptions): ViewBox {
  const m = typeof margin === "number" ? { top: margin, right: margin, bottom: margin, left: margin } : margin;
  const finite = points.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y));
  const innerW = Math.max(1, width - m.left - m.right);
  const innerHMax = Math.max(1, maxHeight - m.top - m.bottom);

  if (finite.length === 0) {
    const height = minHeight;
    return build(width, height, 1, (p) => ({ x: width / 2 + p.x, y: height / 2 - p.y }));
  }

  const xs = finite.map((p) => p.x);
  const ys = finite.map((p) => p.y);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const spanX = maxX - minX;
  const spanY = maxY - minY;

  // A zero span gives no constraint; if both are zero (one joint, or all coincident) any scale draws the same dot.
  const candidates: number[] = [];
  if (spanX > 0) candidates.push(innerW / spanX);
  if (spanY > 0) candidates.push(innerHMax / spanY);
  const scale = candidates.length > 0 ? Math.min(...candidates) : 1;

  const drawnW = spanX * scale;
  const drawnH = spanY * scale;
  const height = Math.max(minHeight, drawnH + m.top + m.bottom);
  // Centre in whatever room is left over, inside the margins.
  const offsetX = m.left + (innerW - drawnW) / 2;
  const offsetY = m.top + (height - m.top - m.bottom - drawnH) / 2;

  return build(width, height, scale, (p) => ({ x: offsetX + (p.x - minX) * scale, y: offsetY + (maxY - p.y) * scale }));
}

function build(width: number, height: number, scale: number, toSvg: (p: Point) => Point): ViewBox {
  return { width, height, scale, viewBox: `0 0 ${round(width)} ${round(height)}`, toSvg };
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
