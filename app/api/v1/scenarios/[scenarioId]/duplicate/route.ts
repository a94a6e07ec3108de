import { db } from "@/db/client";
import { duplicateScenario, scenarioFor } from "@/db/queries/scenarios";
import { apiRoute, readJson } from "@/lib/api/route";
import { scenarioDuplicateSchema } from "@/lib/schemas/workspace";

type P = { scenarioId: string };

/** A copy of the scenario (target, notes, items) as a new scenario of the same room. */
export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  await scenarioFor(db, actor, params.scenarioId, "scenario.create");
  const input = await readJson(request, scenarioDuplicateSchema);
  return { body: { scenario: await duplicateScenario(db, actor, params.scenarioId, input) }, status: 201 };
});
