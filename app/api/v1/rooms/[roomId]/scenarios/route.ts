import { db } from "@/db/client";
import { roomFor } from "@/db/queries/rooms";
import { createScenario, listScenarios } from "@/db/queries/scenarios";
import { apiRoute, readJson } from "@/lib/api/route";
import { scenarioInputSchema } from "@/lib/schemas/workspace";

type P = { roomId: string };

/** Scenario summaries, baseline first; `?archived=false` leaves the archived ones out. */
export const GET = apiRoute<P>(async ({ request, actor, params }) => {
  const includeArchived = new URL(request.url).searchParams.get("archived") !== "false";
  return { body: { scenarios: await listScenarios(db, actor, params.roomId, { includeArchived }) } };
});

export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  await roomFor(db, actor, params.roomId, "scenario.create");
  const input = await readJson(request, scenarioInputSchema);
  return { body: { scenario: await createScenario(db, actor, params.roomId, input) }, status: 201 };
});
