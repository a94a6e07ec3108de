/** An object as the app sees it (domain type; the S3 SDK's output shapes stay in s3-storage.ts). */
export interface StoredObject {
  bytes: Uint8Array;
  contentType: string;
  sizeBytes: number;
}

/** What the app needs from object storage; s3-storage.ts implements it over the S3 API. */
export interface ObjectStorage {
  readonly bucket: string;
  /** Writes (or replaces) the object. */
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  /** The object, or undefined when there is none under the key. */
  get(key: string): Promise<StoredObject | undefined>;
  /** Deletes the object; deleting a missing key is not an error. */
  delete(key: string): Promise<void>;
  /** Keys under a prefix, sorted. */
  list(prefix: string): Promise<string[]>;
  /** A time-limited URL that downloads the object without our session (default 300 s). */
  presignGet(key: string, opts?: { expiresInS?: number; downloadName?: string }): Promise<string>;
  /** A time-limited URL that accepts one PUT of the object with this content type (default 300 s). */
  presignPut(key: string, opts: { contentType: string; expiresInS?: number }): Promise<string>;
  /** Creates the bucket when it is missing (development and tests). */
  ensureBucket(): Promise<void>;
}
