import { describe, expect, it } from "vitest";
import { conflictNotePrefix, mergeText } from "@/lib/client/autosave/merge-text";
import type { TipTapNode } from "@/lib/client/autosave/tiptap-node";
import { doc, para } from "./autosave-fixtures";

const isNote = (node: TipTapNode) => node.content?.[0]?.text === conflictNotePrefix;
const truss = (id: string, span: number): TipTapNode => ({ type: "truss", attrs: { id, label: "T1", inputs: { span } } });

describe("mergeText", () => {
  const base = doc(para("Intro", "a"), para("Loads", "b"), para("Checks", "c"));

  it("takes each side's change where the other side left the block alone", () => {
    const mine = doc(para("Intro, mine", "a"), para("Loads", "b"), para("Checks", "c"));
    const theirs = doc(para("Intro", "a"), para("Loads", "b"), para("Checks, theirs", "c"));
    expect(mergeText({ base, mine, theirs })).toEqual({
      document: doc(para("Intro, mine", "a"), para("Loads", "b"), para("Checks, theirs", "c")),
      conflicts: 0,
    });
  });

  it("keeps both versions of a block changed on both sides, theirs first, under a conflict note", () => {
    const mine = doc(para("Intro", "a"), para("Loads: 5 kN/m", "b"), para("Checks", "c"));
    const theirs = doc(para("Intro", "a"), para("Loads: 4 kN/m", "b"), para("Checks", "c"));
    const { document, conflicts } = mergeText({ base, mine, theirs, theirsLabel: "Ben Okafor" });
    expect(conflicts).toBe(1);
    const blocks = document.content ?? [];
    expect(blocks).toHaveLength(5);
    expect(isNote(blocks[1])).toBe(true);
    expect(blocks[1].content?.[1].text).toContain("Ben Okafor");
    expect(blocks.slice(2, 4)).toEqual([para("Loads: 4 kN/m", "b"), para("Loads: 5 kN/m", "b-mine")]);
    expect([blocks[0], blocks[4]]).toEqual([para("Intro", "a"), para("Checks", "c")]);
  });

  it("takes a change once, without a note, when both sides made the same one", () => {
    const same = doc(para("Intro", "a"), para("Loads: 5 kN/m", "b"), para("Checks", "c"));
    expect(mergeText({ base, mine: same, theirs: same })).toEqual({ document: same, conflicts: 0 });
  });

  it("keeps blocks added on either side in their places", () => {
    const mine = doc(para("Intro", "a"), para("Mine, new", "m"), para("Loads", "b"), para("Checks", "c"));
    const theirs = doc(para("Intro", "a"), para("Loads", "b"), para("Checks", "c"), para("Theirs, new", "t"));
    expect(mergeText({ base, mine, theirs }).document).toEqual(
      doc(para("Intro", "a"), para("Mine, new", "m"), para("Loads", "b"), para("Checks", "c"), para("Theirs, new", "t")),
    );
  });

  it("removes a block one side deleted and the other left alone", () => {
    const mine = doc(para("Intro", "a"), para("Checks", "c"));
    const theirs = doc(para("Intro, theirs", "a"), para("Loads", "b"), para("Checks", "c"));
    expect(mergeText({ base, mine, theirs })).toEqual({ document: doc(para("Intro, theirs", "a"), para("Checks", "c")), conflicts: 0 });
  });

  it("keeps, under a note, a block one side deleted and the other changed", () => {
    const mine = doc(para("Intro", "a"), para("Checks", "c"));
    const theirs = doc(para("Intro", "a"), para("Loads: 4 kN/m", "b"), para("Checks", "c"));
    const { document, conflicts } = mergeText({ base, mine, theirs });
    expect(conflicts).toBe(1);
    expect(document.content?.slice(1, 3).map((n) => (isNote(n) ? "note" : n))).toEqual(["note", para("Loads: 4 kN/m", "b")]);
  });

  it("matches blocks without ids by their content, so an edit on one side is taken", () => {
    const plainBase = doc("Intro", "Loads", "Checks");
    const mine = doc("Intro", "Loads: 5 kN/m", "Checks");
    const theirs = doc("Intro", "Loads", "Checks", "Appendix");
    expect(mergeText({ base: plainBase, mine, theirs })).toEqual({ document: doc("Intro", "Loads: 5 kN/m", "Checks", "Appendix"), conflicts: 0 });
  });

  it("keeps both when the same block without an id was rewritten differently on both sides", () => {
    const plainBase = doc("Intro", "Loads");
    const { document, conflicts } = mergeText({ base: plainBase, mine: doc("Intro", "Loads: 5"), theirs: doc("Intro", "Loads: 4") });
    expect(conflicts).toBe(1);
    expect(document.content?.slice(2)).toEqual([para("Loads: 4"), para("Loads: 5")]);
  });

  it("merges calc nodes by id: an input changed on one side survives a text edit on the other", () => {
    const calcBase = doc(para("Intro", "a"), truss("t1", 12));
    const mine = doc(para("Intro", "a"), truss("t1", 14));
    const theirs = doc(para("Intro — revised", "a"), truss("t1", 12));
    expect(mergeText({ base: calcBase, mine, theirs }).document).toEqual(doc(para("Intro — revised", "a"), truss("t1", 14)));
  });

  it("gives the author's copy of a calc changed on both sides its own id and label, so the document still validates", () => {
    const calcBase = doc(truss("calc-0001", 12));
    const { document, conflicts } = mergeText({ base: calcBase, mine: doc(truss("calc-0001", 14)), theirs: doc(truss("calc-0001", 16)) });
    expect(conflicts).toBe(1);
    expect(document.content?.slice(1)).toEqual([
      truss("calc-0001", 16),
      { type: "truss", attrs: { id: "calc-0001-mine", label: "T1_mine", inputs: { span: 14 } } },
    ]);
  });

  it("without a known base keeps what either side has and marks blocks that differ", () => {
    const mine = doc(para("Intro", "a"), para("Loads: 5", "b"), para("Mine only", "m"));
    const theirs = doc(para("Intro", "a"), para("Loads: 4", "b"));
    const { document, conflicts } = mergeText({ base: null, mine, theirs });
    expect(conflicts).toBe(1);
    const blocks = (document.content ?? []).filter((n) => !isNote(n));
    expect(blocks).toEqual([para("Intro", "a"), para("Loads: 4", "b"), para("Loads: 5", "b-mine"), para("Mine only", "m")]);
  });

  it("returns theirs unchanged when the author changed nothing", () => {
    const theirs = doc(para("Intro", "a"), para("Loads, theirs", "b"), para("Checks", "c"));
    expect(mergeText({ base, mine: base, theirs })).toEqual({ document: theirs, conflicts: 0 });
  });
});
