import { describe, expect, it } from "vitest";
import { conflictNotePrefix, mergeText } from "@/lib/client/autosave/merge-text";
import type { TipTapNode } from "@/lib/client/autosave/tiptap-node";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import { validatePackageDocument } from "@/lib/document/validate-package-document";

/** The demo package as the editor would hold it, with `change` applied to one copy. */
function demo(change: (blocks: TipTapNode[]) => void = () => undefined): TipTapNode {
  const document = JSON.parse(JSON.stringify(demoFootbridgeDocument())) as TipTapNode;
  change(document.content ?? []);
  return document;
}

const formulaF1 = (blocks: TipTapNode[]) => {
  const found = blocks.find((block) => block.attrs?.id === demoCalcIds.F1);
  if (!found?.attrs) throw new Error("the demo has a formula F1");
  return found.attrs as { inputs: { source: string } };
};
const firstParagraph = (blocks: TipTapNode[]) => {
  const found = blocks.find((block) => block.type === "paragraph" && block.content?.[0]?.type === "text" && !block.content[0].marks);
  if (!found?.content?.[0]) throw new Error("the demo has a plain paragraph");
  return found.content[0];
};

describe("a merge of two edits of the footbridge package", () => {
  it("passes the server's document validation, conflict notes and the author's copy of a calc included", () => {
    const base = demo();
    const mine = demo((blocks) => {
      formulaF1(blocks).inputs.source += "\nutil = sigma_Ed / (355 MPa)";
      firstParagraph(blocks).text = "Mine: the span is 24 m.";
    });
    const theirs = demo((blocks) => {
      formulaF1(blocks).inputs.source += "\nmargin = 355 MPa - sigma_Ed";
      firstParagraph(blocks).text = "Theirs: the span is 24.0 m.";
    });
    const { document, conflicts } = mergeText({ base, mine, theirs, theirsLabel: "Ben Okafor" });
    expect(conflicts).toBe(2);
    expect(document.content?.filter((block) => block.content?.[0]?.text === conflictNotePrefix)).toHaveLength(2);

    const checked = validatePackageDocument(document);
    expect(checked.ok ? "valid" : checked.message).toBe("valid");
  });
});
