import type { ReportMeta } from "../lib/report/report-model";
import { escapeHtml } from "./escape-html";
import { qrSvg } from "./qr-svg";

const day = (iso: string | null | undefined) => escapeHtml((iso ?? "").slice(0, 10));

/** The cover sheet: what the package is, its revision, the seal and signature area, how to verify it, and the caution. */
export function coverSheet(meta: ReportMeta): string {
  const fact = (k: string, v: string | null | undefined, cls = "") => (v ? `<div class="k">${escapeHtml(k)}</div><div class="${cls}">${escapeHtml(v)}</div>` : "");
  const revision = meta.revision
    ? `Rev ${meta.revision.label} — issued ${meta.revision.issuedAt.slice(0, 10)} by ${meta.revision.issuedBy}`
    : "PRELIMINARY — NOT FOR CONSTRUCTION (draft, not issued)";
  const seal = meta.seal;
  const sealBlock = seal
    ? `${seal.imageDataUri && /^data:image\/(png|svg\+xml);/.test(seal.imageDataUri) ? `<img src="${escapeHtml(seal.imageDataUri)}" alt="Seal of ${escapeHtml(seal.name)}">` : `<div class="empty">No seal image on file</div>`}
<div class="name">${escapeHtml(seal.name)}</div><div>Licence ${escapeHtml(seal.licenceNumber)}</div><div>${escapeHtml(seal.jurisdiction)}</div><div class="pp-muted">Licence expires ${day(seal.expiresOn)}</div>`
    : `<div class="empty">${meta.revision ? "No seal on file for this revision" : "Not sealed: draft"}</div><div class="pp-muted">Engineer of record</div>`;
  const verify = meta.verification
    ? `<div class="verify">${qrSvg(meta.verification.url)}<div><b>This file is digitally signed; verify it at ${escapeHtml(meta.verification.url)}</b><br><span class="pp-muted">Verification code ${escapeHtml(meta.verification.token)}</span></div></div>`
    : `<div class="verify pp-muted">A draft is not signed and cannot be verified. Issued revisions carry a digital signature and a verification link here.</div>`;
  return `<section class="pp-b pp-cover" id="cover" data-break="before" data-subject="Cover sheet">
<div class="firm">${escapeHtml(meta.firmName)}</div>
<div class="kicker">Calculation package</div>
<div class="title">${escapeHtml(meta.packageTitle)}</div>
<div class="project">${escapeHtml(meta.projectName)}</div>
<div class="facts">
${fact("Job number", meta.jobNumber)}${fact("Client", meta.client)}${fact("Site", meta.site)}
${fact("Revision", revision, meta.revision ? "" : "prelim")}${fact("Date", (meta.revision?.issuedAt ?? meta.generatedAt).slice(0, 10))}
${fact("Prepared by", `${meta.preparedBy.name}, ${meta.preparedBy.date.slice(0, 10)}`)}${fact("Checked by", meta.checkedBy ? `${meta.checkedBy.name}, ${meta.checkedBy.date.slice(0, 10)}` : "not checked")}
<div class="k">Sheets</div><div><span data-total-sheets>—</span> sheets, each numbered “Sheet x of y”; see the index</div>
</div>
<div class="lower">
<div class="seal"><span class="k">Seal of the engineer of record</span>${sealBlock}</div>
<div class="sign"><span class="k">Signature</span>
<div class="row"><div><div class="line"></div><span class="pp-muted">Signed${seal ? ` — ${escapeHtml(seal.name)}` : ""}</span></div><div><div class="line"></div><span class="pp-muted">Date</span></div></div>
${verify}
</div>
</div>
<div class="caution"><b>Caution</b>${escapeHtml(meta.safetyText)}</div>
<div class="fpfull">Package fingerprint (SHA-256 of the package content): ${escapeHtml(meta.fingerprint)}</div>
</section>`;
}
