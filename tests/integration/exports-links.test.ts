import { createHash } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { findProjectAccess } from "@/lib/data/projects";
import { createExport } from "@/lib/exports/create-export";
import { downloadExport } from "@/lib/exports/download-export";
import { EXPORT_LINK_SECONDS, signExportLink } from "@/lib/exports/export-link";
import { listExports } from "@/lib/exports/list-exports";
import { runExport } from "@/lib/exports/run-export";
import { lookUpVerification } from "@/lib/exports/verification";
import { stopBoss } from "@/lib/jobs/boss";
import { samplePdf } from "../support/sample-pdf";
import { seedFirm, seedPackage, seedTeam, seedUser } from "../support/seed";

// The renderer is not under test here: a small pdf-lib PDF stands in for Chromium's, the rest is the real pipeline.
const pdfLibRenderers = {
  pdf: async () => ({ pdf: await samplePdf(2), sheetCount: 2 }),
  docx: async () => Buffer.from("PK not really a docx"),
};

let team: Awaited<ReturnType<typeof seedTeam>>;
let exportId: string;
let packageId: string;

beforeAll(async () => {
  team = await seedTeam();
  packageId = (await seedPackage({ projectId: team.project.id, title: "Footbridge truss" })).id;
  const access = await findProjectAccess(team.viewer, team.project.id);
  const row = await createExport({ actor: team.viewer, access: access!, packageId, format: "pdf" });
  await runExport({ exportId: row.id, renderers: pdfLibRenderers });
  exportId = row.id;
});
afterAll(async () => {
  await stopBoss();
  await closeDb();
});

describe("signed download links", () => {
  it("the history lists a done export with a five-minute link and who asked for it", async () => {
    const [row] = await listExports({ packageId });
    expect(row).toMatchObject({ id: exportId, status: "done", format: "pdf", revisionLabel: null, requestedBy: "Viewer", signed: false, verifyPath: null });
    const url = new URL(row.downloadUrl!, "http://x");
    expect(url.pathname).toBe(`/api/v1/exports/${exportId}/download`);
    const expires = Number(url.searchParams.get("expires"));
    expect(expires - Date.now() / 1000).toBeGreaterThan(EXPORT_LINK_SECONDS - 30);
    expect(expires - Date.now() / 1000).toBeLessThanOrEqual(EXPORT_LINK_SECONDS);
  });

  it("serve the file to a member of the project, named after job, package and revision", async () => {
    const link = signExportLink(exportId);
    const file = await downloadExport({ actor: team.engineer, exportId, expires: link.expires, signature: link.signature });
    expect(file.contentType).toBe("application/pdf");
    expect(file.fileName).toBe(`${team.project.jobNumber}_Footbridge-truss_DRAFT.pdf`);
    const [row] = await listExports({ packageId });
    expect(createHash("sha256").update(file.body).digest("hex")).toBe(row.sha256);
  });

  it("refuse a tampered signature as not found", async () => {
    const link = signExportLink(exportId);
    const flipped = (link.signature[0] === "A" ? "B" : "A") + link.signature.slice(1);
    await expect(downloadExport({ actor: team.engineer, exportId, expires: link.expires, signature: flipped })).rejects.toMatchObject({ code: "NOT_FOUND" });
    // Nor may the expiry be pushed out under the old signature.
    await expect(downloadExport({ actor: team.engineer, exportId, expires: link.expires + 3600, signature: link.signature })).rejects.toMatchObject({ code: "NOT_FOUND" });
  });

  it("refuse an expired link with 403 and say to download again", async () => {
    const link = signExportLink(exportId, new Date(Date.now() - (EXPORT_LINK_SECONDS + 1) * 1000));
    await expect(downloadExport({ actor: team.engineer, exportId, expires: link.expires, signature: link.signature })).rejects.toMatchObject({
      code: "FORBIDDEN",
      message: expect.stringContaining("expired"),
    });
  });

  it("answer 404 to someone not on the project, even with a valid link", async () => {
    const link = signExportLink(exportId);
    await expect(downloadExport({ actor: team.outsider, exportId, expires: link.expires, signature: link.signature })).rejects.toMatchObject({ code: "NOT_FOUND" });
    const otherFirm = await seedFirm();
    const stranger = await seedUser({ firmId: otherFirm.id, firmRole: "admin" });
    await expect(downloadExport({ actor: stranger, exportId, expires: link.expires, signature: link.signature })).rejects.toMatchObject({ code: "NOT_FOUND" });
  });
});

describe("the verification lookup", () => {
  it("is not found for a wrong token, and a draft export has no token at all", async () => {
    await expect(lookUpVerification("NoSuchToken0000000000000")).rejects.toMatchObject({ code: "NOT_FOUND" });
    const [row] = await listExports({ packageId });
    expect(row.verifyPath).toBeNull();
  });
});
