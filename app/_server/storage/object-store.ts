import "server-only";
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { AppError } from "../errors";

/** Where attachments are kept: an S3-compatible bucket. */
export interface ObjectStoreConfig {
  readonly endpoint: string;
  readonly bucket: string;
  readonly region: string;
  readonly accessKeyId: string;
  readonly secretAccessKey: string;
}

const LOCAL_KEY = Symbol.for("vierbein.localObjectStore");

/** Set by local-s3.ts when the project's own S3 fake is running in this process. */
export function localObjectStoreConfig(): ObjectStoreConfig | null {
  return (globalThis as Record<symbol, ObjectStoreConfig | undefined>)[LOCAL_KEY] ?? null;
}

export function publishLocalObjectStore(config: ObjectStoreConfig | null): void {
  (globalThis as Record<symbol, ObjectStoreConfig | null>)[LOCAL_KEY] = config;
}

/** Production names its bucket with S3_*; otherwise the local fake started by server.ts (or a test). */
export function objectStoreConfig(env: Record<string, string | undefined> = process.env): ObjectStoreConfig | null {
  if (env.S3_ENDPOINT) {
    return {
      endpoint: env.S3_ENDPOINT,
      bucket: env.S3_BUCKET || "vierbein-attachments",
      region: env.S3_REGION || "us-east-1",
      accessKeyId: env.S3_ACCESS_KEY_ID || "",
      secretAccessKey: env.S3_SECRET_ACCESS_KEY || "",
    };
  }
  return localObjectStoreConfig();
}

const CLIENT_KEY = Symbol.for("vierbein.s3Client");

function client(config: ObjectStoreConfig): S3Client {
  const g = globalThis as Record<symbol, { endpoint: string; client: S3Client } | undefined>;
  const cached = g[CLIENT_KEY];
  if (cached && cached.endpoint === config.endpoint) return cached.client;
  const created = new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    // Path-style addressing works with every S3-compatible service, including the local fake.
    forcePathStyle: true,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
  });
  g[CLIENT_KEY] = { endpoint: config.endpoint, client: created };
  return created;
}

function configured(): ObjectStoreConfig {
  const config = objectStoreConfig();
  if (!config) throw new AppError("internal:storage", "File storage is not set up on this server (S3_ENDPOINT is missing).");
  return config;
}

export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array; contentType: string }): Promise<void> {
  const config = configured();
  await client(config).send(new PutObjectCommand({ Bucket: config.bucket, Key: key, Body: body, ContentType: contentType }));
}

export async function getObject({ key }: { key: string }): Promise<Uint8Array | null> {
  const config = configured();
  try {
    const answer = await client(config).send(new GetObjectCommand({ Bucket: config.bucket, Key: key }));
    return answer.Body ? await answer.Body.transformToByteArray() : new Uint8Array();
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchKey") return null;
    throw error;
  }
}

export async function hasObject({ key }: { key: string }): Promise<boolean> {
  const config = configured();
  try {
    await client(config).send(new HeadObjectCommand({ Bucket: config.bucket, Key: key }));
    return true;
  } catch (error) {
    const name = (error as { name?: string }).name;
    if (name === "NotFound" || name === "NoSuchKey") return false;
    throw error;
  }
}

export async function deleteObject({ key }: { key: string }): Promise<void> {
  const config = configured();
  await client(config).send(new DeleteObjectCommand({ Bucket: config.bucket, Key: key }));
}
