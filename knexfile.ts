import { fileURLToPath } from "node:url";
import type { Knex } from "knex";
import { knexConfig } from "./db/config";

// Absolute folders: the knex CLI changes directory, code that calls knex does not.
const config: Knex.Config = {
  ...knexConfig(),
  migrations: { directory: fileURLToPath(new URL("./db/migrations", import.meta.url)), extension: "ts", loadExtensions: [".ts"] },
  seeds: { directory: fileURLToPath(new URL("./db/seeds", import.meta.url)), extension: "ts", loadExtensions: [".ts"] },
};

export default config;
