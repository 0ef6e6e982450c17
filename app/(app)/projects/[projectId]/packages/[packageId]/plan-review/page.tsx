import Link from "next/link";
import { notFound } from "next/navigation";
import { PlanReviewWorkspace } from "@/components/plan-review/plan-review-workspace";
import type { CommentListDto, LetterDto } from "@/components/plan-review/plan-review-types";
import { can } from "@/lib/access/permissions";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { calcKindNames } from "@/lib/calcs/calc-kind-names";
import { extractCalcs } from "@/lib/calcs/extract-calcs";
import { findPackage } from "@/lib/data/packages";
import { isUuid } from "@/lib/data/projects";
import { numberedHeadings } from "@/lib/document/numbered-headings";
import { getResponseLetter } from "@/lib/plan-review/get-response-letter";
import { listComments } from "@/lib/plan-review/list-comments";

// The permit office's comments on the latest issued revision, their responses in the draft, and the response letter they make.
export default async function PlanReviewPage({ params }: { params: Promise<{ projectId: string; packageId: string }> }) {
  const { projectId, packageId } = await params;
  const { user, access } = await loadProjectPage(projectId, "planReview.read");
  const pkg = isUuid(packageId) ? await findPackage(projectId, packageId, { withDocument: true }) : undefined;
  if (!pkg) notFound();
  const [list, letter] = await Promise.all([listComments({ actor: user, packageId: pkg.id }), getResponseLetter({ actor: user, packageId: pkg.id })]);
  const places = {
    calcs: extractCalcs(pkg.document).map((c) => ({ id: c.id, label: c.label, kindName: calcKindNames[c.kind] })),
    headings: numberedHeadings(pkg.document).map((h) => ({ index: h.index, number: h.number, text: h.text })),
  };
  return (
    <article className="space-y-4" aria-label="Plan-review comments">
      <header className="flex flex-wrap items-baseline gap-3">
        <h2 className="font-serif text-2xl font-semibold">Plan-review comments — {pkg.title}</h2>
        <Link className="pp-btn-quiet" href={`/projects/${projectId}/packages/${pkg.id}`}>Back to the package</Link>
      </header>
      <p className="text-sm text-ink-soft">
        The permit office’s numbered comments on an issued revision, each answered in the draft that follows. When that draft is issued, its response letter is frozen with it.
      </p>
      <PlanReviewWorkspace
        packageId={pkg.id}
        issued={pkg.status === "issued"}
        canManage={can("planReview.manage", access.grantees)}
        places={places}
        initialList={JSON.parse(JSON.stringify(list)) as CommentListDto}
        initialLetter={letter as LetterDto}
      />
    </article>
  );
}
