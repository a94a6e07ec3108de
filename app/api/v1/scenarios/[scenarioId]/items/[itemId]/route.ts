import { db } from "@/db/client";
import { scenarioFor } from "@/db/queries/scenarios";
import { removeTreatmentItem, updateTreatmentItem } from "@/db/queries/treatment-items";
import { apiRoute, readJson } from "@/lib/api/route";
import { treatmentItemUpdateSchema, versionOnlySchema } from "@/lib/schemas/workspace";

type P = { scenarioId: string; itemId: string };

export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  await scenarioFor(db, actor, params.scenarioId, "treatment.update");
  const input = await readJson(request, treatmentItemUpdateSchema);
  return { body: await updateTreatmentItem(db, actor, params.scenarioId, params.itemId, input) };
});

/** DELETE …?version=N (the scenario's version). */
export const DELETE = apiRoute<P>(async ({ request, actor, params }) => {
  await scenarioFor(db, actor, params.scenarioId, "treatment.update");
  const { version } = versionOnlySchema.parse({ version: new URL(request.url).searchParams.get("version") ?? undefined });
  return { body: await removeTreatmentItem(db, actor, params.scenarioId, params.itemId, version) };
});
