import { db } from "@/db/client";
import { listProjectReports, saveDraft } from "@/db/queries/reports";
import { AppError } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { checkDraftScenarios } from "@/lib/report/draft";
import { reportDraftSchema } from "@/lib/report/schemas";

export const GET = apiRoute(async ({ request, actor }) => {
  const projectId = new URL(request.url).searchParams.get("projectId");
  if (!projectId) throw new AppError("bad_request", "Give ?projectId=", { projectId: ["required"] });
  return { body: { reports: await listProjectReports(db, actor, projectId) } };
});

export const POST = apiRoute(async ({ request, actor }) => {
  const input = await readJson(request, reportDraftSchema);
  await checkDraftScenarios(db, actor, input.roomId, input.scenarioIds);
  return { body: { revision: await saveDraft(db, actor, input.roomId, input) }, status: 201 };
});
