import { db } from "@/db/knex";
import { checkStorage } from "@/lib/storage/check-storage";

export type Health = { ok: boolean; database: { ok: boolean; message?: string }; storage: { ok: boolean; message?: string } };

export async function checkHealth(): Promise<Health> {
  const database = await db()
    .raw("select 1")
    .then(
      () => ({ ok: true }),
      (e: unknown) => ({ ok: false, message: e instanceof Error ? e.message : String(e) }),
    );
  const storage = await checkStorage().then(
    (s) => ({ ok: s.ok, message: s.message }),
    (e: unknown) => ({ ok: false, message: e instanceof Error ? e.message : String(e) }),
  );
  return { ok: database.ok && storage.ok, database, storage };
}
