import { db, type DbOrTrx } from "@/db/knex";
import type { FirmRole } from "@/lib/access/roles";
import { notFound } from "@/lib/app-error";
import type { ActingUser } from "./users";

export type FirmMember = { id: string; email: string; name: string; disabled: boolean; role: FirmRole; invited: boolean; projectCount: number };

/** Everyone in the acting user's firm. */
export async function listFirmMembers(actor: ActingUser, trx: DbOrTrx = db()): Promise<FirmMember[]> {
  const rows = await trx
    .from("users as u")
    .join("firmMemberships as fm", "fm.userId", "u.id")
    .leftJoin("projectMemberships as pm", "pm.userId", "u.id")
    .select("u.id", "u.email", "u.name", "u.disabled", "fm.role")
    .select(trx.raw("u.password_hash is null as invited"))
    .count<{ projectCount: string }[]>("pm.projectId as projectCount")
    .where("fm.firmId", actor.firmId)
    .groupBy("u.id", "fm.role")
    .orderBy("u.name");
  return rows.map((r) => ({ ...(r as unknown as FirmMember), projectCount: Number(r.projectCount) }));
}

export type UpdateFirmMemberOptions = { actor: ActingUser; userId: string; role?: FirmRole; disabled?: boolean };

export async function updateFirmMember(o: UpdateFirmMemberOptions, trx: DbOrTrx = db()): Promise<void> {
  const member = await trx.from("firmMemberships").select("userId").where({ firmId: o.actor.firmId, userId: o.userId }).first();
  if (!member) throw notFound("Firm member");
  if (o.role) await trx.from("firmMemberships").where({ firmId: o.actor.firmId, userId: o.userId }).update({ role: o.role });
  if (o.disabled !== undefined) await trx.from("users").where({ id: o.userId }).update({ disabled: o.disabled });
}
