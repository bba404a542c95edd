// Server side (Node only): the local S3-compatible fake (s3rver) that development, the demo
// and the tests use instead of a real bucket. server.ts starts it when S3_ENDPOINT is not
// set; route handlers only ever speak S3 to it through object-store.ts.
import "server-only";
import { mkdirSync, mkdtempSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import S3rver from "s3rver";
import { publishLocalObjectStore, type ObjectStoreConfig } from "./object-store";

const BUCKET = "vierbein-attachments";

export interface LocalObjectStore {
  readonly config: ObjectStoreConfig;
  close(): Promise<void>;
}

/** Where the fake keeps its files: DATA_DIR/objects, or a temporary folder for an in-memory database. */
function storageDirectory(dataDir: string): string {
  if (dataDir.startsWith("memory://")) return mkdtempSync(path.join(os.tmpdir(), "vierbein-objects-"));
  const directory = path.resolve(dataDir, "objects");
  mkdirSync(directory, { recursive: true });
  return directory;
}

/**
 * Starts s3rver on a free loopback port and publishes its address for this process.
 *
 * @example
 * const store = await startLocalObjectStore({ dataDir: ".data" }); // … later: await store.close()
 */
export async function startLocalObjectStore({ dataDir = process.env.DATA_DIR || "./.data" }: { dataDir?: string } = {}): Promise<LocalObjectStore> {
  const server = new S3rver({
    address: "127.0.0.1",
    port: 0,
    silent: true,
    directory: storageDirectory(dataDir),
    configureBuckets: [{ name: BUCKET, configs: [] }],
  });
  const address = await server.run();
  // s3rver's fixed development credentials; the fake listens on loopback only.
  const config: ObjectStoreConfig = {
    endpoint: `http://127.0.0.1:${address.port}`,
    bucket: BUCKET,
    region: "us-east-1",
    accessKeyId: "S3RVER",
    secretAccessKey: "S3RVER",
  };
  publishLocalObjectStore(config);
  return {
    config,
    async close() {
      publishLocalObjectStore(null);
      await server.close();
    },
  };
}
