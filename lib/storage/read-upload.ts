import "server-only";
import { AppError } from "@/lib/api/errors";
import { formatBytes, MAX_UPLOAD_BYTES } from "./limits";

/** Room for the multipart framing and text fields around a file of the largest size. */
const MULTIPART_OVERHEAD = 64 * 1024;

/**
 * Reads a multipart/form-data upload with a hard size limit (the body stops being read past it) and
 * refuses a body shorter than its Content-Length (cut off on the way). Returns the parsed form.
 */
export async function readUploadForm(request: Request): Promise<FormData> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    throw new AppError("unsupported_media_type", "Send the file as multipart/form-data with a `file` part and a `kind` field.");
  }
  const limit = MAX_UPLOAD_BYTES + MULTIPART_OVERHEAD;
  const tooLarge = () => new AppError("payload_too_large", `The upload is larger than ${formatBytes(MAX_UPLOAD_BYTES)}; files may be at most ${formatBytes(MAX_UPLOAD_BYTES)}.`, { file: [`Larger than ${formatBytes(MAX_UPLOAD_BYTES)}`] });
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (declared > limit) throw tooLarge();
  if (!request.body) throw new AppError("bad_request", "The upload has no body.");
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  if (Number.isFinite(declared) && size !== declared) throw new AppError("bad_request", "The upload was cut off before it arrived whole. Try again.");
  const body = new Uint8Array(size);
  let at = 0;
  for (const c of chunks) {
    body.set(c, at);
    at += c.byteLength;
  }
  try {
    return await new Request("http://upload.invalid/", { method: "POST", headers: { "content-type": type }, body }).formData();
  } catch {
    throw new AppError("bad_request", "The upload is not valid multipart/form-data.");
  }
}
