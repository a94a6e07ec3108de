import { type Kysely, sql, type Transaction } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject, type ProjectAction } from "@/lib/auth/permissions";
import { conflict, forbidden, notFound } from "@/lib/api/errors";
import type { RoomInput, RoomUpdate } from "@/lib/schemas/room";
import type { Database, RoomRow } from "../schema";
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
    return toRoom(row);
  });
}

export async function deleteRoom(db: Kysely<Database>, actor: Actor, roomId: string): Promise<void> {
  await roomFor(db, actor, roomId, "room.delete");
  await db.deleteFrom("rooms").where("id", "=", roomId).execute();
}
