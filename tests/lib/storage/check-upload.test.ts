import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { AppError } from "@/lib/api/errors";
import { checkUpload, cleanFileName } from "@/lib/storage/check-upload";
import { MAX_UPLOAD_BYTES, notAcceptedMessage, tooLargeMessage } from "@/lib/storage/limits";

// The refusals a person sees (common practice: say what the file is, what is allowed, what to do).
const jpeg = async () => new Uint8Array(await sharp({ create: { width: 16, height: 12, channels: 3, background: "#8a7" } }).jpeg().toBuffer());
const PDF = new TextEncoder().encode("%PDF-1.4\n%%EOF\n");
const refusal = async (p: Promise<unknown>) => {
  const error = await p.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
};

describe("checkUpload: accepted", () => {
  it("takes the type from the bytes: a JPEG photo, a PDF drawing, PNG bytes named .jpg stored as PNG", async () => {
    expect(await checkUpload({ name: "rear wall.jpg", kind: "photo", bytes: await jpeg() })).toEqual({ contentType: "image/jpeg", name: "rear wall.jpg", extension: "jpg" });
    expect(await checkUpload({ name: "section.pdf", kind: "drawing", bytes: PDF })).toEqual({ contentType: "application/pdf", name: "section.pdf", extension: "pdf" });
    const png = new Uint8Array(await sharp({ create: { width: 4, height: 4, channels: 3, background: "#000" } }).png().toBuffer());
    expect((await checkUpload({ name: "mislabelled.jpg", kind: "photo", bytes: png })).contentType).toBe("image/png");
  });

  it("accepts a file of exactly 20 MB (the limit is inclusive)", async () => {
    const bytes = new Uint8Array(MAX_UPLOAD_BYTES);
    bytes.set(PDF);
    expect((await checkUpload({ name: "big.pdf", kind: "drawing", bytes })).contentType).toBe("application/pdf");
  });
});

describe("checkUpload: refused with a clear message", () => {
  it("a Windows program renamed .jpg (415) says what it is", async () => {
    const exe = new Uint8Array(4096);
    exe.set([0x4d, 0x5a, 0x90, 0x00]);
    const e = await refusal(checkUpload({ name: "site-photo.jpg", kind: "photo", bytes: exe }));
    expect(e.code).toBe("unsupported_media_type");
    expect(e.message).toBe("“site-photo.jpg” is a Windows program, not a picture or a PDF, whatever its name says. It was not stored.");
    expect(e.fields?.file?.[0]).toBe("This is a Windows program; programs are never accepted");
  });

  it("a file one byte over 20 MB (413), with the same words the drop zone uses", async () => {
    const e = await refusal(checkUpload({ name: "huge.jpg", kind: "photo", bytes: new Uint8Array(MAX_UPLOAD_BYTES + 1) }));
    expect(e.code).toBe("payload_too_large");
    expect(e.message).toBe("“huge.jpg” is 20.0 MB; files may be at most 20 MB.");
    expect(e.message).toBe(tooLargeMessage("huge.jpg", MAX_UPLOAD_BYTES + 1));
  });

  it("a program name ending, plain text, a PDF as a photo, an empty file", async () => {
    expect((await refusal(checkUpload({ name: "plan.pdf.exe", kind: "drawing", bytes: PDF }))).message).toContain("(.exe)");
    const text = await refusal(checkUpload({ name: "notes.txt", kind: "client-file", bytes: new TextEncoder().encode("just some notes") }));
    expect(text.message).toBe("“notes.txt” is not a PDF document, JPEG image, PNG image or WebP image. Export it in one of those formats and try again.");
    expect(text.message).toBe(notAcceptedMessage("notes.txt", "client-file"));
    expect((await refusal(checkUpload({ name: "scan.pdf", kind: "photo", bytes: PDF }))).message).toBe("A photo must be a JPEG image, PNG image, WebP image; “scan.pdf” is a PDF document.");
    expect((await refusal(checkUpload({ name: "empty.jpg", kind: "photo", bytes: new Uint8Array(0) }))).code).toBe("bad_request");
  });
});

describe("cleanFileName", () => {
  it("keeps the last path segment without control characters or quotes", () => {
    expect(cleanFileName('C:\\photos\\"rear"\u0007 wall.jpg')).toBe("rear wall.jpg");
  });
});
