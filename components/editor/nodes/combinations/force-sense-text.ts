/** Tension or compression in words, so a sign is never the only clue. Round-off below `tolerance` is no force. */
export function forceSenseText(force: number, tolerance = 1e-9): "tension" | "compression" | "no force" {
  if (!Number.isFinite(force) || Math.abs(force) < tolerance) return "no force";
  return force > 0 ? "tension" : "compression";
}
