import type { Knex } from "knex";

/** Who saved a package last: the conflict message tells an author whose newer version they met. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("packages", (t) => {
    t.uuid("updated_by").references("users.id").onDelete("SET NULL");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("packages", (t) => {
    t.dropColumn("updated_by");
  });
}
