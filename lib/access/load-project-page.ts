import { notFound, redirect } from "next/navigation";
import { getActingUser } from "@/lib/auth/acting-user";
import { findProjectAccess, type ProjectAccess } from "@/lib/data/projects";
import type { ActingUser } from "@/lib/data/users";
import { can, type Permission } from "./permissions";

/**
 * For project pages: the signed-in user and their access, or the sign-in page,
 * or a 404 (another firm's project, or one the user is not on, is simply not there).
 */
export async function loadProjectPage(projectId: string, permission: Permission = "project.read"): Promise<{ user: ActingUser; access: ProjectAccess }> {
  const user = await getActingUser();
  if (!user) redirect("/sign-in");
  const access = await findProjectAccess(user, projectId);
  if (!access || !can(permission, access.grantees)) notFound();
  return { user, access };
}
