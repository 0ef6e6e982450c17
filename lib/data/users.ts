import { db, type DbOrTrx } from "@/db/knex";
import type { FirmRole } from "@/lib/access/roles";

/** The person making a request, with the firm that scopes everything they touch. */
export type ActingUser = { id: string; email: string; name: string; disabled: boolean; firmId: string; firmName: string; firmRole: FirmRole };

export type SigninUser = { id: string; email: string; name: string; passwordHash: string | null; disabled: boolean };

export async function findUserForSignin(email: string, trx: DbOrTrx = db()): Promise<SigninUser | undefined> {
  return trx.from("users").select("id", "email", "name", "passwordHash", "disabled").whereRaw("lower(email) = lower(?)", [email]).first();
}

export async function findActingUser(id: string, trx: DbOrTrx = db()): Promise<ActingUser | undefined> {
  return trx
    .from("users as u")
    .join("firmMemberships as fm", "fm.userId", "u.id")
    .join("firms as f", "f.id", "fm.firmId")
    .select("u.id", "u.email", "u.name", "u.disabled", "fm.firmId", "f.name as firmName", "fm.role as firmRole")
    .where("u.id", id)
    .first();
}

export async function findUserIdByEmail(email: string, trx: DbOrTrx = db()): Promise<{ id: string; firmId: string | null } | undefined> {
  return trx
    .from("users as u")
    .leftJoin("firmMemberships as fm", "fm.userId", "u.id")
    .select("u.id", "fm.firmId")
    .whereRaw("lower(u.email) = lower(?)", [email])
    .first();
}

export type CreateUserOptions = { email: string; name: string; passwordHash: string | null; firmId: string; firmRole: FirmRole };

export async function createUser(o: CreateUserOptions, trx: DbOrTrx = db()): Promise<string> {
  const [row] = await trx.insert({ email: o.email.toLowerCase(), name: o.name, passwordHash: o.passwordHash }).into("users").returning("id");
  await trx.insert({ firmId: o.firmId, userId: row.id, role: o.firmRole }).into("firmMemberships");
  return row.id as string;
}

export async function setUserPassword(userId: string, passwordHash: string, trx: DbOrTrx = db()): Promise<void> {
  await trx.from("users").where({ id: userId }).update({ passwordHash });
}

export async function updateUserName(userId: string, name: string, trx: DbOrTrx = db()): Promise<void> {
  await trx.from("users").where({ id: userId }).update({ name });
}
