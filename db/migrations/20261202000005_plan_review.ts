import type { Knex } from "knex";

/**
 * Plan-review comments: what the permit office wrote about an issued revision,
 * and the project engineer's response in the draft that follows. When the next
 * revision is issued, the response letter built from them is frozen in that
 * revision. Adding a nullable column rewrites no row, so the frozen-revisions
 * trigger does not fire and earlier revisions keep `response_letter` null.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("plan_review_comments", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("package_id").notNullable().references("packages.id").onDelete("CASCADE");
    // The issued revision the permit office reviewed; revisions are never deleted, so no cascade is needed.
    t.uuid("revision_id").notNullable().references("revisions.id");
    // As the office wrote it: "1", "2a", "S-3".
    t.text("number").notNullable();
    t.integer("position").notNullable();
    t.text("text").notNullable();
    t.text("reviewer");
    t.date("received_on");
    t.text("response").notNullable().defaultTo("");
    // [{ type: "calc", calcId, label } | { type: "heading", index, text }] — where the next revision answers it.
    t.jsonb("answered_in").notNullable().defaultTo("[]");
    t.uuid("created_by").notNullable().references("users.id");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["package_id", "revision_id", "position"]);
  });
  await knex.schema.alterTable("revisions", (t) => {
    t.jsonb("response_letter");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("revisions", (t) => {
    t.dropColumn("response_letter");
  });
  await knex.schema.dropTableIfExists("plan_review_comments");
}
