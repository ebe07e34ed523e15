import { parseTraceText } from "@/lib/traces";

/**
 * Pasted text that is an instrument export (a header, then a numeric table the reader
 * recognises) rather than prose: it becomes an attached file and a trace block.
 */
export function looksLikeExport(text: string): boolean {
  if (text.length < 40 || text.length > 20_000_000) return false;
  const lines = text.split(/\r?\n/, 40).filter((l) => l.trim());
  const numeric = lines.filter((l) => /^[\s\d.,;eE+\t-]+$/.test(l)).length;
  if (numeric < 5) return false;
  return parseTraceText(text.slice(0, 2_000_000)).summary.technique !== "unknown";
}
