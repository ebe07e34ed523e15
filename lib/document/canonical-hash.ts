import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils.js";

/**
 * The content hash of an entry revision: SHA-256 (hex) of the document's canonical JSON.
 *
 * Canonical JSON here: object keys sorted by UTF-16 code unit order, no whitespace, keys
 * whose value is `undefined` left out (as JSON.stringify does), arrays kept in order.
 * Two documents that differ only in key order hash the same; a signature records this hash,
 * so it must not depend on how a client happened to serialise the tree.
 *
 * SHA-256 comes from @noble/hashes (audited, synchronous, identical in the browser and in
 * Node) rather than Web Crypto, whose `crypto.subtle` is async and is missing on plain-http
 * origins other than localhost.
 */
export function canonicalJson(value: unknown): string {
  return serialise(value, new Set());
}

/** Hex SHA-256 of a string's UTF-8 bytes. */
export function sha256Hex(text: string): string {
  return bytesToHex(sha256(utf8ToBytes(text)));
}

export function canonicalHash(doc: unknown): string {
  return sha256Hex(canonicalJson(doc));
}

function serialise(value: unknown, ancestors: Set<object>): string {
  if (value === null) return "null";
  switch (typeof value) {
    case "string":
      return JSON.stringify(value);
    case "boolean":
      return value ? "true" : "false";
    case "number":
      if (!Number.isFinite(value))
        throw new TypeError("Canonical JSON cannot hold NaN or Infinity.");
      return JSON.stringify(value);
    case "object":
      break;
    default:
      throw new TypeError(`Canonical JSON cannot hold a ${typeof value}.`);
  }
  const object = value;
  if (ancestors.has(object)) throw new TypeError("Canonical JSON cannot hold a cycle.");
  ancestors.add(object);
  let out: string;
  if (Array.isArray(object)) {
    // Array holes and undefined become null, as in JSON.stringify.
    out = `[${Array.from(object, (item) => (item === undefined ? "null" : serialise(item, ancestors))).join(",")}]`;
  } else {
    const record = object as Record<string, unknown>;
    const keys = Object.keys(record)
      .filter((key) => record[key] !== undefined)
      .sort();
    out = `{${keys.map((key) => `${JSON.stringify(key)}:${serialise(record[key], ancestors)}`).join(",")}}`;
  }
  ancestors.delete(object);
  return out;
}
