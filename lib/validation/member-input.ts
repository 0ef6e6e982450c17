import { z } from "zod";
import { firmRoles, projectRoles } from "@/lib/access/roles";

export const inviteMemberInput = z.object({
  email: z.email("Give a valid e-mail address.").max(254),
  name: z.string().trim().min(1, "Give the person's name.").max(200),
  role: z.enum(projectRoles),
});
export type InviteMemberInput = z.infer<typeof inviteMemberInput>;

export const changeMemberRoleInput = z.object({ role: z.enum(projectRoles) }).strict();

export const memberParams = z.object({ projectId: z.uuid(), userId: z.uuid() });

export const firmMemberParams = z.object({ userId: z.uuid() });
export const firmMemberUpdateInput = z.object({ role: z.enum(firmRoles), disabled: z.boolean() }).partial().strict();
