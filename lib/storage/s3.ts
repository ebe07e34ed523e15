import { createReadStream } from "node:fs";
import { stat } from "node:fs/promises";
import { type Readable } from "node:stream";
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  NotFound,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { isStorageKey, type BlobStorage } from "./types";

export interface S3Settings {
  endpoint?: string;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

/**
 * Attachments in S3-compatible object storage, so several app instances share them. The same
 * keys as on disk; objects are written once (content-addressed) and read with ranges.
 */
export function s3Storage(settings: S3Settings): BlobStorage {
  const client = new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    forcePathStyle: settings.forcePathStyle,
    credentials: { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey },
    // Plain uploads: not every S3-compatible server understands the SDK's streaming checksum
    // framing, which would then be stored as part of the object.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  const Bucket = settings.bucket;
  const check = (key: string) => {
    if (!isStorageKey(key)) throw new Error(`not a storage key: ${key}`);
    return key;
  };
  const size = async (key: string) => {
    try {
      const head = await client.send(new HeadObjectCommand({ Bucket, Key: check(key) }));
      return head.ContentLength ?? 0;
    } catch (error) {
      if (error instanceof NotFound || (error as { name?: string }).name === "NotFound")
        return null;
      throw error;
    }
  };
  return {
    driver: "s3",
    async putFile(key, localPath, contentType) {
      if ((await size(key)) !== null) return;
      const { size: length } = await stat(localPath);
      await client.send(
        new PutObjectCommand({
          Bucket,
          Key: check(key),
          Body: createReadStream(localPath),
          ContentLength: length,
          ContentType: contentType,
        }),
      );
    },
    size,
    async read(key, range) {
      const object = await client.send(
        new GetObjectCommand({
          Bucket,
          Key: check(key),
          Range: range ? `bytes=${range.start}-${range.end}` : undefined,
        }),
      );
      return object.Body as Readable;
    },
    async remove(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: check(key) }));
    },
  };
}
