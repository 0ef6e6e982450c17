import { createHash } from "node:crypto";
import type { PackageDocument } from "@/lib/document/document-types";
import type { ReportSource } from "@/lib/report/build-report-model";
import type { ReportMeta } from "@/lib/report/report-model";
import { SAFETY_TEXT } from "@/lib/safety-notice";

/** The demo's title block facts; a draft unless `issued`, with the fingerprint of the document given. */
export function reportMeta(document: PackageDocument, options: { issued?: boolean; paperSize?: "letter" | "a4" } = {}): ReportMeta {
  const issued = options.issued ?? false;
  return {
    firmName: "Kestrel & Vane Engineering",
    projectName: "Alder Creek Footbridge",
    jobNumber: "KV-2026-014",
    client: "Alder County Parks",
    site: "Alder Creek crossing",
    paperSize: options.paperSize ?? "letter",
    packageId: "b3f0c2a4-0000-4000-8000-000000000001",
    packageTitle: "Main trusses — 24 m Pratt span",
    revision: issued ? { id: "b3f0c2a4-0000-4000-8000-0000000000r1", label: "1", number: 1, issuedAt: "2026-12-02T10:00:00.000Z", issuedBy: "Rita Okafor" } : null,
    previousRevisionLabel: issued ? "0" : null,
    fingerprint: createHash("sha256").update(JSON.stringify(document)).digest("hex"),
    preparedBy: { name: "Rita Okafor", date: "2026-12-01" },
    checkedBy: issued ? { name: "Mats Lindqvist", date: "2026-12-02" } : null,
    seal: issued ? { name: "Rita Okafor, P.E.", licenceNumber: "PE-041122", jurisdiction: "Example State Board", expiresOn: "2027-06-30", imageDataUri: null } : null,
    verification: issued ? { url: "https://panelpoint.example/v/K7Q2M9", token: "K7Q2M9" } : null,
    generatedAt: "2026-12-02T14:00:00.000Z",
    safetyText: SAFETY_TEXT,
  };
}

/** A report source for `document` with an empty check record and revision log unless given. */
export function reportSource(document: PackageDocument, options: { issued?: boolean; changedCalcIds?: string[] } = {}): ReportSource {
  return {
    document,
    meta: reportMeta(document, options),
    checkRecord: [],
    revisionLog: [{ label: "0", date: "2026-11-20", by: "Rita Okafor", description: "Issued for plan review" }],
    responseLetter: null,
    changedCalcIds: options.changedCalcIds ?? [],
  };
}
