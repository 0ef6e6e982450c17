import { diff3Hunks } from "./diff3-hunks";
import { lcsMatches } from "./lcs-matches";
import { stableJson } from "./stable-json";
import type { TipTapNode } from "./tiptap-node";
import { uniqueBlockAttrs } from "./unique-block-attrs";

export type MergeTextOptions = {
  /** The version both sides were edited from; null when it is not known (both are compared directly). */
  base: TipTapNode | null;
  mine: TipTapNode;
  theirs: TipTapNode;
  /** Who saved `theirs`, for the conflict notes. */
  theirsLabel?: string;
};

export type MergeTextResult = {
  document: TipTapNode;
  /** How many places were changed on both sides and now hold both versions under a note. */
  conflicts: number;
};

/** Every conflict note starts with this, so the editor (or a test) can find them. */
export const conflictNotePrefix = "Conflict:";

type Block = { node: TipTapNode; key: string; content: string };

/** Sentinel content for a base block we never saw: equal to neither side, so a difference is a conflict. */
const unknownContent = "\u0000unknown";

function toBlock(node: TipTapNode): Block {
  const content = stableJson(node);
  const id = node.attrs?.id;
  // Blocks with an id keep their identity through edits; others are known by what they hold.
  const key = typeof id === "string" && id !== "" ? `id:${id}` : `content:${content}`;
  return { node, key, content };
}

function conflictNote(theirsLabel: string): TipTapNode {
  const text = ` This passage was changed here and in the version saved by ${theirsLabel}. Their version comes first, then yours; keep what you want and delete this note.`;
  return { type: "paragraph", content: [{ type: "text", text: conflictNotePrefix, marks: [{ type: "bold" }] }, { type: "text", text }] };
}

/** Without a base, the blocks both sides share stand in for it: what only one side has is kept. */
function guessBase(mine: Block[], theirs: Block[]): Block[] {
  const matches = lcsMatches(
    mine.map((block) => block.key),
    theirs.map((block) => block.key),
  );
  const base: Block[] = [];
  matches.forEach((j, i) => {
    if (j === -1) return;
    const same = mine[i].content === theirs[j].content;
    base.push(same ? mine[i] : { ...mine[i], content: unknownContent });
  });
  return base;
}

const sameContent = (x: Block[], y: Block[]) => x.length === y.length && x.every((block, i) => block.content === y[i].content);

/**
 * A block-level three-way merge of two TipTap documents. Top-level blocks are
 * matched by `attrs.id` when they have one, else by their content (in order).
 * A block changed, added or removed on one side only takes that side. Where
 * both sides changed the same place differently, both are kept — the server's
 * first, then the author's — under a paragraph starting "Conflict:", so
 * nothing either person wrote is lost and the author decides. The author's
 * copy of a calc gets its own id and label (`-mine`, `_mine`) so the merged
 * document still validates.
 */
export function mergeText({ base, mine, theirs, theirsLabel = "someone else" }: MergeTextOptions): MergeTextResult {
  const mineBlocks = (mine.content ?? []).map(toBlock);
  const theirBlocks = (theirs.content ?? []).map(toBlock);
  const baseBlocks = base ? (base.content ?? []).map(toBlock) : guessBase(mineBlocks, theirBlocks);
  const out: TipTapNode[] = [];
  let conflicts = 0;
  const keepBoth = (theirSide: Block[], mySide: Block[]) => {
    conflicts++;
    out.push(conflictNote(theirsLabel), ...theirSide.map((b) => b.node), ...mySide.map((b) => b.node));
  };

  for (const hunk of diff3Hunks(baseBlocks, mineBlocks, theirBlocks, (block) => block.key)) {
    if (hunk.stable) {
      // Same blocks in the same places; a block with an id may still have been edited on either side.
      hunk.base.forEach((was, i) => {
        const [m, t] = [hunk.mine[i], hunk.theirs[i]];
        if (m.content === t.content || t.content === was.content) out.push(m.node);
        else if (m.content === was.content) out.push(t.node);
        else keepBoth([t], [m]);
      });
    } else if (sameContent(hunk.mine, hunk.theirs) || sameContent(hunk.theirs, hunk.base)) {
      out.push(...hunk.mine.map((b) => b.node));
    } else if (sameContent(hunk.mine, hunk.base)) {
      out.push(...hunk.theirs.map((b) => b.node));
    } else {
      keepBoth(hunk.theirs, hunk.mine);
    }
  }
  return { document: { ...theirs, content: uniqueBlockAttrs(out) }, conflicts };
}
