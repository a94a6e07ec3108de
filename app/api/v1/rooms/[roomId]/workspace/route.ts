import { db } from "@/db/client";
import { getWorkspace } from "@/db/queries/workspace";
import { apiRoute } from "@/lib/api/route";

type P = { roomId: string };

/** The room page's data in one call: room, six surfaces, seats, sources, scenario summaries. */
export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { workspace: await getWorkspace(db, actor, params.roomId) } }));
