import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/knex";
import { findProjectAccess, listProjects } from "@/lib/data/projects";
import { can } from "@/lib/access/permissions";
import { seedTeam } from "../support/seed";

afterAll(closeDb);

describe("project access is scoped by firm and membership", () => {
  it("lists a project to its members and to the firm admin, not to a colleague who is not on it", async () => {
    const t = await seedTeam();
    for (const u of [t.engineer, t.checker, t.pe, t.viewer, t.admin]) {
      expect((await listProjects(u)).map((p) => p.id)).toContain(t.project.id);
    }
    expect((await listProjects(t.outsider)).map((p) => p.id)).not.toContain(t.project.id);
  });

  it("finds nothing for a member of another firm, even their admin", async () => {
    const a = await seedTeam();
    const b = await seedTeam();
    expect(await findProjectAccess(b.admin, a.project.id)).toBeUndefined();
    expect(await findProjectAccess(b.pe, a.project.id)).toBeUndefined();
    expect((await listProjects(b.admin)).map((p) => p.id)).not.toContain(a.project.id);
  });

  it("gives each role the actions of the permission table and no more", async () => {
    const t = await seedTeam();
    const access = async (u: typeof t.engineer) => (await findProjectAccess(u, t.project.id))!.grantees;
    expect(can("package.create", await access(t.engineer))).toBe(true);
    expect(can("package.create", await access(t.checker))).toBe(false);
    expect(can("calc.check", await access(t.checker))).toBe(true);
    expect(can("revision.issue", await access(t.pe))).toBe(true);
    expect(can("revision.issue", await access(t.engineer))).toBe(false);
    expect(can("package.edit", await access(t.viewer))).toBe(false);
    expect(can("member.invite", await access(t.admin))).toBe(true);
  });

  it("answers undefined for a malformed id rather than a database error", async () => {
    const t = await seedTeam();
    expect(await findProjectAccess(t.admin, "not-a-uuid")).toBeUndefined();
  });
});
