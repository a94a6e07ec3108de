import { type Kysely, sql } from "kysely";

// Frozen in time: never import application code here.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("firms")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("contact_email", "text")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable("users")
    .addColumn("id", "text", (c) => c.primaryKey())
    .addColumn("firm_id", "uuid", (c) => c.notNull().references("firms.id").onDelete("cascade"))
    .addColumn("email", "text", (c) => c.notNull())
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("role", "text", (c) => c.notNull().check(sql`role in ('owner','engineer','builder','client')`))
    .addColumn("password_hash", "text")
    .addColumn("unit_system", "text", (c) => c.notNull().defaultTo("metric").check(sql`unit_system in ('metric','imperial')`))
    .addColumn("active", "boolean", (c) => c.notNull().defaultTo(true))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("users_email_key").unique().on("users").expression(sql`lower(email)`).execute();
  await db.schema.createIndex("users_firm_idx").on("users").column("firm_id").execute();

  // lucia v3 PostgreSQL adapter: id, user_id, expires_at.
  await db.schema
    .createTable("user_sessions")
    .addColumn("id", "text", (c) => c.primaryKey())
    .addColumn("user_id", "text", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .execute();
  await db.schema.createIndex("user_sessions_user_idx").on("user_sessions").column("user_id").execute();

  // One-time tokens (password reset, invitation). Only the SHA-256 of the token is stored.
  await db.schema
    .createTable("auth_tokens")
    .addColumn("token_hash", "text", (c) => c.primaryKey())
    .addColumn("purpose", "text", (c) => c.notNull().check(sql`purpose in ('password-reset','invitation')`))
    .addColumn("user_id", "text", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .addColumn("used_at", "timestamptz")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("auth_tokens_user_idx").on("auth_tokens").column("user_id").execute();

  await db.schema
    .createTable("login_attempts")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("key", "text", (c) => c.notNull())
    .addColumn("succeeded", "boolean", (c) => c.notNull())
    .addColumn("attempted_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("login_attempts_key_time_idx").on("login_attempts").columns(["key", "attempted_at"]).execute();

  await db.schema
    .createTable("projects")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("firm_id", "uuid", (c) => c.notNull().references("firms.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("client_name", "text", (c) => c.notNull())
    .addColumn("client_user_id", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("site_address", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("survey").check(sql`status in ('survey','design','build','delivered','closed')`))
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("version", "integer", (c) => c.notNull().defaultTo(1))
    .addColumn("created_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("projects_firm_idx").on("projects").column("firm_id").execute();
  await db.schema.createIndex("projects_client_idx").on("projects").column("client_user_id").execute();

  await db.schema
    .createTable("project_builders")
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("user_id", "text", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addPrimaryKeyConstraint("project_builders_pkey", ["project_id", "user_id"])
    .execute();

  await db.schema
    .createTable("rooms")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("length_m", "double precision", (c) => c.notNull().check(sql`length_m > 0 and length_m <= 100`))
    .addColumn("width_m", "double precision", (c) => c.notNull().check(sql`width_m > 0 and width_m <= 100`))
    .addColumn("height_m", "double precision", (c) => c.notNull().check(sql`height_m > 0 and height_m <= 100`))
    .addColumn("temperature_c", "double precision", (c) => c.notNull().defaultTo(20))
    .addColumn("humidity_pct", "double precision", (c) => c.notNull().defaultTo(50))
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("version", "integer", (c) => c.notNull().defaultTo(1))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("rooms_project_idx").on("rooms").column("project_id").execute();

  await db.schema
    .createTable("dev_outbox")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("received_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("envelope_from", "text")
    .addColumn("envelope_to", sql`text[]`, (c) => c.notNull())
    .addColumn("subject", "text")
    .addColumn("text_body", "text")
    .addColumn("html_body", "text")
    .addColumn("raw", "text", (c) => c.notNull())
    .addColumn("attachments", "jsonb", (c) => c.notNull().defaultTo(sql`'[]'::jsonb`))
    .execute();

  await db.schema
    .createTable("demo_seed")
    .addColumn("id", "integer", (c) => c.primaryKey())
    .addColumn("seeded_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ["demo_seed", "dev_outbox", "rooms", "project_builders", "projects", "login_attempts", "auth_tokens", "user_sessions", "users", "firms"]) {
    await db.schema.dropTable(t).ifExists().cascade().execute();
  }
}
