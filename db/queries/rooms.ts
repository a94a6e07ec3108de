import { type Kysely, sql, type Transaction } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject, type ProjectAction } from "@/lib/auth/permissions";
import { AppError, conflict, forbidden, notFound } from "@/lib/api/errors";
import { roomGeometryIssues } from "@/lib/analysis";
import type { RoomInput, RoomUpdate } from "@/lib/schemas/room";
import type { Database, RoomRow } from "../schema";
import { analysisItemOf, loadAnalysisRoom, loadItems, recomputeRoomScenarios } from "./analysis";
import { findProject, isUuid, projectFor, type Project } from "./projects";

type Db = Kysely<Database> | Transaction<Database>;

export interface Room {
  id: string;
  projectId: string;
  name: string;
  lengthM: number;
  widthM: number;
  heightM: number;
  temperatureC: number;
  humidityPct: number;
  notes: string;
  version: number;
  createdAt: Date;
  updatedAt: Date;
}

export function toRoom(r: RoomRow): Room {
  return {
    id: r.id,
    projectId: r.project_id,
    name: r.name,
    lengthM: r.length_m,
    widthM: r.width_m,
    heightM: r.height_m,
    temperatureC: r.temperature_c,
    humidityPct: r.humidity_pct,
    notes: r.notes,
    version: r.version,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
  };
}

export async function listRooms(db: Db, actor: Actor, projectId: string): Promise<Room[]> {
  await projectFor(db, actor, projectId, "room.read");
  const rows = await db.selectFrom("rooms").selectAll().where("project_id", "=", projectId).orderBy("created_at").execute();
  return rows.map(toRoom);
}

/** A room with its project, if the actor may see the project (else 404) and do the action (else 403). */
export async function roomFor(db: Db, actor: Actor, roomId: string, action: ProjectAction): Promise<{ room: Room; project: Project }> {
  if (!isUuid(roomId)) throw notFound("That room");
  const row = await db.selectFrom("rooms").selectAll().where("id", "=", roomId).executeTakeFirst();
  const project = row ? await findProject(db, actor, row.project_id) : undefined;
  if (!row || !project) throw notFound("That room");
  if (!canOnProject(actor, action, project)) throw forbidden();
  return { room: toRoom(row), project };
}

export async function createRoom(db: Kysely<Database>, actor: Actor, projectId: string, input: RoomInput): Promise<Room> {
  return db.transaction().execute(async (trx) => {
    await projectFor(trx, actor, projectId, "room.create");
    const row = await trx
      .insertInto("rooms")
      .values({
        project_id: projectId,
        name: input.name,
        length_m: input.lengthM,
        width_m: input.widthM,
        height_m: input.heightM,
        temperature_c: input.temperatureC,
        humidity_pct: input.humidityPct,
        notes: input.notes,
      })
      .returningAll()
      .executeTakeFirstOrThrow();
    await trx.updateTable("projects").set({ updated_at: sql`now()` }).where("id", "=", projectId).execute();
    // The insert trigger gave the room its six surfaces and its baseline scenario: analyse it now.
    await recomputeRoomScenarios(trx, row.id);
    return toRoom(row);
  });
}

export async function updateRoom(db: Kysely<Database>, actor: Actor, roomId: string, input: RoomUpdate): Promise<Room> {
  return db.transaction().execute(async (trx) => {
    await roomFor(trx, actor, roomId, "room.update");
    const { version, ...rest } = input;
    const row = await trx
      .updateTable("rooms")
      .set({
        ...(rest.name !== undefined && { name: rest.name }),
        ...(rest.lengthM !== undefined && { length_m: rest.lengthM }),
        ...(rest.widthM !== undefined && { width_m: rest.widthM }),
        ...(rest.heightM !== undefined && { height_m: rest.heightM }),
        ...(rest.temperatureC !== undefined && { temperature_c: rest.temperatureC }),
        ...(rest.humidityPct !== undefined && { humidity_pct: rest.humidityPct }),
        ...(rest.notes !== undefined && { notes: rest.notes }),
        version: sql`version + 1`,
        updated_at: sql`now()`,
      })
      .where("id", "=", roomId)
      .where("version", "=", version)
      .returningAll()
      .executeTakeFirst();
    if (!row) throw conflict();
    const resized = rest.lengthM !== undefined || rest.widthM !== undefined || rest.heightM !== undefined;
    if (resized) await checkRoomGeometry(trx, roomId, rest);
    if (resized || rest.temperatureC !== undefined || rest.humidityPct !== undefined) await recomputeRoomScenarios(trx, roomId);
    return toRoom(row);
  });
}

/**
 * After a change of dimensions (inside the same transaction): every position, opening and item
 * placement must still fit, else the change is refused with the offending things named (400).
 */
async function checkRoomGeometry(trx: Transaction<Database>, roomId: string, changed: Partial<Pick<RoomUpdate, "lengthM" | "widthM" | "heightM">>): Promise<void> {
  const room = await loadAnalysisRoom(trx, roomId);
  const scenarioIds = (await trx.selectFrom("scenarios").select("id").where("room_id", "=", roomId).execute()).map((s) => s.id);
  const items = (await loadItems(trx, scenarioIds)).map(analysisItemOf);
  const issues = roomGeometryIssues(room, items);
  if (issues.length === 0) return;
  const messages = issues.slice(0, 10).map((i) => i.message);
  const fields: Record<string, string[]> = {};
  for (const key of ["lengthM", "widthM", "heightM"] as const) if (changed[key] !== undefined) fields[key] = messages;
  throw new AppError("bad_request", `The new size leaves ${issues.length} position(s), opening(s) or item(s) outside the room: move them first.`, fields);
}

/**
 * Takes the room's row lock and bumps its version if `version` is current (else 409): the first
 * step of every write to a room's surfaces or positions, which belong to the room's version.
 */
export async function bumpRoomVersion(trx: Transaction<Database>, roomId: string, version: number): Promise<Room> {
  const row = await trx
    .updateTable("rooms")
    .set({ version: sql`version + 1`, updated_at: sql`now()` })
    .where("id", "=", roomId)
    .where("version", "=", version)
    .returningAll()
    .executeTakeFirst();
  if (!row) throw conflict();
  return toRoom(row);
}

export async function deleteRoom(db: Kysely<Database>, actor: Actor, roomId: string): Promise<void> {
  await roomFor(db, actor, roomId, "room.delete");
  await db.deleteFrom("rooms").where("id", "=", roomId).execute();
}
