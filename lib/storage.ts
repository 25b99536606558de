import "server-only";
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";

// File bytes live in S3; the bucket, endpoint and keys come from the environment, so the local fake
// and a real bucket are the same code.

function setting(name: string): string {
  const value = process.env[name];
  if (!value)
    throw new Error(
      `${name} is not set: file storage needs S3_BUCKET, S3_REGION, S3_ACCESS_KEY_ID and S3_SECRET_ACCESS_KEY (and S3_ENDPOINT for a non-AWS store).`,
    );
  return value;
}

const globalForS3 = globalThis as unknown as { spanwrightS3?: S3Client };

function client(): S3Client {
  return (globalForS3.spanwrightS3 ??= new S3Client({
    region: setting("S3_REGION"),
    endpoint: process.env.S3_ENDPOINT || undefined,
    forcePathStyle: process.env.S3_FORCE_PATH_STYLE === "true",
    credentials: { accessKeyId: setting("S3_ACCESS_KEY_ID"), secretAccessKey: setting("S3_SECRET_ACCESS_KEY") },
  }));
}

export async function putObject(key: string, body: Uint8Array, contentType: string, sha256Hex: string): Promise<void> {
  await client().send(
    new PutObjectCommand({
      Bucket: setting("S3_BUCKET"),
      Key: key,
      Body: body,
      ContentType: contentType,
      ContentLength: body.byteLength,
      Metadata: { sha256: sha256Hex },
    }),
  );
}

/** The object's bytes as a web stream, for answering a download without holding it in memory; null when the bucket has no such object. */
export async function getObjectStream(key: string): Promise<ReadableStream | null> {
  try {
    const answer = await client().send(new GetObjectCommand({ Bucket: setting("S3_BUCKET"), Key: key }));
    return answer.Body?.transformToWebStream() ?? null;
  } catch (error) {
    if (error instanceof NoSuchKey) return null;
    throw error;
  }
}

/** Removes an object; removing one the bucket does not have is not an error (S3 answers the same). */
export async function deleteObject(key: string): Promise<void> {
  await client().send(new DeleteObjectCommand({ Bucket: setting("S3_BUCKET"), Key: key }));
}
