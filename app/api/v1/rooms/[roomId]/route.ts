import { db } from "@/db/client";
import { deleteRoom, roomFor, updateRoom } from "@/db/queries/rooms";
import { apiRoute, readJson } from "@/lib/api/route";
import { roomUpdateSchema } from "@/lib/schemas/room";

type P = { roomId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { room: (await roomFor(db, actor, params.roomId, "room.read")).room } }));

export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  await roomFor(db, actor, params.roomId, "room.update");
  const input = await readJson(request, roomUpdateSchema);
  return { body: { room: await updateRoom(db, actor, params.roomId, input) } };
});

export const DELETE = apiRoute<P>(async ({ actor, params }) => {
  await deleteRoom(db, actor, params.roomId);
  return new Response(null, { status: 204 });
});
