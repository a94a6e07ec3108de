// The local S3-compatible server for development and tests: s3rver (a well-known S3 stand-in) on
// loopback, path-style buckets, objects on disk under a folder (.data/s3 for npm start, .data/s3-test
// for npm test, a temporary folder in the integration tests). It accepts only its own fixed
// development access key (which is what the app is given) and refuses expired presigned URLs; it does
// not recompute SigV4 signatures, so it is a stand-in, not a security boundary. s3rver corrupts
// uploads sent with the SDK's default streamed checksums, so the app's S3 client uses
// requestChecksumCalculation and responseChecksumValidation "WHEN_REQUIRED" and forcePathStyle
// (lib/storage/s3-storage.ts; see ../shared/STACK.md).
import { mkdir } from "node:fs/promises";
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import S3rver from "s3rver";

export interface FakeS3Options {
  /** 0 = any free port. */
  port: number;
  host?: "127.0.0.1" | "::1";
  /** Folder that holds the buckets. */
  dir: string;
  /** Created at start when missing. */
  bucket: string;
  log?: (line: string) => void;
}

export interface FakeS3Handle {
  port: number;
  /** http://127.0.0.1:<port> — the S3_ENDPOINT to give the app. */
  endpoint: string;
  /** The key pair the server accepts (s3rver's built-in development account): S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY. */
  accessKeyId: string;
  secretAccessKey: string;
  stop(): Promise<void>;
}

/** s3rver's built-in development account (the only key it accepts); nothing secret, it exists only on this loopback server. */
export const FAKE_S3_ACCESS_KEY_ID = "S3RVER";
export const FAKE_S3_SECRET_ACCESS_KEY = "S3RVER";

const BUCKET_NAME = /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/;

/** Lets a browser page PUT to a presigned URL and read the ETag (as a hosted bucket is configured). */
const CORS = `<CORSConfiguration><CORSRule><AllowedOrigin>*</AllowedOrigin><AllowedMethod>GET</AllowedMethod><AllowedMethod>PUT</AllowedMethod><AllowedMethod>HEAD</AllowedMethod><AllowedHeader>*</AllowedHeader><ExposeHeader>ETag</ExposeHeader><MaxAgeSeconds>600</MaxAgeSeconds></CORSRule></CORSConfiguration>`;

/** Starts s3rver and creates its bucket; resolves once it listens. */
export async function startFakeS3(opts: FakeS3Options): Promise<FakeS3Handle> {
  const host = opts.host ?? "127.0.0.1";
  if (host !== "127.0.0.1" && host !== "::1") throw new RangeError(`host must be a loopback address, got ${String(host)}`);
  if (!BUCKET_NAME.test(opts.bucket)) throw new RangeError(`bucket must be a valid S3 bucket name, got ${opts.bucket}`);
  const log = opts.log ?? ((line: string) => console.log(`s3: ${line}`));
  const root = path.resolve(opts.dir);
  await mkdir(root, { recursive: true });
  const s3rver = new S3rver({
    directory: root,
    silent: true,
    vhostBuckets: false,
    allowMismatchedSignatures: false,
    resetOnClose: false,
    configureBuckets: [{ name: opts.bucket, configs: [CORS] }],
  });
  await s3rver.configureBuckets();
  // Our own listener around s3rver's request handler, so that stop() can end the SDK's keep-alive sockets.
  const server = createServer(s3rver.callback());
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
  log(`s3rver listening on ${endpoint}, bucket ${opts.bucket} in ${path.relative(process.cwd(), root) || root}`);
  return {
    port,
    endpoint,
    accessKeyId: FAKE_S3_ACCESS_KEY_ID,
    secretAccessKey: FAKE_S3_SECRET_ACCESS_KEY,
    stop: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
