import { extractCalcs } from "@/lib/calcs/extract-calcs";
import type { AnsweredInLink } from "@/lib/data/plan-review-comments";
import { numberedHeadings, type NumberedHeading } from "@/lib/document/numbered-headings";
import type { ResponseLetter } from "@/lib/report/report-model";

export type LetterComment = { number: string; text: string; response: string; reviewer: string | null; receivedOn: string | null; answeredIn: AnsweredInLink[] };

export type BuildResponseLetterOptions = {
  /** Label of the revision the comments were made on. */
  answersRevisionLabel: string;
  /** In the office's order. */
  comments: LetterComment[];
  /** The document of the revision that answers them (the current draft). */
  document: unknown;
};

/** The letter, and what would make it wrong to send: a comment without response, or a link to a calc or heading no longer there. */
export type BuiltResponseLetter = { letter: ResponseLetter; problems: string[] };

/**
 * Each comment quoted with its response and where the answering revision
 * addresses it, calcs by their current label and headings as the document now
 * numbers them ("3.2 Section cut"). A heading is found at its linked position
 * when it still reads the same, else by its text wherever it moved.
 */
export function buildResponseLetter({ answersRevisionLabel, comments, document }: BuildResponseLetterOptions): BuiltResponseLetter {
  const calcs = new Map(extractCalcs(document).map((c) => [c.id, c.label]));
  const headings = numberedHeadings(document);
  const problems: string[] = [];
  const letterComments = comments.map((c) => {
    if (!c.response.trim()) problems.push(`Plan-review comment ${c.number} has no response yet.`);
    const answeredIn = c.answeredIn.map((link) => {
      if (link.type === "calc") {
        const label = calcs.get(link.calcId);
        if (label !== undefined) return label;
        problems.push(`Plan-review comment ${c.number} is answered in calc ${link.label}, which is no longer in the package.`);
        return `${link.label} (removed)`;
      }
      const heading = findHeading(headings, link);
      if (heading) return `${heading.number} ${heading.text}`.trim();
      problems.push(`Plan-review comment ${c.number} is answered in the heading "${link.text}", which is no longer in the package.`);
      return `${link.text} (removed)`;
    });
    return { number: c.number, text: c.text, response: c.response.trim(), answeredIn };
  });
  const reviewers = [...new Set(comments.map((c) => c.reviewer?.trim()).filter((r): r is string => !!r))];
  const dates = comments.map((c) => c.receivedOn).filter((d): d is string => !!d).sort();
  return {
    letter: { answersRevisionLabel, reviewer: reviewers.length ? reviewers.join("; ") : null, date: dates.length ? dates[dates.length - 1] : null, comments: letterComments },
    problems,
  };
}

function findHeading(headings: NumberedHeading[], link: { index: number; text: string }): NumberedHeading | undefined {
  return headings.find((h) => h.index === link.index && h.text === link.text) ?? headings.find((h) => h.text === link.text);
}
