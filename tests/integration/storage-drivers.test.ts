// @vitest-environment node
/**
 * One contract, both storage drivers: the local disk and S3-compatible object storage, the
 * latter against s3rver, a fake S3 server from the npm registry started here on loopback.
 */
import { createHash } from "node:crypto";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { diskStorage } from "@/lib/storage/disk";
import { s3Storage } from "@/lib/storage/s3";
import { originalKey, type BlobStorage } from "@/lib/storage/types";

const scratch = mkdtempSync(join(tmpdir(), "ionleaf-storage-"));
let server: S3rver;
let s3: BlobStorage;

beforeAll(async () => {
  server = new S3rver({
    address: "127.0.0.1",
    port: 0,
    silent: true,
    directory: join(scratch, "s3"),
    configureBuckets: [{ name: "ionleaf-test", configs: [] }],
  });
  const address = await server.run();
  s3 = s3Storage({
    endpoint: `http://127.0.0.1:${address.port}`,
    region: "us-east-1",
    bucket: "ionleaf-test",
    accessKeyId: "S3RVER",
    secretAccessKey: "S3RVER",
    forcePathStyle: true,
  });
}, 30_000);

afterAll(async () => {
  await server?.close();
  rmSync(scratch, { recursive: true, force: true });
});

async function readAll(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(Buffer.from(c as Uint8Array));
  return Buffer.concat(chunks);
}

const drivers: [string, () => BlobStorage][] = [
  ["disk", () => diskStorage(join(scratch, "disk"))],
  ["s3", () => s3],
];

describe.each(drivers)("%s storage", (_name, storage) => {
  const bytes = Buffer.from("E/V,I/A\n0.10,1.5e-6\n0.20,2.5e-6\n".repeat(200));
  const sha = createHash("sha256").update(bytes).digest("hex");
  const key = originalKey(sha);
  const local = join(scratch, `${_name}-file.csv`);
  writeFileSync(local, bytes);

  it("stores a file once under its key and reads it back whole and by range", async () => {
    expect(await storage().size(key)).toBeNull();
    await storage().putFile(key, local, "text/plain");
    await storage().putFile(key, local, "text/plain"); // a second put of the same content is a no-op
    expect(await storage().size(key)).toBe(bytes.length);
    expect(
      createHash("sha256")
        .update(await readAll(await storage().read(key)))
        .digest("hex"),
    ).toBe(sha);
    const part = await readAll(await storage().read(key, { start: 8, end: 17 }));
    expect(part.toString()).toBe(bytes.subarray(8, 18).toString());
  });

  it("removes an object, and refuses keys that are not storage keys", async () => {
    await storage().remove(key);
    expect(await storage().size(key)).toBeNull();
    await expect(storage().size("../../etc/passwd")).rejects.toThrow(/not a storage key/);
  });
});
