import { db } from "@/db/client";
import { roomFor } from "@/db/queries/rooms";
import { listSurfaces, saveSurfaces } from "@/db/queries/surfaces";
import { apiRoute, readJson } from "@/lib/api/route";
import { surfacesInputSchema } from "@/lib/schemas/workspace";

type P = { roomId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { surfaces: await listSurfaces(db, actor, params.roomId) } }));

/** All six surfaces at once, with the room's version (409 when stale). */
export const PUT = apiRoute<P>(async ({ request, actor, params }) => {
  await roomFor(db, actor, params.roomId, "workspace.update");
  const input = await readJson(request, surfacesInputSchema);
  return { body: await saveSurfaces(db, actor, params.roomId, input) };
});
