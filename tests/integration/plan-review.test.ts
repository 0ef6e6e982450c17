import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { deleteComment } from "@/lib/plan-review/delete-comment";
import { getResponseLetter } from "@/lib/plan-review/get-response-letter";
import { listComments } from "@/lib/plan-review/list-comments";
import { recordComments } from "@/lib/plan-review/record-comments";
import { updateComment } from "@/lib/plan-review/update-comment";
import { issueRevision } from "@/lib/review/issue-revision";
import { listRevisions } from "@/lib/review/list-revisions";
import { markCalc } from "@/lib/review/mark-calc";
import { startNextRevision } from "@/lib/review/start-next-revision";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { verifyFingerprint } from "@/lib/review/verify-fingerprint";
import { checkEveryCalc, reviewTeam, saveAs, statusOf } from "./review-fixtures";

afterAll(closeDb);

/** The canopy package with numbered headings around its two formula calcs. */
function canopyDocument(q = "3 kN/m") {
  return {
    type: "doc",
    content: [
      { type: "heading", attrs: { level: 1 }, content: [{ type: "text", text: "Loads" }] },
      { type: "paragraph", content: [{ type: "text", text: "Loads on the canopy truss." }] },
      { type: "heading", attrs: { level: 2 }, content: [{ type: "text", text: "Wind" }] },
      { type: "formula", attrs: { id: "calc-f1-0001", label: "F1", inputs: { source: `q = ${q}` } } },
      { type: "heading", attrs: { level: 1 }, content: [{ type: "text", text: "Members" }] },
      { type: "formula", attrs: { id: "calc-f2-0002", label: "F2", inputs: { source: "w = F1.q * 2" } } },
    ],
  };
}

const officePaste = [
  "Plan review — Alder Creek permit office",
  "",
  "1. Provide the wind load derivation for the canopy,",
  "   including the exposure category.",
  "2) Verify the member forces under the revised line load.",
  "",
  "(3) Show the load path to the supports:",
  "  - at the pinned end",
  "  - at the roller",
].join("\n");

/** Rev 0 issued, and the next revision started as a draft: where the permit office's comments are answered. */
async function draftAfterRev0() {
  const t = await reviewTeam({ document: canopyDocument() });
  await submitForCheck({ actor: t.engineer, packageId: t.packageId });
  await checkEveryCalc(t.checker, t.packageId);
  const rev0 = await issueRevision({ actor: t.pe, packageId: t.packageId });
  await startNextRevision({ actor: t.pe, packageId: t.packageId });
  return { ...t, rev0 };
}

async function recordOfficeComments(t: Awaited<ReturnType<typeof draftAfterRev0>>) {
  return recordComments({ actor: t.pe, packageId: t.packageId, input: { revisionId: t.rev0.id, reviewer: "R. Okafor, plans examiner", receivedOn: "2026-11-20", paste: officePaste } });
}

describe("recording plan-review comments", () => {
  it("splits a pasted numbered list of three comments into three comments with their numbers and texts", async () => {
    const t = await draftAfterRev0();
    const comments = await recordOfficeComments(t);
    expect(comments.map((c) => [c.number, c.text])).toEqual([
      ["1", "Provide the wind load derivation for the canopy, including the exposure category."],
      ["2", "Verify the member forces under the revised line load."],
      ["3", "Show the load path to the supports:\n- at the pinned end\n- at the roller"],
    ]);
    const listed = await listComments({ actor: t.viewer, packageId: t.packageId });
    expect(listed.comments.map((c) => [c.number, c.revisionLabel, c.reviewer, c.receivedOn, c.editable])).toEqual([
      ["1", "0", "R. Okafor, plans examiner", "2026-11-20", true],
      ["2", "0", "R. Okafor, plans examiner", "2026-11-20", true],
      ["3", "0", "R. Okafor, plans examiner", "2026-11-20", true],
    ]);
    const audit = await db().from("auditLog").select("action", "data").where({ entityId: t.packageId, action: "plan_review.record" });
    expect(audit).toHaveLength(1);
    expect(audit[0].data.numbers).toEqual(["1", "2", "3"]);
  });

  it("refuses the same numbers pasted twice, naming the field", async () => {
    const t = await draftAfterRev0();
    await recordOfficeComments(t);
    await expect(recordOfficeComments(t)).rejects.toMatchObject({ code: "INVALID", path: "paste", message: "Comment 1 is already recorded on Rev 0." });
  });

  it("refuses an engineer who is not the project engineer (403)", async () => {
    const t = await draftAfterRev0();
    await expect(recordComments({ actor: t.engineer, packageId: t.packageId, input: { revisionId: t.rev0.id, paste: officePaste } })).rejects.toMatchObject({
      code: "FORBIDDEN",
      message: "Only the project engineer records and answers plan-review comments.",
    });
    await expect(recordComments({ actor: t.checker, packageId: t.packageId, input: { revisionId: t.rev0.id, number: "1", text: "x" } })).rejects.toMatchObject({ code: "FORBIDDEN" });
    expect((await listComments({ actor: t.engineer, packageId: t.packageId })).comments).toEqual([]);
  });

  it("hides the comments from another firm", async () => {
    const t = await draftAfterRev0();
    const stranger = await reviewTeam();
    await expect(listComments({ actor: stranger.pe, packageId: t.packageId })).rejects.toMatchObject({ code: "NOT_FOUND" });
  });

  it("records one comment with its number, and refuses a revision other than the one the draft answers", async () => {
    const t = await draftAfterRev0();
    const [one] = await recordComments({ actor: t.pe, packageId: t.packageId, input: { revisionId: t.rev0.id, number: "S-3", text: "Confirm the splice bolts." } });
    expect([one.number, one.text, one.reviewer]).toEqual(["S-3", "Confirm the splice bolts.", null]);
    await expect(recordComments({ actor: t.pe, packageId: t.packageId, input: { revisionId: "00000000-0000-4000-8000-000000000000", number: "4", text: "x" } })).rejects.toMatchObject({ code: "INVALID", path: "revisionId" });
    await expect(recordComments({ actor: t.pe, packageId: t.packageId, input: { revisionId: t.rev0.id, number: "4" } })).rejects.toMatchObject({ code: "INVALID", path: "text" });
    await expect(recordComments({ actor: t.pe, packageId: t.packageId, input: { revisionId: t.rev0.id, receivedOn: "2026-02-30", paste: "1. x" } })).rejects.toMatchObject({ code: "INVALID", path: "receivedOn" });
  });
});

describe("answering a comment", () => {
  it("refuses a link to a calc that does not exist, naming the field", async () => {
    const t = await draftAfterRev0();
    const [first] = await recordOfficeComments(t);
    await expect(
      updateComment({ actor: t.pe, packageId: t.packageId, commentId: first.id, input: { response: "See F1.", answeredIn: [{ type: "calc", calcId: "calc-f1-0001" }, { type: "calc", calcId: "calc-gone-9999" }] } }),
    ).rejects.toMatchObject({ code: "INVALID", path: "answeredIn[1].calcId" });
    await expect(updateComment({ actor: t.pe, packageId: t.packageId, commentId: first.id, input: { answeredIn: [{ type: "heading", index: 1 }] } })).rejects.toMatchObject({ code: "INVALID", path: "answeredIn[0].index" });
    const [unchanged] = (await listComments({ actor: t.pe, packageId: t.packageId })).comments;
    expect([unchanged.response, unchanged.answeredIn]).toEqual(["", []]);
  });

  it("finds a linked heading again by its text after it moved, and refuses a heading the draft no longer has", async () => {
    const t = await draftAfterRev0();
    const [first] = await recordOfficeComments(t);
    // "Wind" was at position 2 when the page loaded; a heading inserted above moved it to 3.
    const doc = canopyDocument();
    doc.content.unshift({ type: "heading", attrs: { level: 1 }, content: [{ type: "text", text: "Basis of design" }] });
    await saveAs(t.engineer, t.project.id, t.packageId, doc);
    const updated = await updateComment({ actor: t.pe, packageId: t.packageId, commentId: first.id, input: { answeredIn: [{ type: "heading", index: 2, text: "Wind" }] } });
    expect(updated.answeredIn).toEqual([{ type: "heading", index: 3, text: "Wind" }]);
    await expect(updateComment({ actor: t.pe, packageId: t.packageId, commentId: first.id, input: { answeredIn: [{ type: "heading", index: 3, text: "Snow" }] } })).rejects.toMatchObject({ code: "INVALID", path: "answeredIn[0].text" });
  });

  it("builds the letter with each comment quoted, its answer, and where it is answered as the draft numbers it", async () => {
    const t = await draftAfterRev0();
    const [c1, c2, c3] = await recordOfficeComments(t);
    await updateComment({ actor: t.pe, packageId: t.packageId, commentId: c1.id, input: { response: "The derivation is added; exposure C.", answeredIn: [{ type: "heading", index: 2, text: "Wind" }, { type: "calc", calcId: "calc-f1-0001" }] } });
    await updateComment({ actor: t.pe, packageId: t.packageId, commentId: c2.id, input: { response: "Member forces re-run for 3.5 kN/m.", answeredIn: [{ type: "calc", calcId: "calc-f2-0002" }] } });
    // A heading inserted before the linked ones renumbers them; the letter follows the document as it now reads.
    const doc = canopyDocument();
    doc.content.unshift({ type: "heading", attrs: { level: 1 }, content: [{ type: "text", text: "Basis of design" }] });
    await saveAs(t.engineer, t.project.id, t.packageId, doc);

    const preview = await getResponseLetter({ actor: t.viewer, packageId: t.packageId });
    expect(preview.letter).toEqual({
      answersRevisionLabel: "0",
      reviewer: "R. Okafor, plans examiner",
      date: "2026-11-20",
      comments: [
        { number: "1", text: c1.text, response: "The derivation is added; exposure C.", answeredIn: ["2.1 Wind", "F1"] },
        { number: "2", text: c2.text, response: "Member forces re-run for 3.5 kN/m.", answeredIn: ["F2"] },
        { number: "3", text: c3.text, response: "", answeredIn: [] },
      ],
    });
    expect(preview.problems).toEqual(["Plan-review comment 3 has no response yet."]);
  });
});

describe("issuing the revision that answers the comments", () => {
  async function answeredAndChecked() {
    const t = await draftAfterRev0();
    const comments = await recordOfficeComments(t);
    await saveAs(t.engineer, t.project.id, t.packageId, canopyDocument("3.5 kN/m"));
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" });
    return { ...t, comments };
  }

  it("is refused while a comment has no response, with the reason", async () => {
    const t = await answeredAndChecked();
    await updateComment({ actor: t.pe, packageId: t.packageId, commentId: t.comments[0].id, input: { response: "Added." } });
    await updateComment({ actor: t.pe, packageId: t.packageId, commentId: t.comments[2].id, input: { response: "Shown in F2." } });
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({ code: "CONFLICT", message: "This package cannot be issued: Plan-review comment 2 has no response yet." });
    expect(await statusOf(t.packageId)).toBe("checked");
    expect((await listRevisions({ actor: t.pe, packageId: t.packageId })).map((r) => r.label)).toEqual(["0"]);
  });

  it("freezes the letter in the revision, under a fingerprint that recomputes, and freezes the comments with it", async () => {
    const t = await answeredAndChecked();
    for (const [i, c] of t.comments.entries()) {
      await updateComment({ actor: t.pe, packageId: t.packageId, commentId: c.id, input: { response: `Answer ${i + 1}.`, answeredIn: [{ type: "calc", calcId: "calc-f1-0001" }] } });
    }
    const expected = (await getResponseLetter({ actor: t.pe, packageId: t.packageId })).letter;
    const rev1 = await issueRevision({ actor: t.pe, packageId: t.packageId });

    const [rev0row, rev1row] = await listRevisions({ actor: t.viewer, packageId: t.packageId });
    expect(rev0row.responseLetter).toBeNull();
    expect(rev1row.id).toBe(rev1.id);
    expect(rev1row.responseLetter).toEqual(expected);
    expect(rev1row.responseLetter?.comments.map((c) => [c.number, c.response, c.answeredIn])).toEqual([["1", "Answer 1.", ["F1"]], ["2", "Answer 2.", ["F1"]], ["3", "Answer 3.", ["F1"]]]);
    expect(verifyFingerprint({ revision: rev0row }).ok).toBe(true);
    expect(verifyFingerprint({ revision: rev1row }).ok).toBe(true);
    // The letter is covered: the same revision with another letter, or none, does not verify.
    expect(verifyFingerprint({ revision: { ...rev1row, responseLetter: null } }).ok).toBe(false);
    expect(verifyFingerprint({ revision: { ...rev1row, responseLetter: { ...expected!, reviewer: "Someone else" } } }).ok).toBe(false);

    // Rev 0's comments now belong to Rev 1's frozen letter.
    await startNextRevision({ actor: t.pe, packageId: t.packageId });
    await expect(updateComment({ actor: t.pe, packageId: t.packageId, commentId: t.comments[0].id, input: { response: "Changed later." } })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("frozen") });
    await expect(deleteComment({ actor: t.pe, packageId: t.packageId, commentId: t.comments[0].id })).rejects.toMatchObject({ code: "CONFLICT" });
    expect((await listComments({ actor: t.pe, packageId: t.packageId })).comments.every((c) => !c.editable)).toBe(true);
    expect((await getResponseLetter({ actor: t.pe, packageId: t.packageId })).letter).toBeNull();
  });

  it("refuses changes to comments while the package is issued, and deletes with an audit entry", async () => {
    const t = await draftAfterRev0();
    const [first, second] = await recordOfficeComments(t);
    await deleteComment({ actor: t.pe, packageId: t.packageId, commentId: second.id });
    expect((await listComments({ actor: t.pe, packageId: t.packageId })).comments.map((c) => c.number)).toEqual(["1", "3"]);
    const audit = await db().from("auditLog").select("action", "data").where({ entityId: second.id });
    expect(audit.map((a) => [a.action, a.data.number])).toEqual([["plan_review.delete", "2"]]);

    await db().from("packages").where({ id: t.packageId }).update({ status: "issued" });
    await expect(updateComment({ actor: t.pe, packageId: t.packageId, commentId: first.id, input: { response: "Too late." } })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("start the next revision") });
  });
});
