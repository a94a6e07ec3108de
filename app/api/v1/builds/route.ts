import { db } from "@/db/client";
import { createBuild, listBuilds } from "@/db/queries/builds";
import { AppError } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { canInFirm } from "@/lib/auth/permissions";
import { buildInputSchema } from "@/lib/schemas/workspace";

/** The firm's build library (owner, engineer, builder). */
export const GET = apiRoute(async ({ actor }) => ({ body: { builds: await listBuilds(db, actor) } }));

/** Save a build to the library (owner, engineer). */
export const POST = apiRoute(async ({ request, actor }) => {
  if (!canInFirm(actor, "library.manage")) throw new AppError("forbidden", "Your role cannot change the build library.");
  const input = await readJson(request, buildInputSchema);
  return { body: { build: await createBuild(db, actor, input) }, status: 201 };
});
