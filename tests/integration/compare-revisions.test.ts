import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { demoCalcIds, demoFootbridgeDocument } from "@/lib/document/demo-footbridge-document";
import type { PackageDocument } from "@/lib/document/document-types";
import { changedCalcIdsSince } from "@/lib/review/changed-calc-ids-since";
import { closeRemark } from "@/lib/review/close-remark";
import { compareRevisions } from "@/lib/review/compare-revisions";
import { createRemark } from "@/lib/review/create-remark";
import { issueRevision } from "@/lib/review/issue-revision";
import { markCalc } from "@/lib/review/mark-calc";
import { startNextRevision } from "@/lib/review/start-next-revision";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { seedFirm, seedUser } from "../support/seed";
import { checkEveryCalc, reviewTeam, saveAs } from "./review-fixtures";

afterAll(closeDb);

/** The demo footbridge package with T1's permanent line load set to `w` kN/m. */
function withPermanentLoad(w: number): PackageDocument {
  const doc = demoFootbridgeDocument();
  const t1 = doc.content!.find((n) => n.type === "truss") as { attrs: { inputs: { lineLoads: { case: string; w: number }[] } } };
  t1.attrs.inputs.lineLoads.find((l) => l.case === "G")!.w = w;
  return doc;
}

/** The footbridge package issued as Rev 0 (with a remark raised and closed before it), then reopened as the next draft. */
async function issuedThenReopened() {
  const t = await reviewTeam({ document: demoFootbridgeDocument() });
  await submitForCheck({ actor: t.engineer, packageId: t.packageId });
  const before = await createRemark({ actor: t.checker, packageId: t.packageId, calcId: demoCalcIds.S1, text: "Which side is kept?" });
  await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: before.id });
  await checkEveryCalc(t.checker, t.packageId);
  const rev0 = await issueRevision({ actor: t.pe, packageId: t.packageId });
  await startNextRevision({ actor: t.engineer, packageId: t.packageId });
  return { ...t, rev0, earlyRemarkId: before.id };
}

const affectedByG = [demoCalcIds.T1, demoCalcIds.C1, demoCalcIds.F1, demoCalcIds.M1];

describe("comparing revisions of a package", () => {
  it("lists exactly the calcs a load change affects when Rev 0 is compared with the next draft", async () => {
    const t = await issuedThenReopened();
    await saveAs(t.engineer, t.project.id, t.packageId, withPermanentLoad(3.5));
    const c = await compareRevisions({ actor: t.viewer, packageId: t.packageId, from: t.rev0.id, to: "draft" });
    expect([c.from.label, c.to.label]).toEqual(["Rev 0", "Draft"]);
    expect(c.calcs.map((x) => [x.calcId, x.change])).toEqual([
      [demoCalcIds.T1, "inputsChanged"],
      [demoCalcIds.C1, "resultsChanged"],
      [demoCalcIds.F1, "resultsChanged"],
      [demoCalcIds.M1, "resultsChanged"],
    ]);
    expect(c.text).toEqual([]);
    // Frozen results read back from the database compare equal to a fresh recompute: nothing else is listed.
    const nEd = c.calcs.find((x) => x.calcId === demoCalcIds.F1)!.values.find((v) => v.name === "N_Ed")!;
    // N_Ed = 1.35·N_G + 1.5·N_Q with N_G = −24·w: it moves by 1.35 × 24 × 0.5 kN.
    expect(nEd.new!.value - nEd.old!.value).toBeCloseTo(-1.35 * 24 * 0.5, 6);
    expect(await changedCalcIdsSince({ actor: t.engineer, packageId: t.packageId })).toEqual(affectedByG);
  });

  it("lists nothing for a draft unchanged since Rev 0, and only the remarks raised and closed after it", async () => {
    const t = await issuedThenReopened();
    const unchanged = await compareRevisions({ actor: t.engineer, packageId: t.packageId, from: t.rev0.id, to: "draft" });
    expect([unchanged.calcs, unchanged.text, unchanged.remarks]).toEqual([[], [], { raised: [], closed: [] }]);

    const after = await createRemark({ actor: t.checker, packageId: t.packageId, calcId: demoCalcIds.F1, text: "State the partial factors." });
    const open = await createRemark({ actor: t.checker, packageId: t.packageId, text: "Add the bearing reactions." });
    await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: after.id });
    const c = await compareRevisions({ actor: t.engineer, packageId: t.packageId, from: t.rev0.id, to: "draft" });
    expect(c.remarks.raised.map((r) => [r.id, r.calcLabel])).toEqual([
      [after.id, "F1"],
      [open.id, null],
    ]);
    expect(c.remarks.closed.map((r) => [r.id, r.closedBy])).toEqual([[after.id, "Checker"]]);
    expect([...c.remarks.raised, ...c.remarks.closed].map((r) => r.id)).not.toContain(t.earlyRemarkId);
  });

  it("compares two issued revisions, either way round, and marks the sheets Rev 1 revised", async () => {
    const t = await issuedThenReopened();
    await saveAs(t.engineer, t.project.id, t.packageId, withPermanentLoad(3.5));
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    // Only T1's inputs changed, so only its check mark was cleared.
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: demoCalcIds.T1, state: "checked" });
    const rev1 = await issueRevision({ actor: t.pe, packageId: t.packageId });
    const forward = await compareRevisions({ actor: t.pe, packageId: t.packageId, from: t.rev0.id, to: rev1.id });
    const backward = await compareRevisions({ actor: t.pe, packageId: t.packageId, from: rev1.id, to: t.rev0.id });
    expect([forward.from.label, forward.to.label]).toEqual(["Rev 0", "Rev 1"]);
    expect(backward.calcs).toEqual(forward.calcs);
    expect(forward.calcs.map((x) => x.calcId)).toEqual(affectedByG);
    expect(await changedCalcIdsSince({ actor: t.pe, packageId: t.packageId, to: rev1.id })).toEqual(affectedByG);
    expect(await changedCalcIdsSince({ actor: t.pe, packageId: t.packageId, to: t.rev0.id })).toEqual([]);
  });

  it("does not find another firm's package, nor a revision of another package", async () => {
    const t = await issuedThenReopened();
    const other = await reviewTeam();
    const stranger = await seedUser({ firmId: (await seedFirm()).id });
    await expect(compareRevisions({ actor: stranger, packageId: t.packageId, from: t.rev0.id, to: "draft" })).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(changedCalcIdsSince({ actor: stranger, packageId: t.packageId })).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(compareRevisions({ actor: other.pe, packageId: other.packageId, from: t.rev0.id, to: "draft" })).rejects.toMatchObject({ code: "NOT_FOUND", message: "Revision not found." });
  });
});
