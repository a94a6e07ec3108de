// A small S3-compatible server for development and tests: path-style buckets on loopback, objects on
// disk under a folder (.data/s3 for npm start; a temporary folder in tests). It speaks the part of the
// S3 REST API the app uses — bucket create/head, object put/get/head/delete, ListObjectsV2, presigned
// GET/PUT, CORS for the browser — and checks the access key id and the expiry of presigned URLs.
// Request signatures themselves are not recomputed: this is a stand-in, not a security boundary.
import { createHash } from "node:crypto";
import { existsSync } from "node:fs";
import { mkdir, readdir, readFile, rm, writeFile } from "node:fs/promises";
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";

export interface FakeS3Options {
  /** 0 = any free port. */
  port: number;
  host?: "127.0.0.1" | "::1";
  /** Folder that holds the buckets. */
  dir: string;
  /** Created at start when missing. */
  bucket: string;
  accessKeyId: string;
  log?: (line: string) => void;
  /** Largest object accepted (default 64 MiB). */
  maxObjectBytes?: number;
}

export interface FakeS3Handle {
  port: number;
  /** http://127.0.0.1:<port> — the S3_ENDPOINT to give the app. */
  endpoint: string;
  stop(): Promise<void>;
}

interface Meta {
  key: string;
  contentType: string;
  size: number;
  etag: string;
  lastModified: string;
}

const BUCKET_NAME = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

function xmlEscape(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&apos;");
}

function sendError(res: ServerResponse, status: number, code: string, message: string, head = false): void {
  res.writeHead(status, { "content-type": "application/xml", "x-amz-error-code": code });
  res.end(head ? undefined : `<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>${code}</Code><Message>${xmlEscape(message)}</Message></Error>`);
}

async function readBody(req: IncomingMessage, max: number): Promise<Buffer | "too-large"> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > max) return "too-large";
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

/** Decodes the SDK's aws-chunked framing: `<hex size>[;chunk-signature=…]\r\n<data>\r\n` … `0\r\n` trailers. */
export function decodeAwsChunked(body: Buffer): Buffer {
  const out: Buffer[] = [];
  let at = 0;
  for (;;) {
    const eol = body.indexOf("\r\n", at);
    if (eol < 0) throw new Error("aws-chunked: missing chunk header");
    const size = Number.parseInt(body.subarray(at, eol).toString("latin1").split(";")[0]!, 16);
    if (!Number.isFinite(size)) throw new Error("aws-chunked: bad chunk size");
    if (size === 0) break;
    out.push(body.subarray(eol + 2, eol + 2 + size));
    at = eol + 2 + size + 2;
  }
  return Buffer.concat(out);
}

function accessKeyOf(req: IncomingMessage, url: URL): string | undefined {
  const auth = req.headers.authorization;
  const credential = auth ? /Credential=([^/,\s]+)/.exec(auth)?.[1] : url.searchParams.get("X-Amz-Credential")?.split("/")[0];
  return credential ?? undefined;
}

function presignExpired(url: URL): boolean {
  const date = url.searchParams.get("X-Amz-Date");
  const expires = Number(url.searchParams.get("X-Amz-Expires"));
  if (!date || !Number.isFinite(expires)) return false;
  const m = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z$/.exec(date);
  if (!m) return true;
  const signedAt = Date.UTC(+m[1]!, +m[2]! - 1, +m[3]!, +m[4]!, +m[5]!, +m[6]!);
  return Date.now() > signedAt + expires * 1000;
}

/** Starts the fake S3 server and creates its bucket; resolves once it listens. */
export async function startFakeS3(opts: FakeS3Options): Promise<FakeS3Handle> {
  const host = opts.host ?? "127.0.0.1";
  if (host !== "127.0.0.1" && host !== "::1") throw new RangeError(`host must be a loopback address, got ${String(host)}`);
  if (!BUCKET_NAME.test(opts.bucket)) throw new RangeError(`bucket must be a valid S3 bucket name, got ${opts.bucket}`);
  const log = opts.log ?? ((line: string) => console.log(`s3: ${line}`));
  const max = opts.maxObjectBytes ?? 64 * 1024 * 1024;
  const root = path.resolve(opts.dir);
  const bucketDir = (b: string) => path.join(root, b);
  const fileOf = (b: string, key: string) => path.join(bucketDir(b), "objects", createHash("sha256").update(key).digest("hex"));
  const metaOf = (b: string, key: string) => `${fileOf(b, key)}.json`;
  await mkdir(path.join(bucketDir(opts.bucket), "objects"), { recursive: true });

  async function listKeys(b: string, prefix: string): Promise<Meta[]> {
    const dir = path.join(bucketDir(b), "objects");
    const names = (await readdir(dir)).filter((n) => n.endsWith(".json"));
    const metas = await Promise.all(names.map(async (n) => JSON.parse(await readFile(path.join(dir, n), "utf8")) as Meta));
    return metas.filter((m) => m.key.startsWith(prefix)).sort((a, b2) => (a.key < b2.key ? -1 : a.key > b2.key ? 1 : 0));
  }

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", `http://${req.headers.host ?? "localhost"}`);
    const method = req.method ?? "GET";
    res.setHeader("access-control-allow-origin", "*");
    res.setHeader("access-control-expose-headers", "ETag");
    if (method === "OPTIONS") {
      res.writeHead(204, { "access-control-allow-methods": "GET, PUT, HEAD", "access-control-allow-headers": req.headers["access-control-request-headers"] ?? "*", "access-control-max-age": "600" });
      res.end();
      return;
    }
    const head = method === "HEAD";
    const key0 = accessKeyOf(req, url);
    if (key0 !== opts.accessKeyId) return sendError(res, 403, "InvalidAccessKeyId", "The access key id is not known to this server.", head);
    if (presignExpired(url)) return sendError(res, 403, "AccessDenied", "Request has expired", head);

    const [, bucket = "", ...rest] = url.pathname.split("/");
    const key = rest.map((s) => decodeURIComponent(s)).join("/");
    if (!bucket) return sendError(res, 400, "InvalidRequest", "Path-style requests only: /<bucket>/<key>", head);
    const exists = existsSync(path.join(bucketDir(bucket), "objects"));

    if (!key) {
      if (method === "PUT") {
        if (!BUCKET_NAME.test(bucket)) return sendError(res, 400, "InvalidBucketName", "The bucket name is not valid.");
        await mkdir(path.join(bucketDir(bucket), "objects"), { recursive: true });
        res.writeHead(200, { location: `/${bucket}` });
        res.end();
        return;
      }
      if (!exists) return sendError(res, 404, "NoSuchBucket", "The specified bucket does not exist", head);
      if (head) {
        res.writeHead(200);
        res.end();
        return;
      }
      if (method === "GET") {
        const prefix = url.searchParams.get("prefix") ?? "";
        const maxKeys = Math.min(1000, Number(url.searchParams.get("max-keys") ?? 1000) || 1000);
        const after = url.searchParams.get("continuation-token") ?? url.searchParams.get("start-after") ?? "";
        const all = (await listKeys(bucket, prefix)).filter((m) => m.key > after);
        const page = all.slice(0, maxKeys);
        const truncated = all.length > page.length;
        const contents = page
          .map((m) => `<Contents><Key>${xmlEscape(m.key)}</Key><LastModified>${m.lastModified}</LastModified><ETag>&quot;${m.etag}&quot;</ETag><Size>${m.size}</Size><StorageClass>STANDARD</StorageClass></Contents>`)
          .join("");
        res.writeHead(200, { "content-type": "application/xml" });
        res.end(
          `<?xml version="1.0" encoding="UTF-8"?>\n<ListBucketResult xmlns="http://s3.amazonaws.com/doc/2006-03-01/"><Name>${xmlEscape(bucket)}</Name><Prefix>${xmlEscape(prefix)}</Prefix><KeyCount>${page.length}</KeyCount><MaxKeys>${maxKeys}</MaxKeys><IsTruncated>${truncated}</IsTruncated>${
            truncated ? `<NextContinuationToken>${xmlEscape(page[page.length - 1]!.key)}</NextContinuationToken>` : ""
          }${contents}</ListBucketResult>`,
        );
        return;
      }
      return sendError(res, 405, "MethodNotAllowed", `${method} on a bucket is not supported here`);
    }

    if (!exists) return sendError(res, 404, "NoSuchBucket", "The specified bucket does not exist", head);
    if (method === "PUT") {
      const raw = await readBody(req, max + 64 * 1024);
      if (raw === "too-large") return sendError(res, 400, "EntityTooLarge", `Objects may be at most ${max} bytes here.`);
      const chunked = String(req.headers["content-encoding"] ?? "").includes("aws-chunked") || String(req.headers["x-amz-content-sha256"] ?? "").startsWith("STREAMING-");
      const body = chunked ? decodeAwsChunked(raw) : raw;
      const declared = req.headers["x-amz-decoded-content-length"];
      if (declared !== undefined && Number(declared) !== body.length) return sendError(res, 400, "IncompleteBody", "The body is shorter or longer than declared.");
      const etag = createHash("md5").update(body).digest("hex");
      const meta: Meta = { key, contentType: String(req.headers["content-type"] ?? "application/octet-stream"), size: body.length, etag, lastModified: new Date().toISOString() };
      await writeFile(fileOf(bucket, key), body);
      await writeFile(metaOf(bucket, key), JSON.stringify(meta));
      res.writeHead(200, { etag: `"${etag}"` });
      res.end();
      return;
    }
    if (method === "GET" || head) {
      let meta: Meta;
      try {
        meta = JSON.parse(await readFile(metaOf(bucket, key), "utf8")) as Meta;
      } catch {
        return sendError(res, 404, "NoSuchKey", "The specified key does not exist.", head);
      }
      const headers: Record<string, string> = {
        "content-type": url.searchParams.get("response-content-type") ?? meta.contentType,
        "content-length": String(meta.size),
        etag: `"${meta.etag}"`,
        "last-modified": new Date(meta.lastModified).toUTCString(),
        "accept-ranges": "none",
      };
      const disposition = url.searchParams.get("response-content-disposition");
      if (disposition) headers["content-disposition"] = disposition;
      res.writeHead(200, headers);
      if (head) {
        res.end();
        return;
      }
      res.end(await readFile(fileOf(bucket, key)));
      return;
    }
    if (method === "DELETE") {
      await rm(fileOf(bucket, key), { force: true });
      await rm(metaOf(bucket, key), { force: true });
      res.writeHead(204);
      res.end();
      return;
    }
    return sendError(res, 405, "MethodNotAllowed", `${method} is not supported here`);
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((err: unknown) => {
      log(`error: ${err instanceof Error ? err.message : String(err)}`);
      if (!res.headersSent) sendError(res, 500, "InternalError", "The fake S3 server failed; see its log.");
      else res.destroy();
    });
  });
  await new Promise<void>((resolve, reject) => {
    const onError = (err: Error) => reject(new Error(`fake S3 server could not listen on ${host}:${opts.port}: ${err.message}`));
    server.once("error", onError);
    server.listen(opts.port, host, () => {
      server.off("error", onError);
      resolve();
    });
  });
  const port = (server.address() as AddressInfo).port;
  const endpoint = `http://${host === "::1" ? "[::1]" : host}:${port}`;
  log(`listening on ${endpoint}, bucket ${opts.bucket} in ${path.relative(process.cwd(), root) || root}`);
  return {
    port,
    endpoint,
    stop: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
