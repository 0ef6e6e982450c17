import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import { computeFingerprint } from "@/lib/review/compute-fingerprint";
import { createRemark } from "@/lib/review/create-remark";
import { issueRevision } from "@/lib/review/issue-revision";
import { listRevisions, type Revision } from "@/lib/review/list-revisions";
import { markCalc } from "@/lib/review/mark-calc";
import { startNextRevision } from "@/lib/review/start-next-revision";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { verifyFingerprint } from "@/lib/review/verify-fingerprint";
import { deletePackage } from "@/lib/packages/delete-package";
import { saveDocument } from "@/lib/packages/save-document";
import { checkEveryCalc, reviewTeam, saveAs, statusOf, twoFormulaDocument } from "./review-fixtures";

afterAll(closeDb);

/** A package submitted for check and with every calc checked: ready to issue. */
async function checkedPackage(o: { document?: unknown } = {}) {
  const t = await reviewTeam(o);
  await submitForCheck({ actor: t.engineer, packageId: t.packageId });
  await checkEveryCalc(t.checker, t.packageId);
  return t;
}

describe("issuing a revision", () => {
  it("is refused with the reason while a calc is unchecked", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" });
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({
      code: "CONFLICT",
      message: "This package cannot be issued: 1 of 2 calcs not checked: F2 (unchecked).",
    });
  });

  it("is refused with the reason while a remark is open", async () => {
    const t = await checkedPackage();
    await createRemark({ actor: t.checker, packageId: t.packageId, text: "One more thing." });
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({ code: "CONFLICT", message: "This package cannot be issued: 1 remark is still open." });
    expect(await statusOf(t.packageId)).toBe("in_check");
  });

  it("is refused to a checker and to an engineer: only the project engineer issues", async () => {
    const t = await checkedPackage();
    await expect(issueRevision({ actor: t.checker, packageId: t.packageId })).rejects.toMatchObject({ code: "FORBIDDEN", message: expect.stringContaining("Only the project engineer") });
    await expect(issueRevision({ actor: t.engineer, packageId: t.packageId })).rejects.toMatchObject({ code: "FORBIDDEN" });
    expect(await statusOf(t.packageId)).toBe("checked");
  });

  it("freezes the document, the server's results and the check record under a fingerprint that recomputes to the stored value", async () => {
    const t = await checkedPackage({ document: demoFootbridgeDocument() });
    const issued = await issueRevision({ actor: t.pe, packageId: t.packageId });
    expect(issued).toMatchObject({ number: 0, label: "0" });
    expect(issued.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(await statusOf(t.packageId)).toBe("issued");

    const [rev] = await listRevisions({ actor: t.viewer, packageId: t.packageId });
    expect(rev).toMatchObject({ fingerprint: issued.fingerprint, issuedBy: t.pe.id, document: demoFootbridgeDocument() });
    expect(Object.values(rev.results as Record<string, { label: string; status: string }>).map((r) => [r.label, r.status])).toEqual(
      ["T1", "C1", "S1", "J1", "F1", "M1", "D1"].map((l) => [l, "ok"]),
    );
    expect((rev.checkRecord as { calcs: { checker: string; state: string }[] }).calcs.every((c) => c.state === "checked" && c.checker === "Checker")).toBe(true);
    expect(verifyFingerprint({ revision: rev }).ok).toBe(true);
    expect(verifyFingerprint({ revision: { ...rev, number: 1 } }).ok).toBe(false);
  });

  it("leaves an issued package unchangeable until the next revision is started, which keeps its document", async () => {
    const t = await checkedPackage();
    await issueRevision({ actor: t.pe, packageId: t.packageId });
    const row = await db().from("packages").select("version").where({ id: t.packageId }).first();
    await expect(saveDocument({ actor: t.engineer, projectId: t.project.id, packageId: t.packageId, version: row.version, document: twoFormulaDocument("9 kN/m") })).rejects.toMatchObject({ code: "CONFLICT" });
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("already issued") });
    await expect(createRemark({ actor: t.checker, packageId: t.packageId, text: "Late remark" })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("start the next revision") });
    await startNextRevision({ actor: t.engineer, packageId: t.packageId });
    const after = await db().from("packages").select("status", "document").where({ id: t.packageId }).first();
    expect(after).toEqual({ status: "draft", document: twoFormulaDocument() });
  });
});

describe("revisions in the database", () => {
  it("refuses UPDATE and DELETE of an issued revision in raw SQL", async () => {
    const t = await checkedPackage();
    const { id } = await issueRevision({ actor: t.pe, packageId: t.packageId });
    await expect(db().raw("UPDATE revisions SET label = 'X' WHERE id = ?", [id])).rejects.toThrow(/revisions are frozen once issued \(UPDATE refused\)/);
    await expect(db().raw("DELETE FROM revisions WHERE id = ?", [id])).rejects.toThrow(/revisions are frozen once issued \(DELETE refused\)/);
    expect((await db().from("revisions").select("label").where({ id }).first()).label).toBe("0");
  });

  it("gives the stored fingerprint when every issued revision's is recomputed", async () => {
    const t = await checkedPackage();
    await issueRevision({ actor: t.pe, packageId: t.packageId });
    const all: Revision[] = await db().from("revisions").select("id", "packageId", "number", "label", "document", "results", "checkRecord", "issuedBy", "issuedAt", "fingerprint", "seal", "responseLetter");
    expect(all.length).toBeGreaterThan(0);
    expect(all.filter((r) => !verifyFingerprint({ revision: r }).ok).map((r) => r.id)).toEqual([]);
  });
});

describe("revision numbering", () => {
  async function issueTwice(t: Awaited<ReturnType<typeof checkedPackage>>) {
    const first = await issueRevision({ actor: t.pe, packageId: t.packageId });
    await startNextRevision({ actor: t.pe, packageId: t.packageId });
    await saveAs(t.engineer, t.project.id, t.packageId, twoFormulaDocument("3.5 kN/m"));
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    // Only F1 changed: F2's mark still holds, so the checker re-checks F1 alone.
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" });
    const second = await issueRevision({ actor: t.pe, packageId: t.packageId });
    return [first, second];
  }

  it("numbers revisions 0 then 1 on a numeric project", async () => {
    const t = await checkedPackage();
    expect((await issueTwice(t)).map((r) => [r.number, r.label])).toEqual([[0, "0"], [1, "1"]]);
  });

  it("labels revisions A then B on a project with the alpha scheme", async () => {
    const t = await checkedPackage();
    await db().from("projects").where({ id: t.project.id }).update({ revisionScheme: "alpha" });
    expect((await issueTwice(t)).map((r) => [r.number, r.label])).toEqual([[0, "A"], [1, "B"]]);
  });
});

describe("a package with issued revisions", () => {
  it("cannot be deleted, even as the next draft", async () => {
    const t = await reviewTeam();
    // Inserted directly (no seal or check needed here), but with its true fingerprint, so the
    // "every issued revision recomputes" test stays true on a database this test has run against.
    const frozen = { document: { type: "doc", content: [] }, results: {}, checkRecord: [], number: 0 };
    await db()
      .insert({ packageId: t.packageId, number: 0, label: "0", document: JSON.stringify(frozen.document), results: "{}", checkRecord: "[]", issuedBy: t.pe.id, issuedAt: new Date(), fingerprint: computeFingerprint(frozen) })
      .into("revisions");
    await expect(deletePackage({ actor: t.engineer, projectId: t.project.id, packageId: t.packageId })).rejects.toMatchObject({ code: "CONFLICT" });
  });
});
