import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { ProjectsView } from "@/components/projects/projects-view";
import { getActingUser } from "@/lib/auth/acting-user";
import { listProjects } from "@/lib/data/projects";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const user = await getActingUser();
  if (!user) redirect("/sign-in");
  const projects = await listProjects(user);
  return <ProjectsView initial={JSON.parse(JSON.stringify(projects))} />;
}
