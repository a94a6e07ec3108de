// Room files against the real test database and the local S3 stand-in (s3rver) started here, reached
// through @aws-sdk/client-s3 as in production (no orchestrator needed): accepted types, refusals with
// clear messages, nothing orphaned in storage, role rules.
import { createHash } from "node:crypto";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as filesRoute from "@/app/api/v1/rooms/[roomId]/files/route";
import * as fileRoute from "@/app/api/v1/rooms/[roomId]/files/[fileId]/route";
import * as contentRoute from "@/app/api/v1/rooms/[roomId]/files/[fileId]/content/route";
import * as roomRoute from "@/app/api/v1/rooms/[roomId]/route";
import { reportPhotos } from "@/db/queries/files";
import type { Actor } from "@/lib/auth/actor";
import { createS3Storage, type ObjectStorage, roomPrefix } from "@/lib/storage";
import { loadReportPhotos, sweepStorageDeletions, uploadRoomFile } from "@/lib/storage/room-files";
import { startFakeS3, type FakeS3Handle } from "@/scripts/services/fake-s3";
import { actAs, userIdOf, type DemoWho } from "../support/act-as";
import { resetTables, testDb } from "./support/db";

const MiB = 1024 * 1024;
let s3: FakeS3Handle;
let dir: string;
let storage: ObjectStorage;
let room: string; // Hollis media room (client, builder assigned)
let valeRoom: string;

beforeAll(async () => {
  await resetTables();
  dir = await mkdtemp(path.join(tmpdir(), "eigenroom-s3-"));
  s3 = await startFakeS3({ port: 0, dir, bucket: "eigenroom-it", log: () => {} });
  Object.assign(process.env, { S3_ENDPOINT: s3.endpoint, S3_BUCKET: "eigenroom-it", S3_ACCESS_KEY_ID: s3.accessKeyId, S3_SECRET_ACCESS_KEY: s3.secretAccessKey, S3_REGION: "us-east-1" });
  storage = createS3Storage({ endpoint: s3.endpoint, bucket: "eigenroom-it", region: "us-east-1", accessKeyId: s3.accessKeyId, secretAccessKey: s3.secretAccessKey });
  const db = testDb();
  const roomOf = async (project: string) =>
    (await db.selectFrom("rooms").innerJoin("projects", "projects.id", "rooms.project_id").select("rooms.id").where("projects.name", "=", project).executeTakeFirstOrThrow()).id;
  room = await roomOf("Hollis media room");
  valeRoom = await roomOf("Vale home studio");
});

afterAll(async () => {
  await s3?.stop();
  if (dir) await rm(dir, { recursive: true, force: true });
});

// Real images made here: a 640×480 gradient in each format.
async function image(format: "jpeg" | "png" | "webp", width = 640, height = 480): Promise<Uint8Array> {
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < width * height; i++) raw.set([(i % width) % 256, Math.floor(i / width) % 256, 128], i * 3);
  return new Uint8Array(await sharp(raw, { raw: { width, height, channels: 3 } })[format]().toBuffer());
}
const PDF = new TextEncoder().encode("%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n");
// The first bytes of a Windows executable (DOS header "MZ" … "PE\0\0"), padded.
const EXE = (() => {
  const b = new Uint8Array(4096);
  b.set([0x4d, 0x5a, 0x90, 0x00]);
  b.set([0x50, 0x45, 0x00, 0x00], 0x80);
  return b;
})();
const ELF = new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, ...new Array(120).fill(0)]);

async function upload(roomId: string, name: string, bytes: Uint8Array, kind: string) {
  const form = new FormData();
  form.set("kind", kind);
  form.set("file", new File([bytes as BlobPart], name));
  const res = await filesRoute.POST(new Request("http://eigenroom.test/api/v1/rooms/x/files", { method: "POST", body: form }), { params: Promise.resolve({ roomId }) });
  return { status: res.status, json: await res.json() };
}
const call = async (handler: (r: Request, c: { params: Promise<any> }) => Promise<Response>, params: object, init: RequestInit & { url?: string } = {}) => {
  const res = await handler(new Request(init.url ?? "http://eigenroom.test/api/v1/x", init), { params: Promise.resolve(params) });
  return res;
};
const objects = () => storage.list(roomPrefix(room));
const sha = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");
async function actor(who: Exclude<DemoWho, "anonymous">): Promise<Actor> {
  const u = await testDb().selectFrom("users").selectAll().where("id", "=", await userIdOf(who)).executeTakeFirstOrThrow();
  return { userId: u.id, firmId: u.firm_id, role: u.role, email: u.email, name: u.name, unitSystem: u.unit_system };
}

describe("POST /rooms/{roomId}/files: accepted types", () => {
  it("stores a JPEG photo with its sniffed type, size, hash and a WebP thumbnail of at most 480 px", async () => {
    await actAs("engineer");
    const bytes = await image("jpeg");
    const r = await upload(room, "rear wall.jpg", bytes, "photo");
    expect(r.status).toBe(201);
    expect(r.json.file).toMatchObject({ kind: "photo", name: "rear wall.jpg", contentType: "image/jpeg", sizeBytes: bytes.byteLength, sha256: sha(bytes), hasThumbnail: true, widthPx: 640, heightPx: 480 });
    expect(r.json.file).not.toHaveProperty("storageKey");
    const original = await call(contentRoute.GET, { roomId: room, fileId: r.json.file.id });
    expect(original.status).toBe(200);
    expect(original.headers.get("content-type")).toBe("image/jpeg");
    expect(original.headers.get("x-content-type-options")).toBe("nosniff");
    expect(sha(new Uint8Array(await original.arrayBuffer()))).toBe(sha(bytes));
    const thumb = await call(contentRoute.GET, { roomId: room, fileId: r.json.file.id }, { url: "http://eigenroom.test/x?variant=thumbnail" });
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    const meta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(meta.format).toBe("webp");
    expect(meta.width).toBe(480);
    expect(meta.height).toBe(360);
  });

  it("accepts a PNG drawing, a WebP photo and a PDF drawing (PDF without thumbnail)", async () => {
    await actAs("engineer");
    const png = await upload(room, "plan.png", await image("png"), "drawing");
    const webp = await upload(room, "corner.webp", await image("webp"), "photo");
    const pdf = await upload(room, "section A-A.pdf", PDF, "drawing");
    expect([png.status, webp.status, pdf.status]).toEqual([201, 201, 201]);
    expect(png.json.file.contentType).toBe("image/png");
    expect(webp.json.file.contentType).toBe("image/webp");
    expect(pdf.json.file).toMatchObject({ contentType: "application/pdf", hasThumbnail: false, widthPx: null });
    const list = await call(filesRoute.GET, { roomId: room });
    expect((await list.json()).files.map((f: { name: string }) => f.name)).toEqual(expect.arrayContaining(["plan.png", "corner.webp", "section A-A.pdf", "rear wall.jpg"]));
  });

  it("names the type by its bytes, not its name: PNG bytes called .jpg are stored as PNG", async () => {
    await actAs("engineer");
    const r = await upload(room, "mislabelled.jpg", await image("png"), "photo");
    expect(r.status).toBe(201);
    expect(r.json.file.contentType).toBe("image/png");
  });

  it("GET /files/{id} gives a presigned link that downloads the same bytes from storage without our session", async () => {
    await actAs("engineer");
    const bytes = await image("jpeg", 320, 200);
    const up = await upload(room, "link.jpg", bytes, "photo");
    const res = await call(fileRoute.GET, { roomId: room, fileId: up.json.file.id });
    const body = await res.json();
    expect(body.downloadUrl).toMatch(new RegExp(`^${s3.endpoint}/eigenroom-it/rooms/${room}/`));
    const got = await fetch(body.downloadUrl);
    expect(got.status).toBe(200);
    expect(got.headers.get("content-disposition")).toContain("attachment");
    expect(sha(new Uint8Array(await got.arrayBuffer()))).toBe(sha(bytes));
  });
});

describe("object storage through the S3 SDK against s3rver", () => {
  it("an object of the largest allowed size (20 MB) round-trips byte for byte", async () => {
    const bytes = new Uint8Array(20 * MiB);
    for (let i = 0; i < bytes.length; i += 4096) bytes[i] = (i / 4096) % 251;
    await storage.put("probe/large.bin", bytes, "application/octet-stream");
    const back = await storage.get("probe/large.bin");
    expect(back?.sizeBytes).toBe(bytes.byteLength);
    expect(sha(back!.bytes)).toBe(sha(bytes));
    await storage.delete("probe/large.bin");
    expect(await storage.get("probe/large.bin")).toBeUndefined();
  });

  it("s3rver checks who asks and until when: an unknown access key is refused, and so is an expired presigned link", async () => {
    // (s3rver checks the access key id and the expiry; it does not recompute SigV4 signatures.)
    const stranger = createS3Storage({ endpoint: s3.endpoint, bucket: "eigenroom-it", region: "us-east-1", accessKeyId: "someone-else", secretAccessKey: s3.secretAccessKey });
    await expect(stranger.put("probe/x.bin", new Uint8Array([1, 2, 3]), "application/octet-stream")).rejects.toMatchObject({ name: "InvalidAccessKeyId" });
    expect(await storage.get("probe/x.bin")).toBeUndefined();
    await storage.put("probe/short.bin", new Uint8Array([1, 2, 3]), "application/octet-stream");
    const url = await storage.presignGet("probe/short.bin", { expiresInS: 1 });
    expect((await fetch(url)).status).toBe(200);
    await new Promise((resolve) => setTimeout(resolve, 2100));
    const late = await fetch(url);
    expect(late.status).toBe(403);
    expect(await late.text()).toContain("Request has expired");
    await storage.delete("probe/short.bin");
  });
});

describe("POST /rooms/{roomId}/files: refusals", () => {
  it("refuses a Windows program renamed .jpg (415), saying what it is, and stores nothing", async () => {
    await actAs("engineer");
    const before = await objects();
    const r = await upload(room, "site-photo.jpg", EXE, "photo");
    expect(r.status).toBe(415);
    expect(r.json.error.code).toBe("unsupported_media_type");
    expect(r.json.error.message).toContain("“site-photo.jpg” is a Windows program");
    expect(r.json.error.fields.file[0]).toMatch(/programs are never accepted/);
    expect(await objects()).toEqual(before);
    expect(await testDb().selectFrom("room_files").select("id").where("original_name", "=", "site-photo.jpg").execute()).toEqual([]);
  });

  it("refuses a Linux program called .pdf, a double extension ending in .exe, and plain text", async () => {
    await actAs("engineer");
    const elf = await upload(room, "drawing.pdf", ELF, "drawing");
    expect(elf.status).toBe(415);
    expect(elf.json.error.message).toContain("a Linux program");
    const twice = await upload(room, "plan.pdf.exe", PDF, "drawing");
    expect(twice.status).toBe(415);
    expect(twice.json.error.message).toContain("(.exe)");
    const text = await upload(room, "notes.txt", new TextEncoder().encode("just some notes"), "client-file");
    expect(text.status).toBe(415);
    expect(text.json.error.message).toBe("“notes.txt” is not a PDF document, JPEG image, PNG image or WebP image. Export it in one of those formats and try again.");
  });

  it("refuses a PDF as a photo, and bytes that only start like a JPEG", async () => {
    await actAs("engineer");
    const pdfPhoto = await upload(room, "scan.pdf", PDF, "photo");
    expect(pdfPhoto.status).toBe(415);
    expect(pdfPhoto.json.error.message).toBe("A photo must be a JPEG image, PNG image, WebP image; “scan.pdf” is a PDF document.");
    const fake = new Uint8Array(2048);
    fake.set([0xff, 0xd8, 0xff, 0xe0]);
    const broken = await upload(room, "broken.jpg", fake, "photo");
    expect(broken.status).toBe(415);
    expect(broken.json.error.message).toContain("cannot be read as one");
  });

  it("refuses a file one byte over 20 MB (413) and a body far over the limit before reading it whole", async () => {
    await actAs("engineer");
    const before = await objects();
    const over = new Uint8Array(20 * MiB + 1);
    over.set([0xff, 0xd8, 0xff, 0xe0]);
    const r = await upload(room, "huge.jpg", over, "photo");
    expect(r.status).toBe(413);
    expect(r.json.error.message).toBe("“huge.jpg” is 20.0 MB; files may be at most 20 MB.");
    const far = await upload(room, "huger.jpg", new Uint8Array(21 * MiB), "photo");
    expect(far.status).toBe(413);
    expect(far.json.error.message).toContain("at most 20 MB");
    expect(await objects()).toEqual(before);
  });

  it("refuses an empty file and a JSON body", async () => {
    await actAs("engineer");
    expect((await upload(room, "empty.jpg", new Uint8Array(0), "photo")).status).toBe(400);
    const json = await call(filesRoute.POST, { roomId: room }, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(json.status).toBe(415);
  });
});

describe("uploadRoomFile: nothing orphaned", () => {
  it("deletes the objects it wrote when the row cannot be written (the room deleted during the upload)", async () => {
    const db = testDb();
    const spare = (await db.insertInto("rooms").values({ project_id: (await db.selectFrom("rooms").select("project_id").where("id", "=", room).executeTakeFirstOrThrow()).project_id, name: "Doomed", length_m: 3, width_m: 3, height_m: 2.4 }).returning("id").executeTakeFirstOrThrow()).id;
    const written: string[] = [];
    // Real storage; the room disappears between writing the bytes and writing the row.
    const racing: ObjectStorage = {
      ...storage,
      async put(key, bytes, type) {
        await storage.put(key, bytes, type);
        written.push(key);
        await db.deleteFrom("rooms").where("id", "=", spare).execute();
      },
    };
    await expect(uploadRoomFile(db, racing, await actor("engineer"), spare, { name: "late.jpg", kind: "photo", bytes: await image("jpeg") })).rejects.toMatchObject({
      code: "not_found",
      message: "The room was deleted while the file was uploading.",
    });
    expect(written.length).toBe(2); // the original and its thumbnail were really written …
    expect(await storage.list(roomPrefix(spare))).toEqual([]); // … and are gone again
    for (const key of written) expect(await storage.get(key)).toBeUndefined();
    expect(await db.selectFrom("room_files").select("id").where("room_id", "=", spare).execute()).toEqual([]);
  });

  it("DELETE removes the row and both objects; deleting a room queues and then removes its files' objects", async () => {
    await actAs("engineer");
    const up = await upload(room, "to-delete.jpg", await image("jpeg"), "photo");
    const prefix = `${roomPrefix(room)}${up.json.file.id}/`;
    expect((await storage.list(prefix)).length).toBe(2);
    expect((await call(fileRoute.DELETE, { roomId: room, fileId: up.json.file.id }, { method: "DELETE" })).status).toBe(204);
    expect(await storage.list(prefix)).toEqual([]);
    expect(await testDb().selectFrom("storage_deletions").selectAll().execute()).toEqual([]);

    const db = testDb();
    const project = (await db.selectFrom("rooms").select("project_id").where("id", "=", room).executeTakeFirstOrThrow()).project_id;
    const other = (await db.insertInto("rooms").values({ project_id: project, name: "Short-lived", length_m: 3, width_m: 3, height_m: 2.4 }).returning("id").executeTakeFirstOrThrow()).id;
    await upload(other, "a.jpg", await image("jpeg"), "photo");
    await upload(other, "b.pdf", PDF, "drawing");
    expect((await storage.list(roomPrefix(other))).length).toBe(3);
    expect((await call(roomRoute.DELETE, { roomId: other }, { method: "DELETE" })).status).toBe(204);
    expect((await db.selectFrom("storage_deletions").select("storage_key").execute()).length).toBe(3);
    expect(await sweepStorageDeletions(db, storage)).toBe(3);
    expect(await storage.list(roomPrefix(other))).toEqual([]);
    expect(await db.selectFrom("storage_deletions").selectAll().execute()).toEqual([]);
  });
});

describe("room files: role rules", () => {
  it("builders add photos but not drawings; clients add their own files but not photos", async () => {
    await actAs("builder");
    const photo = await upload(room, "framing.jpg", await image("jpeg"), "photo");
    expect(photo.status).toBe(201);
    const drawing = await upload(room, "my plan.pdf", PDF, "drawing");
    expect(drawing.status).toBe(403);
    expect(drawing.json.error.message).toBe("Builders add site photos here; drawings come from the engineer and the client's files from the client.");
    await actAs("client");
    expect((await upload(room, "our floor plan.pdf", PDF, "client-file")).status).toBe(201);
    const clientPhoto = await upload(room, "phone.jpg", await image("jpeg"), "photo");
    expect(clientPhoto.status).toBe(403);
  });

  it("a client of another project, and an anonymous caller, get 404 and 401", async () => {
    await actAs("client2");
    expect((await call(filesRoute.GET, { roomId: room })).status).toBe(404);
    expect((await upload(room, "x.pdf", PDF, "client-file")).status).toBe(404);
    expect((await call(filesRoute.GET, { roomId: valeRoom })).status).toBe(200);
    await actAs("anonymous");
    expect((await call(filesRoute.GET, { roomId: room })).status).toBe(401);
  });

  it("builders and clients delete only their own files; only staff choose report photos", async () => {
    const db = testDb();
    const byName = async (name: string) => (await db.selectFrom("room_files").select("id").where("original_name", "=", name).executeTakeFirstOrThrow()).id;
    await actAs("builder");
    expect((await call(fileRoute.DELETE, { roomId: room, fileId: await byName("rear wall.jpg") }, { method: "DELETE" })).status).toBe(403);
    await actAs("client");
    const patch = (fileId: string, body: unknown) => call(fileRoute.PATCH, { roomId: room, fileId }, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    expect((await patch(await byName("rear wall.jpg"), { includeInReport: true })).status).toBe(403);
    expect((await call(fileRoute.DELETE, { roomId: room, fileId: await byName("our floor plan.pdf") }, { method: "DELETE" })).status).toBe(204);
    await actAs("builder");
    expect((await call(fileRoute.DELETE, { roomId: room, fileId: await byName("framing.jpg") }, { method: "DELETE" })).status).toBe(204);

    await actAs("engineer");
    const chosen = await patch(await byName("rear wall.jpg"), { includeInReport: true, caption: "Rear wall before treatment" });
    expect(chosen.status).toBe(200);
    expect((await chosen.json()).file).toMatchObject({ includeInReport: true, caption: "Rear wall before treatment" });
    expect((await patch(await byName("section A-A.pdf"), { includeInReport: true })).status).toBe(400);
    expect((await patch(await byName("rear wall.jpg"), {})).status).toBe(400);
  });

  it("reportPhotos lists the chosen photos; loadReportPhotos gives JPEG bytes for the PDF", async () => {
    await actAs("engineer");
    const webpId = (await testDb().selectFrom("room_files").select("id").where("original_name", "=", "corner.webp").executeTakeFirstOrThrow()).id;
    await call(fileRoute.PATCH, { roomId: room, fileId: webpId }, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ includeInReport: true }) });
    const photos = await reportPhotos(testDb(), room);
    expect(photos.map((p) => [p.name, p.caption])).toEqual([
      ["rear wall.jpg", "Rear wall before treatment"],
      ["corner.webp", ""],
    ]);
    const images = await loadReportPhotos(testDb(), storage, room);
    expect(images).toHaveLength(2);
    for (const i of images) {
      expect([...i.jpeg.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
      expect([i.widthPx, i.heightPx]).toEqual([640, 480]);
    }
    expect(await reportPhotos(testDb(), valeRoom)).toEqual([]);
  });
});
