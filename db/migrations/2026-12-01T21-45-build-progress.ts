import { type Kysely, sql } from "kysely";

// Frozen in time: never import application code here.
export async function up(db: Kysely<any>): Promise<void> {
  // The firm's price list and stock sizes for the build sheet: one row per firm. Lengths in metres,
  // prices in the firm's currency (major units). `boards` holds the stock lengths of the frame section
  // ([{ lengthM, price }], price used when lumber is bought per board); `slab_prices` the insulation
  // slabs of the standard size by thickness ([{ thicknessM, price }]).
  await db.schema
    .createTable("firm_price_lists")
    .addColumn("firm_id", "uuid", (c) => c.primaryKey().references("firms.id").onDelete("cascade"))
    .addColumn("currency", "text", (c) => c.notNull().defaultTo("EUR").check(sql`currency ~ '^[A-Z]{3}$'`))
    .addColumn("lumber_thickness_m", "float8", (c) => c.notNull().check(sql`lumber_thickness_m > 0 and lumber_thickness_m <= 0.1`))
    .addColumn("lumber_width_m", "float8", (c) => c.notNull().check(sql`lumber_width_m > 0 and lumber_width_m <= 0.5`))
    .addColumn("lumber_density_kg_m3", "float8", (c) => c.notNull().defaultTo(500).check(sql`lumber_density_kg_m3 between 100 and 1500`))
    .addColumn("lumber_basis", "text", (c) => c.notNull().check(sql`lumber_basis in ('per-metre','per-board')`))
    .addColumn("lumber_price_per_m", "float8", (c) => c.notNull().defaultTo(0).check(sql`lumber_price_per_m >= 0`))
    .addColumn("boards", "jsonb", (c) => c.notNull().check(sql`jsonb_typeof(boards) = 'array' and jsonb_array_length(boards) between 1 and 10`))
    .addColumn("kerf_m", "float8", (c) => c.notNull().defaultTo(0.003).check(sql`kerf_m >= 0 and kerf_m <= 0.02`))
    .addColumn("slab_standard", "text", (c) => c.notNull().check(sql`slab_standard in ('metric','imperial')`))
    .addColumn("slab_length_m", "float8", (c) => c.notNull().check(sql`slab_length_m between 0.1 and 5`))
    .addColumn("slab_width_m", "float8", (c) => c.notNull().check(sql`slab_width_m between 0.1 and 5`))
    .addColumn("slab_prices", "jsonb", (c) => c.notNull().check(sql`jsonb_typeof(slab_prices) = 'array' and jsonb_array_length(slab_prices) between 1 and 10`))
    .addColumn("fabric_price_per_m2", "float8", (c) => c.notNull().defaultTo(0).check(sql`fabric_price_per_m2 >= 0`))
    .addColumn("fabric_wrap_m", "float8", (c) => c.notNull().defaultTo(0.05).check(sql`fabric_wrap_m between 0 and 0.3`))
    .addColumn("sheet_length_m", "float8", (c) => c.notNull().defaultTo(2.44).check(sql`sheet_length_m between 0.1 and 5`))
    .addColumn("sheet_width_m", "float8", (c) => c.notNull().defaultTo(1.22).check(sql`sheet_width_m between 0.1 and 5`))
    .addColumn("sheet_price", "float8", (c) => c.notNull().defaultTo(0).check(sql`sheet_price >= 0`))
    .addColumn("screw_price", "float8", (c) => c.notNull().defaultTo(0).check(sql`screw_price >= 0`))
    .addColumn("cleat_price", "float8", (c) => c.notNull().defaultTo(0).check(sql`cleat_price >= 0`))
    .addColumn("bracket_price", "float8", (c) => c.notNull().defaultTo(0).check(sql`bracket_price >= 0`))
    .addColumn("version", "integer", (c) => c.notNull().defaultTo(1))
    .addColumn("updated_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  // Progress of one treatment item on site: built (made in the shop) and installed (fixed in the room),
  // each with the day and who marked it. Names are kept beside the ids so the record survives a member
  // leaving the firm.
  await db.schema
    .createTable("treatment_item_progress")
    .addColumn("item_id", "uuid", (c) => c.primaryKey().references("treatment_items.id").onDelete("cascade"))
    .addColumn("built_at", "date")
    .addColumn("built_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("built_by_name", "text")
    .addColumn("installed_at", "date")
    .addColumn("installed_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("installed_by_name", "text")
    .addColumn("note", "text", (c) => c.notNull().defaultTo("").check(sql`length(note) <= 2000`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    // Installed only once built.
    .addCheckConstraint("treatment_item_progress_installed_after_built", sql`installed_at is null or (built_at is not null and installed_at >= built_at)`)
    .execute();

  // Which scenario of a room is to be built: the one the build sheet lists (chosen by an engineer).
  await db.schema
    .createTable("room_build_scenarios")
    .addColumn("room_id", "uuid", (c) => c.primaryKey().references("rooms.id").onDelete("cascade"))
    .addColumn("scenario_id", "uuid", (c) => c.notNull().references("scenarios.id").onDelete("cascade"))
    .addColumn("chosen_by", "text", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("chosen_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("room_build_scenarios").execute();
  await db.schema.dropTable("treatment_item_progress").execute();
  await db.schema.dropTable("firm_price_lists").execute();
}
