import { db } from "@/db/client";
import { createProject, listProjects } from "@/db/queries/projects";
import { forbidden } from "@/lib/api/errors";
import { apiRoute, readJson } from "@/lib/api/route";
import { canInFirm } from "@/lib/auth/permissions";
import { projectInputSchema } from "@/lib/schemas/project";

export const GET = apiRoute(async ({ actor }) => ({ body: { projects: await listProjects(db, actor) } }));

export const POST = apiRoute(async ({ request, actor }) => {
  if (!canInFirm(actor, "project.create")) throw forbidden("Your role cannot create projects.");
  const input = await readJson(request, projectInputSchema);
  return { body: { project: await createProject(db, actor, input) }, status: 201 };
});
