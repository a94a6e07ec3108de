import { db } from "@/db/client";
import { AppError } from "@/lib/api/errors";
import { apiRoute } from "@/lib/api/route";
import { objectStorage, roomFileUploadFieldsSchema } from "@/lib/storage";
import { readUploadForm } from "@/lib/storage/read-upload";
import { roomFiles, uploadRoomFile } from "@/lib/storage/room-files";

type P = { roomId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { files: await roomFiles(db, actor, params.roomId) } }));

/** multipart/form-data: `file` (the bytes, with its name), `kind` (photo | drawing | client-file), `caption`. */
export const POST = apiRoute<P>(async ({ request, actor, params }) => {
  const form = await readUploadForm(request);
  const file = form.get("file");
  if (!(file instanceof File)) throw new AppError("bad_request", "Attach the file as the `file` part.", { file: ["Required"] });
  const fields = roomFileUploadFieldsSchema.parse({ kind: form.get("kind") ?? undefined, caption: form.get("caption") ?? undefined });
  const bytes = new Uint8Array(await file.arrayBuffer());
  const stored = await uploadRoomFile(db, objectStorage(), actor, params.roomId, { name: file.name, kind: fields.kind, caption: fields.caption, bytes });
  return { body: { file: stored }, status: 201 };
});
