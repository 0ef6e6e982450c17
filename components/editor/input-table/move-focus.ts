/** A cell by row and column index; the last column may be the row's remove button. */
export type CellPosition = { row: number; col: number };

export type MoveFocusOptions = {
  at: CellPosition;
  key: string;
  shift?: boolean;
  /** Ctrl, Alt or Meta held: left to the browser (word jumps, shortcuts). */
  modifier?: boolean;
  rows: number;
  cols: number;
  /**
   * Where the caret is in a text field; arrows left and right only leave the
   * cell from its edge, so they still move the caret inside a value.
   * A select or a button is "both": it has no caret.
   */
  caret?: "start" | "end" | "both" | "middle";
  /** A button handles Enter itself (it presses it). */
  isButton?: boolean;
  /** Enter on the last row may add one; not in a read-only table. */
  canAddRow?: boolean;
};

export type FocusMove = { kind: "move"; to: CellPosition } | { kind: "add-row"; to: CellPosition } | { kind: "none" };

const NONE: FocusMove = { kind: "none" };

/**
 * Spreadsheet-like movement in an input grid. "none" means the key is not the
 * grid's: the browser's default applies, so Tab past the last cell leaves the
 * table instead of trapping focus in it.
 */
export function moveFocus({ at, key, shift = false, modifier = false, rows, cols, caret = "both", isButton = false, canAddRow = true }: MoveFocusOptions): FocusMove {
  if (modifier || rows <= 0 || cols <= 0) return NONE;
  const { row, col } = at;
  const to = (r: number, c: number): FocusMove => ({ kind: "move", to: { row: r, col: c } });
  switch (key) {
    case "ArrowUp":
      return row > 0 ? to(row - 1, col) : NONE;
    case "ArrowDown":
      return row < rows - 1 ? to(row + 1, col) : NONE;
    case "ArrowLeft":
      return col > 0 && (caret === "start" || caret === "both") ? to(row, col - 1) : NONE;
    case "ArrowRight":
      return col < cols - 1 && (caret === "end" || caret === "both") ? to(row, col + 1) : NONE;
    case "Enter":
      if (isButton) return NONE;
      if (shift) return row > 0 ? to(row - 1, col) : NONE;
      if (row < rows - 1) return to(row + 1, col);
      return canAddRow ? { kind: "add-row", to: { row: rows, col } } : NONE;
    case "Tab":
      if (shift) {
        if (col > 0) return to(row, col - 1);
        return row > 0 ? to(row - 1, cols - 1) : NONE;
      }
      if (col < cols - 1) return to(row, col + 1);
      return row < rows - 1 ? to(row + 1, 0) : NONE;
    default:
      return NONE;
  }
}

/** The caret's place in a text field, from its selection. A selection spanning all the text counts as both edges. */
export function caretPlace(selectionStart: number | null, selectionEnd: number | null, length: number): MoveFocusOptions["caret"] {
  if (selectionStart === null || selectionEnd === null) return "both";
  const atStart = selectionStart === 0 && selectionEnd === 0;
  const atEnd = selectionStart === length && selectionEnd === length;
  if (length === 0 || (selectionStart === 0 && selectionEnd === length)) return "both";
  return atStart ? "start" : atEnd ? "end" : "middle";
}
