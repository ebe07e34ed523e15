import "server-only";
import { open } from "node:fs/promises";

const SNIFF_BYTES = 64 * 1024;

/**
 * The file's type from its bytes: magic numbers (the file-type package) for binary formats;
 * when there are none, plain text if the first 64 kB decode as UTF-8 (or UTF-16 with a byte
 * order mark) without NUL bytes. The client's claim is never read.
 */
export async function detectFileType(path: string): Promise<string> {
  const { fileTypeFromFile } = await import("file-type");
  const found = await fileTypeFromFile(path);
  if (found) return found.mime;
  const handle = await open(path, "r");
  try {
    const buffer = Buffer.alloc(SNIFF_BYTES);
    const { bytesRead } = await handle.read(buffer, 0, SNIFF_BYTES, 0);
    return looksLikeText(buffer.subarray(0, bytesRead)) ? "text/plain" : "application/octet-stream";
  } finally {
    await handle.close();
  }
}

function looksLikeText(bytes: Buffer): boolean {
  if (bytes.length === 0) return false;
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))
    return true;
  if (bytes.includes(0)) return false;
  // The sample may end in the middle of a multi-byte character: drop up to 3 trailing bytes.
  for (let cut = 0; cut < 4 && cut < bytes.length; cut++) {
    try {
      new TextDecoder("utf-8", { fatal: true }).decode(bytes.subarray(0, bytes.length - cut));
      return true;
    } catch {
      // try a shorter prefix
    }
  }
  return false;
}
