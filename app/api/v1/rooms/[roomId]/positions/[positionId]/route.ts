import { db } from "@/db/client";
import { deletePosition, updatePosition } from "@/db/queries/positions";
import { roomFor } from "@/db/queries/rooms";
import { apiRoute, readJson } from "@/lib/api/route";
import { positionUpdateSchema, versionOnlySchema } from "@/lib/schemas/workspace";

type P = { roomId: string; positionId: string };

/** Rename, move (a drag sends x, y, z only), main mark, delay, polarity; with the room's version. */
export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  await roomFor(db, actor, params.roomId, "workspace.update");
  const input = await readJson(request, positionUpdateSchema);
  return { body: await updatePosition(db, actor, params.roomId, params.positionId, input) };
});

/** DELETE …?version=N (the room's version). */
export const DELETE = apiRoute<P>(async ({ request, actor, params }) => {
  await roomFor(db, actor, params.roomId, "workspace.update");
  const { version } = versionOnlySchema.parse({ version: new URL(request.url).searchParams.get("version") ?? undefined });
  return { body: await deletePosition(db, actor, params.roomId, params.positionId, version) };
});
