import type { DbOrTrx } from "@/db/knex";

/** Where the next revision answers a comment, as stored: the label and text are what they read when linked. */
export type AnsweredInLink = { type: "calc"; calcId: string; label: string } | { type: "heading"; index: number; text: string };

export type PlanReviewComment = {
  id: string;
  packageId: string;
  revisionId: string;
  /** The reviewed revision's label ("0", "A" …). */
  revisionLabel: string;
  revisionNumber: number;
  number: string;
  position: number;
  text: string;
  reviewer: string | null;
  /** YYYY-MM-DD, or null when not given. */
  receivedOn: string | null;
  response: string;
  answeredIn: AnsweredInLink[];
  createdBy: string;
  createdAt: Date;
  updatedAt: Date;
};

export type NewPlanReviewComment = Pick<PlanReviewComment, "revisionId" | "number" | "position" | "text" | "reviewer" | "receivedOn"> & {
  firmId: string;
  projectId: string;
  packageId: string;
  createdBy: string;
};

export type CommentPatch = Partial<Pick<PlanReviewComment, "number" | "text" | "reviewer" | "receivedOn" | "response" | "answeredIn">>;

export type RevisionRef = { id: string; number: number; label: string };

function selectComments(trx: DbOrTrx, packageId: string) {
  return trx
    .from("planReviewComments as c")
    .join("revisions as r", "r.id", "c.revisionId")
    .select(
      "c.id", "c.packageId", "c.revisionId", "r.label as revisionLabel", "r.number as revisionNumber", "c.number", "c.position", "c.text", "c.reviewer",
      trx.raw("to_char(c.received_on, 'YYYY-MM-DD') as received_on"), "c.response", "c.answeredIn", "c.createdBy", "c.createdAt", "c.updatedAt",
    )
    .where("c.packageId", packageId);
}

/** A package's comments, oldest revision first, then as the office ordered them. Callers have already scoped the package to the actor. */
export async function listPackageComments(packageId: string, trx: DbOrTrx, o: { revisionId?: string } = {}): Promise<PlanReviewComment[]> {
  const q = selectComments(trx, packageId).orderBy([{ column: "r.number" }, { column: "c.position" }, { column: "c.createdAt" }]);
  return o.revisionId ? q.andWhere("c.revisionId", o.revisionId) : q;
}

export async function findPackageComment(packageId: string, commentId: string, trx: DbOrTrx): Promise<PlanReviewComment | undefined> {
  return selectComments(trx, packageId).andWhere("c.id", commentId).first();
}

export async function insertComments(rows: NewPlanReviewComment[], trx: DbOrTrx): Promise<string[]> {
  if (rows.length === 0) return [];
  const ids: { id: string }[] = await trx.insert(rows).into("planReviewComments").returning("id");
  return ids.map((r) => r.id);
}

export async function updateCommentRow(commentId: string, patch: CommentPatch, trx: DbOrTrx): Promise<void> {
  const { answeredIn, ...rest } = patch;
  await trx
    .from("planReviewComments")
    .where({ id: commentId })
    .update({ ...rest, ...(answeredIn ? { answeredIn: JSON.stringify(answeredIn) } : {}), updatedAt: trx.fn.now() });
}

export async function deleteCommentRow(commentId: string, trx: DbOrTrx): Promise<void> {
  await trx.from("planReviewComments").where({ id: commentId }).delete();
}

/** The next free position after the revision's comments (positions keep the office's order across several pastes). */
export async function nextCommentPosition(packageId: string, revisionId: string, trx: DbOrTrx): Promise<number> {
  const [row] = await trx.from("planReviewComments").where({ packageId, revisionId }).max<{ max: number | null }[]>({ max: "position" });
  return row.max === null ? 1 : row.max + 1;
}

/** The package's issued revisions, newest first. */
export async function listRevisionRefs(packageId: string, trx: DbOrTrx): Promise<RevisionRef[]> {
  return trx.from("revisions").select("id", "number", "label").where({ packageId }).orderBy("number", "desc");
}
