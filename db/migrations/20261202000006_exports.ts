import type { Knex } from "knex";

/**
 * Exports: one row per requested PDF or DOCX, worked by the export.render job.
 * The row is the job's visible state (queued → rendering sheet n of m → done
 * or failed), and for a signed PDF of an issued revision it carries the public
 * verification token, created with the row so the cover can print it.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("exports", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("package_id").notNullable().references("packages.id").onDelete("CASCADE");
    // Null for an export of the current draft; revisions are never deleted, so no cascade is needed.
    t.uuid("revision_id").references("revisions.id");
    t.text("format").notNullable().checkIn(["pdf", "docx"]);
    t.text("status").notNullable().defaultTo("queued").checkIn(["queued", "rendering", "done", "failed"]);
    t.integer("sheet");
    t.integer("sheet_count");
    t.text("error");
    t.text("object_key");
    t.integer("byte_size");
    // Of the final file as stored (the signed PDF), so a downloaded copy can be compared byte for byte.
    t.text("sha256");
    t.boolean("signed").notNullable().defaultTo(false);
    t.text("verify_token").unique();
    t.uuid("requested_by").references("users.id").onDelete("SET NULL");
    t.integer("attempts").notNullable().defaultTo(0);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("started_at", { useTz: true });
    t.timestamp("finished_at", { useTz: true });
    t.index(["package_id", "created_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("exports");
}
