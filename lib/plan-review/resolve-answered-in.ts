import { AppError } from "@/lib/app-error";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import type { AnsweredInLink } from "@/lib/data/plan-review-comments";
import { numberedHeadings } from "@/lib/document/numbered-headings";
import type { AnsweredInLinkInput } from "@/lib/validation/plan-review-input";

/**
 * Checks each "answered in" link against the draft's document and stores what
 * it reads now: a calc must exist (its current label is kept), a heading must
 * stand at that position, or — when the editor sent its text and the heading has moved — read so elsewhere.
 * Duplicates are dropped. Errors name the field: `answeredIn[1].calcId`.
 */
export function resolveAnsweredIn(links: AnsweredInLinkInput[], document: unknown): AnsweredInLink[] {
  const calcs = new Map(extractCalcs(document).map((c) => [c.id, c]));
  const headings = new Map(numberedHeadings(document).map((h) => [h.index, h]));
  const out: AnsweredInLink[] = [];
  const seen = new Set<string>();
  links.forEach((link, i) => {
    if (link.type === "calc") {
      const calc = calcs.get(link.calcId);
      if (!calc) throw new AppError("INVALID", `answeredIn[${i}].calcId: the current draft has no calc with id "${link.calcId}".`, `answeredIn[${i}].calcId`);
      if (!seen.has(`calc:${calc.id}`)) out.push({ type: "calc", calcId: calc.id, label: calc.label });
      seen.add(`calc:${calc.id}`);
      return;
    }
    // A heading that moved since the page was loaded is found again by its text.
    const wanted = link.text?.trim();
    const atIndex = headings.get(link.index);
    const heading = wanted === undefined ? atIndex : atIndex?.text === wanted ? atIndex : [...headings.values()].find((h) => h.text === wanted);
    if (!heading) {
      if (wanted !== undefined && atIndex) throw new AppError("INVALID", `answeredIn[${i}].text: the current draft has no heading "${wanted}"; the one at that position now reads "${atIndex.text}".`, `answeredIn[${i}].text`);
      throw new AppError("INVALID", `answeredIn[${i}].index: the current draft has no heading at position ${link.index}.`, `answeredIn[${i}].index`);
    }
    if (!seen.has(`heading:${heading.index}`)) out.push({ type: "heading", index: heading.index, text: heading.text });
    seen.add(`heading:${heading.index}`);
  });
  return out;
}
