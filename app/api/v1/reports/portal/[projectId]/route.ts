import { isUuid } from "@/db/queries/projects";
import { jsonError } from "@/lib/api/route";
import { getActor } from "@/lib/auth/session";

type P = { projectId: string };

/**
 * The link in report e-mails: a signed-in person goes straight to the project's reports; anyone else
 * to the sign-in page, which returns them there afterwards. (The page itself decides visibility: 404
 * for a project the person may not see.)
 */
export async function GET(request: Request, { params }: { params: Promise<P> }): Promise<Response> {
  const { projectId } = await params;
  if (!isUuid(projectId)) return jsonError(404, "not_found", "That project was not found.");
  const target = `/projects/${projectId}/reports`;
  const actor = await getActor();
  const location = actor ? target : `/sign-in?next=${encodeURIComponent(target)}`;
  return new Response(null, { status: 303, headers: { location: new URL(location, request.url).href, "cache-control": "no-store" } });
}
