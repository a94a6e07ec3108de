import { progressInputSchema } from "@/lib/schemas/build-sheet";
import { db } from "@/db/client";
import { markProgress } from "@/db/queries/build-progress";
import { apiRoute, readJson } from "@/lib/api/route";

type P = { itemId: string };

/** Marks a treatment item built and/or installed (`build.mark-done`: the project's builders, the owner). */
export const PUT = apiRoute<P>(async ({ request, actor, params }) => {
  const input = await readJson(request, progressInputSchema);
  return { body: { progress: await markProgress(db, actor, params.itemId, input) } };
});
