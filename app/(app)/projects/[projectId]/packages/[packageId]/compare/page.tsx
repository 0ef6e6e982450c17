import Link from "next/link";
import { notFound } from "next/navigation";
import { CompareView } from "@/components/review/compare-view";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { AppError } from "@/lib/app-error";
import { findPackage } from "@/lib/data/packages";
import { isUuid } from "@/lib/data/projects";
import { compareRevisions } from "@/lib/review/compare-revisions";
import { listRevisionHeads } from "@/lib/review/list-revision-heads";

type Search = { from?: string | string[]; to?: string | string[] };

// Two revisions of the package (or a revision and the current draft) side by side: what changed between them.
export default async function ComparePage({ params, searchParams }: { params: Promise<{ projectId: string; packageId: string }>; searchParams: Promise<Search> }) {
  const { projectId, packageId } = await params;
  const { user } = await loadProjectPage(projectId, "revision.read");
  const pkg = isUuid(packageId) ? await findPackage(projectId, packageId) : undefined;
  if (!pkg) notFound();
  const revisions = await listRevisionHeads({ actor: user, packageId: pkg.id });
  const search = await searchParams;
  const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);
  const latest = revisions.at(-1);
  const from = one(search.from) ?? latest?.id;
  const to = one(search.to) ?? "draft";
  const back = `/projects/${projectId}/packages/${pkg.id}`;

  let comparison;
  if (from) {
    try {
      comparison = await compareRevisions({ actor: user, packageId: pkg.id, from, to });
    } catch (e) {
      if (e instanceof AppError && e.code === "NOT_FOUND") notFound();
      throw e;
    }
  }

  return (
    <article className="space-y-4" aria-label="Compare revisions">
      <header className="flex flex-wrap items-baseline gap-3">
        <h2 className="font-serif text-2xl font-semibold">Compare revisions — {pkg.title}</h2>
        <Link className="pp-btn-quiet" href={back}>Back to the package</Link>
      </header>
      {revisions.length === 0 ? (
        <p className="text-sm text-ink-soft">Nothing to compare yet: this package has no issued revision. Issue Rev 0 first, then compare it with the next draft.</p>
      ) : (
        <form method="get" className="flex flex-wrap items-end gap-3" aria-label="Pick two revisions">
          <label className="block">
            <span className="pp-label">From</span>
            <select name="from" defaultValue={from} className="pp-input">
              {revisions.map((r) => <option key={r.id} value={r.id}>Rev {r.label} — {new Date(r.issuedAt).toISOString().slice(0, 10)}</option>)}
            </select>
          </label>
          <label className="block">
            <span className="pp-label">To</span>
            <select name="to" defaultValue={to} className="pp-input">
              <option value="draft">Current draft</option>
              {revisions.map((r) => <option key={r.id} value={r.id}>Rev {r.label} — {new Date(r.issuedAt).toISOString().slice(0, 10)}</option>)}
            </select>
          </label>
          <button type="submit" className="pp-btn">Compare</button>
        </form>
      )}
      {comparison && (
        <>
          <p className="text-sm" data-testid="compare-summary">
            <span className="font-semibold">{comparison.from.label}</span> → <span className="font-semibold">{comparison.to.label}</span>: {comparison.calcs.length} calc{comparison.calcs.length === 1 ? "" : "s"} changed, {comparison.text.length} text change{comparison.text.length === 1 ? "" : "s"}, {comparison.remarks.raised.length} remark{comparison.remarks.raised.length === 1 ? "" : "s"} raised, {comparison.remarks.closed.length} closed.
          </p>
          <CompareView comparison={comparison} />
        </>
      )}
    </article>
  );
}
