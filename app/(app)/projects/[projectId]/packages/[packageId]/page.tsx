import { notFound } from "next/navigation";
import { PackageView } from "@/components/packages/package-view";
import { can } from "@/lib/access/permissions";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { findPackage } from "@/lib/data/packages";
import { isUuid } from "@/lib/data/projects";

export default async function PackagePage({ params }: { params: Promise<{ projectId: string; packageId: string }> }) {
  const { projectId, packageId } = await params;
  const { access } = await loadProjectPage(projectId, "package.read");
  const pkg = isUuid(packageId) ? await findPackage(projectId, packageId, { withDocument: true }) : undefined;
  if (!pkg) notFound();
  return (
    <PackageView
      projectId={projectId}
      pkg={{ id: pkg.id, title: pkg.title, status: pkg.status, version: pkg.version, updatedAt: String(pkg.updatedAt), document: pkg.document }}
      unitSystem={access.project.unitSystem}
      canEdit={can("package.edit", access.grantees)}
      canDelete={can("package.delete", access.grantees)}
    />
  );
}
