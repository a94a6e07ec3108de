import "server-only";
import { createHash, randomUUID } from "node:crypto";
import type { Kysely } from "kysely";
import {
  deleteRoomFileRow,
  findRoomFile,
  forgetStorageDeletion,
  insertRoomFile,
  listRoomFiles,
  noteStorageDeletionFailed,
  pendingStorageDeletions,
  publicFile,
  reportPhotos,
  type RoomFile,
  type StoredRoomFile,
  updateRoomFile,
} from "@/db/queries/files";
import { roomFor } from "@/db/queries/rooms";
import type { Database, RoomFileKind } from "@/db/schema";
import { AppError, forbidden, notFound } from "@/lib/api/errors";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject, UPLOAD_KINDS } from "@/lib/auth/permissions";
import { checkUpload } from "./check-upload";
import { roomFileKey, roomThumbnailKey } from "./keys";
import type { ObjectStorage } from "./object-storage";
import { makeThumbnail } from "./thumbnail";

const KIND_REFUSAL: Record<Actor["role"], string> = {
  owner: "That kind of file cannot be added.",
  engineer: "That kind of file cannot be added.",
  builder: "Builders add site photos here; drawings come from the engineer and the client's files from the client.",
  client: "Add your files as “Your file”; photos and drawings are added by the firm.",
};

/** Deletes queued objects (from deleted files, rooms or projects); failures stay queued for the next call. */
export async function sweepStorageDeletions(db: Kysely<Database>, storage: ObjectStorage, opts: { limit?: number; keys?: readonly string[] } = {}): Promise<number> {
  const keys = await pendingStorageDeletions(db, opts.limit ?? 25, opts.keys);
  let deleted = 0;
  for (const key of keys) {
    try {
      await storage.delete(key);
      await forgetStorageDeletion(db, key);
      deleted += 1;
    } catch (error) {
      console.error(`[storage] could not delete ${key}; it stays queued`, error);
      await noteStorageDeletionFailed(db, key);
    }
  }
  return deleted;
}

export interface UploadInput {
  name: string;
  kind: RoomFileKind;
  bytes: Uint8Array;
  caption?: string;
}

/**
 * Stores a file for a room: permission (404 unseen room, 403 role or kind not allowed) → content
 * checks (413/415 with a message naming the file) → thumbnail → objects written → row inserted. If the
 * row cannot be written, the objects just written are deleted again, so storage never keeps bytes
 * without a row.
 */
export async function uploadRoomFile(db: Kysely<Database>, storage: ObjectStorage, actor: Actor, roomId: string, input: UploadInput): Promise<RoomFile> {
  const { room } = await roomFor(db, actor, roomId, "file.upload");
  if (!UPLOAD_KINDS[actor.role].includes(input.kind)) throw forbidden(KIND_REFUSAL[actor.role]);
  const checked = await checkUpload({ name: input.name, kind: input.kind, bytes: input.bytes });
  const image = await makeThumbnail(input.bytes, checked.contentType, checked.name);
  void sweepStorageDeletions(db, storage, { limit: 10 }).catch((error: unknown) => console.error("[storage] sweep failed", error));

  const id = randomUUID();
  const storageKey = roomFileKey(room.id, id, checked.extension);
  const thumbnailKey = image ? roomThumbnailKey(room.id, id) : null;
  const written: string[] = [];
  try {
    await storage.put(storageKey, input.bytes, checked.contentType);
    written.push(storageKey);
    if (image && thumbnailKey) {
      await storage.put(thumbnailKey, image.thumbnail.bytes, "image/webp");
      written.push(thumbnailKey);
    }
    const row = await db.transaction().execute((trx) =>
      insertRoomFile(trx, {
        id,
        roomId: room.id,
        uploadedBy: actor.userId,
        uploaderName: actor.name,
        kind: input.kind,
        name: checked.name,
        contentType: checked.contentType,
        sizeBytes: input.bytes.byteLength,
        sha256: createHash("sha256").update(input.bytes).digest("hex"),
        storageKey,
        thumbnailKey,
        widthPx: image?.imageWidthPx ?? null,
        heightPx: image?.imageHeightPx ?? null,
        caption: (input.caption ?? "").trim().slice(0, 500),
      }),
    );
    return publicFile(row);
  } catch (error) {
    // Nothing orphaned: the bytes go again when their row could not be written.
    for (const key of written) {
      await storage.delete(key).catch((e: unknown) => console.error(`[storage] could not remove ${key} after a failed upload`, e));
    }
    if ((error as { code?: string }).code === "23503") throw new AppError("not_found", "The room was deleted while the file was uploading.");
    throw error;
  }
}

/** The room's files (404 when the room is not visible). */
export async function roomFiles(db: Kysely<Database>, actor: Actor, roomId: string): Promise<RoomFile[]> {
  const { room } = await roomFor(db, actor, roomId, "file.read");
  return (await listRoomFiles(db, room.id)).map(publicFile);
}

async function fileFor(db: Kysely<Database>, actor: Actor, roomId: string, fileId: string, action: "file.read" | "file.curate"): Promise<{ file: StoredRoomFile; canDelete: boolean }> {
  const { room, project } = await roomFor(db, actor, roomId, "file.read");
  const file = /^[0-9a-f-]{36}$/i.test(fileId) ? await findRoomFile(db, room.id, fileId) : undefined;
  if (!file) throw notFound("That file");
  if (!canOnProject(actor, action, project)) throw forbidden();
  const canDelete = canOnProject(actor, "file.delete", project) || (canOnProject(actor, "file.delete-own", project) && file.uploadedBy === actor.userId);
  return { file, canDelete };
}

/** One file's metadata (for reading, with whether the actor may delete it). */
export async function roomFile(db: Kysely<Database>, actor: Actor, roomId: string, fileId: string): Promise<{ file: StoredRoomFile; canDelete: boolean }> {
  return fileFor(db, actor, roomId, fileId, "file.read");
}

/** The bytes of a file or its thumbnail. */
export async function roomFileContent(db: Kysely<Database>, storage: ObjectStorage, actor: Actor, roomId: string, fileId: string, variant: "original" | "thumbnail") {
  const { file } = await fileFor(db, actor, roomId, fileId, "file.read");
  const key = variant === "thumbnail" ? file.thumbnailKey : file.storageKey;
  if (!key) throw notFound("A thumbnail of that file");
  const object = await storage.get(key);
  if (!object) throw notFound("The stored bytes of that file");
  return { file: publicFile(file), object };
}

/** Chooses a photo for the report or changes its caption (owners and engineers). */
export async function curateRoomFile(db: Kysely<Database>, actor: Actor, roomId: string, fileId: string, change: { includeInReport?: boolean; caption?: string }): Promise<RoomFile> {
  const { file } = await fileFor(db, actor, roomId, fileId, "file.curate");
  if (change.includeInReport && file.kind !== "photo") throw new AppError("bad_request", "Only photos go into the report.", { includeInReport: ["Only photos go into the report"] });
  const updated = await updateRoomFile(db, roomId, fileId, change);
  if (!updated) throw notFound("That file");
  return publicFile(updated);
}

/** Deletes a file: the row first (its objects are queued in the same statement), then the objects. */
export async function deleteRoomFile(db: Kysely<Database>, storage: ObjectStorage, actor: Actor, roomId: string, fileId: string): Promise<void> {
  const { file, canDelete } = await fileFor(db, actor, roomId, fileId, "file.read");
  if (!canDelete) throw forbidden("You may delete only the files you added.");
  const gone = await deleteRoomFileRow(db, roomId, fileId);
  if (!gone) throw notFound("That file");
  await sweepStorageDeletions(db, storage, { keys: [file.storageKey, ...(file.thumbnailKey ? [file.thumbnailKey] : [])] });
}

/** A chosen photo ready for a PDF: JPEG bytes (react-pdf reads JPEG and PNG, not WebP), at most 1600 px. */
export interface ReportPhotoImage {
  id: string;
  name: string;
  caption: string;
  jpeg: Uint8Array;
  widthPx: number;
  heightPx: number;
}

/**
 * The room's chosen photos with their bytes, for the report renderer. No permission check: the
 * caller renders a report it has already authorised. A photo whose bytes are missing is left out.
 */
export async function loadReportPhotos(db: Kysely<Database>, storage: ObjectStorage, roomId: string): Promise<ReportPhotoImage[]> {
  const { default: sharp } = await import("sharp");
  const out: ReportPhotoImage[] = [];
  for (const p of await reportPhotos(db, roomId)) {
    const object = await storage.get(p.storageKey);
    if (!object) {
      console.error(`[storage] report photo ${p.id} has no bytes under ${p.storageKey}`);
      continue;
    }
    const { data, info } = await sharp(object.bytes).rotate().resize({ width: 1600, height: 1600, fit: "inside", withoutEnlargement: true }).jpeg({ quality: 85 }).toBuffer({ resolveWithObject: true });
    out.push({ id: p.id, name: p.name, caption: p.caption, jpeg: new Uint8Array(data), widthPx: info.width, heightPx: info.height });
  }
  return out;
}
