import { hash } from "@node-rs/argon2";
import type { Kysely, Transaction } from "kysely";
import { ARGON2_OPTIONS } from "../lib/auth/password-options";
import { newUserId } from "../lib/auth/ids";
import { placementIssues, positionInputSchema, scenarioInputSchema, buildInputSchema, surfacesInputSchema, treatmentItemInputSchema, positionInsideRoomIssues, openingIssues } from "../lib/schemas/workspace";
import { recomputeRoomScenarios } from "./queries/analysis";
import { priceListInputSchema } from "../lib/schemas/build-sheet";
import { DEMO_ACCOUNTS, DEMO_BUILDS, DEMO_FIRM, DEMO_PRICE_LIST, DEMO_PROJECTS, DEMO_WORKSPACES } from "./seed-data";
import type { Database } from "./schema";

/**
 * Fills the invented demo world once. A marker row in `demo_seed` makes a second call a no-op, so
 * `npm start` can call it every time without duplicating or overwriting the user's own edits.
 */
export async function seedDemo(db: Kysely<Database>): Promise<{ created: boolean }> {
  const hashes = await Promise.all(DEMO_ACCOUNTS.map((a) => hash(a.password, ARGON2_OPTIONS)));
  return db.transaction().execute(async (trx) => {
    const marker = await trx.insertInto("demo_seed").values({ id: 1 }).onConflict((oc) => oc.doNothing()).returning("id").executeTakeFirst();
    if (!marker) return { created: false };

    const firm = await trx.insertInto("firms").values({ name: DEMO_FIRM.name, contact_email: DEMO_FIRM.contactEmail }).returning("id").executeTakeFirstOrThrow();
    const ids = new Map<string, string>();
    for (const [i, account] of DEMO_ACCOUNTS.entries()) {
      const id = newUserId();
      ids.set(account.email, id);
      await trx
        .insertInto("users")
        .values({ id, firm_id: firm.id, email: account.email, name: account.name, role: account.role, password_hash: hashes[i] ?? null, unit_system: account.role === "client" ? "imperial" : "metric" })
        .execute();
    }
    const engineerId = DEMO_ACCOUNTS.find((a) => a.role === "engineer")?.email;
    const builderEmail = DEMO_ACCOUNTS.find((a) => a.role === "builder")?.email;
    const roomIds = new Map<string, { id: string; lengthM: number; widthM: number; heightM: number }>();
    for (const p of DEMO_PROJECTS) {
      const project = await trx
        .insertInto("projects")
        .values({
          firm_id: firm.id,
          name: p.name,
          client_name: p.clientName,
          client_user_id: ids.get(p.clientEmail) ?? null,
          site_address: p.siteAddress,
          status: p.status,
          notes: p.notes,
          created_by: engineerId ? ids.get(engineerId) ?? null : null,
        })
        .returning("id")
        .executeTakeFirstOrThrow();
      if (p.builderAssigned && builderEmail) {
        await trx.insertInto("project_builders").values({ project_id: project.id, user_id: ids.get(builderEmail)! }).execute();
      }
      for (const r of p.rooms) {
        const room = await trx
          .insertInto("rooms")
          .values({ project_id: project.id, name: r.name, length_m: r.lengthM, width_m: r.widthM, height_m: r.heightM, temperature_c: r.temperatureC, humidity_pct: r.humidityPct, notes: r.notes })
          .returning("id")
          .executeTakeFirstOrThrow();
        roomIds.set(r.name, { id: room.id, lengthM: r.lengthM, widthM: r.widthM, heightM: r.heightM });
      }
    }
    const engineerUserId = engineerId ? ids.get(engineerId) ?? null : null;
    await seedWorkspaces(trx, firm.id, engineerUserId, roomIds);
    await seedPriceList(trx, firm.id);
    return { created: true };
  });
}

/** Fails the seed loudly when demo data breaks a rule the app enforces (so the demo never shows invalid data). */
function assertNoIssues(what: string, issues: { path: (string | number)[]; message: string }[]) {
  if (issues.length > 0) throw new Error(`demo ${what}: ${issues.map((i) => `${i.path.join(".")} ${i.message}`).join("; ")}`);
}

/**
 * The rooms' workspaces: surfaces, seats and sources, the treated scenarios with their items, the
 * firm's build library, and the stored analysis of every scenario (lib/analysis, as the app computes
 * it). The insert trigger already gave each room its six surfaces and its baseline scenario.
 */
async function seedWorkspaces(
  trx: Transaction<Database>,
  firmId: string,
  engineerUserId: string | null,
  rooms: Map<string, { id: string; lengthM: number; widthM: number; heightM: number }>,
): Promise<void> {
  const buildIds = new Map<string, string>();
  for (const b of DEMO_BUILDS) {
    const build = buildInputSchema.parse(b);
    const row = await trx
      .insertInto("builds")
      .values({ firm_id: firmId, name: build.name, kind: build.spec.kind, spec: JSON.stringify(build.spec), notes: build.notes, created_by: engineerUserId })
      .returning("id")
      .executeTakeFirstOrThrow();
    buildIds.set(build.name, row.id);
  }
  for (const w of DEMO_WORKSPACES) {
    const room = rooms.get(w.room);
    if (!room) throw new Error(`demo workspace for an unknown room: ${w.room}`);
    const { surfaces } = surfacesInputSchema.parse({ version: 1, surfaces: w.surfaces });
    for (const s of surfaces) {
      assertNoIssues(`${w.room} ${s.surface} openings`, openingIssues(s.surface, s.openings, room));
      await trx
        .updateTable("room_surfaces")
        .set({ finish: JSON.stringify(s.finish), openings: JSON.stringify(s.openings), assumed: false })
        .where("room_id", "=", room.id)
        .where("surface", "=", s.surface)
        .execute();
    }
    for (const [i, raw] of w.positions.entries()) {
      const p = positionInputSchema.parse({ ...raw, version: 1 });
      assertNoIssues(`${w.room} ${p.name}`, positionInsideRoomIssues(p, room));
      await trx
        .insertInto("room_positions")
        .values({
          room_id: room.id,
          kind: p.kind,
          name: p.name,
          x_m: p.xM,
          y_m: p.yM,
          z_m: p.zM,
          is_main: p.kind === "seat" && p.isMain,
          sort_order: i,
          ...(p.kind !== "seat" && { delay_ms: p.delayMs, polarity: p.polarity, drives_bass: p.drivesBass }),
        })
        .execute();
    }
    for (const [i, raw] of w.scenarios.entries()) {
      const sc = scenarioInputSchema.parse(raw);
      const row = await trx
        .insertInto("scenarios")
        .values({ room_id: room.id, name: sc.name, notes: sc.notes, target: JSON.stringify(sc.target), sort_order: i + 1, created_by: engineerUserId })
        .returning("id")
        .executeTakeFirstOrThrow();
      for (const [k, rawItem] of raw.items.entries()) {
        const item = treatmentItemInputSchema.parse({ ...rawItem, version: 1 });
        assertNoIssues(`${w.room} ${sc.name} ${item.name}`, placementIssues(item, room));
        await trx
          .insertInto("treatment_items")
          .values({
            scenario_id: row.id,
            name: item.name,
            kind: item.spec.kind,
            spec: JSON.stringify(item.spec),
            count: item.count,
            placements: JSON.stringify(item.placements),
            unit_cost: item.unitCost,
            unit_mass_kg: item.unitMassKg,
            build_id: typeof rawItem.buildName === "string" ? (buildIds.get(rawItem.buildName) ?? null) : null,
            notes: item.notes,
            sort_order: k,
          })
          .execute();
      }
    }
  }
  for (const room of rooms.values()) await recomputeRoomScenarios(trx, room.id);
}

/** The firm's demo price list (parsed with the settings page's schema, so the demo is always valid). */
async function seedPriceList(trx: Transaction<Database>, firmId: string): Promise<void> {
  const p = priceListInputSchema.parse({ ...DEMO_PRICE_LIST, version: 0 });
  await trx
    .insertInto("firm_price_lists")
    .values({
      firm_id: firmId,
      currency: p.currency,
      lumber_thickness_m: p.lumber.thicknessM,
      lumber_width_m: p.lumber.widthM,
      lumber_density_kg_m3: p.lumber.densityKgM3,
      lumber_basis: p.lumber.basis,
      lumber_price_per_m: p.lumber.pricePerM,
      boards: JSON.stringify(p.lumber.boards),
      kerf_m: p.kerfM,
      slab_standard: p.slab.standard,
      slab_length_m: p.slab.lengthM,
      slab_width_m: p.slab.widthM,
      slab_prices: JSON.stringify(p.slab.prices),
      fabric_price_per_m2: p.fabric.pricePerM2,
      fabric_wrap_m: p.fabric.wrapM,
      sheet_length_m: p.sheet.lengthM,
      sheet_width_m: p.sheet.widthM,
      sheet_price: p.sheet.price,
      screw_price: p.fixings.screwPrice,
      cleat_price: p.fixings.cleatPrice,
      bracket_price: p.fixings.bracketPrice,
    })
    .execute();
}
