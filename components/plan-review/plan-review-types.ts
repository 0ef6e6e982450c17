import type { ResponseLetter } from "@/lib/report/report-model";

/** What the plan-review page passes to the browser (dates as strings). */
export type RevisionChoice = { id: string; number: number; label: string };

export type AnsweredInDto = { type: "calc"; calcId: string; label: string } | { type: "heading"; index: number; text: string };

export type CommentDto = {
  id: string;
  revisionId: string;
  revisionLabel: string;
  number: string;
  text: string;
  reviewer: string | null;
  receivedOn: string | null;
  response: string;
  answeredIn: AnsweredInDto[];
  editable: boolean;
};

export type CommentListDto = { answers: RevisionChoice | null; revisions: RevisionChoice[]; comments: CommentDto[] };

export type LetterDto = { answers: { id: string; label: string } | null; letter: ResponseLetter | null; problems: string[] };

/** Places of the current draft a comment may be answered in. */
export type DraftPlaces = {
  calcs: { id: string; label: string; kindName: string }[];
  headings: { index: number; number: string; text: string }[];
};
