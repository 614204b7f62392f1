import type { Env } from "../../env.ts";
import { createLocalStorage } from "./local-storage.ts";
import { createS3Storage } from "./s3-storage.ts";
import type { Storage } from "./storage.ts";

export type { Storage, StoredObject } from "./storage.ts";
export { readAll } from "./storage.ts";
export { createLocalStorage } from "./local-storage.ts";
export { createS3Storage } from "./s3-storage.ts";

/** The storage driver the configuration names (STORAGE_DRIVER). */
export function createStorage(env: Env): Storage {
  if (env.STORAGE_DRIVER === "s3") {
    if (!env.S3_BUCKET) throw new Error("STORAGE_DRIVER=s3 needs S3_BUCKET.");
    return createS3Storage({
      bucket: env.S3_BUCKET, region: env.S3_REGION, endpoint: env.S3_ENDPOINT,
      accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY,
    });
  }
  return createLocalStorage(env.STORAGE_DIR);
}
