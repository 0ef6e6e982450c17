import Link from "next/link";
import { notFound } from "next/navigation";
import { describeAuditEntry } from "@/lib/audit/describe-audit-entry";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { listPackageAudit } from "@/lib/data/package-audit";
import { findPackage } from "@/lib/data/packages";
import { isUuid } from "@/lib/data/projects";

// The package's history as the audit log holds it: every state change, check mark, remark, issue and export.
export default async function PackageAuditPage({ params }: { params: Promise<{ projectId: string; packageId: string }> }) {
  const { projectId, packageId } = await params;
  const { user } = await loadProjectPage(projectId, "package.read");
  const pkg = isUuid(packageId) ? await findPackage(projectId, packageId) : undefined;
  if (!pkg) notFound();
  const rows = await listPackageAudit({ firmId: user.firmId, projectId, packageId: pkg.id });
  return (
    <article className="space-y-4" aria-label="Audit trail">
      <header className="flex flex-wrap items-baseline gap-3">
        <h2 className="font-serif text-2xl font-semibold">Audit trail — {pkg.title}</h2>
        <Link className="pp-btn-quiet" href={`/projects/${projectId}/packages/${pkg.id}`}>Back to the package</Link>
      </header>
      <p className="text-sm text-ink-soft">Recorded by the server as each action happened; the log cannot be edited or deleted.</p>
      {rows.length === 0 ? (
        <p className="text-sm text-ink-soft">Nothing recorded yet.</p>
      ) : (
        <table className="pp-table w-full text-sm" data-testid="audit-trail">
          <thead>
            <tr><th className="text-left">When (UTC)</th><th className="text-left">Who</th><th className="text-left">What</th><th className="text-left">Action</th></tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.id} data-action={r.action}>
                <td className="pp-num whitespace-nowrap">{new Date(r.at).toISOString().replace("T", " ").slice(0, 19)}</td>
                <td>{r.actorName ?? "system"}</td>
                <td>{describeAuditEntry(r.action, r.data)}</td>
                <td className="pp-num text-xs text-ink-faint">{r.action}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </article>
  );
}
