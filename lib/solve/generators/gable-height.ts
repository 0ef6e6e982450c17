/**
 * Height of panel point `i` of `panels` on a symmetric gable line that rises
 * `rise` from the ends to midspan. Computed from the index, not from x, so
 * mirrored panel points get bit-identical heights.
 */
export function gableHeight(rise: number, i: number, panels: number): number {
  return (rise * (panels - Math.abs(2 * i - panels))) / panels;
}
