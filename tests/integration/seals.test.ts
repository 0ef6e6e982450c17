import { afterAll, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { findSealProfile } from "@/lib/data/seal-profiles";
import { computeFingerprint } from "@/lib/review/compute-fingerprint";
import { issueRevision } from "@/lib/review/issue-revision";
import { listRevisions, type Revision } from "@/lib/review/list-revisions";
import { submitForCheck } from "@/lib/review/submit-for-check";
import { verifyFingerprint } from "@/lib/review/verify-fingerprint";
import { findValidSeal } from "@/lib/seals/find-valid-seal";
import { readSealImage } from "@/lib/seals/read-seal-image";
import { reportSealOf } from "@/lib/seals/report-seal";
import { saveSealProfile } from "@/lib/seals/save-seal-profile";
import { uploadSealImage } from "@/lib/seals/upload-seal-image";
import { getObject } from "@/lib/storage/get-object";
import { seedSealProfile } from "../support/seed";
import { TINY_PNG } from "../support/tiny-png";
import { checkEveryCalc, reviewTeam, statusOf } from "./review-fixtures";

afterAll(closeDb);

const firmIds: string[] = [];

/** A package ready to issue, its project engineer's seal as `seal` says (none by default). */
async function readyToIssue() {
  const t = await reviewTeam({ seal: false });
  firmIds.push(t.firm.id);
  await submitForCheck({ actor: t.engineer, packageId: t.packageId });
  await checkEveryCalc(t.checker, t.packageId);
  return t;
}

const svgWithScript = `<?xml version="1.0" encoding="UTF-8"?>
<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="0 0 100 100" onload="alert('seal')">
  <script>document.cookie</script>
  <circle cx="50" cy="50" r="45" fill="none" stroke="#1b3a4b" stroke-width="3" onclick="steal()"/>
  <foreignObject width="100" height="20"><div xmlns="http://www.w3.org/1999/xhtml">html inside</div></foreignObject>
  <image href="https://tracker.example/pixel.png" width="1" height="1"/>
  <text x="50" y="55" text-anchor="middle">TEST SEAL</text>
</svg>`;

describe("issuing needs the project engineer's valid seal", () => {
  it("is refused to a project engineer without a seal profile, saying what to do", async () => {
    const t = await readyToIssue();
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({
      code: "CONFLICT",
      message: expect.stringMatching(/^You need a valid seal profile to issue: you have no seal profile yet; add .* on your account page\.$/),
    });
    expect(await statusOf(t.packageId)).toBe("checked");
  });

  it("is refused while the profile has no seal image, naming what is missing", async () => {
    const t = await readyToIssue();
    await seedSealProfile(t.pe, { image: null });
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({
      code: "CONFLICT",
      message: "You need a valid seal profile to issue: add your seal image on your account page.",
    });
  });

  it("is refused when the seal has expired, giving the date", async () => {
    const t = await readyToIssue();
    await seedSealProfile(t.pe, { expiresOn: "2026-01-31" });
    await expect(issueRevision({ actor: t.pe, packageId: t.packageId })).rejects.toMatchObject({
      code: "CONFLICT",
      message: "You need a valid seal profile to issue: your seal expired on 2026-01-31; renew it on your account page.",
    });
    expect(await db().from("revisions").where({ packageId: t.packageId }).count<{ count: string }[]>({ count: "*" })).toEqual([{ count: "0" }]);
  });

  it("counts a seal as valid up to and including its expiry date", async () => {
    const t = await readyToIssue();
    await seedSealProfile(t.pe, { expiresOn: "2027-03-31" });
    expect((await findValidSeal({ actor: t.pe, today: "2027-03-31" })).valid).toBe(true);
    expect(await findValidSeal({ actor: t.pe, today: "2027-04-01" })).toEqual({ valid: false, reason: "your seal expired on 2027-03-31; renew it on your account page" });
  });

  it("freezes the seal used into the revision and its fingerprint, unaffected by a later change of the profile", async () => {
    const t = await readyToIssue();
    await seedSealProfile(t.pe, { name: "Ines Varga", licenceNumber: "PE-40417", jurisdiction: "Testland", expiresOn: "2030-06-30" });
    const profile = await findSealProfile({ userId: t.pe.id, firmId: t.firm.id });
    const issued = await issueRevision({ actor: t.pe, packageId: t.packageId });

    await saveSealProfile({ actor: t.pe, input: { name: "Ines Varga", licenceNumber: "PE-99999", jurisdiction: "Testland", expiresOn: "2034-06-30" } });
    const [rev] = await listRevisions({ actor: t.pe, packageId: t.packageId });
    expect(rev.seal).toEqual({
      name: "Ines Varga",
      licenceNumber: "PE-40417",
      jurisdiction: "Testland",
      expiresOn: "2030-06-30",
      imageKey: profile!.imageKey,
      imageType: "png",
      imageSha256: profile!.imageSha256,
    });
    expect((await getObject(rev.seal!.imageKey))?.body.equals(TINY_PNG)).toBe(true);
    expect(verifyFingerprint({ revision: rev }).ok).toBe(true);
    // The seal is covered: the same revision without it, or with another licence number, gives another fingerprint.
    expect(computeFingerprint({ ...rev, seal: null })).not.toBe(issued.fingerprint);
    expect(computeFingerprint({ ...rev, seal: { ...rev.seal!, licenceNumber: "PE-99999" } })).not.toBe(issued.fingerprint);
    // The export prints the frozen seal, its image checked against the frozen hash.
    expect(await reportSealOf(rev.seal)).toEqual({ name: "Ines Varga", licenceNumber: "PE-40417", jurisdiction: "Testland", expiresOn: "2030-06-30", imageDataUri: `data:image/png;base64,${TINY_PNG.toString("base64")}` });
    await expect(reportSealOf({ ...rev.seal!, imageSha256: "0".repeat(64) })).rejects.toMatchObject({ code: "CONFLICT", message: expect.stringContaining("no longer matches") });
  });

  it("recomputes the stored fingerprint of every revision, those issued before seals existed included", async () => {
    const t = await readyToIssue();
    await seedSealProfile(t.pe);
    await issueRevision({ actor: t.pe, packageId: t.packageId });
    // A revision as it was stored before the seal column existed: no seal, fingerprint without one.
    const frozen = { document: { type: "doc", content: [] }, results: {}, checkRecord: { calcs: [], remarks: [] }, number: 1 };
    await db()
      .insert({ packageId: t.packageId, number: 1, label: "1", document: JSON.stringify(frozen.document), results: "{}", checkRecord: JSON.stringify(frozen.checkRecord), issuedBy: t.pe.id, issuedAt: new Date(), fingerprint: computeFingerprint(frozen) })
      .into("revisions");
    const all: Revision[] = await db()
      .from("revisions as r")
      .join("packages as k", "k.id", "r.packageId")
      .join("projects as p", "p.id", "k.projectId")
      .whereIn("p.firmId", firmIds)
      .select("r.id", "r.packageId", "r.number", "r.label", "r.document", "r.results", "r.checkRecord", "r.issuedBy", "r.issuedAt", "r.fingerprint", "r.seal", "r.responseLetter");
    expect(all.filter((r) => r.seal === null).length).toBeGreaterThan(0);
    expect(all.filter((r) => r.seal !== null).length).toBeGreaterThan(1);
    expect(all.filter((r) => !verifyFingerprint({ revision: r }).ok).map((r) => r.id)).toEqual([]);
  });
});

describe("the seal profile", () => {
  it("refuses a malformed expiry date, naming the field", async () => {
    const t = await reviewTeam({ seal: false });
    await expect(saveSealProfile({ actor: t.pe, input: { name: "A", licenceNumber: "1", jurisdiction: "Testland", expiresOn: "31/01/2027" } })).rejects.toMatchObject({
      code: "INVALID",
      path: "expiresOn",
      message: "expiresOn: Give the expiry date as YYYY-MM-DD.",
    });
    await expect(saveSealProfile({ actor: t.pe, input: { name: "A", licenceNumber: " ", jurisdiction: "Testland", expiresOn: "2027-01-31" } })).rejects.toMatchObject({ path: "licenceNumber" });
  });
});

describe("the seal image", () => {
  it("stores an SVG without its script, event handlers, foreignObject or external references", async () => {
    const t = await reviewTeam({ seal: false });
    const stored = await uploadSealImage({ actor: t.pe, bytes: Buffer.from(svgWithScript) });
    expect(stored.imageType).toBe("svg");
    const { body, contentType } = await readSealImage({ actor: t.pe });
    const svg = body.toString("utf8");
    expect(contentType).toBe("image/svg+xml");
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
    expect(svg).toContain("<circle");
    expect(svg).toContain("TEST SEAL");
    for (const gone of ["<script", "document.cookie", "onload", "onclick", "foreignObject", "html inside", "tracker.example"]) expect(svg).not.toContain(gone);
  });

  it("stores a PNG as it was sent", async () => {
    const t = await reviewTeam({ seal: false });
    await uploadSealImage({ actor: t.pe, bytes: TINY_PNG });
    const { body, contentType } = await readSealImage({ actor: t.pe });
    expect([contentType, body.equals(TINY_PNG)]).toEqual(["image/png", true]);
  });

  it("refuses a 600 KB file, saying the limit", async () => {
    const t = await reviewTeam({ seal: false });
    const big = Buffer.concat([TINY_PNG, Buffer.alloc(600 * 1024 - TINY_PNG.length)]);
    await expect(uploadSealImage({ actor: t.pe, bytes: big })).rejects.toMatchObject({ code: "INVALID", path: "file", message: "The seal image is 600 KB; seal images may be at most 512 KB." });
    expect(await findSealProfile({ userId: t.pe.id, firmId: t.firm.id })).toBeUndefined();
  });

  it("refuses a JPEG, and anything that is neither PNG nor SVG", async () => {
    const t = await reviewTeam({ seal: false });
    const jpeg = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01]);
    await expect(uploadSealImage({ actor: t.pe, bytes: jpeg })).rejects.toMatchObject({ code: "INVALID", message: "JPEG images cannot be seals; upload the seal as a PNG or an SVG." });
    await expect(uploadSealImage({ actor: t.pe, bytes: Buffer.from("%PDF-1.7\n") })).rejects.toMatchObject({ code: "INVALID", message: "The file is neither a PNG nor an SVG; upload the seal as a PNG or an SVG." });
  });
});
