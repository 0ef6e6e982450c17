/**
 * Rotation, in degrees for SVG `rotate()`, of a support symbol drawn upright
 * (apex at the joint, base below). The symbol turns so that its apex points
 * along the restrained direction, seated on the side the reaction pushes from:
 * [0, 1] is upright, [1, 0] sits to the left of the joint, [0, -1] hangs above.
 * `direction` is in model axes (y up); a zero or missing direction is upright.
 */
export function supportRotation(direction: [number, number] | undefined): number {
  if (!direction) return 0;
  const [dx, dy] = direction;
  if (!Number.isFinite(dx) || !Number.isFinite(dy) || (dx === 0 && dy === 0)) return 0;
  // SVG rotate(θ) takes the upright apex vector (0, -1) to (sin θ, -cos θ); it must equal (dx, -dy) in SVG axes.
  const deg = (Math.atan2(dx, dy) * 180) / Math.PI;
  return Math.round(deg * 1000) / 1000 + 0;
}
