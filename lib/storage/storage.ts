import { storageEnv } from "@/lib/env";
import type { ObjectStorage } from "./object-storage";
import { createS3Storage } from "./s3-storage";

let instance: ObjectStorage | undefined;

/** The app's object storage, configured from S3_* once (see lib/env.ts). */
export function objectStorage(): ObjectStorage {
  if (instance) return instance;
  const env = storageEnv();
  instance = createS3Storage({
    bucket: env.S3_BUCKET,
    region: env.S3_REGION,
    accessKeyId: env.S3_ACCESS_KEY_ID,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY,
    endpoint: env.S3_ENDPOINT,
    forcePathStyle: env.S3_FORCE_PATH_STYLE ? env.S3_FORCE_PATH_STYLE === "true" : Boolean(env.S3_ENDPOINT),
  });
  return instance;
}
