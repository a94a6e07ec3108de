import "server-only";
import type { Kysely } from "kysely";
import { roomFor } from "@/db/queries/rooms";
import type { Database } from "@/db/schema";
import { AppError } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";

/** The chosen scenarios must belong to the room (404 for a room the actor cannot compose in). */
export async function checkDraftScenarios(db: Kysely<Database>, actor: Actor, roomId: string, scenarioIds: readonly string[]): Promise<void> {
  await roomFor(db, actor, roomId, "report.compose");
  const rows = await db.selectFrom("scenarios").select("id").where("room_id", "=", roomId).where("id", "in", [...scenarioIds]).execute();
  if (rows.length !== new Set(scenarioIds).size) throw new AppError("bad_request", "Some scenarios are not in this room.", { scenarioIds: ["choose scenarios of this room"] });
}
