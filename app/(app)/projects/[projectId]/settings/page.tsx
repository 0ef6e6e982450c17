import type { Metadata } from "next";
import { ProjectSettingsForm } from "@/components/projects/project-settings-form";
import { can } from "@/lib/access/permissions";
import { loadProjectPage } from "@/lib/access/load-project-page";

export const metadata: Metadata = { title: "Project settings" };

export default async function SettingsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const { access } = await loadProjectPage(projectId);
  const p = access.project;
  return (
    <ProjectSettingsForm
      projectId={projectId}
      canEdit={can("project.update", access.grantees)}
      initial={{ name: p.name, jobNumber: p.jobNumber, client: p.client, site: p.site, unitSystem: p.unitSystem, paperSize: p.paperSize, revisionScheme: p.revisionScheme, designCodes: p.designCodes.join("\n") }}
    />
  );
}
