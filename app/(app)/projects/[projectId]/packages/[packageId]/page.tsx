import { notFound } from "next/navigation";
import { PackageView } from "@/components/packages/package-view";
import { can } from "@/lib/access/permissions";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { findPackage } from "@/lib/data/packages";
import { listProjectMembers } from "@/lib/data/project-members";
import { isUuid } from "@/lib/data/projects";
import { listRevisionHeads } from "@/lib/review/list-revision-heads";

export default async function PackagePage({ params }: { params: Promise<{ projectId: string; packageId: string }> }) {
  const { projectId, packageId } = await params;
  const { user, access } = await loadProjectPage(projectId, "package.read");
  const pkg = isUuid(packageId) ? await findPackage(projectId, packageId, { withDocument: true }) : undefined;
  if (!pkg) notFound();
  const members = await listProjectMembers(projectId);
  const revisions = (await listRevisionHeads({ actor: user, packageId: pkg.id })).map((r) => ({ id: r.id, label: r.label }));
  const g = access.grantees;
  return (
    <PackageView
      projectId={projectId}
      pkg={{ id: pkg.id, title: pkg.title, status: pkg.status, version: pkg.version, updatedAt: String(pkg.updatedAt), document: pkg.document }}
      unitSystem={access.project.unitSystem}
      canEdit={can("package.edit", g)}
      canDelete={can("package.delete", g)}
      exports={{ revisions, canExport: can("export.create", g) }}
      review={{
        status: pkg.status,
        assignedChecker: pkg.assignedChecker,
        checkers: members.filter((m) => m.role === "checker" && !m.disabled).map((m) => ({ userId: m.userId, name: m.name })),
        abilities: {
          userId: user.id,
          canRemark: can("remark.create", g),
          canReply: can("remark.reply", g),
          // As closeRemark decides: the engineer of record (who may issue) closes any remark.
          canCloseAny: can("revision.issue", g),
          canCloseOwn: can("remark.close", g),
          canCheck: can("calc.check", g) && pkg.assignedChecker === user.id,
          canSubmit: can("package.submit", g),
          canAssign: can("checker.assign", g),
          canIssue: can("revision.issue", g),
          canStartNext: can("package.edit", g),
        },
      }}
    />
  );
}
