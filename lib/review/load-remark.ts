import type { Trx } from "@/db/knex";
import { notFound } from "@/lib/app-error";

export type Remark = { id: string; packageId: string; calcId: string | null; text: string; state: "open" | "answered" | "closed"; openedBy: string; openerName: string };

export type LoadRemarkOptions = { packageId: string; remarkId: string; trx: Trx };

/** A remark of a package whose access the caller resolved, locked for the transaction; another package's remark is not found. */
export async function loadRemark({ packageId, remarkId, trx }: LoadRemarkOptions): Promise<Remark> {
  const remark: Remark | undefined = await trx
    .from("remarks as r")
    .join("users as u", "u.id", "r.openedBy")
    .select("r.id", "r.packageId", "r.calcId", "r.text", "r.state", "r.openedBy", "u.name as openerName")
    .where({ "r.id": remarkId, "r.packageId": packageId })
    .forUpdate("r")
    .first();
  if (!remark) throw notFound("Remark");
  return remark;
}
