import { type Kysely, sql } from "kysely";

// Frozen in time: never import application code here.
export async function up(db: Kysely<any>): Promise<void> {
  // Files attached to a room. The bytes live in object storage under storage_key (and thumbnail_key);
  // content_type is what the bytes were sniffed as, never what the browser claimed.
  await db.schema
    .createTable("room_files")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("room_id", "uuid", (c) => c.notNull().references("rooms.id").onDelete("cascade"))
    .addColumn("uploaded_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("uploader_name", "text", (c) => c.notNull())
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('photo','drawing','client-file')`))
    .addColumn("original_name", "text", (c) => c.notNull().check(sql`length(original_name) between 1 and 255`))
    .addColumn("content_type", "text", (c) => c.notNull().check(sql`content_type in ('image/jpeg','image/png','image/webp','application/pdf')`))
    .addColumn("size_bytes", "integer", (c) => c.notNull().check(sql`size_bytes > 0`))
    .addColumn("sha256", "text", (c) => c.notNull().check(sql`sha256 ~ '^[0-9a-f]{64}$'`))
    .addColumn("storage_key", "text", (c) => c.notNull().unique())
    .addColumn("thumbnail_key", "text", (c) => c.unique())
    .addColumn("width_px", "integer")
    .addColumn("height_px", "integer")
    .addColumn("include_in_report", "boolean", (c) => c.notNull().defaultTo(false))
    .addColumn("caption", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    // Only photos go into a report.
    .addCheckConstraint("room_files_report_photos_only", sql`not include_in_report or kind = 'photo'`)
    .execute();
  await db.schema.createIndex("room_files_room_idx").on("room_files").columns(["room_id", "created_at"]).execute();

  // Objects whose row is gone (deleted file, or a room or project deleted with its files): a trigger
  // queues their keys in the same transaction, and the storage layer deletes the objects and the queue
  // entries afterwards, so no object outlives its row for long, whoever deleted it.
  await db.schema
    .createTable("storage_deletions")
    .addColumn("storage_key", "text", (c) => c.primaryKey())
    .addColumn("queued_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("attempts", "integer", (c) => c.notNull().defaultTo(0))
    .execute();
  await sql`
    create function room_files_queue_objects() returns trigger language plpgsql as $$
    begin
      insert into storage_deletions (storage_key) values (old.storage_key) on conflict do nothing;
      if old.thumbnail_key is not null then
        insert into storage_deletions (storage_key) values (old.thumbnail_key) on conflict do nothing;
      end if;
      return old;
    end $$`.execute(db);
  await sql`create trigger room_files_queue_objects after delete on room_files for each row execute function room_files_queue_objects()`.execute(db);

  // The firm's engineering fee and whether a client's report download waits for its payment.
  await db.schema
    .createTable("fees")
    .addColumn("firm_id", "uuid", (c) => c.primaryKey().references("firms.id").onDelete("cascade"))
    .addColumn("basis", "text", (c) => c.notNull().check(sql`basis in ('per-report','per-project')`))
    // Minor units of the currency (cents, pence); ISO 4217 code in upper case.
    .addColumn("amount_minor", "integer", (c) => c.notNull().check(sql`amount_minor >= 0 and amount_minor <= 100000000`))
    .addColumn("currency", "text", (c) => c.notNull().check(sql`currency ~ '^[A-Z]{3}$'`))
    .addColumn("downloads_wait_for_payment", "boolean", (c) => c.notNull().defaultTo(false))
    .addColumn("updated_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable("invoices")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("firm_id", "uuid", (c) => c.notNull().references("firms.id").onDelete("cascade"))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    // Set for a per-report fee: the report it pays for. No foreign key on purpose: an invoice is the
    // record of what was charged and paid, and stays as it was when its report goes with its room.
    .addColumn("report_id", "uuid")
    .addColumn("description", "text", (c) => c.notNull())
    .addColumn("amount_minor", "integer", (c) => c.notNull().check(sql`amount_minor > 0`))
    .addColumn("currency", "text", (c) => c.notNull().check(sql`currency ~ '^[A-Z]{3}$'`))
    .addColumn("status", "text", (c) => c.notNull().defaultTo("open").check(sql`status in ('open','paid','void')`))
    .addColumn("checkout_session_id", "text", (c) => c.unique())
    .addColumn("checkout_url", "text")
    .addColumn("paid_at", "timestamptz")
    .addColumn("voided_at", "timestamptz")
    .addColumn("created_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint("invoices_paid_has_time", sql`(status = 'paid') = (paid_at is not null)`)
    .execute();
  await db.schema.createIndex("invoices_project_idx").on("invoices").columns(["project_id", "created_at"]).execute();
  // At most one open or paid invoice per project fee (report_id null) and per report.
  await db.schema
    .createIndex("invoices_one_live_per_fee")
    .unique()
    .on("invoices")
    .expression(sql`project_id, coalesce(report_id, '00000000-0000-0000-0000-000000000000'::uuid)`)
    .where(sql.ref("status"), "<>", "void")
    .execute();

  // Every provider event received, once: the unique event id makes a replayed webhook a no-op.
  await db.schema
    .createTable("payment_events")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("provider_event_id", "text", (c) => c.notNull().unique())
    .addColumn("type", "text", (c) => c.notNull())
    .addColumn("invoice_id", "uuid", (c) => c.references("invoices.id").onDelete("set null"))
    .addColumn("outcome", "text", (c) => c.notNull())
    .addColumn("payload", "jsonb", (c) => c.notNull())
    .addColumn("received_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("payment_events").execute();
  await db.schema.dropTable("invoices").execute();
  await db.schema.dropTable("fees").execute();
  await sql`drop trigger if exists room_files_queue_objects on room_files`.execute(db);
  await db.schema.dropTable("room_files").execute();
  await sql`drop function if exists room_files_queue_objects()`.execute(db);
  await db.schema.dropTable("storage_deletions").execute();
}
