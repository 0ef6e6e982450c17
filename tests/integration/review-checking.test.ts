import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { assignChecker } from "@/lib/review/assign-checker";
import { checkProgress } from "@/lib/review/check-progress";
import { closeRemark } from "@/lib/review/close-remark";
import { createRemark } from "@/lib/review/create-remark";
import { markCalc } from "@/lib/review/mark-calc";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { checkEveryCalc, reviewTeam, saveAs, statusOf, twoFormulaDocument } from "./review-fixtures";

afterAll(closeDb);

describe("submitting for check", () => {
  it("refuses to submit a package that has no checker assigned, saying so", async () => {
    const t = await reviewTeam({ assign: false });
    await expect(submitForCheck({ actor: t.engineer, packageId: t.packageId })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("No checker is assigned") });
    expect(await statusOf(t.packageId)).toBe("draft");
  });

  it("lets only the project engineer assign the checker, who must hold the checker role on the project", async () => {
    const t = await reviewTeam({ assign: false });
    await expect(assignChecker({ actor: t.engineer, packageId: t.packageId, checkerId: t.checker.id })).rejects.toMatchObject({ code: "FORBIDDEN" });
    await expect(assignChecker({ actor: t.pe, packageId: t.packageId, checkerId: t.viewer.id })).rejects.toMatchObject({ code: "INVALID", path: "checkerId" });
    await assignChecker({ actor: t.pe, packageId: t.packageId, checkerId: t.checker.id });
    expect((await db().from("packages").select("assignedChecker").where({ id: t.packageId }).first()).assignedChecker).toBe(t.checker.id);
  });

  it("moves a draft with an assigned checker to in check, and refuses to submit it twice", async () => {
    const t = await reviewTeam();
    expect(await submitForCheck({ actor: t.engineer, packageId: t.packageId })).toEqual({ status: "in_check", assignedChecker: t.checker.id });
    await expect(submitForCheck({ actor: t.engineer, packageId: t.packageId })).rejects.toMatchObject({ code: "CONFLICT", message: "This package is already in check." });
  });

  it("does not let the checker submit, nor mark calcs of a draft", async () => {
    const t = await reviewTeam();
    await expect(submitForCheck({ actor: t.checker, packageId: t.packageId })).rejects.toMatchObject({ code: "FORBIDDEN" });
    await expect(markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("submitted for check") });
  });
});

describe("check marks and progress", () => {
  it("counts n of m calcs checked and the open remarks", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" });
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f2-0002", state: "returned" });
    await createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-f2-0002", text: "Why twice?" });
    const p = await checkProgress({ actor: t.engineer, packageId: t.packageId });
    expect(p).toMatchObject({ total: 2, checked: 1, openRemarks: 1, complete: false });
    expect(p.calcs.map((c) => [c.label, c.state, c.checkerName])).toEqual([["F1", "checked", "Checker"], ["F2", "returned", "Checker"]]);
  });

  it("clears a calc's check mark when its inputs change later, and says so", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await checkEveryCalc(t.checker, t.packageId);
    expect((await checkProgress({ actor: t.checker, packageId: t.packageId })).checked).toBe(2);

    await saveAs(t.engineer, t.project.id, t.packageId, twoFormulaDocument("4 kN/m"));
    const p = await checkProgress({ actor: t.checker, packageId: t.packageId });
    expect(p.checked).toBe(1);
    expect(p.calcs.find((c) => c.label === "F1")).toMatchObject({ state: "unchecked", cleared: true, checkerName: null });
    expect(p.calcs.find((c) => c.label === "F2")).toMatchObject({ state: "checked", cleared: false });
  });

  it("lets only the assigned checker mark calcs", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await expect(markCalc({ actor: t.engineer, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" })).rejects.toMatchObject({ code: "FORBIDDEN", message: "Only the checker marks calcs checked or returned." });
  });
});

describe("package states", () => {
  it("becomes checked only once every calc is checked and no remark is open", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    const r = await createRemark({ actor: t.checker, packageId: t.packageId, text: "Cite the load source." });
    await checkEveryCalc(t.checker, t.packageId);
    expect(await statusOf(t.packageId)).toBe("in_check");
    await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: r.id });
    expect(await statusOf(t.packageId)).toBe("checked");
  });

  it("falls back from checked to in check when a remark is raised or a checked calc's inputs change", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await checkEveryCalc(t.checker, t.packageId);
    const r = await createRemark({ actor: t.engineer, packageId: t.packageId, text: "Added a note on wind." });
    expect(await statusOf(t.packageId)).toBe("in_check");
    await closeRemark({ actor: t.engineer, packageId: t.packageId, remarkId: r.id });
    expect(await statusOf(t.packageId)).toBe("checked");

    // The save itself settles the state: no later mark or remark is needed for the fall-back.
    await saveAs(t.engineer, t.project.id, t.packageId, twoFormulaDocument("5 kN/m"));
    expect(await statusOf(t.packageId)).toBe("in_check");
  });
});
