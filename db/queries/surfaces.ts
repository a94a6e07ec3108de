import { sql } from "kysely";
import type { Actor } from "@/lib/auth/actor";
import { AppError } from "@/lib/api/errors";
import { openingIssues, type SurfacesInput } from "@/lib/schemas/workspace";
import { inTransaction, loadSurfaces, recomputeRoomScenarios, type Db, type RoomSurface } from "./analysis";
import { bumpRoomVersion, roomFor } from "./rooms";

export type { RoomSurface } from "./analysis";

/** The six surfaces of a room (front, rear, left, right, floor, ceiling), for `workspace.read`. */
export async function listSurfaces(db: Db, actor: Actor, roomId: string): Promise<RoomSurface[]> {
  const { room } = await roomFor(db, actor, roomId, "workspace.read");
  return loadSurfaces(db, room);
}

/**
 * Saves all six surfaces at once (finish or custom α, openings) if the room's `version` is current
 * (else 409), bumps the room's version and recomputes every scenario of the room; all or nothing.
 * Openings must fit their surface (400 naming `surfaces.i.openings.j.…`).
 * @returns the saved surfaces and the room's new version
 */
export async function saveSurfaces(db: Db, actor: Actor, roomId: string, input: SurfacesInput): Promise<{ surfaces: RoomSurface[]; roomVersion: number }> {
  return inTransaction(db, async (trx) => {
    await roomFor(trx, actor, roomId, "workspace.update");
    const room = await bumpRoomVersion(trx, roomId, input.version);
    const fields: Record<string, string[]> = {};
    input.surfaces.forEach((s, i) => {
      for (const issue of openingIssues(s.surface, s.openings, room, ["surfaces", i, "openings"])) (fields[issue.path.join(".")] ??= []).push(issue.message);
    });
    if (Object.keys(fields).length > 0) throw new AppError("bad_request", "Some openings do not fit their surface.", fields);
    for (const s of input.surfaces) {
      await trx
        .insertInto("room_surfaces")
        .values({ room_id: roomId, surface: s.surface, finish: JSON.stringify(s.finish), openings: JSON.stringify(s.openings), assumed: false })
        .onConflict((oc) =>
          oc.columns(["room_id", "surface"]).doUpdateSet({ finish: JSON.stringify(s.finish), openings: JSON.stringify(s.openings), assumed: false, updated_at: sql`now()` }),
        )
        .execute();
    }
    await recomputeRoomScenarios(trx, roomId);
    return { surfaces: await loadSurfaces(trx, room), roomVersion: room.version };
  });
}
