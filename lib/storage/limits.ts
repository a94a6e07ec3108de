// Pure: shared by the server's checks and the browser's drop zone (no Node or SDK imports here).
import type { RoomFileKind, StoredContentType } from "@/db/schema";

/** Largest accepted file: 20 MB (20 × 1024² bytes). */
export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

/** Content types by kind of room file (the bytes decide the type, never the name or the browser). */
export const ACCEPTED_TYPES: Record<RoomFileKind, readonly StoredContentType[]> = {
  photo: ["image/jpeg", "image/png", "image/webp"],
  drawing: ["application/pdf", "image/jpeg", "image/png", "image/webp"],
  "client-file": ["application/pdf", "image/jpeg", "image/png", "image/webp"],
};

export const TYPE_LABEL: Record<StoredContentType, string> = {
  "image/jpeg": "JPEG image",
  "image/png": "PNG image",
  "image/webp": "WebP image",
  "application/pdf": "PDF document",
};

export const EXTENSION_OF: Record<StoredContentType, string> = {
  "image/jpeg": "jpg",
  "image/png": "png",
  "image/webp": "webp",
  "application/pdf": "pdf",
};

export const KIND_LABEL: Record<RoomFileKind, string> = {
  photo: "Photo",
  drawing: "Drawing",
  "client-file": "Client's file",
};

/**
 * What the file picker and the drop zone offer for a kind (by the browser's type or the name's
 * ending). Only a first sieve for a quick answer: the server decides by the bytes.
 */
export const PICKER_ACCEPT: Record<StoredContentType, string[]> = {
  "image/jpeg": [".jpg", ".jpeg"],
  "image/png": [".png"],
  "image/webp": [".webp"],
  "application/pdf": [".pdf"],
};

/** “huge.jpg” is 20.0 MB; files may be at most 20 MB. (The same words in the browser and from the server.) */
export function tooLargeMessage(name: string, bytes: number): string {
  return `“${name}” is ${formatBytes(bytes)}; files may be at most ${formatBytes(MAX_UPLOAD_BYTES)}.`;
}

/** “notes.txt” is not a PDF document, JPEG image, PNG image or WebP image. Export it … (for a client's file). */
export function notAcceptedMessage(name: string, kind: RoomFileKind): string {
  const list = ACCEPTED_TYPES[kind].map((t) => TYPE_LABEL[t]).join(", ");
  return `“${name}” is not a ${list.replace(/, ([^,]*)$/, " or $1")}. Export it in one of those formats and try again.`;
}

export const ROOM_FILE_KINDS: readonly RoomFileKind[] = ["photo", "drawing", "client-file"];

/** "4.2 MB" — in units of 1024, as the limit is set (20 MB = 20 × 1024² bytes). */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) throw new RangeError(`bytes must be a non-negative number, got ${bytes}`);
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} kB`;
  const mb = bytes / (1024 * 1024);
  return `${Number.isInteger(mb) ? mb : mb.toFixed(1)} MB`;
}
