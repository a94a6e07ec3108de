import { sql, type Transaction } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { AppError, notFound } from "@/lib/api/errors";
import { POSITION_LIMITS, positionInsideRoomIssues, type PositionInput, type PositionUpdate } from "@/lib/schemas/workspace";
import type { Database } from "../schema";
import { inTransaction, loadPositions, recomputeRoomScenarios, toPosition, type Db, type Position } from "./analysis";
import { isUuid } from "./projects";
import { bumpRoomVersion, roomFor, type Room } from "./rooms";

export type { Position, Seat, Source } from "./analysis";

/** Seats and sources of a room in their order, for `workspace.read`. */
export async function listPositions(db: Db, actor: Actor, roomId: string): Promise<Position[]> {
  await roomFor(db, actor, roomId, "workspace.read");
  return loadPositions(db, roomId);
}

function insideOrThrow(p: { xM?: number; yM?: number; zM?: number }, room: Room) {
  const issues = positionInsideRoomIssues(p, room);
  if (issues.length === 0) return;
  const fields: Record<string, string[]> = {};
  for (const i of issues) (fields[i.path.join(".")] ??= []).push(i.message);
  throw new AppError("bad_request", "The position must lie inside the room.", fields);
}

async function positionRow(trx: Transaction<Database>, roomId: string, positionId: string) {
  if (!isUuid(positionId)) throw notFound("That position");
  const row = await trx.selectFrom("room_positions").selectAll().where("id", "=", positionId).where("room_id", "=", roomId).executeTakeFirst();
  if (!row) throw notFound("That position");
  return row;
}

/**
 * Adds a seat or a source if the room's `version` is current (409 otherwise); checks it lies inside
 * the room and the room's limits (64 seats, 16 sources); the first seat becomes the main one, and a
 * new main seat takes the mark from the old one. Bumps the room's version and recomputes every
 * scenario of the room, all in one transaction.
 */
export async function createPosition(db: Db, actor: Actor, roomId: string, input: PositionInput): Promise<{ position: Position; roomVersion: number }> {
  return inTransaction(db, async (trx) => {
    await roomFor(trx, actor, roomId, "workspace.update");
    const room = await bumpRoomVersion(trx, roomId, input.version);
    insideOrThrow(input, room);
    const existing = await loadPositions(trx, roomId);
    const seats = existing.filter((p) => p.kind === "seat");
    if (input.kind === "seat" && seats.length >= POSITION_LIMITS.maxSeats) throw new AppError("bad_request", `A room holds at most ${POSITION_LIMITS.maxSeats} seats.`, { kind: [`at most ${POSITION_LIMITS.maxSeats} seats`] });
    if (input.kind !== "seat" && existing.length - seats.length >= POSITION_LIMITS.maxSources)
      throw new AppError("bad_request", `A room holds at most ${POSITION_LIMITS.maxSources} sources.`, { kind: [`at most ${POSITION_LIMITS.maxSources} sources`] });
    const isMain = input.kind === "seat" && (input.isMain || !seats.some((s) => s.kind === "seat" && s.isMain));
    if (isMain) await trx.updateTable("room_positions").set({ is_main: false }).where("room_id", "=", roomId).where("is_main", "=", true).execute();
    const sortOrder = existing.reduce((m, p) => Math.max(m, p.sortOrder), -1) + 1;
    const row = await trx
      .insertInto("room_positions")
      .values({
        room_id: roomId,
        kind: input.kind,
        name: input.name,
        x_m: input.xM,
        y_m: input.yM,
        z_m: input.zM,
        is_main: isMain,
        sort_order: sortOrder,
        ...(input.kind !== "seat" && { delay_ms: input.delayMs, polarity: input.polarity, drives_bass: input.drivesBass }),
      })
      .returningAll()
      .executeTakeFirstOrThrow();
    await recomputeRoomScenarios(trx, roomId);
    return { position: toPosition(row), roomVersion: room.version };
  });
}

/**
 * Changes a position (name, coordinates — a drag on the plan is a call with x, y, z only — main
 * mark, delay, polarity, bass) if the room's `version` is current (409 otherwise). Fields that do not
 * apply to the kind (a seat's delay, a source's main mark) are refused. One transaction: the room's
 * version is bumped and every scenario of the room recomputed.
 */
export async function updatePosition(db: Db, actor: Actor, roomId: string, positionId: string, input: PositionUpdate): Promise<{ position: Position; roomVersion: number }> {
  return inTransaction(db, async (trx) => {
    await roomFor(trx, actor, roomId, "workspace.update");
    const room = await bumpRoomVersion(trx, roomId, input.version);
    const current = await positionRow(trx, roomId, positionId);
    const fields: Record<string, string[]> = {};
    if (current.kind === "seat") {
      for (const k of ["delayMs", "polarity", "drivesBass"] as const) if (input[k] !== undefined) fields[k] = ["only sources have this"];
      if (input.isMain === false && current.is_main) fields.isMain = ["mark another seat as the main one instead"];
    } else if (input.isMain !== undefined) fields.isMain = ["only seats can be the main listening position"];
    if (Object.keys(fields).length > 0) throw new AppError("bad_request", "Some fields do not apply to this position.", fields);
    insideOrThrow({ xM: input.xM ?? current.x_m, yM: input.yM ?? current.y_m, zM: input.zM ?? current.z_m }, room);
    if (input.isMain === true) await trx.updateTable("room_positions").set({ is_main: false }).where("room_id", "=", roomId).where("is_main", "=", true).execute();
    const row = await trx
      .updateTable("room_positions")
      .set({
        ...(input.name !== undefined && { name: input.name }),
        ...(input.xM !== undefined && { x_m: input.xM }),
        ...(input.yM !== undefined && { y_m: input.yM }),
        ...(input.zM !== undefined && { z_m: input.zM }),
        ...(input.isMain !== undefined && { is_main: input.isMain }),
        ...(input.delayMs !== undefined && { delay_ms: input.delayMs }),
        ...(input.polarity !== undefined && { polarity: input.polarity }),
        ...(input.drivesBass !== undefined && { drives_bass: input.drivesBass }),
        updated_at: sql`now()`,
      })
      .where("id", "=", positionId)
      .returningAll()
      .executeTakeFirstOrThrow();
    await recomputeRoomScenarios(trx, roomId);
    return { position: toPosition(row), roomVersion: room.version };
  });
}

/**
 * Deletes a position if the room's `version` is current (409 otherwise); when it was the main seat,
 * the first remaining seat becomes the main one. Recomputes every scenario of the room.
 */
export async function deletePosition(db: Db, actor: Actor, roomId: string, positionId: string, version: number): Promise<{ roomVersion: number }> {
  return inTransaction(db, async (trx) => {
    await roomFor(trx, actor, roomId, "workspace.update");
    const room = await bumpRoomVersion(trx, roomId, version);
    const current = await positionRow(trx, roomId, positionId);
    await trx.deleteFrom("room_positions").where("id", "=", positionId).execute();
    if (current.is_main) {
      const next = (await loadPositions(trx, roomId)).find((p) => p.kind === "seat");
      if (next) await trx.updateTable("room_positions").set({ is_main: true }).where("id", "=", next.id).execute();
    }
    await recomputeRoomScenarios(trx, roomId);
    return { roomVersion: room.version };
  });
}
