import { db } from "@/db/client";
import { getScenario, scenarioFor, updateScenario } from "@/db/queries/scenarios";
import { apiRoute, readJson } from "@/lib/api/route";
import { scenarioUpdateSchema } from "@/lib/schemas/workspace";

type P = { scenarioId: string };

/** One scenario with its items and its stored analysis (recomputed first when stale). */
export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { scenario: await getScenario(db, actor, params.scenarioId) } }));

/** Rename, notes, target, archive / unarchive (`archived`), with the scenario's version. */
export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  await scenarioFor(db, actor, params.scenarioId, "scenario.update");
  const input = await readJson(request, scenarioUpdateSchema);
  return { body: { scenario: await updateScenario(db, actor, params.scenarioId, input) } };
});
