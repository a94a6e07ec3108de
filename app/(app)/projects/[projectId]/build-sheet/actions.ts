"use server";

// Server action of the build sheet: a builder marks an item built or installed. who → may they
// (build.mark-done, inside the query) → zod → query → revalidate → typed result.

import { revalidatePath } from "next/cache";
import { progressInputSchema } from "@/lib/schemas/build-sheet";
import { db } from "@/db/client";
import { markProgress, type ItemProgress } from "@/db/queries/build-progress";
import { AppError } from "@/lib/api/errors";
import { fieldErrors } from "@/lib/api/zod-fields";
import { requireActor } from "@/lib/auth/session";
import type { ActionResult } from "../../actions";

/** Marks a build-sheet item built and/or installed. Input: `progressInputSchema`. */
export async function markProgressAction(projectId: string, itemId: string, input: unknown): Promise<ActionResult<ItemProgress>> {
  const actor = await requireActor();
  const parsed = progressInputSchema.safeParse(input);
  if (!parsed.success) return { ok: false, code: "bad_request", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
  try {
    const progress = await markProgress(db, actor, itemId, parsed.data);
    revalidatePath(`/projects/${projectId}/build-sheet`);
    return { ok: true, data: progress };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, code: error.code, message: error.message, fields: error.fields };
    throw error;
  }
}
