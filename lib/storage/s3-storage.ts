import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  type GetObjectCommandOutput,
  HeadBucketCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import type { ObjectStorage, StoredObject } from "./object-storage";

export interface S3StorageConfig {
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
  /** An S3-compatible endpoint (the local fake, or another provider); undefined = the provider's own. */
  endpoint?: string;
  forcePathStyle?: boolean;
}

/** Raw SDK output → the app's object (the body is read whole: files are at most 20 MiB). */
export async function reshapeObject(out: GetObjectCommandOutput): Promise<StoredObject> {
  const bytes = out.Body ? await out.Body.transformToByteArray() : new Uint8Array();
  return { bytes, contentType: out.ContentType ?? "application/octet-stream", sizeBytes: bytes.byteLength };
}

const isMissing = (error: unknown) =>
  error instanceof S3ServiceException && (error.name === "NoSuchKey" || error.name === "NotFound" || error.$metadata?.httpStatusCode === 404);

/**
 * Object storage over the S3 API. Checksums are computed and validated only when an operation
 * requires them: S3-compatible servers differ in how they take the SDK's default checksum framing.
 */
export function createS3Storage(config: S3StorageConfig): ObjectStorage {
  const client = new S3Client({
    region: config.region,
    endpoint: config.endpoint,
    forcePathStyle: config.forcePathStyle ?? Boolean(config.endpoint),
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  const Bucket = config.bucket;
  return {
    bucket: Bucket,
    async put(key, bytes, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: bytes, ContentType: contentType, ContentLength: bytes.byteLength }));
    },
    async get(key) {
      try {
        return await reshapeObject(await client.send(new GetObjectCommand({ Bucket, Key: key })));
      } catch (error) {
        if (isMissing(error)) return undefined;
        throw error;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async list(prefix) {
      const keys: string[] = [];
      let token: string | undefined;
      do {
        const out = await client.send(new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken: token }));
        for (const o of out.Contents ?? []) if (o.Key) keys.push(o.Key);
        token = out.IsTruncated ? out.NextContinuationToken : undefined;
      } while (token);
      return keys.sort();
    },
    async presignGet(key, opts = {}) {
      const disposition = opts.downloadName ? `attachment; filename*=UTF-8''${encodeURIComponent(opts.downloadName)}` : undefined;
      return getSignedUrl(client, new GetObjectCommand({ Bucket, Key: key, ResponseContentDisposition: disposition }), { expiresIn: opts.expiresInS ?? 300 });
    },
    async presignPut(key, opts) {
      return getSignedUrl(client, new PutObjectCommand({ Bucket, Key: key, ContentType: opts.contentType }), { expiresIn: opts.expiresInS ?? 300 });
    },
    async ensureBucket() {
      try {
        await client.send(new HeadBucketCommand({ Bucket }));
      } catch (error) {
        if (!isMissing(error)) throw error;
        await client.send(new CreateBucketCommand({ Bucket }));
      }
    },
  };
}
