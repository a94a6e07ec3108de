import { type Kysely, sql } from "kysely";

// Frozen in time: never import application code here.
export async function up(db: Kysely<any>): Promise<void> {
  // Per-firm delivery settings. signing_certificate_ref names where the certificate comes from
  // (e.g. "configured" = SIGNING_P12_PATH); the fingerprint of the last one used is kept for display.
  await db.schema
    .createTable("firm_report_settings")
    .addColumn("firm_id", "uuid", (c) => c.primaryKey().references("firms.id").onDelete("cascade"))
    .addColumn("attach_pdf", "boolean", (c) => c.notNull().defaultTo(true))
    .addColumn("signing_certificate_ref", "text", (c) => c.notNull().defaultTo("configured"))
    .addColumn("certificate_fingerprint", "text")
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  // Report numbers ER-<year>-<nnnn>, unique across the installation (the public check looks them up).
  await db.schema
    .createTable("report_number_counters")
    .addColumn("year", "integer", (c) => c.primaryKey())
    .addColumn("last_number", "integer", (c) => c.notNull())
    .execute();

  await db.schema
    .createTable("reports")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("firm_id", "uuid", (c) => c.notNull().references("firms.id").onDelete("cascade"))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("room_id", "uuid", (c) => c.notNull().unique().references("rooms.id").onDelete("cascade"))
    .addColumn("number", "text", (c) => c.notNull().unique().check(sql`number ~ '^ER-[0-9]{4}-[0-9]{4,}$'`))
    .addColumn("created_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("reports_project_idx").on("reports").column("project_id").execute();

  await db.schema
    .createTable("report_revisions")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("report_id", "uuid", (c) => c.notNull().references("reports.id").onDelete("cascade"))
    .addColumn("revision", "integer", (c) => c.notNull().check(sql`revision >= 1`))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("draft").check(sql`status in ('draft','issued','superseded')`))
    .addColumn("scenario_ids", sql`text[]`, (c) => c.notNull().defaultTo(sql`'{}'::text[]`))
    .addColumn("paper_size", "text", (c) => c.notNull().defaultTo("A4").check(sql`paper_size in ('A4','LETTER')`))
    .addColumn("note", "text", (c) => c.notNull().defaultTo(""))
    // Filled when issued: the signed file, its hash, who signed when, with which certificate and engine.
    .addColumn("pdf", "bytea")
    .addColumn("sha256", "text", (c) => c.check(sql`sha256 ~ '^[0-9a-f]{64}$'`))
    .addColumn("page_count", "integer")
    .addColumn("signed_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("signer_name", "text")
    .addColumn("signed_at", "timestamptz")
    .addColumn("certificate_fingerprint", "text")
    .addColumn("engine_version", "text")
    .addColumn("superseded_at", "timestamptz")
    .addColumn("created_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("report_revisions_report_revision_key", ["report_id", "revision"])
    .addCheckConstraint(
      "report_revisions_issued_complete",
      sql`status = 'draft' or (pdf is not null and sha256 is not null and signed_at is not null and signer_name is not null)`,
    )
    .execute();
  // At most one draft per report; hashes of issued files are unique (the public check finds them).
  await db.schema.createIndex("report_revisions_one_draft").unique().on("report_revisions").column("report_id").where(sql.ref("status"), "=", "draft").execute();
  await db.schema.createIndex("report_revisions_sha256_key").unique().on("report_revisions").column("sha256").where(sql.ref("sha256"), "is not", null).execute();

  // An issued revision is immutable: only issued → superseded (with its time) may change, and it is
  // never deleted on its own (deleting the whole room or project still cascades).
  await sql`
    create function report_revisions_guard() returns trigger language plpgsql as $$
    begin
      if tg_op = 'DELETE' then
        if old.status <> 'draft' and pg_trigger_depth() = 1 then
          if exists (select 1 from reports r where r.id = old.report_id) then
            raise exception 'issued report revisions cannot be deleted' using errcode = 'check_violation';
          end if;
        end if;
        return old;
      end if;
      if old.status = 'draft' then
        return new;
      end if;
      if new.pdf is distinct from old.pdf or new.sha256 is distinct from old.sha256 or new.signed_at is distinct from old.signed_at
         or new.signed_by is distinct from old.signed_by or new.signer_name is distinct from old.signer_name
         or new.scenario_ids is distinct from old.scenario_ids or new.paper_size is distinct from old.paper_size
         or new.revision is distinct from old.revision or new.report_id is distinct from old.report_id
         or new.certificate_fingerprint is distinct from old.certificate_fingerprint or new.note is distinct from old.note
         or new.engine_version is distinct from old.engine_version or new.page_count is distinct from old.page_count then
        raise exception 'an issued report revision is immutable; issue a new revision instead' using errcode = 'check_violation';
      end if;
      if not (new.status = old.status or (old.status = 'issued' and new.status = 'superseded')) then
        raise exception 'an issued report revision can only become superseded' using errcode = 'check_violation';
      end if;
      return new;
    end $$`.execute(db);
  await sql`create trigger report_revisions_guard before update or delete on report_revisions for each row execute function report_revisions_guard()`.execute(db);

  // The audit log. actor_name is kept as written at the time (the user may be renamed or removed).
  await db.schema
    .createTable("report_events")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("report_id", "uuid", (c) => c.notNull().references("reports.id").onDelete("cascade"))
    .addColumn("revision_id", "uuid", (c) => c.references("report_revisions.id").onDelete("cascade"))
    .addColumn("kind", "text", (c) =>
      c.notNull().check(sql`kind in ('drafted','issued','superseded','sent','viewed','downloaded','approved','question','answer')`),
    )
    .addColumn("actor_user_id", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("actor_name", "text", (c) => c.notNull())
    .addColumn("detail", "jsonb", (c) => c.notNull().defaultTo(sql`'{}'::jsonb`))
    .addColumn("at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("report_events_report_idx").on("report_events").columns(["report_id", "at"]).execute();

  await db.schema
    .createTable("report_comments")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("report_id", "uuid", (c) => c.notNull().references("reports.id").onDelete("cascade"))
    .addColumn("revision_id", "uuid", (c) => c.references("report_revisions.id").onDelete("set null"))
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('question','answer')`))
    .addColumn("author_user_id", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("author_name", "text", (c) => c.notNull())
    .addColumn("body", "text", (c) => c.notNull().check(sql`length(body) between 1 and 4000`))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("report_comments_report_idx").on("report_comments").columns(["report_id", "created_at"]).execute();

  await db.schema
    .createTable("report_approvals")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("report_id", "uuid", (c) => c.notNull().references("reports.id").onDelete("cascade"))
    .addColumn("revision_id", "uuid", (c) => c.notNull().references("report_revisions.id").onDelete("cascade"))
    .addColumn("user_id", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("user_name", "text", (c) => c.notNull())
    .addColumn("note", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("approved_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("report_approvals_revision_user_key", ["revision_id", "user_id"])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ["report_approvals", "report_comments", "report_events", "report_revisions", "reports", "report_number_counters", "firm_report_settings"]) {
    await db.schema.dropTable(t).ifExists().cascade().execute();
  }
  await sql`drop function if exists report_revisions_guard()`.execute(db);
}
