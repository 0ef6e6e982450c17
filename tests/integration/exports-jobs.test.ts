import { createHash } from "node:crypto";
import { execFile } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import type { Job } from "pg-boss";
import { afterAll, describe, expect, it } from "vitest";
import * as verifyRoute from "@/app/api/v1/verify/[token]/route";
import { closeDb, db } from "@/db/knex";
import { findExport } from "@/lib/data/exports";
import { findProjectAccess } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { createExport } from "@/lib/exports/create-export";
import { EXPORT_ATTEMPTS, runExport } from "@/lib/exports/run-export";
import { compareWithIssued, lookUpVerification } from "@/lib/exports/verification";
import { stopBoss } from "@/lib/jobs/boss";
import { handlers } from "@/lib/jobs/handlers";
import { closeBrowser } from "@/lib/report/pdf/browser";
import { issueRevision } from "@/lib/review/issue-revision";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { getObject } from "@/lib/storage/get-object";
import { checkEveryCalc, reviewTeam } from "./review-fixtures";

const run = promisify(execFile);
const sha256 = (b: Buffer) => createHash("sha256").update(b).digest("hex");

afterAll(async () => {
  await closeBrowser();
  await stopBoss();
  await closeDb();
});

/** What pg-boss hands the worker; the handler is ours, the queue is not needed to call it. */
function fakeJob(exportId: string): Job<object> {
  return { id: `test-${exportId}`, name: "export.render", data: { exportId } } as Job<object>;
}

async function queue(actor: ActingUser, projectId: string, packageId: string, format: "pdf" | "docx", revisionId: string | null = null) {
  const access = await findProjectAccess(actor, projectId);
  if (!access) throw new Error("the test actor cannot see the project");
  return createExport({ actor, access, packageId, format, revisionId });
}

describe("the export.render job", () => {
  it("renders a draft PDF through the handler, stores it and records its SHA-256", { timeout: 180_000 }, async () => {
    const t = await reviewTeam();
    const row = await queue(t.viewer, t.project.id, t.packageId, "pdf");
    expect(row).toMatchObject({ status: "queued", revisionId: null, verifyToken: null });
    const job = await db().withSchema("pgboss").from("job").where({ name: "export.render" }).whereRaw("data->>'exportId' = ?", [row.id]).first();
    expect(job, "the export was queued as a job").toBeTruthy();

    await handlers["export.render"](fakeJob(row.id));

    const done = await findExport(t.firm.id, row.id);
    expect(done).toMatchObject({ status: "done", signed: false, attempts: 1, error: null, objectKey: `firms/${t.firm.id}/exports/${row.id}.pdf` });
    expect(done?.sheetCount).toBeGreaterThan(0);
    expect(done?.sheet).toBe(done?.sheetCount);
    const stored = await getObject(done!.objectKey!);
    expect(stored?.body.subarray(0, 5).toString()).toBe("%PDF-");
    expect(stored?.body.length).toBe(done?.byteSize);
    expect(sha256(stored!.body)).toBe(done?.sha256);
    const audit = await db().from("auditLog").where({ entityId: row.id }).orderBy("id").pluck("action");
    expect(audit).toEqual(["export.create", "export.done"]);
  });

  it("retries a crashed render and marks the export failed, with the reason, on the last attempt", async () => {
    const t = await reviewTeam();
    const row = await queue(t.engineer, t.project.id, t.packageId, "pdf");
    const crashing = {
      pdf: async () => {
        throw new Error("Protocol error (Page.printToPDF): Target closed");
      },
      docx: async () => Buffer.alloc(0),
    };
    for (let attempt = 1; attempt < EXPORT_ATTEMPTS; attempt++) {
      await expect(runExport({ exportId: row.id, renderers: crashing })).rejects.toThrow("Target closed");
      const between = await findExport(t.firm.id, row.id);
      expect(between).toMatchObject({ status: "queued", attempts: attempt });
      expect(between?.error).toContain(`Attempt ${attempt} of ${EXPORT_ATTEMPTS} failed`);
    }
    await expect(runExport({ exportId: row.id, renderers: crashing })).resolves.toBeUndefined();
    const failed = await findExport(t.firm.id, row.id);
    expect(failed).toMatchObject({ status: "failed", attempts: EXPORT_ATTEMPTS, objectKey: null });
    expect(failed?.error).toBe("the PDF renderer (Chromium) stopped unexpectedly: Protocol error (Page.printToPDF): Target closed");
    expect(failed?.finishedAt).toBeInstanceOf(Date);
    const fail = await db().from("auditLog").where({ entityId: row.id, action: "export.fail" }).first();
    expect(fail?.data).toMatchObject({ error: failed?.error, attempts: EXPORT_ATTEMPTS });
    // A late redelivery of the same job changes nothing.
    await runExport({ exportId: row.id, renderers: crashing });
    expect((await findExport(t.firm.id, row.id))?.attempts).toBe(EXPORT_ATTEMPTS);
  });

  it("signs the PDF of an issued revision: poppler reports the signature valid, and the verification page knows its hash", { timeout: 180_000 }, async () => {
    const t = await reviewTeam();
    await submitForCheck({ actor: t.engineer, packageId: t.packageId });
    await checkEveryCalc(t.checker, t.packageId);
    const revision = await issueRevision({ actor: t.pe, packageId: t.packageId });
    const row = await queue(t.checker, t.project.id, t.packageId, "pdf", revision.id);
    expect(row.verifyToken).toMatch(/^[A-Za-z0-9]{24}$/);

    await handlers["export.render"](fakeJob(row.id));

    const done = await findExport(t.firm.id, row.id);
    expect(done).toMatchObject({ status: "done", signed: true });
    const file = (await getObject(done!.objectKey!))!.body;
    expect(sha256(file)).toBe(done?.sha256);
    const dir = mkdtempSync(path.join(tmpdir(), "pp-export-"));
    writeFileSync(path.join(dir, "rev0.pdf"), file);
    const { stdout } = await run("pdfsig", [path.join(dir, "rev0.pdf")]).catch((e: { stdout: string }) => ({ stdout: e.stdout }));
    expect(stdout).toContain("Signature Validation: Signature is Valid.");
    expect(stdout).toContain("Total document signed");
    // The cover carries the verification link, so the token existed before rendering.
    const { stdout: text } = await run("pdftotext", [path.join(dir, "rev0.pdf"), "-"]);
    expect(text.replace(/\s+/g, "")).toContain(`/verify/${row.verifyToken}`);

    const v = await lookUpVerification(row.verifyToken!);
    expect(Object.keys(v).sort()).toEqual(["fingerprint", "issuedAt", "issuer", "jobNumber", "packageTitle", "projectName", "revisionLabel", "sha256"]);
    expect(v).toMatchObject({ sha256: done?.sha256, fingerprint: revision.fingerprint, revisionLabel: revision.label, issuer: "Project Engineer" });

    expect(await compareWithIssued(row.verifyToken!, sha256(file))).toMatchObject({ identical: true, message: "Byte-identical to the issued file." });
    const altered = Buffer.from(file);
    altered[Math.floor(altered.length / 2)] ^= 0x01;
    expect(await compareWithIssued(row.verifyToken!, sha256(altered))).toMatchObject({ identical: false, message: expect.stringContaining("NOT identical") });

    // The public route answers the same without a session; a wrong token is a plain 404.
    const ctx = (token: string) => ({ params: Promise.resolve({ token }) });
    const post = (token: string, hash: string) => verifyRoute.POST(new Request("http://x/", { method: "POST", body: JSON.stringify({ sha256: hash }) }), ctx(token));
    expect(await (await post(row.verifyToken!, sha256(file))).json()).toMatchObject({ identical: true });
    expect(await (await post(row.verifyToken!, sha256(altered))).json()).toMatchObject({ identical: false });
    expect((await verifyRoute.GET(new Request("http://x/"), ctx("WrongToken00000000000000"))).status).toBe(404);
    const shown = await (await verifyRoute.GET(new Request("http://x/"), ctx(row.verifyToken!))).json();
    expect(shown).toEqual(v);
  });

  it("renders a DOCX of the draft through the handler", { timeout: 120_000 }, async () => {
    const t = await reviewTeam();
    const row = await queue(t.engineer, t.project.id, t.packageId, "docx");
    await handlers["export.render"](fakeJob(row.id));
    const after = await findExport(t.firm.id, row.id);
    expect(after).toMatchObject({ status: "done", signed: false, objectKey: `firms/${t.firm.id}/exports/${row.id}.docx` });
    const file = (await getObject(after!.objectKey!))!.body;
    expect(file.subarray(0, 2).toString()).toBe("PK");
    expect(sha256(file)).toBe(after?.sha256);
  });
});
