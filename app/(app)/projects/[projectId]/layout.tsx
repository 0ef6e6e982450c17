import type { ReactNode } from "react";
import { ProjectBar } from "@/components/projects/project-bar";
import { loadProjectPage } from "@/lib/access/load-project-page";

export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const { access } = await loadProjectPage(projectId);
  const p = access.project;
  return (
    <div className="space-y-6">
      <ProjectBar id={p.id} name={p.name} jobNumber={p.jobNumber} client={p.client} site={p.site} role={access.role} />
      {children}
    </div>
  );
}
