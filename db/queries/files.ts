import { type Kysely, sql, type Transaction } from "kysely";
import type { Database, RoomFileKind, StoredContentType } from "../schema";

type Db = Kysely<Database> | Transaction<Database>;

/** A file attached to a room, as the app and the API show it (storage keys stay on the server). */
export interface RoomFile {
  id: string;
  roomId: string;
  kind: RoomFileKind;
  name: string;
  contentType: StoredContentType;
  sizeBytes: number;
  sha256: string;
  hasThumbnail: boolean;
  widthPx: number | null;
  heightPx: number | null;
  includeInReport: boolean;
  caption: string;
  uploadedBy: string | null;
  uploaderName: string;
  createdAt: Date;
}

/** The row with where its bytes live (server side only). */
export interface StoredRoomFile extends RoomFile {
  storageKey: string;
  thumbnailKey: string | null;
}

type Row = Awaited<ReturnType<ReturnType<typeof selectFiles>["executeTakeFirstOrThrow"]>>;

function selectFiles(db: Db) {
  return db.selectFrom("room_files").selectAll();
}

function toStored(r: Row): StoredRoomFile {
  return {
    id: r.id,
    roomId: r.room_id,
    kind: r.kind,
    name: r.original_name,
    contentType: r.content_type,
    sizeBytes: r.size_bytes,
    sha256: r.sha256,
    hasThumbnail: r.thumbnail_key !== null,
    widthPx: r.width_px,
    heightPx: r.height_px,
    includeInReport: r.include_in_report,
    caption: r.caption,
    uploadedBy: r.uploaded_by,
    uploaderName: r.uploader_name,
    createdAt: r.created_at,
    storageKey: r.storage_key,
    thumbnailKey: r.thumbnail_key,
  };
}

/** Drops the storage keys. */
export function publicFile(f: StoredRoomFile): RoomFile {
  const { storageKey: _s, thumbnailKey: _t, ...rest } = f;
  return rest;
}

export interface NewRoomFile {
  id: string;
  roomId: string;
  uploadedBy: string;
  uploaderName: string;
  kind: RoomFileKind;
  name: string;
  contentType: StoredContentType;
  sizeBytes: number;
  sha256: string;
  storageKey: string;
  thumbnailKey: string | null;
  widthPx: number | null;
  heightPx: number | null;
  caption: string;
}

export async function insertRoomFile(db: Db, f: NewRoomFile): Promise<StoredRoomFile> {
  const row = await db
    .insertInto("room_files")
    .values({
      id: f.id,
      room_id: f.roomId,
      uploaded_by: f.uploadedBy,
      uploader_name: f.uploaderName,
      kind: f.kind,
      original_name: f.name,
      content_type: f.contentType,
      size_bytes: f.sizeBytes,
      sha256: f.sha256,
      storage_key: f.storageKey,
      thumbnail_key: f.thumbnailKey,
      width_px: f.widthPx,
      height_px: f.heightPx,
      caption: f.caption,
    })
    .returningAll()
    .executeTakeFirstOrThrow();
  return toStored(row);
}

/** A room's files, newest first. */
export async function listRoomFiles(db: Db, roomId: string): Promise<StoredRoomFile[]> {
  const rows = await selectFiles(db).where("room_id", "=", roomId).orderBy("created_at", "desc").orderBy("id").execute();
  return rows.map(toStored);
}

/** One file of the room, or undefined (also when it belongs to another room). */
export async function findRoomFile(db: Db, roomId: string, fileId: string): Promise<StoredRoomFile | undefined> {
  const row = await selectFiles(db).where("room_id", "=", roomId).where("id", "=", fileId).executeTakeFirst();
  return row ? toStored(row) : undefined;
}

export async function updateRoomFile(db: Db, roomId: string, fileId: string, change: { includeInReport?: boolean; caption?: string }): Promise<StoredRoomFile | undefined> {
  const row = await db
    .updateTable("room_files")
    .set({
      ...(change.includeInReport !== undefined && { include_in_report: change.includeInReport }),
      ...(change.caption !== undefined && { caption: change.caption }),
    })
    .where("room_id", "=", roomId)
    .where("id", "=", fileId)
    .returningAll()
    .executeTakeFirst();
  return row ? toStored(row) : undefined;
}

/** Deletes the row; the table's trigger queues its objects in storage_deletions. */
export async function deleteRoomFileRow(db: Db, roomId: string, fileId: string): Promise<StoredRoomFile | undefined> {
  const row = await db.deleteFrom("room_files").where("room_id", "=", roomId).where("id", "=", fileId).returningAll().executeTakeFirst();
  return row ? toStored(row) : undefined;
}

/** A photo chosen for the room's report (metadata; lib/storage `loadReportPhotos` adds the bytes). */
export interface ReportPhoto {
  id: string;
  name: string;
  caption: string;
  contentType: StoredContentType;
  storageKey: string;
  widthPx: number | null;
  heightPx: number | null;
  createdAt: Date;
}

/**
 * The photos chosen for the room's report (include_in_report), oldest first — the order they were
 * taken in on site. Empty when none are chosen.
 */
export async function reportPhotos(db: Db, roomId: string): Promise<ReportPhoto[]> {
  const rows = await selectFiles(db).where("room_id", "=", roomId).where("include_in_report", "=", true).where("kind", "=", "photo").orderBy("created_at").orderBy("id").execute();
  return rows.map((r) => ({ id: r.id, name: r.original_name, caption: r.caption, contentType: r.content_type, storageKey: r.storage_key, widthPx: r.width_px, heightPx: r.height_px, createdAt: r.created_at }));
}

/** Object keys waiting to be deleted from storage, oldest first. */
export async function pendingStorageDeletions(db: Db, limit: number, keys?: readonly string[]): Promise<string[]> {
  let q = db.selectFrom("storage_deletions").select("storage_key").orderBy("queued_at").limit(limit);
  if (keys) {
    if (keys.length === 0) return [];
    q = q.where("storage_key", "in", keys);
  }
  return (await q.execute()).map((r) => r.storage_key);
}

export async function forgetStorageDeletion(db: Db, key: string): Promise<void> {
  await db.deleteFrom("storage_deletions").where("storage_key", "=", key).execute();
}

export async function noteStorageDeletionFailed(db: Db, key: string): Promise<void> {
  await db.updateTable("storage_deletions").set({ attempts: sql`attempts + 1` }).where("storage_key", "=", key).execute();
}
