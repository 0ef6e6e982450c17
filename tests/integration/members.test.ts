import { afterAll, beforeEach, describe, expect, it } from "vitest";
import { closeDb, db } from "@/db/knex";
import { authenticate } from "@/lib/auth/authenticate";
import { findProjectAccess } from "@/lib/data/projects";
import { acceptInvitation } from "@/lib/invitations/accept-invitation";
import { listCapturedMail } from "@/lib/mail/list-captured-mail";
import { changeMemberRole } from "@/lib/members/change-member-role";
import { inviteMember } from "@/lib/members/invite-member";
import { removeMember } from "@/lib/members/remove-member";
import { findActingUser } from "@/lib/data/users";
import { env } from "@/lib/env";
import { seedTeam } from "../support/seed";

afterAll(closeDb);
beforeEach(async () => {
  await fetch(`${env().MAIL_CAPTURE_URL}/messages`, { method: "DELETE" });
});

describe("inviting people to a project", () => {
  it("creates the account, mails a one-time link, and the link sets a password that signs in", async () => {
    const t = await seedTeam();
    const { project } = (await findProjectAccess(t.pe, t.project.id))!;
    const email = `new-${Date.now()}@test.example`;
    const res = await inviteMember({ actor: t.pe, project, email, name: "New Checker", role: "checker" });
    expect(res).toMatchObject({ invited: true, mailSent: true });

    const mail = (await listCapturedMail()).find((m) => m.to.includes(email));
    expect(mail?.subject).toContain("invited you to Panelpoint");
    const token = mail!.text.match(/\/invitation\/([A-Za-z0-9_-]+)/)?.[1];
    expect(token).toBeTruthy();

    await acceptInvitation({ token: token!, password: "a-long-new-password" });
    const who = await authenticate({ email, password: "a-long-new-password", ip: "10.1.1.1" });
    expect(who.id).toBe(res.userId);
    const access = await findProjectAccess((await findActingUser(who.id))!, t.project.id);
    expect(access?.role).toBe("checker");
    await expect(acceptInvitation({ token: token!, password: "another-password" })).rejects.toThrow(/not valid any more/);
  });

  it("refuses an e-mail address that belongs to another firm", async () => {
    const a = await seedTeam();
    const b = await seedTeam();
    const { project } = (await findProjectAccess(a.pe, a.project.id))!;
    await expect(inviteMember({ actor: a.pe, project, email: b.engineer.email, name: "X", role: "viewer" })).rejects.toMatchObject({ code: "CONFLICT", path: "email" });
  });

  it("adds a colleague who already has an account without a new invitation", async () => {
    const t = await seedTeam();
    const { project } = (await findProjectAccess(t.pe, t.project.id))!;
    const res = await inviteMember({ actor: t.pe, project, email: t.outsider.email, name: t.outsider.name, role: "viewer" });
    expect(res.invited).toBe(false);
    expect((await findProjectAccess(t.outsider, t.project.id))?.role).toBe("viewer");
  });

  it("keeps at least one project engineer on a project", async () => {
    const t = await seedTeam();
    await expect(changeMemberRole({ actor: t.pe, projectId: t.project.id, userId: t.pe.id, role: "engineer" })).rejects.toMatchObject({ code: "CONFLICT" });
    await expect(removeMember({ actor: t.pe, projectId: t.project.id, userId: t.pe.id })).rejects.toMatchObject({ code: "CONFLICT" });
    await changeMemberRole({ actor: t.pe, projectId: t.project.id, userId: t.engineer.id, role: "project_engineer" });
    await removeMember({ actor: t.pe, projectId: t.project.id, userId: t.pe.id });
    expect(await findProjectAccess(t.pe, t.project.id)).toBeUndefined();
    const audit = await db().from("auditLog").where({ projectId: t.project.id }).orderBy("id");
    expect(audit.map((a) => a.action)).toEqual(["member.role", "member.remove"]);
  });
});
