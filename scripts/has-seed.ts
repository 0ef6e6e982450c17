import pg from "pg";
import { env } from "../lib/env";

/**
 * Prints how many firms the database holds, so demo.sh seeds only an empty database and a re-run
 * keeps what the user did. A missing table (migrations not run yet) counts as 0.
 */
const UNDEFINED_TABLE = "42P01";

async function main(): Promise<void> {
  const client = new pg.Client({ connectionString: env().DATABASE_URL });
  await client.connect();
  try {
    const result = await client.query<{ n: number }>("select count(*)::int as n from firms");
    console.log(result.rows[0]?.n ?? 0);
  } catch (error: unknown) {
    if (error instanceof Error && "code" in error && error.code === UNDEFINED_TABLE) console.log(0);
    else throw error;
  } finally {
    await client.end();
  }
}

main().catch((error: unknown) => {
  console.error(`has-seed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
