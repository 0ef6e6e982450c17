import knexFactory, { type Knex } from "knex";
import { knexConfig } from "./config";

// One pool per process; kept on globalThis so Next's dev reloads do not open a new pool each time.
const holder = globalThis as unknown as { __panelpointKnex?: Knex };

export function db(): Knex {
  holder.__panelpointKnex ??= knexFactory(knexConfig());
  return holder.__panelpointKnex;
}

export type Trx = Knex.Transaction;
export type DbOrTrx = Knex | Knex.Transaction;

export async function closeDb(): Promise<void> {
  const k = holder.__panelpointKnex;
  holder.__panelpointKnex = undefined;
  if (k) await k.destroy();
}
