import { PackagesView } from "@/components/packages/packages-view";
import { can } from "@/lib/access/permissions";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { listPackages } from "@/lib/data/packages";

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const { access } = await loadProjectPage(projectId);
  const packages = await listPackages(projectId);
  return <PackagesView projectId={projectId} initial={JSON.parse(JSON.stringify(packages))} canCreate={can("package.create", access.grantees)} />;
}
