import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { VerifyDropZone } from "@/components/verify/verify-drop-zone";
import { AppError } from "@/lib/app-error";
import { lookUpVerification, type Verification } from "@/lib/exports/verification";
import { SAFETY_TEXT } from "@/lib/safety-notice";
import { verifyParams } from "@/lib/validation/export-input";

export const metadata: Metadata = { title: "Verification", robots: { index: false } };
export const dynamic = "force-dynamic";

// The public verification page: no sign-in. It shows what was issued under the token, and nothing else.
export default async function VerifyPage({ params }: { params: Promise<{ token: string }> }) {
  const parsed = verifyParams.safeParse(await params);
  if (!parsed.success) notFound();
  let v: Verification;
  try {
    v = await lookUpVerification(parsed.data.token);
  } catch (e) {
    if (e instanceof AppError && e.code === "NOT_FOUND") notFound();
    throw e;
  }
  const rows: [string, string][] = [
    ["Project", `${v.projectName} (job ${v.jobNumber})`],
    ["Package", v.packageTitle],
    ["Revision", `Rev ${v.revisionLabel}`],
    ["Issued by", v.issuer],
    ["Issued", new Date(v.issuedAt).toUTCString()],
    ["Package fingerprint", v.fingerprint],
    ["SHA-256 of the signed PDF", v.sha256],
  ];
  return (
    <main className="mx-auto max-w-2xl space-y-6 px-4 py-10" data-testid="verification-page">
      <header className="space-y-1">
        <p className="text-xs uppercase tracking-wide text-ink-faint">Panelpoint verification page</p>
        <h1 className="font-serif text-2xl font-semibold">Issued calculation package</h1>
      </header>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-2 text-sm">
        {rows.map(([k, val]) => (
          <div key={k} className="contents">
            <dt className="text-ink-faint">{k}</dt>
            <dd className={k.includes("SHA") || k.includes("fingerprint") ? "pp-num break-all" : ""} data-testid={`verify-${k.toLowerCase().replace(/[^a-z0-9]+/g, "-")}`}>{val}</dd>
          </div>
        ))}
      </dl>
      <VerifyDropZone token={parsed.data.token} expectedSha256={v.sha256} />
      <p className="text-xs text-ink-faint">{SAFETY_TEXT}</p>
    </main>
  );
}
