import type { Knex } from "knex";

/**
 * Seal profiles of engineers of record, and the seal each revision was issued
 * under. A revision row is frozen by a trigger that refuses UPDATE; adding a
 * nullable column rewrites no row, so earlier revisions keep `seal` null and
 * their fingerprints (which cover the seal only when present) still verify.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("seal_profiles", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    // One seal per person: the engineer of record manages their own.
    t.uuid("user_id").notNullable().unique().references("users.id").onDelete("CASCADE");
    // Every field may be missing while the profile is being filled in; a seal is valid only when all are present.
    t.text("name");
    t.text("licence_number");
    t.text("jurisdiction");
    t.date("expires_on");
    // Content-addressed key: a frozen revision's imageKey keeps pointing at the very bytes it was issued with.
    t.text("image_key");
    t.text("image_type").checkIn(["png", "svg"]);
    t.text("image_sha256");
    t.integer("image_bytes");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["firm_id"]);
  });
  await knex.schema.alterTable("revisions", (t) => {
    t.jsonb("seal");
  });
}

export async function down(knex: Knex): Promise<void> {
  // Dropping a column is an ALTER, not a row UPDATE: the frozen-revisions trigger does not fire.
  await knex.schema.alterTable("revisions", (t) => {
    t.dropColumn("seal");
  });
  await knex.schema.dropTableIfExists("seal_profiles");
}
