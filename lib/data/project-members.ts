import { db, type DbOrTrx } from "@/db/knex";
import type { ProjectRole } from "@/lib/access/roles";

export type ProjectMember = { userId: string; email: string; name: string; role: ProjectRole; invited: boolean; disabled: boolean };

export async function listProjectMembers(projectId: string, trx: DbOrTrx = db()): Promise<ProjectMember[]> {
  return trx
    .from("projectMemberships as pm")
    .join("users as u", "u.id", "pm.userId")
    .select("pm.userId", "u.email", "u.name", "pm.role", "u.disabled")
    .select(trx.raw("u.password_hash is null as invited"))
    .where("pm.projectId", projectId)
    .orderBy("u.name");
}

export async function findProjectMember(projectId: string, userId: string, trx: DbOrTrx = db()): Promise<ProjectMember | undefined> {
  return trx
    .from("projectMemberships as pm")
    .join("users as u", "u.id", "pm.userId")
    .select("pm.userId", "u.email", "u.name", "pm.role", "u.disabled")
    .select(trx.raw("u.password_hash is null as invited"))
    .where({ "pm.projectId": projectId, "pm.userId": userId })
    .first();
}

/** Adds or changes a person's role on a project. */
export async function upsertProjectMember(projectId: string, userId: string, role: ProjectRole, trx: DbOrTrx = db()): Promise<void> {
  await trx.insert({ projectId, userId, role }).into("projectMemberships").onConflict(["projectId", "userId"]).merge(["role"]);
}

export async function removeProjectMember(projectId: string, userId: string, trx: DbOrTrx = db()): Promise<number> {
  return trx.from("projectMemberships").where({ projectId, userId }).delete();
}

export async function countProjectEngineers(projectId: string, trx: DbOrTrx = db()): Promise<number> {
  const [row] = await trx.from("projectMemberships").where({ projectId, role: "project_engineer" }).count<{ count: string }[]>("* as count");
  return Number(row.count);
}
