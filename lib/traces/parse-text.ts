/** Parses a whole text at once through the same incremental parser (tests, small uploads). */
import { createTraceParser } from "./incremental-parser";
import type { ParsedTrace, TraceParseOptions } from "./types";

/** Feeds the text in chunks of `chunkChars`, as a stream would. */
export function parseTraceText(
  text: string,
  options: TraceParseOptions = {},
  chunkChars = 1 << 16,
): ParsedTrace {
  const parser = createTraceParser(options);
  for (let at = 0; at < text.length; at += chunkChars) parser.push(text.slice(at, at + chunkChars));
  return parser.finish();
}
