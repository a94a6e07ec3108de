import { sql, type Transaction } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject, type ProjectAction } from "@/lib/auth/permissions";
import { AppError, conflict, forbidden, notFound } from "@/lib/api/errors";
import type { ScenarioResults } from "@/lib/analysis";
import type { BandVerdict } from "@/lib/reverb";
import type { ScenarioDuplicate, ScenarioInput, ScenarioTarget, ScenarioUpdate } from "@/lib/schemas/workspace";
import type { Database } from "../schema";
import { freshResults, inTransaction, loadItems, parseTarget, recomputeScenario, type Db, type TreatmentItem } from "./analysis";
import { findProject, isUuid, type Project } from "./projects";
import { roomFor, toRoom, type Room } from "./rooms";

type ScenarioRow = Awaited<ReturnType<ReturnType<typeof scenarioRows>["execute"]>>[number];

/** A scenario without its full results: what lists and the workspace show. */
export interface ScenarioSummary {
  id: string;
  roomId: string;
  name: string;
  notes: string;
  isBaseline: boolean;
  archived: boolean;
  archivedAt: Date | null;
  target: ScenarioTarget;
  version: number;
  itemCount: number;
  totalCost: number;
  engineVersion: string | null;
  inputsHash: string | null;
  computedAt: Date | null;
  sortOrder: number;
  createdAt: Date;
  updatedAt: Date;
  /** A few figures from the stored results for a scenario list (null before the first analysis) */
  headline: null | {
    treatedEyringS: number[] | null;
    verdicts: BandVerdict[] | null;
    mainSeatSpreadDb: number | null;
    schroederHz: number | null;
  };
}

/** A scenario with its items and its (fresh) analysis. */
export interface Scenario extends ScenarioSummary {
  items: TreatmentItem[];
  results: ScenarioResults;
}

function scenarioRows(db: Db) {
  return db
    .selectFrom("scenarios as s")
    .selectAll("s")
    .select([
      sql<number>`(select coalesce(sum(t.count), 0)::int from treatment_items t where t.scenario_id = s.id)`.as("item_count"),
      sql<number>`(select coalesce(sum(t.count * t.unit_cost), 0)::float8 from treatment_items t where t.scenario_id = s.id)`.as("total_cost"),
    ])
    .orderBy("s.is_baseline", "desc")
    .orderBy("s.sort_order")
    .orderBy("s.created_at");
}

function headlineOf(results: ScenarioResults | null): ScenarioSummary["headline"] {
  if (!results) return null;
  return {
    treatedEyringS: results.reverb?.treated.eyringS ?? null,
    verdicts: results.reverb?.comparison.map((b) => b.verdict) ?? null,
    mainSeatSpreadDb: results.lowFrequency?.seats.find((s) => s.isMain)?.spreadDb ?? null,
    schroederHz: results.modes.schroederHz,
  };
}

function toSummary(r: ScenarioRow, results: ScenarioResults | null): ScenarioSummary {
  return {
    id: r.id,
    roomId: r.room_id,
    name: r.name,
    notes: r.notes,
    isBaseline: r.is_baseline,
    archived: r.archived_at !== null,
    archivedAt: r.archived_at,
    target: parseTarget(r.target),
    version: r.version,
    itemCount: r.item_count,
    totalCost: r.total_cost,
    engineVersion: results?.engineVersion ?? r.engine_version,
    inputsHash: results?.inputsHash ?? r.inputs_hash,
    computedAt: r.computed_at,
    sortOrder: r.sort_order,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    headline: headlineOf(results),
  };
}

/**
 * The scenario with its room and project, if the actor may see the project (else 404) and do the
 * action (else 403) — the scenario counterpart of `roomFor`.
 */
export async function scenarioFor(db: Db, actor: Actor, scenarioId: string, action: ProjectAction): Promise<{ row: ScenarioRow; room: Room; project: Project }> {
  if (!isUuid(scenarioId)) throw notFound("That scenario");
  const row = await scenarioRows(db).where("s.id", "=", scenarioId).executeTakeFirst();
  const roomRow = row ? await db.selectFrom("rooms").selectAll().where("id", "=", row.room_id).executeTakeFirst() : undefined;
  const project = roomRow ? await findProject(db, actor, roomRow.project_id) : undefined;
  if (!row || !roomRow || !project) throw notFound("That scenario");
  if (!canOnProject(actor, action, project)) throw forbidden();
  return { row, room: toRoom(roomRow), project };
}

/** Takes the scenario's row lock and bumps its version if `version` is current (else 409). */
export async function bumpScenarioVersion(trx: Transaction<Database>, scenarioId: string, version: number): Promise<void> {
  const row = await trx
    .updateTable("scenarios")
    .set({ version: sql`version + 1`, updated_at: sql`now()` })
    .where("id", "=", scenarioId)
    .where("version", "=", version)
    .returning("id")
    .executeTakeFirst();
  if (!row) throw conflict();
}

/**
 * The scenarios of a room, baseline first, with the headline of their results (refreshed where the
 * engine version or the inputs changed). Archived ones only with `includeArchived` (default true).
 */
export async function listScenarios(db: Db, actor: Actor, roomId: string, options: { includeArchived?: boolean } = {}): Promise<ScenarioSummary[]> {
  await roomFor(db, actor, roomId, "workspace.read");
  return inTransaction(db, async (trx) => {
    let q = scenarioRows(trx).where("s.room_id", "=", roomId);
    if (options.includeArchived === false) q = q.where("s.archived_at", "is", null);
    const rows = await q.execute();
    const results = await freshResults(trx, roomId, rows);
    return rows.map((r) => toSummary(r, results.get(r.id) ?? null));
  });
}

async function fullScenario(trx: Db, scenarioId: string): Promise<Scenario> {
  const row = await scenarioRows(trx).where("s.id", "=", scenarioId).executeTakeFirstOrThrow();
  const results = (await freshResults(trx, row.room_id, [row])).get(row.id)!;
  return { ...toSummary(row, results), items: await loadItems(trx, [row.id]), results };
}

/** One scenario with its items and its analysis (recomputed first if stale), for `workspace.read`. */
export async function getScenario(db: Db, actor: Actor, scenarioId: string): Promise<Scenario> {
  await scenarioFor(db, actor, scenarioId, "workspace.read");
  return inTransaction(db, (trx) => fullScenario(trx, scenarioId));
}

/**
 * Full scenarios of a room for a comparison (the listed ids, or every scenario that is not archived),
 * each with fresh results.
 */
export async function compareScenarios(db: Db, actor: Actor, roomId: string, scenarioIds?: readonly string[]): Promise<Scenario[]> {
  await roomFor(db, actor, roomId, "workspace.read");
  if (scenarioIds && scenarioIds.some((id) => !isUuid(id))) throw new AppError("bad_request", "Some scenario ids are not valid.", { scenarioIds: ["must be scenario ids of this room"] });
  return inTransaction(db, async (trx) => {
    let q = scenarioRows(trx).where("s.room_id", "=", roomId);
    q = scenarioIds && scenarioIds.length > 0 ? q.where("s.id", "in", scenarioIds) : q.where("s.archived_at", "is", null);
    const rows = await q.execute();
    if (scenarioIds && rows.length !== new Set(scenarioIds).size) throw new AppError("bad_request", "Some scenarios are not in this room.", { scenarioIds: ["must be scenario ids of this room"] });
    const results = await freshResults(trx, roomId, rows);
    const items = await loadItems(trx, rows.map((r) => r.id));
    return rows.map((r) => ({ ...toSummary(r, results.get(r.id)!), items: items.filter((i) => i.scenarioId === r.id), results: results.get(r.id)! }));
  });
}

async function copyItems(trx: Transaction<Database>, fromScenarioId: string, toScenarioId: string) {
  await sql`
    insert into treatment_items (scenario_id, name, kind, spec, count, placements, unit_cost, unit_mass_kg, build_id, notes, sort_order)
    select ${toScenarioId}, name, kind, spec, count, placements, unit_cost, unit_mass_kg, build_id, notes, sort_order
      from treatment_items where scenario_id = ${fromScenarioId}`.execute(trx);
}

async function nextSortOrder(trx: Transaction<Database>, roomId: string): Promise<number> {
  const r = await trx.selectFrom("scenarios").select(sql<number>`coalesce(max(sort_order), 0)::int + 1`.as("n")).where("room_id", "=", roomId).executeTakeFirstOrThrow();
  return r.n;
}

/**
 * Creates a scenario of the room (not a baseline: each room has exactly one, made with the room),
 * empty or as a copy of `copyFromScenarioId`'s items, and analyses it; one transaction.
 */
export async function createScenario(db: Db, actor: Actor, roomId: string, input: ScenarioInput): Promise<Scenario> {
  return inTransaction(db, async (trx) => {
    await roomFor(trx, actor, roomId, "scenario.create");
    if (input.copyFromScenarioId) {
      const from = await trx.selectFrom("scenarios").select("id").where("id", "=", input.copyFromScenarioId).where("room_id", "=", roomId).executeTakeFirst();
      if (!from) throw new AppError("bad_request", "Copy from a scenario of this room.", { copyFromScenarioId: ["must be a scenario of this room"] });
    }
    const row = await trx
      .insertInto("scenarios")
      .values({ room_id: roomId, name: input.name, notes: input.notes, target: JSON.stringify(input.target), sort_order: await nextSortOrder(trx, roomId), created_by: actor.userId })
      .returning("id")
      .executeTakeFirstOrThrow();
    if (input.copyFromScenarioId) await copyItems(trx, input.copyFromScenarioId, row.id);
    await recomputeScenario(trx, row.id);
    return fullScenario(trx, row.id);
  });
}

/**
 * Renames, re-notes, re-targets, archives or brings back a scenario if `version` is current (else
 * 409); the baseline cannot be archived (400). A target change recomputes the analysis.
 */
export async function updateScenario(db: Db, actor: Actor, scenarioId: string, input: ScenarioUpdate): Promise<Scenario> {
  return inTransaction(db, async (trx) => {
    const needs: ProjectAction = input.archived !== undefined ? "scenario.archive" : "scenario.update";
    const { row } = await scenarioFor(trx, actor, scenarioId, needs);
    if (input.archived === true && row.is_baseline) throw new AppError("bad_request", "The baseline (the untreated room) cannot be archived.", { archived: ["the baseline stays"] });
    await bumpScenarioVersion(trx, scenarioId, input.version);
    await trx
      .updateTable("scenarios")
      .set({
        ...(input.name !== undefined && { name: input.name }),
        ...(input.notes !== undefined && { notes: input.notes }),
        ...(input.target !== undefined && { target: JSON.stringify(input.target) }),
        ...(input.archived !== undefined && { archived_at: input.archived ? (row.archived_at ?? sql`now()`) : null }),
      })
      .where("id", "=", scenarioId)
      .execute();
    if (input.target !== undefined) await recomputeScenario(trx, scenarioId);
    return fullScenario(trx, scenarioId);
  });
}

/**
 * Copies a scenario (target, notes, items) as a new, not archived, non-baseline scenario of the same
 * room — duplicating the baseline is how a treated scenario starts. Analysed in the same transaction.
 */
export async function duplicateScenario(db: Db, actor: Actor, scenarioId: string, input: ScenarioDuplicate): Promise<Scenario> {
  return inTransaction(db, async (trx) => {
    const { row } = await scenarioFor(trx, actor, scenarioId, "scenario.create");
    const copy = await trx
      .insertInto("scenarios")
      .values({
        room_id: row.room_id,
        name: input.name ?? `${row.name} (copy)`.slice(0, 120),
        notes: row.notes,
        target: JSON.stringify(row.target),
        sort_order: await nextSortOrder(trx, row.room_id),
        created_by: actor.userId,
      })
      .returning("id")
      .executeTakeFirstOrThrow();
    await copyItems(trx, scenarioId, copy.id);
    await recomputeScenario(trx, copy.id);
    return fullScenario(trx, copy.id);
  });
}
