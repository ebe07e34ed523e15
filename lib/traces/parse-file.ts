/**
 * NODE ONLY: the one file of lib/traces that touches the file system. Streams an export
 * from disk through the incremental parser in 1 MB chunks, so memory holds the columns and
 * one chunk, never the file as a string. The encoding comes from the byte-order mark
 * (UTF-8 without one; UTF-16 LE/BE with one); TextDecoder's stream mode keeps a character
 * split between two chunks whole.
 */
import { createReadStream } from "node:fs";
import { createTraceParser } from "./incremental-parser";
import type { ParsedTrace, TraceParseOptions } from "./types";

const CHUNK_BYTES = 1 << 20;

function encodingOf(first: Uint8Array): {
  encoding: "utf-8" | "utf-16le" | "utf-16be";
  bomBytes: number;
} {
  if (first[0] === 0xef && first[1] === 0xbb && first[2] === 0xbf)
    return { encoding: "utf-8", bomBytes: 3 };
  if (first[0] === 0xff && first[1] === 0xfe) return { encoding: "utf-16le", bomBytes: 2 };
  if (first[0] === 0xfe && first[1] === 0xff) return { encoding: "utf-16be", bomBytes: 2 };
  return { encoding: "utf-8", bomBytes: 0 };
}

export function parseTraceFile(
  path: string,
  options: TraceParseOptions = {},
): Promise<ParsedTrace> {
  return parseTraceStream(createReadStream(path, { highWaterMark: CHUNK_BYTES }), options);
}

/** The same from any byte stream (a file, or an object read back from the storage). */
export async function parseTraceStream(
  chunks: AsyncIterable<unknown>,
  options: TraceParseOptions = {},
): Promise<ParsedTrace> {
  const parser = createTraceParser(options);
  let decoder: TextDecoder | null = null;
  for await (const piece of chunks) {
    let bytes = piece as Uint8Array;
    if (!decoder) {
      const { encoding, bomBytes } = encodingOf(bytes);
      decoder = new TextDecoder(encoding);
      bytes = bytes.subarray(bomBytes);
    }
    parser.push(decoder.decode(bytes, { stream: true }));
  }
  if (decoder) parser.push(decoder.decode());
  return parser.finish();
}
