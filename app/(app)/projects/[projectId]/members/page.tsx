import type { Metadata } from "next";
import { MembersView } from "@/components/members/members-view";
import { can } from "@/lib/access/permissions";
import { loadProjectPage } from "@/lib/access/load-project-page";
import { listProjectMembers } from "@/lib/data/project-members";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  const { user, access } = await loadProjectPage(projectId, "member.list");
  const members = await listProjectMembers(projectId);
  return <MembersView projectId={projectId} selfId={user.id} initial={members} canManage={can("member.update", access.grantees)} canInvite={can("member.invite", access.grantees)} />;
}
