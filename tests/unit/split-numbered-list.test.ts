import { describe, expect, it } from "vitest";
import { headingNumbers } from "@/components/editor/heading-numbers";
import { numberedHeadings } from "@/lib/document/numbered-headings";
import { matchItemStart, splitNumberedList } from "@/lib/plan-review/split-numbered-list";

const numbersOf = (paste: string) => splitNumberedList(paste).items.map((i) => i.number);

describe("splitting a pasted list of plan-review comments", () => {
  it("splits the usual numbering styles and keeps wrapped lines with their item", () => {
    const paste = "1. Provide the wind load derivation,\n   continued on this line.\n2) Verify joint L2.\n(3) Show the bearing detail.\nComment 4: Confirm the splice.";
    expect(splitNumberedList(paste)).toEqual({
      numbered: true,
      preamble: "",
      items: [
        { number: "1", text: "Provide the wind load derivation, continued on this line." },
        { number: "2", text: "Verify joint L2." },
        { number: "3", text: "Show the bearing detail." },
        { number: "4", text: "Confirm the splice." },
      ],
    });
  });

  it("reads numbers with letters and prefixes as the office wrote them", () => {
    expect(numbersOf("2a. Check the gusset.\n2b. Check the weld.\nS-3. Structural: anchor bolts.\nA12) Architectural note.")).toEqual(["2a", "2b", "S-3", "A12"]);
    expect(numbersOf("1 - Provide calcs.\n2 – Provide drawings.\n3 — Provide details.")).toEqual(["1", "2", "3"]);
    expect(numbersOf("Item 1. First.\nNo. 2 Second.\nComment #3 - Third.\n#4 Fourth.\nCOMMENT 5 Fifth.")).toEqual(["1", "2", "3", "4", "5"]);
    expect(numbersOf("1.) First.\n2: Second.\n3.1 Sub-clause with a capital.\n3.2. Another.")).toEqual(["1", "2", "3.1", "3.2"]);
  });

  it("tolerates blank lines between and inside items, Windows line ends and tabs", () => {
    const paste = "\r\n1. First comment.\r\n\r\n\tIts second paragraph.\r\n\r\n\r\n2. Second comment.\r\n\r\n";
    expect(splitNumberedList(paste).items).toEqual([
      { number: "1", text: "First comment.\n\nIts second paragraph." },
      { number: "2", text: "Second comment." },
    ]);
  });

  it("keeps bullets inside an item on their own lines, joining a bullet's wrapped line to it", () => {
    const paste = "1. Show the load path:\n   - at the pinned end, including\n     the anchor bolts\n   * at the roller\n   • at the splice\n2. Next.";
    expect(splitNumberedList(paste).items[0]).toEqual({ number: "1", text: "Show the load path:\n- at the pinned end, including the anchor bolts\n- at the roller\n- at the splice" });
  });

  it("keeps a nested numbered list, indented under an item, inside that item", () => {
    const paste = "1. Revise the connection:\n    1) bolt spacing\n    2) edge distance\n2. Provide the index.";
    expect(splitNumberedList(paste).items).toEqual([
      { number: "1", text: "Revise the connection: 1) bolt spacing 2) edge distance" },
      { number: "2", text: "Provide the index." },
    ]);
  });

  it("does not start an item at a wrapped line that merely begins with a quantity or a year", () => {
    const paste = "1. The span is taken as\n3.5 m in the calcs but\n24 m on the drawings.\n2. The 2021 edition is cited;\n2024. edition governs.";
    expect(splitNumberedList(paste).items).toEqual([
      { number: "1", text: "The span is taken as 3.5 m in the calcs but 24 m on the drawings." },
      { number: "2", text: "The 2021 edition is cited; 2024. edition governs." },
    ]);
  });

  it("keeps the text before the first number apart as the preamble", () => {
    const split = splitNumberedList("City of Alder Creek — Plan Review\nReviewer: R. Okafor\n\n1. Provide the index.");
    expect(split.preamble).toBe("City of Alder Creek — Plan Review Reviewer: R. Okafor");
    expect(split.items).toEqual([{ number: "1", text: "Provide the index." }]);
  });

  it("makes text without numbering one comment", () => {
    expect(splitNumberedList("Please provide the connection design\nfor the bottom chord splice.")).toEqual({
      numbered: false,
      preamble: "",
      items: [{ number: "1", text: "Please provide the connection design for the bottom chord splice." }],
    });
  });

  it("gives nothing for an empty or blank paste", () => {
    expect(splitNumberedList("").items).toEqual([]);
    expect(splitNumberedList("  \n\n\t ").items).toEqual([]);
  });

  it("drops a number with no text at all, but keeps a number whose text starts on the next line", () => {
    expect(splitNumberedList("1.\n2.\n   Verify the uplift.").items).toEqual([{ number: "2", text: "Verify the uplift." }]);
  });

  it("keeps numbering the office repeats or restarts, in the order pasted", () => {
    expect(numbersOf("1. A.\n2. B.\n1. C (second round).")).toEqual(["1", "2", "1"]);
  });

  it("recognises the start of an item only at the beginning of a line", () => {
    expect(matchItemStart("See comment 3 above.")).toBeNull();
    expect(matchItemStart("Note: verify.")).toBeNull();
    expect(matchItemStart("(12) Twelve.")).toEqual({ number: "12", text: "Twelve." });
  });
});

describe("the headings a comment can be answered in", () => {
  it("carry the numbers the editor's outline shows, with their text", () => {
    const h = (level: number, text: string) => ({ type: "heading", attrs: { level }, content: [{ type: "text", text }] });
    const doc = { type: "doc", content: [h(2, "Orphan"), h(1, "Basis"), { type: "paragraph" }, h(2, "Loads"), h(3, "Wind"), h(2, "Snow"), h(1, "Members"), h(3, "Deep")] };
    const editor = headingNumbers(doc);
    const server = numberedHeadings(doc);
    expect(server.map((x) => [x.index, x.number])).toEqual([...editor.entries()]);
    expect(server.map((x) => `${x.number} ${x.text}`)).toEqual(["1.1 Orphan", "1 Basis", "1.1 Loads", "1.1.1 Wind", "1.2 Snow", "2 Members", "2.1.1 Deep"]);
  });
});
