import { db } from "@/db/client";
import { publicFile } from "@/db/queries/files";
import { apiRoute, readJson } from "@/lib/api/route";
import { objectStorage, roomFileUpdateSchema } from "@/lib/storage";
import { curateRoomFile, deleteRoomFile, roomFile } from "@/lib/storage/room-files";

type P = { roomId: string; fileId: string };

/** The file's metadata and a download link valid for five minutes (straight from storage). */
export const GET = apiRoute<P>(async ({ actor, params }) => {
  const { file, canDelete } = await roomFile(db, actor, params.roomId, params.fileId);
  const downloadUrl = await objectStorage().presignGet(file.storageKey, { expiresInS: 300, downloadName: file.name });
  return { body: { file: publicFile(file), canDelete, downloadUrl, downloadExpiresInS: 300 } };
});

export const PATCH = apiRoute<P>(async ({ request, actor, params }) => {
  const change = await readJson(request, roomFileUpdateSchema);
  return { body: { file: await curateRoomFile(db, actor, params.roomId, params.fileId, change) } };
});

export const DELETE = apiRoute<P>(async ({ actor, params }) => {
  await deleteRoomFile(db, objectStorage(), actor, params.roomId, params.fileId);
  return new Response(null, { status: 204 });
});
