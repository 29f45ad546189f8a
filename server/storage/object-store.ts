import {
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadBucketCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import type { Readable } from "node:stream";
import type { Env } from "../env";

/**
 * Logger files, parsed series and attachments live in an S3-compatible bucket; the database
 * keeps only their keys and SHA-256 checksums. Locally the bucket is the s3rver fake.
 */
export interface ObjectStore {
  readonly bucket: string;
  /** Streams a body up; contentLength is required for a stream (S3 wants it up front). */
  put(key: string, body: Buffer | Readable, meta: { contentLength: number; contentType: string; sha256: string }): Promise<void>;
  getStream(key: string): Promise<Readable>;
  getBuffer(key: string): Promise<Buffer>;
  /** Deletes the keys; missing keys are not an error (S3 semantics). */
  delete(keys: string[]): Promise<void>;
  list(prefix?: string): Promise<string[]>;
  /** Fails fast at start when the bucket is unreachable or missing. */
  check(): Promise<void>;
  close(): void;
}

export function createObjectStore(env: Env): ObjectStore {
  const client = new S3Client({
    region: env.S3_REGION,
    ...(env.S3_ENDPOINT ? { endpoint: env.S3_ENDPOINT } : {}),
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    // The SDK's default CRC32 trailers use aws-chunked uploads, which not every S3-compatible
    // service (s3rver among them) reads. We keep our own SHA-256 beside each object instead.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  const bucket = env.S3_BUCKET;

  return {
    bucket,
    async put(key, body, meta) {
      await client.send(
        new PutObjectCommand({
          Bucket: bucket,
          Key: key,
          Body: body,
          ContentLength: meta.contentLength,
          ContentType: meta.contentType,
          Metadata: { sha256: meta.sha256 },
        }),
      );
    },
    async getStream(key) {
      const out = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
      return out.Body as Readable;
    },
    async getBuffer(key) {
      const stream = await this.getStream(key);
      const chunks: Buffer[] = [];
      for await (const chunk of stream) chunks.push(chunk as Buffer);
      return Buffer.concat(chunks);
    },
    async delete(keys) {
      for (let i = 0; i < keys.length; i += 1000) {
        const batch = keys.slice(i, i + 1000);
        if (batch.length === 0) continue;
        await client.send(new DeleteObjectsCommand({ Bucket: bucket, Delete: { Objects: batch.map((Key) => ({ Key })), Quiet: true } }));
      }
    },
    async list(prefix) {
      const keys: string[] = [];
      let token: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket: bucket, Prefix: prefix, ContinuationToken: token }));
        for (const o of page.Contents ?? []) if (o.Key) keys.push(o.Key);
        token = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (token);
      return keys;
    },
    async check() {
      try {
        await client.send(new HeadBucketCommand({ Bucket: bucket }));
      } catch (error) {
        throw new Error(`Object storage is not reachable: bucket "${bucket}" at ${env.S3_ENDPOINT || "the SDK's default endpoint"} (${(error as Error).name}). Check S3_ENDPOINT, S3_BUCKET and the credentials.`, { cause: error });
      }
    },
    close() {
      client.destroy();
    },
  };
}
