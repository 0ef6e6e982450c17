import type { Knex } from "knex";

/**
 * The ground every later table stands on: firms, people, projects, packages,
 * invitations and an append-only audit log. Later issues add their own
 * migrations; nothing here should need to change for them.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists pgcrypto");

  await knex.schema.createTable("firms", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("users", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("email").notNullable();
    t.text("name").notNullable();
    // Null until an invited person sets a password from the invitation link.
    t.text("password_hash");
    t.boolean("disabled").notNullable().defaultTo(false);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.raw("create unique index users_email_unique on users (lower(email))");

  await knex.schema.createTable("firm_memberships", (t) => {
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    // One firm per person: the acting user's firm is what scopes every query.
    t.uuid("user_id").notNullable().unique().references("users.id").onDelete("CASCADE");
    t.text("role").notNullable().checkIn(["admin", "member"]);
    t.primary(["firm_id", "user_id"]);
  });

  await knex.schema.createTable("projects", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("job_number").notNullable();
    t.text("client").notNullable().defaultTo("");
    t.text("site").notNullable().defaultTo("");
    t.text("unit_system").notNullable().defaultTo("SI").checkIn(["SI", "US"]);
    t.jsonb("design_codes").notNullable().defaultTo("[]");
    t.text("paper_size").notNullable().defaultTo("A4").checkIn(["A4", "Letter"]);
    t.text("revision_scheme").notNullable().defaultTo("numeric").checkIn(["numeric", "alpha"]);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["firm_id", "job_number"]);
  });

  await knex.schema.createTable("project_memberships", (t) => {
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("role").notNullable().checkIn(["engineer", "checker", "project_engineer", "viewer"]);
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["project_id", "user_id"]);
  });

  await knex.schema.createTable("packages", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
    t.text("title").notNullable();
    t.jsonb("document").notNullable().defaultTo(knex.raw(`'{"type":"doc","content":[]}'::jsonb`));
    // Optimistic concurrency: every save names the version it started from.
    t.integer("version").notNullable().defaultTo(1);
    t.text("status").notNullable().defaultTo("draft").checkIn(["draft", "in_check", "checked", "issued"]);
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["project_id"]);
  });

  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("project_id").references("projects.id").onDelete("CASCADE");
    t.text("project_role").checkIn(["engineer", "checker", "project_engineer", "viewer"]);
    // Only a hash is stored: the token itself travels in the e-mail alone.
    t.text("token_hash").notNullable().unique();
    t.uuid("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });

  await knex.schema.createTable("signin_attempts", (t) => {
    t.bigIncrements("id");
    t.text("email").notNullable();
    t.text("ip").notNullable();
    t.boolean("succeeded").notNullable();
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "at"]);
    t.index(["ip", "at"]);
  });

  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    // No cascades: a cascade would be an UPDATE or DELETE, which the trigger below refuses.
    t.uuid("firm_id").notNullable().references("firms.id");
    t.uuid("actor_id").references("users.id");
    t.text("action").notNullable();
    t.text("entity_type").notNullable();
    t.uuid("entity_id");
    t.uuid("project_id");
    t.jsonb("data").notNullable().defaultTo("{}");
    t.timestamp("at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["firm_id", "at"]);
    t.index(["entity_id"]);
  });
  // Append-only in the database itself, so no code path can rewrite history.
  await knex.raw(`
    create function audit_log_append_only() returns trigger language plpgsql as $$
    begin
      raise exception 'audit_log is append-only (% refused)', tg_op using errcode = 'P0001';
    end $$;
    create trigger audit_log_no_update before update or delete on audit_log
      for each row execute function audit_log_append_only();
    create trigger audit_log_no_truncate before truncate on audit_log
      for each statement execute function audit_log_append_only();
  `);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop table if exists audit_log cascade");
  await knex.raw("drop function if exists audit_log_append_only");
  for (const t of ["signin_attempts", "invitations", "packages", "project_memberships", "projects", "firm_memberships", "users", "firms"]) {
    await knex.schema.dropTableIfExists(t);
  }
}
