import type { RoomFileKind, StoredContentType } from "@/db/schema";
import { AppError } from "@/lib/api/errors";
import { ACCEPTED_TYPES, EXTENSION_OF, KIND_LABEL, MAX_UPLOAD_BYTES, TYPE_LABEL, formatBytes, notAcceptedMessage, tooLargeMessage } from "./limits";
import { extensionsOf, PROGRAM_EXTENSIONS, sniff } from "./sniff";

export interface CheckedUpload {
  contentType: StoredContentType;
  /** The name to keep: trimmed, without path or control characters, at most 255 characters. */
  name: string;
  extension: string;
}

/** Keeps the last path segment, drops control characters and quotes, caps the length. */
export function cleanFileName(raw: string): string {
  const base = raw.split(/[\\/]/).pop() ?? "";
  // eslint-disable-next-line no-control-regex
  const clean = base.replace(/[\u0000-\u001f\u007f"<>]/g, "").trim();
  return clean.slice(-255);
}

/**
 * Refuses what must not be stored, with a message a person can act on: empty or too large files,
 * programs (also disguised under an image or PDF name), and anything that is not an accepted type
 * for the kind. The type comes from the bytes (`file-type`, see sniff.ts), never from the name or
 * the browser. Throws AppError `payload_too_large` (413) or `unsupported_media_type` (415).
 *
 * @example await checkUpload({ name: "rear wall.jpg", kind: "photo", bytes }) // { contentType: "image/jpeg", … }
 */
export async function checkUpload({ name, kind, bytes }: { name: string; kind: RoomFileKind; bytes: Uint8Array }): Promise<CheckedUpload> {
  const clean = cleanFileName(name);
  if (!clean) throw new AppError("bad_request", "The file needs a name.", { file: ["The file has no name"] });
  if (bytes.byteLength === 0) throw new AppError("bad_request", `“${clean}” is empty.`, { file: ["The file is empty"] });
  if (bytes.byteLength > MAX_UPLOAD_BYTES) {
    throw new AppError("payload_too_large", tooLargeMessage(clean, bytes.byteLength), {
      file: [`Larger than ${formatBytes(MAX_UPLOAD_BYTES)}`],
    });
  }
  const { type, program } = await sniff(bytes);
  if (program) {
    throw new AppError("unsupported_media_type", `“${clean}” is ${program}, not a picture or a PDF, whatever its name says. It was not stored.`, {
      file: [`This is ${program}; programs are never accepted`],
    });
  }
  const runnable = extensionsOf(clean).find((e) => PROGRAM_EXTENSIONS.has(e));
  if (runnable) {
    throw new AppError("unsupported_media_type", `“${clean}” has a name ending that opens as a program (.${runnable}). Rename it or export it as a PDF or image.`, {
      file: [`.${runnable} files are not accepted`],
    });
  }
  const accepted = ACCEPTED_TYPES[kind];
  const list = accepted.map((t) => TYPE_LABEL[t]).join(", ");
  if (!type) throw new AppError("unsupported_media_type", notAcceptedMessage(clean, kind), { file: ["Not an accepted file type"] });
  if (!accepted.includes(type)) {
    throw new AppError("unsupported_media_type", `A ${KIND_LABEL[kind].toLowerCase()} must be a ${list}; “${clean}” is a ${TYPE_LABEL[type]}.`, {
      file: [`A ${TYPE_LABEL[type]} is not accepted as a ${KIND_LABEL[kind].toLowerCase()}`],
    });
  }
  return { contentType: type, name: clean, extension: EXTENSION_OF[type] };
}
