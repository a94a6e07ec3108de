import { db } from "@/db/client";
import { deleteProject, projectFor, updateProject } from "@/db/queries/projects";
import { apiRoute, readJson } from "@/lib/api/route";
import { projectUpdateSchema } from "@/lib/schemas/project";

type P = { projectId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { project: await projectFor(db, actor, params.projectId, "project.read") } }));

export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  await projectFor(db, actor, params.projectId, "project.update");
  const input = await readJson(request, projectUpdateSchema);
  return { body: { project: await updateProject(db, actor, params.projectId, input) } };
});

export const DELETE = apiRoute<P>(async ({ actor, params }) => {
  await deleteProject(db, actor, params.projectId);
  return new Response(null, { status: 204 });
});
