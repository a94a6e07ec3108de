import type { StoredContentType } from "@/db/schema";
import { AppError } from "@/lib/api/errors";

export interface Thumbnail {
  bytes: Uint8Array;
  widthPx: number;
  heightPx: number;
}

/** Longest side of a thumbnail, in pixels (sharp in the grid at twice its CSS size). */
export const THUMBNAIL_PX = 480;
/** Larger images are refused as likely decompression bombs (a 20 MiB file of 100 Mpx is not a photo). */
export const MAX_IMAGE_PIXELS = 100_000_000;

/**
 * A WebP thumbnail of an image (EXIF orientation applied) and the image's own size. Decoding the
 * whole image also proves that it is one: a file that only starts like a JPEG is refused (415).
 * PDFs get no thumbnail (undefined).
 */
export async function makeThumbnail(bytes: Uint8Array, contentType: StoredContentType, name: string): Promise<{ thumbnail: Thumbnail; imageWidthPx: number; imageHeightPx: number } | undefined> {
  if (contentType === "application/pdf") return undefined;
  const { default: sharp } = await import("sharp");
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_IMAGE_PIXELS, failOn: "error" });
    const meta = await image.metadata();
    const rotated = (meta.orientation ?? 1) >= 5;
    const imageWidthPx = (rotated ? meta.height : meta.width) ?? 0;
    const imageHeightPx = (rotated ? meta.width : meta.height) ?? 0;
    const { data, info } = await image
      .rotate()
      .resize({ width: THUMBNAIL_PX, height: THUMBNAIL_PX, fit: "inside", withoutEnlargement: true })
      .webp({ quality: 78 })
      .toBuffer({ resolveWithObject: true });
    return { thumbnail: { bytes: new Uint8Array(data), widthPx: info.width, heightPx: info.height }, imageWidthPx, imageHeightPx };
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    const tooBig = /pixel limit/i.test(reason);
    throw new AppError(
      "unsupported_media_type",
      tooBig ? `“${name}” has more than ${MAX_IMAGE_PIXELS / 1e6} million pixels; save a smaller copy and try again.` : `“${name}” starts like an image but cannot be read as one. It may be damaged; export it again.`,
      { file: [tooBig ? "Too many pixels" : "Not a readable image"] },
    );
  }
}
