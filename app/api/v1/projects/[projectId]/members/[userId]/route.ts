import { route } from "@/lib/http/route";
import { changeMemberRole } from "@/lib/members/change-member-role";
import { removeMember } from "@/lib/members/remove-member";
import { changeMemberRoleInput, memberParams } from "@/lib/validation/member-input";

// PATCH /api/v1/projects/:projectId/members/:userId — change a member's project role
export const PATCH = route({ permission: "member.update", params: memberParams, body: changeMemberRoleInput }, async ({ user, params, body }) => ({
  member: await changeMemberRole({ actor: user, projectId: params.projectId, userId: params.userId, role: body.role }),
}));

// DELETE /api/v1/projects/:projectId/members/:userId — take someone off the project
export const DELETE = route({ permission: "member.remove", params: memberParams }, async ({ user, params }) => {
  await removeMember({ actor: user, projectId: params.projectId, userId: params.userId });
  return new Response(null, { status: 204 });
});
