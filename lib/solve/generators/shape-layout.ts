import type { TrussBuilder } from "./truss-builder";

/** What a shape's layout hands back to `generateTruss` before supports and sections go on. */
export type ShapeLayout = {
  builder: TrussBuilder;
  /** Top chord joint ids, left to right (heels included where the chords meet). */
  top: string[];
  /** Bottom chord joint ids, left to right; the first gets the pin, the last the roller. */
  bottom: string[];
  /** The chord a deck or roof usually bears on for this shape. */
  loadedChord: "top" | "bottom";
};
