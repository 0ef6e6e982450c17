import { db } from "@/db/knex";
import type { ProjectRole } from "@/lib/access/roles";
import { AppError } from "@/lib/app-error";
import { recordAudit } from "@/lib/data/audit";
import { createInvitation } from "@/lib/data/invitations";
import { upsertProjectMember } from "@/lib/data/project-members";
import type { Project } from "@/lib/data/projects";
import { createUser, findUserIdByEmail, type ActingUser } from "@/lib/data/users";
import { env } from "@/lib/env";
import { sendMail } from "@/lib/mail/send-mail";
import { invitationMail } from "./invitation-mail";

export type InviteMemberOptions = { actor: ActingUser; project: Project; email: string; name: string; role: ProjectRole };
export type InviteMemberResult = { userId: string; invited: boolean; mailSent: boolean };

/**
 * Puts a person on a project with a role. Someone new to the firm gets an
 * account without a password and an e-mailed link to set one; a colleague who
 * already has an account is simply added. People of another firm are refused.
 */
export async function inviteMember({ actor, project, email, name, role }: InviteMemberOptions): Promise<InviteMemberResult> {
  const { userId, token } = await db().transaction(async (trx) => {
    const existing = await findUserIdByEmail(email, trx);
    if (existing && existing.firmId !== actor.firmId) {
      throw new AppError("CONFLICT", "This e-mail address belongs to an account outside your firm.", "email");
    }
    const id = existing?.id ?? (await createUser({ email, name, passwordHash: null, firmId: actor.firmId, firmRole: "member" }, trx));
    await upsertProjectMember(project.id, id, role, trx);
    const t = existing ? null : await createInvitation({ firmId: actor.firmId, userId: id, projectId: project.id, projectRole: role, invitedBy: actor.id }, trx);
    await recordAudit({ firmId: actor.firmId, actorId: actor.id, action: "member.invite", entityType: "user", entityId: id, projectId: project.id, data: { email, role, newAccount: !existing } }, trx);
    return { userId: id, token: t };
  });

  const link = token ? `${env().APP_URL}/invitation/${token}` : `${env().APP_URL}/projects/${project.id}`;
  const mail = invitationMail({ inviter: actor.name, firm: actor.firmName, project: project.name, role, link, newAccount: Boolean(token) });
  // The membership stands even if the mail server is down; the admin sees mailSent: false and can resend.
  const mailSent = await sendMail({ to: email, ...mail }).then(
    () => true,
    (e: unknown) => {
      console.error("Invitation mail could not be sent", e);
      return false;
    },
  );
  return { userId, invited: Boolean(token), mailSent };
}
