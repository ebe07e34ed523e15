import type { Readable } from "node:stream";

/**
 * Where attachment bytes live. Keys are content-addressed (derived from SHA-256), so the same
 * bytes are stored once and a stored object never changes. Two drivers implement it: the
 * local disk (the default) and S3-compatible object storage (for several app instances).
 */
export interface BlobStorage {
  readonly driver: "disk" | "s3";
  /** Stores a finished local file under the key; a key that already exists is left as it is. */
  putFile(key: string, localPath: string, contentType: string): Promise<void>;
  /** Size in bytes, or null when the key is absent. */
  size(key: string): Promise<number | null>;
  /** The bytes, or the inclusive byte range [start, end]. */
  read(key: string, range?: { start: number; end: number }): Promise<Readable>;
  /** Removes an object (used only to undo a write whose database row was not committed). */
  remove(key: string): Promise<void>;
}

/** "objects/ab/cd/abcd…": the original of a file with that SHA-256. */
export const originalKey = (sha256: string) =>
  `objects/${sha256.slice(0, 2)}/${sha256.slice(2, 4)}/${sha256}`;

/** A derived copy (thumbnail, web-sized photo) of the original with that SHA-256. */
export const derivedKey = (sha256: string, name: string) =>
  `derived/${sha256.slice(0, 2)}/${sha256}/${name}`;

export const isStorageKey = (key: string) =>
  /^(objects\/[0-9a-f]{2}\/[0-9a-f]{2}\/[0-9a-f]{64}|derived\/[0-9a-f]{2}\/[0-9a-f]{64}\/[a-z0-9.-]{1,40})$/.test(
    key,
  );
