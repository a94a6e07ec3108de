import { type Kysely, sql } from "kysely";

// Frozen in time: never import application code here. The finish ids and the target below are
// written out as they were on this date.
//
// Room workspace: six surfaces per room, seats and sources, scenarios (exactly one baseline per room),
// treatment items, and the firm's build library. A trigger gives every new room its six surfaces
// (finishes marked `assumed` until someone saves them) and its untreated baseline scenario, however
// the room is inserted; existing rooms are backfilled the same way.

const WALL = `{"kind":"finish","finishId":"painted-drywall-on-studs"}`;
const FLOOR = `{"kind":"finish","finishId":"wood-floor"}`;
const TARGET = `{"kind":"small-room","lowerS":0.2,"upperS":0.4}`;

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("room_surfaces")
    .addColumn("room_id", "uuid", (c) => c.notNull().references("rooms.id").onDelete("cascade"))
    .addColumn("surface", "text", (c) => c.notNull().check(sql`surface in ('front','rear','left','right','floor','ceiling')`))
    .addColumn("finish", "jsonb", (c) => c.notNull())
    .addColumn("openings", "jsonb", (c) => c.notNull().defaultTo(sql`'[]'::jsonb`))
    .addColumn("assumed", "boolean", (c) => c.notNull().defaultTo(true))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint("room_surfaces_pkey", ["room_id", "surface"])
    .execute();

  await db.schema
    .createTable("room_positions")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("room_id", "uuid", (c) => c.notNull().references("rooms.id").onDelete("cascade"))
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('seat','main-speaker','subwoofer')`))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("x_m", "double precision", (c) => c.notNull().check(sql`x_m >= 0`))
    .addColumn("y_m", "double precision", (c) => c.notNull().check(sql`y_m >= 0`))
    .addColumn("z_m", "double precision", (c) => c.notNull().check(sql`z_m >= 0`))
    .addColumn("is_main", "boolean", (c) => c.notNull().defaultTo(false))
    .addColumn("delay_ms", "double precision", (c) => c.notNull().defaultTo(0).check(sql`delay_ms >= 0 and delay_ms <= 1000`))
    .addColumn("polarity", "smallint", (c) => c.notNull().defaultTo(1).check(sql`polarity in (1, -1)`))
    .addColumn("drives_bass", "boolean", (c) => c.notNull().defaultTo(true))
    .addColumn("sort_order", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint("room_positions_main_is_seat", sql`kind = 'seat' or not is_main`)
    .execute();
  await db.schema.createIndex("room_positions_room_idx").on("room_positions").columns(["room_id", "sort_order"]).execute();
  await db.schema.createIndex("room_positions_one_main").unique().on("room_positions").column("room_id").where(sql.ref("is_main"), "=", true).execute();

  await db.schema
    .createTable("builds")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("firm_id", "uuid", (c) => c.notNull().references("firms.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('porous-panel','corner-trap','membrane','perforated')`))
    .addColumn("spec", "jsonb", (c) => c.notNull())
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("version", "integer", (c) => c.notNull().defaultTo(1))
    .addColumn("created_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("builds_firm_name_key").unique().on("builds").expression(sql`firm_id, lower(name)`).execute();

  await db.schema
    .createTable("scenarios")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("room_id", "uuid", (c) => c.notNull().references("rooms.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("is_baseline", "boolean", (c) => c.notNull().defaultTo(false))
    .addColumn("archived_at", "timestamptz")
    .addColumn("target", "jsonb", (c) => c.notNull().defaultTo(sql.raw(`'${TARGET}'::jsonb`)))
    .addColumn("version", "integer", (c) => c.notNull().defaultTo(1))
    .addColumn("results", "jsonb")
    .addColumn("engine_version", "text")
    .addColumn("inputs_hash", "text")
    .addColumn("computed_at", "timestamptz")
    .addColumn("sort_order", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("created_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint("scenarios_baseline_not_archived", sql`not (is_baseline and archived_at is not null)`)
    .execute();
  await db.schema.createIndex("scenarios_room_idx").on("scenarios").columns(["room_id", "sort_order"]).execute();
  await db.schema.createIndex("scenarios_one_baseline").unique().on("scenarios").column("room_id").where(sql.ref("is_baseline"), "=", true).execute();

  await db.schema
    .createTable("treatment_items")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("scenario_id", "uuid", (c) => c.notNull().references("scenarios.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("kind", "text", (c) => c.notNull().check(sql`kind in ('porous-panel','corner-trap','membrane','perforated')`))
    .addColumn("spec", "jsonb", (c) => c.notNull())
    .addColumn("count", "integer", (c) => c.notNull().check(sql`count >= 1 and count <= 1000`))
    .addColumn("placements", "jsonb", (c) => c.notNull().defaultTo(sql`'[]'::jsonb`))
    .addColumn("unit_cost", "double precision", (c) => c.notNull().defaultTo(0).check(sql`unit_cost >= 0`))
    .addColumn("unit_mass_kg", "double precision", (c) => c.check(sql`unit_mass_kg >= 0`))
    .addColumn("build_id", "uuid", (c) => c.references("builds.id").onDelete("set null"))
    .addColumn("notes", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("sort_order", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("treatment_items_scenario_idx").on("treatment_items").columns(["scenario_id", "sort_order"]).execute();

  // Every room gets its six surfaces and its baseline scenario, whichever code inserts it.
  await sql
    .raw(
      `create function workspace_room_defaults() returns trigger language plpgsql as $$
       begin
         insert into room_surfaces (room_id, surface, finish)
           select new.id, s, case when s = 'floor' then '${FLOOR}'::jsonb else '${WALL}'::jsonb end
             from unnest(array['front','rear','left','right','floor','ceiling']) as s;
         insert into scenarios (room_id, name, is_baseline, notes)
           values (new.id, 'Untreated room', true, 'The room as it is, without treatment: the baseline the other scenarios are compared with.');
         return new;
       end $$`,
    )
    .execute(db);
  await sql`create trigger rooms_workspace_defaults after insert on rooms for each row execute function workspace_room_defaults()`.execute(db);

  // Backfill the rooms that exist already.
  await sql
    .raw(
      `insert into room_surfaces (room_id, surface, finish)
         select r.id, s, case when s = 'floor' then '${FLOOR}'::jsonb else '${WALL}'::jsonb end
           from rooms r cross join unnest(array['front','rear','left','right','floor','ceiling']) as s
         on conflict do nothing`,
    )
    .execute(db);
  await sql
    .raw(
      `insert into scenarios (room_id, name, is_baseline, notes)
         select r.id, 'Untreated room', true, 'The room as it is, without treatment: the baseline the other scenarios are compared with.'
           from rooms r where not exists (select 1 from scenarios s where s.room_id = r.id and s.is_baseline)`,
    )
    .execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop trigger if exists rooms_workspace_defaults on rooms`.execute(db);
  await sql`drop function if exists workspace_room_defaults()`.execute(db);
  for (const t of ["treatment_items", "scenarios", "builds", "room_positions", "room_surfaces"]) {
    await db.schema.dropTable(t).ifExists().cascade().execute();
  }
}
