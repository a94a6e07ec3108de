import { db } from "@/db/client";
import { apiRoute } from "@/lib/api/route";
import { objectStorage } from "@/lib/storage";
import { roomFileContent } from "@/lib/storage/room-files";

type P = { roomId: string; fileId: string };

/** The bytes (`?variant=thumbnail` for the WebP thumbnail; `?download=1` to save rather than show). */
export const GET = apiRoute<P>(async ({ request, actor, params }) => {
  const url = new URL(request.url);
  const variant = url.searchParams.get("variant") === "thumbnail" ? "thumbnail" : "original";
  const { file, object } = await roomFileContent(db, objectStorage(), actor, params.roomId, params.fileId, variant);
  const name = variant === "thumbnail" ? `${file.name.replace(/\.[^.]*$/, "")}-thumbnail.webp` : file.name;
  const disposition = url.searchParams.get("download") === "1" ? "attachment" : "inline";
  return new Response(Buffer.from(object.bytes), {
    status: 200,
    headers: {
      "content-type": variant === "thumbnail" ? "image/webp" : file.contentType,
      "content-length": String(object.sizeBytes),
      "content-disposition": `${disposition}; filename*=UTF-8''${encodeURIComponent(name)}`,
      "x-content-type-options": "nosniff",
      // Images opened on their own can run nothing; PDFs keep the browser's viewer working.
      ...(file.contentType !== "application/pdf" || variant === "thumbnail" ? { "content-security-policy": "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; sandbox" } : {}),
      "cache-control": "private, max-age=300",
    },
  });
});
