import { describe, expect, it } from "vitest";
import { uniqueBlockAttrs } from "@/lib/client/autosave/unique-block-attrs";
import type { TipTapNode } from "@/lib/client/autosave/tiptap-node";

const calc = (id: string, label: string): TipTapNode => ({ type: "formula", attrs: { id, label, inputs: {} } });

describe("uniqueBlockAttrs", () => {
  it("leaves blocks with distinct ids and labels as they are", () => {
    const blocks = [calc("calc-aaaa", "F1"), calc("calc-bbbb", "F2"), { type: "paragraph" }];
    expect(uniqueBlockAttrs(blocks)).toEqual(blocks);
  });

  it("renames the later of two blocks sharing an id and a label, and numbers further copies", () => {
    const renamed = uniqueBlockAttrs([calc("calc-aaaa", "F1"), calc("calc-aaaa", "F1"), calc("calc-aaaa", "F1")]);
    expect(renamed.map((n) => [n.attrs?.id, n.attrs?.label])).toEqual([
      ["calc-aaaa", "F1"],
      ["calc-aaaa-mine", "F1_mine"],
      ["calc-aaaa-mine2", "F1_mine2"],
    ]);
  });

  it("keeps renamed labels within the 16 characters a label may have, and ids within 64", () => {
    const longId = "x".repeat(64);
    const [, copy] = uniqueBlockAttrs([calc(longId, "TopChordForces"), calc(longId, "TopChordForces")]);
    expect(String(copy.attrs?.label)).toMatch(/^[A-Za-z][A-Za-z0-9_]{0,15}$/);
    expect(String(copy.attrs?.id).length).toBeLessThanOrEqual(64);
  });
});
