import { describe, expect, it } from "vitest";
import { caretPlace, moveFocus, type MoveFocusOptions } from "@/components/editor/input-table/move-focus";

const grid = { rows: 3, cols: 4 };
const press = (key: string, row: number, col: number, extra: Partial<MoveFocusOptions> = {}) => moveFocus({ ...grid, at: { row, col }, key, ...extra });

describe("moveFocus", () => {
  it("moves up and down with the arrows and stops at the edges", () => {
    expect(press("ArrowDown", 0, 1)).toEqual({ kind: "move", to: { row: 1, col: 1 } });
    expect(press("ArrowUp", 1, 1)).toEqual({ kind: "move", to: { row: 0, col: 1 } });
    expect(press("ArrowUp", 0, 1)).toEqual({ kind: "none" });
    expect(press("ArrowDown", 2, 1)).toEqual({ kind: "none" });
  });

  it("moves left and right only from the edge of the text, so the caret can still move inside a value", () => {
    expect(press("ArrowRight", 0, 0, { caret: "end" })).toEqual({ kind: "move", to: { row: 0, col: 1 } });
    expect(press("ArrowRight", 0, 0, { caret: "middle" })).toEqual({ kind: "none" });
    expect(press("ArrowRight", 0, 0, { caret: "start" })).toEqual({ kind: "none" });
    expect(press("ArrowLeft", 0, 2, { caret: "start" })).toEqual({ kind: "move", to: { row: 0, col: 1 } });
    expect(press("ArrowLeft", 0, 0, { caret: "both" })).toEqual({ kind: "none" });
  });

  it("moves down with Enter and up with Shift+Enter", () => {
    expect(press("Enter", 0, 2)).toEqual({ kind: "move", to: { row: 1, col: 2 } });
    expect(press("Enter", 1, 2, { shift: true })).toEqual({ kind: "move", to: { row: 0, col: 2 } });
  });

  it("adds a row with Enter on the last row, landing in the same column", () => {
    expect(press("Enter", 2, 1)).toEqual({ kind: "add-row", to: { row: 3, col: 1 } });
    expect(press("Enter", 2, 1, { canAddRow: false })).toEqual({ kind: "none" });
  });

  it("does nothing for Enter in an empty grid (the add button makes the first row)", () => {
    expect(moveFocus({ rows: 0, cols: 3, at: { row: 0, col: 0 }, key: "Enter" })).toEqual({ kind: "none" });
  });

  it("lets a button handle Enter itself", () => {
    expect(press("Enter", 0, 3, { isButton: true })).toEqual({ kind: "none" });
    expect(press("ArrowLeft", 0, 3, { isButton: true })).toEqual({ kind: "move", to: { row: 0, col: 2 } });
  });

  it("walks Tab along the row and on to the next, and lets Tab leave the table from the last cell", () => {
    expect(press("Tab", 0, 1)).toEqual({ kind: "move", to: { row: 0, col: 2 } });
    expect(press("Tab", 0, 3)).toEqual({ kind: "move", to: { row: 1, col: 0 } });
    expect(press("Tab", 2, 3)).toEqual({ kind: "none" });
    expect(press("Tab", 1, 0, { shift: true })).toEqual({ kind: "move", to: { row: 0, col: 3 } });
    expect(press("Tab", 0, 0, { shift: true })).toEqual({ kind: "none" });
  });

  it("leaves keys with Ctrl, Alt or Meta, and other keys, to the browser", () => {
    expect(press("ArrowDown", 0, 0, { modifier: true })).toEqual({ kind: "none" });
    expect(press("a", 0, 0)).toEqual({ kind: "none" });
  });
});

describe("caretPlace", () => {
  it("reads the caret's edge from the selection", () => {
    expect(caretPlace(0, 0, 5)).toBe("start");
    expect(caretPlace(5, 5, 5)).toBe("end");
    expect(caretPlace(2, 2, 5)).toBe("middle");
    expect(caretPlace(0, 5, 5)).toBe("both");
    expect(caretPlace(0, 0, 0)).toBe("both");
    expect(caretPlace(null, null, 3)).toBe("both");
  });
});
