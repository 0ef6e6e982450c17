import type { Knex } from "knex";

/**
 * Checking and issuing: remarks with their replies, per-calc check marks, the
 * checker assigned to a package, and revisions, which are frozen in the
 * database itself so that no code path can rewrite what was issued.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("packages", (t) => {
    t.uuid("assigned_checker").references("users.id").onDelete("SET NULL");
  });

  await knex.schema.createTable("remarks", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("package_id").notNullable().references("packages.id").onDelete("CASCADE");
    // A calc id from the document; not a foreign key, so a remark survives its calc being deleted (shown as detached).
    t.text("calc_id");
    // { from, to, quote }: the quote lets the editor re-find the text after positions shift.
    t.jsonb("anchor");
    t.text("text").notNullable();
    t.text("state").notNullable().defaultTo("open").checkIn(["open", "answered", "closed"]);
    t.uuid("opened_by").notNullable().references("users.id");
    t.uuid("closed_by").references("users.id");
    t.timestamp("closed_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["package_id", "state"]);
  });

  await knex.schema.createTable("remark_replies", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("remark_id").notNullable().references("remarks.id").onDelete("CASCADE");
    t.uuid("author").notNullable().references("users.id");
    t.text("text").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["remark_id", "created_at"]);
  });

  await knex.schema.createTable("calc_checks", (t) => {
    t.uuid("package_id").notNullable().references("packages.id").onDelete("CASCADE");
    t.text("calc_id").notNullable();
    t.text("state").notNullable().checkIn(["checked", "returned"]);
    t.uuid("checker").notNullable().references("users.id");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    // The mark holds only while the calc's inputs still hash to this value.
    t.text("inputs_hash").notNullable();
    t.primary(["package_id", "calc_id"]);
  });

  await knex.schema.createTable("revisions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    // No cascades: a cascade would be a DELETE, which the trigger below refuses.
    t.uuid("package_id").notNullable().references("packages.id");
    t.integer("number").notNullable();
    t.text("label").notNullable();
    t.jsonb("document").notNullable();
    t.jsonb("results").notNullable();
    t.jsonb("check_record").notNullable();
    t.uuid("issued_by").notNullable().references("users.id");
    t.timestamp("issued_at", { useTz: true }).notNullable();
    t.text("fingerprint").notNullable();
    t.unique(["package_id", "number"]);
  });
  await knex.raw(`
    create function revisions_frozen() returns trigger language plpgsql as $$
    begin
      raise exception 'revisions are frozen once issued (% refused)', tg_op using errcode = 'P0001';
    end $$;
    create trigger revisions_no_update before update or delete on revisions
      for each row execute function revisions_frozen();
    create trigger revisions_no_truncate before truncate on revisions
      for each statement execute function revisions_frozen();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table if exists revisions cascade");
  await knex.raw("drop function if exists revisions_frozen");
  for (const t of ["calc_checks", "remark_replies", "remarks"]) await knex.schema.dropTableIfExists(t);
  await knex.schema.alterTable("packages", (t) => {
    t.dropColumn("assigned_checker");
  });
}
