import { db, type Trx } from "@/db/knex";

/** Runs in the caller's transaction when one is given, so the caller decides the boundary; otherwise in a new one. */
export async function withTransaction<T>(trx: Trx | undefined, work: (trx: Trx) => Promise<T>): Promise<T> {
  return trx ? work(trx) : db().transaction(work);
}
