import { db } from "@/db/client";
import { createPosition, listPositions } from "@/db/queries/positions";
import { roomFor } from "@/db/queries/rooms";
import { apiRoute, readJson } from "@/lib/api/route";
import { positionInputSchema } from "@/lib/schemas/workspace";

type P = { roomId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { positions: await listPositions(db, actor, params.roomId) } }));

export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  await roomFor(db, actor, params.roomId, "workspace.update");
  const input = await readJson(request, positionInputSchema);
  return { body: await createPosition(db, actor, params.roomId, input), status: 201 };
});
