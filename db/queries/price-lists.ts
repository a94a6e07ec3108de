import { sql } from "kysely";
import type { PriceListInput, PriceListValues } from "@/lib/schemas/build-sheet";
import { AppError, conflict, forbidden } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";
import { canInFirm } from "@/lib/auth/permissions";
import type { Db } from "./analysis";

/** The firm's stored price list with its version (rows become domain values here). */
export interface PriceList extends PriceListValues {
  version: number;
  updatedAt: Date;
  updatedBy: string | null;
}

type Row = NonNullable<Awaited<ReturnType<ReturnType<typeof rowQuery>["executeTakeFirst"]>>>;

function rowQuery(db: Db, firmId: string) {
  return db.selectFrom("firm_price_lists").selectAll().where("firm_id", "=", firmId);
}

function toPriceList(r: Row): PriceList {
  return {
    currency: r.currency,
    lumber: { thicknessM: r.lumber_thickness_m, widthM: r.lumber_width_m, densityKgM3: r.lumber_density_kg_m3, basis: r.lumber_basis, pricePerM: r.lumber_price_per_m, boards: r.boards },
    kerfM: r.kerf_m,
    slab: { standard: r.slab_standard, lengthM: r.slab_length_m, widthM: r.slab_width_m, prices: r.slab_prices },
    fabric: { pricePerM2: r.fabric_price_per_m2, wrapM: r.fabric_wrap_m },
    sheet: { lengthM: r.sheet_length_m, widthM: r.sheet_width_m, price: r.sheet_price },
    fixings: { screwPrice: r.screw_price, cleatPrice: r.cleat_price, bracketPrice: r.bracket_price },
    version: r.version,
    updatedAt: r.updated_at,
    updatedBy: r.updated_by,
  };
}

/** The firm's price list without a permission check (callers have checked: a build sheet reads it for its builder). */
export async function loadPriceList(db: Db, firmId: string): Promise<PriceList | null> {
  const row = await rowQuery(db, firmId).executeTakeFirst();
  return row ? toPriceList(row) : null;
}

/** The caller's firm's price list (`price-list.read`: owner, engineer, builder), or null before the owner sets one. */
export async function getPriceList(db: Db, actor: Actor): Promise<PriceList | null> {
  if (!canInFirm(actor, "price-list.read")) throw forbidden("Your role does not see the firm's price list.");
  return loadPriceList(db, actor.firmId);
}

function columns(v: PriceListValues) {
  return {
    currency: v.currency,
    lumber_thickness_m: v.lumber.thicknessM,
    lumber_width_m: v.lumber.widthM,
    lumber_density_kg_m3: v.lumber.densityKgM3,
    lumber_basis: v.lumber.basis,
    lumber_price_per_m: v.lumber.pricePerM,
    boards: JSON.stringify([...v.lumber.boards].sort((a, b) => a.lengthM - b.lengthM)),
    kerf_m: v.kerfM,
    slab_standard: v.slab.standard,
    slab_length_m: v.slab.lengthM,
    slab_width_m: v.slab.widthM,
    slab_prices: JSON.stringify([...v.slab.prices].sort((a, b) => a.thicknessM - b.thicknessM)),
    fabric_price_per_m2: v.fabric.pricePerM2,
    fabric_wrap_m: v.fabric.wrapM,
    sheet_length_m: v.sheet.lengthM,
    sheet_width_m: v.sheet.widthM,
    sheet_price: v.sheet.price,
    screw_price: v.fixings.screwPrice,
    cleat_price: v.fixings.cleatPrice,
    bracket_price: v.fixings.bracketPrice,
  };
}

/**
 * Saves the firm's price list (`price-list.manage`: owner) if `version` is the one read (0 when there
 * is none yet; else 409). Returns the stored list with its new version.
 */
export async function savePriceList(db: Db, actor: Actor, input: PriceListInput): Promise<PriceList> {
  if (!canInFirm(actor, "price-list.manage")) throw forbidden("Only the firm's owner sets the price list.");
  const { version, ...values } = input;
  if (version === 0) {
    const row = await db
      .insertInto("firm_price_lists")
      .values({ firm_id: actor.firmId, ...columns(values), updated_by: actor.userId })
      .onConflict((oc) => oc.column("firm_id").doNothing())
      .returningAll()
      .executeTakeFirst();
    if (!row) throw conflict("The price list was set by someone else meanwhile. Reload to see it.");
    return toPriceList(row);
  }
  const row = await db
    .updateTable("firm_price_lists")
    .set({ ...columns(values), version: sql`version + 1`, updated_by: actor.userId, updated_at: sql`now()` })
    .where("firm_id", "=", actor.firmId)
    .where("version", "=", version)
    .returningAll()
    .executeTakeFirst();
  if (!row) {
    const exists = await rowQuery(db, actor.firmId).executeTakeFirst();
    if (!exists) throw new AppError("bad_request", "The firm has no price list yet: send version 0 to create it.", { version: ["send 0: there is no price list yet"] });
    throw conflict();
  }
  return toPriceList(row);
}
