import { listProjectMembers } from "@/lib/data/project-members";
import { created, route } from "@/lib/http/route";
import { inviteMember } from "@/lib/members/invite-member";
import { inviteMemberInput } from "@/lib/validation/member-input";
import { projectParams } from "@/lib/validation/project-input";

// GET /api/v1/projects/:projectId/members — the people on the project and their roles
export const GET = route({ permission: "member.list", params: projectParams }, async ({ params }) => ({
  members: await listProjectMembers(params.projectId),
}));

// POST /api/v1/projects/:projectId/members — invite someone by e-mail with a project role
export const POST = route({ permission: "member.invite", params: projectParams, body: inviteMemberInput }, async ({ user, access, body }) =>
  created(await inviteMember({ actor: user, project: access!.project, ...body })),
);
