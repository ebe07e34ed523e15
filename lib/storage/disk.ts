import { createReadStream } from "node:fs";
import { copyFile, link, mkdir, rename, rm, stat } from "node:fs/promises";
import { dirname, join } from "node:path";
import type { Readable } from "node:stream";
import { isStorageKey, type BlobStorage } from "./types";

/**
 * Attachments on the local disk under UPLOAD_DIR. A file arrives complete (hashed while it was
 * streamed to a temporary name) and is moved into place with one rename, so a crash never
 * leaves a half-written object under a real key.
 */
export function diskStorage(root: string): BlobStorage {
  const pathOf = (key: string) => {
    if (!isStorageKey(key)) throw new Error(`not a storage key: ${key}`);
    return join(root, key);
  };
  return {
    driver: "disk",
    async putFile(key, localPath) {
      const target = pathOf(key);
      if ((await stat(target).catch(() => null))?.isFile()) return;
      await mkdir(dirname(target), { recursive: true });
      const staging = `${target}.partial-${process.pid}-${Date.now()}`;
      // Hard link when the temp file is on the same disk (no copy), else copy; then rename.
      await link(localPath, staging).catch(() => copyFile(localPath, staging));
      await rename(staging, target);
    },
    async size(key) {
      const info = await stat(pathOf(key)).catch(() => null);
      return info?.isFile() ? info.size : null;
    },
    read(key, range): Promise<Readable> {
      return Promise.resolve(
        createReadStream(pathOf(key), range ? { start: range.start, end: range.end } : {}),
      );
    },
    async remove(key) {
      await rm(pathOf(key), { force: true });
    },
  };
}
