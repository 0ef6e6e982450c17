import { route } from "@/lib/http/route";
import { updateFirmMember } from "@/lib/members/update-firm-member";
import { firmMemberParams, firmMemberUpdateInput } from "@/lib/validation/member-input";

// PATCH /api/v1/firm/members/:userId — make someone firm admin or member, or disable their account
export const PATCH = route({ permission: "firm.members.manage", params: firmMemberParams, body: firmMemberUpdateInput }, async ({ user, params, body }) => {
  await updateFirmMember({ actor: user, userId: params.userId, ...body });
  return { ok: true };
});
