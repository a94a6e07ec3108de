import type { Actor } from "@/lib/auth/actor";
import { canOnProject } from "@/lib/auth/permissions";
import { inTransaction, loadPositions, loadSurfaces, type Db, type RoomSurface, type Seat, type Source } from "./analysis";
import type { Room } from "./rooms";
import { roomFor } from "./rooms";
import { listScenarios, type ScenarioSummary } from "./scenarios";

/** Everything a room page opens with, in one call (GET /rooms/{roomId}/workspace). */
export interface Workspace {
  room: Room;
  surfaces: RoomSurface[];
  seats: Seat[];
  sources: Source[];
  scenarios: ScenarioSummary[];
  /** What the caller may do here (the screens hide what they may not) */
  can: { editRoom: boolean; editScenarios: boolean };
}

/**
 * The room, its six surfaces, seats, sources and the summary of every scenario (archived included,
 * flagged), with results refreshed where stale; for `workspace.read` (owner, engineer, builder).
 */
export async function getWorkspace(db: Db, actor: Actor, roomId: string): Promise<Workspace> {
  const { room, project } = await roomFor(db, actor, roomId, "workspace.read");
  return inTransaction(db, async (trx) => {
    const [surfaces, positions] = await Promise.all([loadSurfaces(trx, room), loadPositions(trx, roomId)]);
    const scenarios = await listScenarios(trx, actor, roomId);
    return {
      room,
      surfaces,
      seats: positions.filter((p): p is Seat => p.kind === "seat"),
      sources: positions.filter((p): p is Source => p.kind !== "seat"),
      scenarios,
      can: { editRoom: canOnProject(actor, "workspace.update", project), editScenarios: canOnProject(actor, "scenario.update", project) },
    };
  });
}

