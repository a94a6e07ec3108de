import { db } from "@/db/client";
import { projectBuildSheet } from "@/db/queries/build-progress";
import { AppError } from "@/lib/api/errors";
import { apiRoute } from "@/lib/api/route";

type P = { projectId: string };

/** The project's build sheet with each item's progress (`build.read`); `?units=metric|imperial`, default the caller's setting. */
export const GET = apiRoute<P>(async ({ request, actor, params }) => {
  const units = new URL(request.url).searchParams.get("units");
  if (units !== null && units !== "metric" && units !== "imperial") throw new AppError("bad_request", "units is metric or imperial.", { units: ["metric or imperial"] });
  return { body: await projectBuildSheet(db, actor, params.projectId, units ?? actor.unitSystem) };
});
