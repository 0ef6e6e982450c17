import { projectRoleLabel, type ProjectRole } from "@/lib/access/roles";

export type InvitationMailOptions = { inviter: string; firm: string; project: string; role: ProjectRole; link: string; newAccount: boolean };

export function invitationMail(o: InvitationMailOptions): { subject: string; text: string } {
  const role = projectRoleLabel[o.role].toLowerCase();
  const subject = o.newAccount ? `${o.inviter} invited you to Panelpoint` : `You were added to ${o.project} on Panelpoint`;
  const text = [
    `${o.inviter} of ${o.firm} added you to the project "${o.project}" as ${role}.`,
    "",
    o.newAccount ? `Set your password and sign in here (the link works once, for 7 days):\n${o.link}` : `Open the project here:\n${o.link}`,
    "",
    "Panelpoint — calculation packages for truss design.",
  ].join("\n");
  return { subject, text };
}
