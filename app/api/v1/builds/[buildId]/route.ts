import { db } from "@/db/client";
import { deleteBuild, getBuild, updateBuild } from "@/db/queries/builds";
import { AppError } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { canInFirm } from "@/lib/auth/permissions";
import { buildUpdateSchema } from "@/lib/schemas/workspace";

type P = { buildId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { build: await getBuild(db, actor, params.buildId) } }));

export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  await getBuild(db, actor, params.buildId);
  if (!canInFirm(actor, "library.manage")) throw new AppError("forbidden", "Your role cannot change the build library.");
  const input = await readJson(request, buildUpdateSchema);
  return { body: { build: await updateBuild(db, actor, params.buildId, input) } };
});

export const DELETE = apiRoute<P>(async ({ actor, params }) => {
  await deleteBuild(db, actor, params.buildId);
  return new Response(null, { status: 204 });
});
