"use client";

import { createContext, useContext } from "react";

/**
 * Whether the math inside a calc is on (or near) the screen. Typesetting is
 * the costly part of a re-render; a calc scrolled far away keeps its values
 * current but typesets only when it comes into view. Defaults to visible, so
 * server rendering, exports and tests always typeset.
 */
export const MathVisibility = createContext(true);

export function useMathVisible(): boolean {
  return useContext(MathVisibility);
}
