"use server";

// Server action of the treatment plan: choose the scenario the project's build sheet lists for this
// room. who → may they (scenario.update) → zod → query → revalidate → typed result.

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { db } from "@/db/client";
import { chooseBuildScenario } from "@/db/queries/build-progress";
import { AppError } from "@/lib/api/errors";
import { requireActor } from "@/lib/auth/session";
import type { ActionResult } from "../../../projects/actions";

const scenarioIdSchema = z.uuid("Choose a scenario of this room");

/** Puts this scenario on the project's build sheet for its room. */
export async function chooseBuildScenarioAction(scenarioId: unknown): Promise<ActionResult<{ roomId: string; projectId: string }>> {
  const actor = await requireActor();
  const parsed = scenarioIdSchema.safeParse(scenarioId);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Choose a scenario of this room.", fields: { scenarioId: ["not a scenario id"] } };
  try {
    const r = await chooseBuildScenario(db, actor, parsed.data);
    revalidatePath(`/rooms/${r.roomId}/plan`);
    revalidatePath(`/projects/${r.projectId}/build-sheet`);
    return { ok: true, data: r };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}
