import { sha256Hex } from "@/lib/document/canonical-hash";

/**
 * The key a lab's column mapping is remembered under: the layout's column names, trimmed and
 * lower-cased, in order. A later file with the same columns is read the same way.
 */
export function layoutKeyOf(columnNames: readonly string[]): string {
  return sha256Hex(columnNames.map((n) => n.trim().toLowerCase()).join("\u001f"));
}
