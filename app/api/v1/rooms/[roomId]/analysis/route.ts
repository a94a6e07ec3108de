import { db } from "@/db/client";
import { compareScenarios } from "@/db/queries/scenarios";
import { apiRoute } from "@/lib/api/route";

type P = { roomId: string };

/** Full results of several scenarios for a comparison: `?scenarioIds=a,b` or every one not archived. */
export const GET = apiRoute<P>(async ({ request, actor, params }) => {
  const raw = new URL(request.url).searchParams.get("scenarioIds");
  const ids = raw ? raw.split(",").map((s) => s.trim()).filter(Boolean).slice(0, 50) : undefined;
  return { body: { scenarios: await compareScenarios(db, actor, params.roomId, ids) } };
});
