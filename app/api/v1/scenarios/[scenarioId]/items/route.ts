import { db } from "@/db/client";
import { scenarioFor } from "@/db/queries/scenarios";
import { addTreatmentItem, listTreatmentItems } from "@/db/queries/treatment-items";
import { apiRoute, readJson } from "@/lib/api/route";
import { treatmentItemInputSchema } from "@/lib/schemas/workspace";

type P = { scenarioId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { items: await listTreatmentItems(db, actor, params.scenarioId) } }));

/** A new item, with the scenario's version; answers the item and the scenario's new version. */
export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  await scenarioFor(db, actor, params.scenarioId, "treatment.update");
  const input = await readJson(request, treatmentItemInputSchema);
  return { body: await addTreatmentItem(db, actor, params.scenarioId, input), status: 201 };
});
