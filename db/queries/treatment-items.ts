import { sql, type Transaction } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { AppError, notFound } from "@/lib/api/errors";
import { placementIssues, treatmentItemUpdateSchema, type TreatmentItemInput, type TreatmentItemUpdate } from "@/lib/schemas/workspace";
import type { Database } from "../schema";
import { inTransaction, loadItems, recomputeScenario, toTreatmentItem, type Db, type TreatmentItem } from "./analysis";
import { isUuid } from "./projects";
import type { Room } from "./rooms";
import { bumpScenarioVersion, scenarioFor } from "./scenarios";

export type { TreatmentItem } from "./analysis";

/** The result of an item write: the item (absent after a delete) and the scenario's new version. */
export interface ItemWrite {
  item: TreatmentItem | null;
  scenarioVersion: number;
}

/** The items of a scenario in their order, for `workspace.read`. */
export async function listTreatmentItems(db: Db, actor: Actor, scenarioId: string): Promise<TreatmentItem[]> {
  await scenarioFor(db, actor, scenarioId, "workspace.read");
  return loadItems(db, [scenarioId]);
}

function fitOrThrow(item: Pick<TreatmentItemInput, "spec" | "placements">, room: Room) {
  const issues = placementIssues(item, room);
  if (issues.length === 0) return;
  const fields: Record<string, string[]> = {};
  for (const i of issues) (fields[i.path.join(".")] ??= []).push(i.message);
  throw new AppError("bad_request", "Some placements do not fit the room.", fields);
}

async function buildOrThrow(trx: Transaction<Database>, actor: Actor, buildId: string | null | undefined) {
  if (!buildId) return;
  const b = await trx.selectFrom("builds").select("id").where("id", "=", buildId).where("firm_id", "=", actor.firmId).executeTakeFirst();
  if (!b) throw new AppError("bad_request", "Choose a build of your firm's library.", { buildId: ["not a build of your firm's library"] });
}

async function scenarioVersion(trx: Transaction<Database>, scenarioId: string): Promise<number> {
  return (await trx.selectFrom("scenarios").select("version").where("id", "=", scenarioId).executeTakeFirstOrThrow()).version;
}

/**
 * Adds a treatment item to a scenario if the scenario's `version` is current (else 409): not to the
 * baseline (400: it is the untreated room), placements must fit the room. Bumps the scenario's
 * version and recomputes its analysis; one transaction.
 */
export async function addTreatmentItem(db: Db, actor: Actor, scenarioId: string, input: TreatmentItemInput): Promise<ItemWrite> {
  return inTransaction(db, async (trx) => {
    const { row, room } = await scenarioFor(trx, actor, scenarioId, "treatment.update");
    if (row.is_baseline) throw new AppError("bad_request", "The baseline is the untreated room: duplicate it or create a scenario to add treatment.", { "": ["the baseline has no treatment"] });
    await bumpScenarioVersion(trx, scenarioId, input.version);
    fitOrThrow(input, room);
    await buildOrThrow(trx, actor, input.buildId);
    const order = await trx.selectFrom("treatment_items").select(sql<number>`coalesce(max(sort_order), -1)::int + 1`.as("n")).where("scenario_id", "=", scenarioId).executeTakeFirstOrThrow();
    const inserted = await trx
      .insertInto("treatment_items")
      .values({
        scenario_id: scenarioId,
        name: input.name,
        kind: input.spec.kind,
        spec: JSON.stringify(input.spec),
        count: input.count,
        placements: JSON.stringify(input.placements),
        unit_cost: input.unitCost,
        unit_mass_kg: input.unitMassKg,
        build_id: input.buildId,
        notes: input.notes,
        sort_order: order.n,
      })
      .returningAll()
      .executeTakeFirstOrThrow();
    await recomputeScenario(trx, scenarioId);
    return { item: toTreatmentItem(inserted), scenarioVersion: await scenarioVersion(trx, scenarioId) };
  });
}

async function itemRow(trx: Transaction<Database>, scenarioId: string, itemId: string) {
  if (!isUuid(itemId)) throw notFound("That item");
  const row = await trx.selectFrom("treatment_items").selectAll().where("id", "=", itemId).where("scenario_id", "=", scenarioId).executeTakeFirst();
  if (!row) throw notFound("That item");
  return toTreatmentItem(row);
}

/**
 * Changes an item if the scenario's `version` is current (else 409); the merged item is checked
 * again as a whole (placements against its spec and the room). Bumps the scenario's version and
 * recomputes its analysis.
 */
export async function updateTreatmentItem(db: Db, actor: Actor, scenarioId: string, itemId: string, input: TreatmentItemUpdate): Promise<ItemWrite> {
  return inTransaction(db, async (trx) => {
    const { room } = await scenarioFor(trx, actor, scenarioId, "treatment.update");
    await bumpScenarioVersion(trx, scenarioId, input.version);
    const current = await itemRow(trx, scenarioId, itemId);
    const merged = {
      name: input.name ?? current.name,
      spec: input.spec ?? current.spec,
      count: input.count ?? current.count,
      placements: input.placements ?? current.placements,
      unitCost: input.unitCost ?? current.unitCost,
      unitMassKg: input.unitMassKg !== undefined ? input.unitMassKg : current.unitMassKg,
      buildId: input.buildId !== undefined ? input.buildId : current.buildId,
      notes: input.notes ?? current.notes,
    };
    // The merged item must pass the same rules as a new one (e.g. placements vs. the new count or kind).
    const check = treatmentItemUpdateSchema.safeParse({ ...merged, version: input.version });
    if (!check.success) {
      const fields: Record<string, string[]> = {};
      for (const i of check.error.issues) (fields[i.path.join(".")] ??= []).push(i.message);
      throw new AppError("bad_request", "The changed item is not consistent.", fields);
    }
    fitOrThrow(merged, room);
    await buildOrThrow(trx, actor, input.buildId);
    const row = await trx
      .updateTable("treatment_items")
      .set({
        name: merged.name,
        kind: merged.spec.kind,
        spec: JSON.stringify(merged.spec),
        count: merged.count,
        placements: JSON.stringify(merged.placements),
        unit_cost: merged.unitCost,
        unit_mass_kg: merged.unitMassKg,
        build_id: merged.buildId,
        notes: merged.notes,
        updated_at: sql`now()`,
      })
      .where("id", "=", itemId)
      .returningAll()
      .executeTakeFirstOrThrow();
    await recomputeScenario(trx, scenarioId);
    return { item: toTreatmentItem(row), scenarioVersion: await scenarioVersion(trx, scenarioId) };
  });
}

/** Removes an item if the scenario's `version` is current (else 409), and recomputes the analysis. */
export async function removeTreatmentItem(db: Db, actor: Actor, scenarioId: string, itemId: string, version: number): Promise<ItemWrite> {
  return inTransaction(db, async (trx) => {
    await scenarioFor(trx, actor, scenarioId, "treatment.update");
    await bumpScenarioVersion(trx, scenarioId, version);
    await itemRow(trx, scenarioId, itemId);
    await trx.deleteFrom("treatment_items").where("id", "=", itemId).execute();
    await recomputeScenario(trx, scenarioId);
    return { item: null, scenarioVersion: await scenarioVersion(trx, scenarioId) };
  });
}
