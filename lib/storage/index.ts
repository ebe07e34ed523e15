import "server-only";
import { resolve } from "node:path";
import { getEnv } from "@/lib/env";
import { diskStorage } from "./disk";
import { s3Storage } from "./s3";
import type { BlobStorage } from "./types";

export { derivedKey, originalKey, type BlobStorage } from "./types";

let storage: BlobStorage | null = null;

/** The configured storage: STORAGE_DRIVER=disk (UPLOAD_DIR, the default) or s3 (S3_*). */
export function getStorage(): BlobStorage {
  if (storage) return storage;
  const env = getEnv();
  storage =
    env.STORAGE_DRIVER === "s3"
      ? s3Storage({
          endpoint: env.S3_ENDPOINT,
          region: env.S3_REGION,
          bucket: env.S3_BUCKET!,
          accessKeyId: env.S3_ACCESS_KEY_ID!,
          secretAccessKey: env.S3_SECRET_ACCESS_KEY!,
          forcePathStyle: env.S3_FORCE_PATH_STYLE,
        })
      : diskStorage(resolve(env.UPLOAD_DIR));
  return storage;
}
