import "server-only";
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

// One client per process; the app stays stateless, every object lives in the bucket.
let client: S3Client | undefined;

function s3(): S3Client {
  const e = env();
  client ??= new S3Client({
    endpoint: e.S3_ENDPOINT || undefined,
    region: e.S3_REGION,
    forcePathStyle: e.S3_FORCE_PATH_STYLE === "1",
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    maxAttempts: 2,
  });
  return client;
}

/** Seconds a client waits before trying a photo again while storage is away. */
export const STORAGE_RETRY_AFTER_S = 30;

/**
 * Sends one command; a storage service that does not answer (refused, timed out, a 5xx) becomes a
 * 503 that says so, while the service's own refusals (a missing object) pass through unchanged.
 */
async function guarded<T>(call: (client: S3Client) => Promise<T>): Promise<T> {
  try {
    return await call(s3());
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === undefined || status >= 500) {
      console.error("photo storage unavailable", (error as Error).message);
      throw new AppError(
        "unavailable:photos",
        "Photo storage is not answering just now, so the photo was not saved or shown. Try again in a minute.",
        { headers: { "Retry-After": String(STORAGE_RETRY_AFTER_S) } },
      );
    }
    throw error;
  }
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await guarded((c) =>
    c.send(new PutObjectCommand({ Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType })),
  );
}

export async function getObject(key: string): Promise<Buffer> {
  const result = await guarded((c) => c.send(new GetObjectCommand({ Bucket: env().S3_BUCKET, Key: key })));
  if (!result.Body) throw new Error(`object ${key} has no body`);
  return Buffer.from(await result.Body.transformToByteArray());
}

export async function deleteObject(key: string): Promise<void> {
  await guarded((c) => c.send(new DeleteObjectCommand({ Bucket: env().S3_BUCKET, Key: key })));
}

/** Creates the bucket when it is missing (the local fake starts empty). */
export async function ensureBucket(): Promise<void> {
  const Bucket = env().S3_BUCKET;
  try {
    await guarded((c) => c.send(new HeadBucketCommand({ Bucket })));
  } catch (error) {
    if (error instanceof AppError) throw error;
    await guarded((c) => c.send(new CreateBucketCommand({ Bucket })));
  }
}
