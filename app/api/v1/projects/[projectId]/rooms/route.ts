import { db } from "@/db/client";
import { projectFor } from "@/db/queries/projects";
import { createRoom, listRooms } from "@/db/queries/rooms";
import { apiRoute, readJson } from "@/lib/api/route";
import { roomInputSchema } from "@/lib/schemas/room";

type P = { projectId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { rooms: await listRooms(db, actor, params.projectId) } }));

export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  await projectFor(db, actor, params.projectId, "room.create");
  const input = await readJson(request, roomInputSchema);
  return { body: { room: await createRoom(db, actor, params.projectId, input) }, status: 201 };
});
