import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { describeAuditEntry } from "@/lib/audit/describe-audit-entry";
import { listPackageAudit } from "@/lib/data/package-audit";
import { closeRemark } from "@/lib/review/close-remark";
import { createRemark } from "@/lib/review/create-remark";
import { markCalc } from "@/lib/review/mark-calc";
import { replyToRemark } from "@/lib/review/reply-to-remark";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { reviewTeam } from "./review-fixtures";

afterAll(closeDb);

describe("a package's audit trail", () => {
  it("lists every state change, check mark and remark of that package with its actor, newest first", async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    const remark = await createRemark({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", text: "Source of q?" });
    await replyToRemark({ actor: t.engineer, packageId: t.packageId, remarkId: remark.id, text: "Table 4-1." });
    await closeRemark({ actor: t.checker, packageId: t.packageId, remarkId: remark.id });
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f1-0001", state: "checked" });
    await markCalc({ actor: t.checker, packageId: t.packageId, calcId: "calc-f2-0002", state: "returned" });

    const rows = await listPackageAudit({ firmId: t.firm.id, projectId: t.project.id, packageId: t.packageId });
    const actions = rows.map((r) => r.action).reverse();
    expect(actions).toEqual(expect.arrayContaining(["checker.assign", "package.submit", "remark.create", "remark.reply", "remark.close", "calc.checked", "calc.returned"]));
    // Order as it happened: the submit before the remark, the remark before its reply and close.
    const at = (a: string) => actions.indexOf(a);
    expect(at("package.submit")).toBeLessThan(at("remark.create"));
    expect(at("remark.create")).toBeLessThan(at("remark.reply"));
    expect(at("remark.reply")).toBeLessThan(at("remark.close"));
    expect(rows.find((r) => r.action === "remark.reply")?.actorName).toBe(t.engineer.name);
    expect(rows.find((r) => r.action === "calc.returned")?.actorName).toBe(t.checker.name);
    expect(describeAuditEntry("calc.returned", rows.find((r) => r.action === "calc.returned")!.data)).toBe("Returned F2");
  });

  it("shows nothing of another package, nor of this package to another firm", async () => {
    const a = await reviewTeam();
    const b = await reviewTeam();
    await submitForCheck({ actor: a.engineer, packageId: a.packageId });
    const ofB = await listPackageAudit({ firmId: b.firm.id, projectId: b.project.id, packageId: b.packageId });
    expect(ofB.some((r) => r.action === "package.submit")).toBe(false);
    expect(await listPackageAudit({ firmId: b.firm.id, projectId: a.project.id, packageId: a.packageId })).toEqual([]);
    expect(await listPackageAudit({ firmId: a.firm.id, projectId: b.project.id, packageId: a.packageId })).toEqual([]);
  });
});
