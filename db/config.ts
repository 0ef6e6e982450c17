import type { Knex } from "knex";
import { env } from "../lib/env";
import { toCamel, toSnake } from "./case";

/** The one knex configuration: snake_case in PostgreSQL, camelCase in TypeScript, converted here only. */
export function knexConfig(): Knex.Config {
  const e = env();
  return {
    client: "pg",
    connection: e.DATABASE_URL,
    pool: { min: 0, max: e.DATABASE_POOL_MAX },
    wrapIdentifier: (value, origImpl) => origImpl(value === "*" ? value : toSnake(value)),
    postProcessResponse: (result) => convertRows(result),
  };
}

function convertRows(result: unknown): unknown {
  if (Array.isArray(result)) return result.map(convertRow);
  return convertRow(result);
}

function convertRow(row: unknown): unknown {
  if (!row || typeof row !== "object" || row instanceof Date || Buffer.isBuffer(row)) return row;
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(row)) out[toCamel(k)] = v;
  return out;
}
