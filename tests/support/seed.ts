import { randomUUID } from "node:crypto";
import { db } from "@/db/knex";
import type { FirmRole, ProjectRole } from "@/lib/access/roles";
import { hashPassword } from "@/lib/auth/password";
import { findActingUser, type ActingUser } from "@/lib/data/users";
import { saveSealProfile } from "@/lib/seals/save-seal-profile";
import { uploadSealImage } from "@/lib/seals/upload-seal-image";
import { TINY_PNG } from "./tiny-png";

/** Seed helpers: each test builds exactly what it needs, with unique names, and depends on no other test's rows. */

export const TEST_PASSWORD = "correct-horse-battery";
let cachedHash: string | undefined;

export async function seedFirm(name = `Firm ${randomUUID().slice(0, 8)}`): Promise<{ id: string; name: string }> {
  const [row] = await db().insert({ name }).into("firms").returning(["id", "name"]);
  return row;
}

export async function seedUser(o: { firmId: string; firmRole?: FirmRole; name?: string; email?: string; disabled?: boolean }): Promise<ActingUser> {
  cachedHash ??= await hashPassword(TEST_PASSWORD);
  const email = o.email ?? `u-${randomUUID().slice(0, 8)}@test.example`;
  const [u] = await db().insert({ email, name: o.name ?? "Test Person", passwordHash: cachedHash, disabled: o.disabled ?? false }).into("users").returning("id");
  await db().insert({ firmId: o.firmId, userId: u.id, role: o.firmRole ?? "member" }).into("firmMemberships");
  const actor = await findActingUser(u.id);
  if (!actor) throw new Error("seeded user not found");
  return actor;
}

export async function seedProject(o: { firmId: string; members?: { user: ActingUser; role: ProjectRole }[]; jobNumber?: string }): Promise<{ id: string; name: string; jobNumber: string }> {
  const jobNumber = o.jobNumber ?? `T-${randomUUID().slice(0, 8)}`;
  const [p] = await db().insert({ firmId: o.firmId, name: `Project ${jobNumber}`, jobNumber }).into("projects").returning(["id", "name", "jobNumber"]);
  for (const m of o.members ?? []) await db().insert({ projectId: p.id, userId: m.user.id, role: m.role }).into("projectMemberships");
  return p;
}

export async function seedPackage(o: { projectId: string; title?: string; status?: "draft" | "in_check" | "checked" | "issued" }): Promise<{ id: string }> {
  const [k] = await db().insert({ projectId: o.projectId, title: o.title ?? "Test package", status: o.status ?? "draft" }).into("packages").returning("id");
  return k;
}

/** A firm with one person in each project role on one project, and its admin. */
export async function seedTeam() {
  const firm = await seedFirm();
  const admin = await seedUser({ firmId: firm.id, firmRole: "admin", name: "Admin" });
  const engineer = await seedUser({ firmId: firm.id, name: "Engineer" });
  const checker = await seedUser({ firmId: firm.id, name: "Checker" });
  const pe = await seedUser({ firmId: firm.id, name: "Project Engineer" });
  const viewer = await seedUser({ firmId: firm.id, name: "Viewer" });
  const outsider = await seedUser({ firmId: firm.id, name: "Not on the project" });
  const project = await seedProject({
    firmId: firm.id,
    members: [
      { user: engineer, role: "engineer" },
      { user: checker, role: "checker" },
      { user: pe, role: "project_engineer" },
      { user: viewer, role: "viewer" },
    ],
  });
  return { firm, admin, engineer, checker, pe, viewer, outsider, project };
}

/**
 * A seal profile for `user`, through the real save and upload (the image, a tiny PNG unless
 * given, is stored in S3). Valid by default: expires on 31 December of next year.
 * Pass `image: null` for a profile without an image.
 */
export async function seedSealProfile(
  user: Pick<ActingUser, "id" | "firmId" | "name">,
  o: { name?: string; licenceNumber?: string; jurisdiction?: string; expiresOn?: string; image?: Buffer | null } = {},
): Promise<void> {
  const expiresOn = o.expiresOn ?? `${new Date().getUTCFullYear() + 1}-12-31`;
  await saveSealProfile({ actor: user, input: { name: o.name ?? user.name, licenceNumber: o.licenceNumber ?? `PE-T${randomUUID().slice(0, 6)}`, jurisdiction: o.jurisdiction ?? "Testland", expiresOn } });
  if (o.image !== null) await uploadSealImage({ actor: user, bytes: o.image ?? TINY_PNG });
}
