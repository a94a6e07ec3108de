import { type Kysely, sql, type Transaction } from "kysely";
import { analysisInputsHash, analyzeScenario, ENGINE_VERSION, type AnalysisItem, type AnalysisRoom, type ScenarioResults } from "@/lib/analysis";
import {
  itemSpecSchema,
  openingSchema,
  placementSchema,
  scenarioTargetSchema,
  SURFACE_IDS,
  surfaceExtentM,
  surfaceFinishSchema,
  type ItemSpec,
  type Opening,
  type Placement,
  type ScenarioTarget,
  type SurfaceFinish,
  type SurfaceId,
} from "@/lib/schemas/workspace";
import type { Database } from "../schema";

/**
 * Loading a room's workspace rows into domain types, and the stored analysis of its scenarios:
 * computed by lib/analysis inside the writer's transaction, and again on read when the engine
 * version or the inputs hash no longer match. No permission checks here: callers check first.
 */

export type Db = Kysely<Database> | Transaction<Database>;

/** Runs `work` in the caller's transaction, or opens one (the caller may open it: STYLE.md). */
export function inTransaction<T>(db: Db, work: (trx: Transaction<Database>) => Promise<T>): Promise<T> {
  return db.isTransaction ? work(db as Transaction<Database>) : (db as Kysely<Database>).transaction().execute(work);
}

/** Parses a stored JSON array element by element with a schema (a non-array reads as empty). */
const listOf = <T>(schema: { parse(v: unknown): T }, v: unknown): T[] => (Array.isArray(v) ? v.map((x) => schema.parse(x)) : []);

export interface RoomSurface {
  surface: SurfaceId;
  finish: SurfaceFinish;
  openings: Opening[];
  /** true while the finish is the default given to a new room and nobody has saved it yet */
  assumed: boolean;
  /** gross area L·W, L·H or W·H, m² */
  areaM2: number;
  updatedAt: Date;
}

export interface Seat {
  id: string;
  roomId: string;
  kind: "seat";
  name: string;
  xM: number;
  yM: number;
  zM: number;
  isMain: boolean;
  sortOrder: number;
}

export interface Source {
  id: string;
  roomId: string;
  kind: "main-speaker" | "subwoofer";
  name: string;
  xM: number;
  yM: number;
  zM: number;
  delayMs: number;
  polarity: 1 | -1;
  drivesBass: boolean;
  sortOrder: number;
}

export type Position = Seat | Source;

export interface TreatmentItem {
  id: string;
  scenarioId: string;
  name: string;
  kind: ItemSpec["kind"];
  spec: ItemSpec;
  count: number;
  placements: Placement[];
  unitCost: number;
  unitMassKg: number | null;
  buildId: string | null;
  notes: string;
  sortOrder: number;
  createdAt: Date;
  updatedAt: Date;
}

type PositionRow = Awaited<ReturnType<ReturnType<typeof positionsQuery>["execute"]>>[number];
type ItemRow = Awaited<ReturnType<ReturnType<typeof itemsQuery>["execute"]>>[number];

function positionsQuery(db: Db, roomId: string) {
  return db.selectFrom("room_positions").selectAll().where("room_id", "=", roomId).orderBy("sort_order").orderBy("created_at").orderBy("id");
}

function itemsQuery(db: Db) {
  return db.selectFrom("treatment_items").selectAll().orderBy("sort_order").orderBy("created_at").orderBy("id");
}

export function toPosition(r: PositionRow): Position {
  const base = { id: r.id, roomId: r.room_id, name: r.name, xM: r.x_m, yM: r.y_m, zM: r.z_m, sortOrder: r.sort_order };
  if (r.kind === "seat") return { ...base, kind: "seat", isMain: r.is_main };
  return { ...base, kind: r.kind, delayMs: r.delay_ms, polarity: r.polarity === -1 ? -1 : 1, drivesBass: r.drives_bass };
}

export function toTreatmentItem(r: ItemRow): TreatmentItem {
  const spec = itemSpecSchema.parse(r.spec);
  return {
    id: r.id,
    scenarioId: r.scenario_id,
    name: r.name,
    kind: spec.kind,
    spec,
    count: r.count,
    placements: listOf(placementSchema, r.placements),
    unitCost: r.unit_cost,
    unitMassKg: r.unit_mass_kg,
    buildId: r.build_id,
    notes: r.notes,
    sortOrder: r.sort_order,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

export async function loadSurfaces(db: Db, room: { id: string; lengthM: number; widthM: number; heightM: number }): Promise<RoomSurface[]> {
  const rows = await db.selectFrom("room_surfaces").selectAll().where("room_id", "=", room.id).execute();
  const out = rows.map((r) => {
    const ext = surfaceExtentM(r.surface, room);
    return {
      surface: r.surface,
      finish: surfaceFinishSchema.parse(r.finish),
      openings: listOf(openingSchema, r.openings),
      assumed: r.assumed,
      areaM2: ext.uM * ext.vM,
      updatedAt: r.updated_at,
    };
  });
  return out.sort((a, b) => SURFACE_IDS.indexOf(a.surface) - SURFACE_IDS.indexOf(b.surface));
}

export async function loadPositions(db: Db, roomId: string): Promise<Position[]> {
  return (await positionsQuery(db, roomId).execute()).map(toPosition);
}

export async function loadItems(db: Db, scenarioIds: readonly string[]): Promise<TreatmentItem[]> {
  if (scenarioIds.length === 0) return [];
  return (await itemsQuery(db).where("scenario_id", "in", scenarioIds).execute()).map(toTreatmentItem);
}

/** A room's full description for lib/analysis, read in the caller's transaction. */
export async function loadAnalysisRoom(db: Db, roomId: string): Promise<AnalysisRoom> {
  const r = await db.selectFrom("rooms").select(["id", "length_m", "width_m", "height_m", "temperature_c", "humidity_pct"]).where("id", "=", roomId).executeTakeFirstOrThrow();
  const dims = { id: r.id, lengthM: r.length_m, widthM: r.width_m, heightM: r.height_m };
  const [surfaces, positions] = await Promise.all([loadSurfaces(db, dims), loadPositions(db, roomId)]);
  return analysisRoomOf(dims, { temperatureC: r.temperature_c, humidityPct: r.humidity_pct }, surfaces, positions);
}

export function analysisRoomOf(
  dims: { lengthM: number; widthM: number; heightM: number },
  air: { temperatureC: number; humidityPct: number },
  surfaces: readonly RoomSurface[],
  positions: readonly Position[],
): AnalysisRoom {
  return {
    lengthM: dims.lengthM,
    widthM: dims.widthM,
    heightM: dims.heightM,
    temperatureC: air.temperatureC,
    humidityPct: air.humidityPct,
    surfaces: surfaces.map((s) => ({ surface: s.surface, finish: s.finish, openings: s.openings })),
    seats: positions.flatMap((p) => (p.kind === "seat" ? [{ id: p.id, name: p.name, xM: p.xM, yM: p.yM, zM: p.zM, isMain: p.isMain }] : [])),
    sources: positions.flatMap((p) =>
      p.kind === "seat" ? [] : [{ id: p.id, name: p.name, kind: p.kind, xM: p.xM, yM: p.yM, zM: p.zM, delayMs: p.delayMs, polarity: p.polarity, drivesBass: p.drivesBass }],
    ),
  };
}

export function analysisItemOf(i: TreatmentItem): AnalysisItem {
  return { id: i.id, name: i.name, spec: i.spec, count: i.count, unitCost: i.unitCost, unitMassKg: i.unitMassKg, placements: i.placements };
}

export function parseTarget(v: unknown): ScenarioTarget {
  return scenarioTargetSchema.parse(v);
}

/** The analysis of every listed scenario (by id), computed now from their current inputs. */
function computeAll(room: AnalysisRoom, scenarios: { id: string; target: unknown }[], items: readonly TreatmentItem[]): Map<string, ScenarioResults> {
  const out = new Map<string, ScenarioResults>();
  for (const s of scenarios) {
    const own = items.filter((i) => i.scenarioId === s.id).map(analysisItemOf);
    out.set(s.id, analyzeScenario(room, { target: parseTarget(s.target), items: own }));
  }
  return out;
}

async function store(db: Db, id: string, results: ScenarioResults, expect?: { engineVersion: string | null; inputsHash: string | null }) {
  let q = db
    .updateTable("scenarios")
    .set({ results: JSON.stringify(results), engine_version: results.engineVersion, inputs_hash: results.inputsHash, computed_at: sql`now()` })
    .where("id", "=", id);
  // On read, store only if no writer stored newer results meanwhile (compare-and-set on what was read).
  if (expect) q = q.where(sql<boolean>`engine_version is not distinct from ${expect.engineVersion}`).where(sql<boolean>`inputs_hash is not distinct from ${expect.inputsHash}`);
  await q.execute();
}

/**
 * Recomputes and stores the analysis of every scenario of a room (archived ones included), in the
 * caller's transaction: called by every write to the room, its surfaces or its positions.
 */
export async function recomputeRoomScenarios(db: Db, roomId: string): Promise<void> {
  const room = await loadAnalysisRoom(db, roomId);
  const scenarios = await db.selectFrom("scenarios").select(["id", "target"]).where("room_id", "=", roomId).execute();
  const items = await loadItems(db, scenarios.map((s) => s.id));
  for (const [id, results] of computeAll(room, scenarios, items)) await store(db, id, results);
}

/** Recomputes and stores one scenario's analysis, in the caller's transaction (after its own writes). */
export async function recomputeScenario(db: Db, scenarioId: string): Promise<ScenarioResults> {
  const s = await db.selectFrom("scenarios").select(["id", "room_id", "target"]).where("id", "=", scenarioId).executeTakeFirstOrThrow();
  const room = await loadAnalysisRoom(db, s.room_id);
  const results = computeAll(room, [s], await loadItems(db, [s.id])).get(s.id)!;
  await store(db, s.id, results);
  return results;
}

/**
 * The stored results of these scenarios of one room, recomputed (and stored again) where the engine
 * version differs or the inputs hash no longer matches the current inputs — so saved work reopens
 * with results that are both instant and consistent.
 */
export async function freshResults(
  db: Db,
  roomId: string,
  scenarios: { id: string; target: unknown; results: unknown; engine_version: string | null; inputs_hash: string | null }[],
): Promise<Map<string, ScenarioResults>> {
  const out = new Map<string, ScenarioResults>();
  if (scenarios.length === 0) return out;
  const room = await loadAnalysisRoom(db, roomId);
  const items = await loadItems(db, scenarios.map((s) => s.id));
  for (const s of scenarios) {
    const own = items.filter((i) => i.scenarioId === s.id).map(analysisItemOf);
    const input = { target: parseTarget(s.target), items: own };
    if (s.results && s.engine_version === ENGINE_VERSION && s.inputs_hash === analysisInputsHash(room, input)) {
      out.set(s.id, s.results as ScenarioResults);
      continue;
    }
    const results = analyzeScenario(room, input);
    await store(db, s.id, results, { engineVersion: s.engine_version, inputsHash: s.inputs_hash });
    out.set(s.id, results);
  }
  return out;
}
