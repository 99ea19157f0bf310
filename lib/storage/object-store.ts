import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { z } from "zod";
import { AppError } from "@/lib/errors";

/**
 * Object storage for uploaded files, through the S3 API. Free of "server-only"
 * so the demo seed (a plain Node script) can store its sample files; the app
 * imports it through lib/storage/s3.ts. In production the
 * endpoint is any S3-compatible service; locally and in tests it is our fake
 * server on loopback (scripts/fake-s3.ts), whose keys are its fixed defaults.
 */
const config = z
  .object({
    BARWRIGHT_S3_ENDPOINT: z.string().url().default("http://127.0.0.1:4568"),
    BARWRIGHT_S3_BUCKET: z.string().min(3).default("barwright"),
    BARWRIGHT_S3_REGION: z.string().min(1).default("us-east-1"),
    BARWRIGHT_S3_ACCESS_KEY_ID: z.string().min(1).default("S3RVER"),
    BARWRIGHT_S3_SECRET_ACCESS_KEY: z.string().min(1).default("S3RVER"),
  })
  .parse(process.env);

const client = new S3Client({
  endpoint: config.BARWRIGHT_S3_ENDPOINT,
  region: config.BARWRIGHT_S3_REGION,
  // Path-style addressing works with every S3-compatible server, ours included.
  forcePathStyle: true,
  credentials: { accessKeyId: config.BARWRIGHT_S3_ACCESS_KEY_ID, secretAccessKey: config.BARWRIGHT_S3_SECRET_ACCESS_KEY },
  maxAttempts: 2,
});

const unavailable = () => new AppError("unavailable", "File storage is not answering. Nothing was saved; try again shortly.");

async function send<T>(run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (err) {
    const e = err as { name?: string; code?: string; $metadata?: { httpStatusCode?: number } };
    if (e.name === "NoSuchKey" || e.$metadata?.httpStatusCode === 404) throw new AppError("not_found", "That file is no longer stored.");
    console.error("object storage failed:", err);
    throw unavailable();
  }
}

export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array; contentType: string }): Promise<void> {
  await send(() => client.send(new PutObjectCommand({ Bucket: config.BARWRIGHT_S3_BUCKET, Key: key, Body: body, ContentType: contentType })));
}

/** The object's bytes as a web stream, for a download response. */
export async function getObject({ key }: { key: string }): Promise<{ body: ReadableStream; length: number | undefined }> {
  const out = await send(() => client.send(new GetObjectCommand({ Bucket: config.BARWRIGHT_S3_BUCKET, Key: key })));
  if (!out.Body) throw new AppError("not_found", "That file is no longer stored.");
  return { body: out.Body.transformToWebStream(), length: out.ContentLength };
}

export async function deleteObject({ key }: { key: string }): Promise<void> {
  await send(() => client.send(new DeleteObjectCommand({ Bucket: config.BARWRIGHT_S3_BUCKET, Key: key })));
}
