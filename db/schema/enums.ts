/**
 * Value sets stored as text with CHECK constraints (not PostgreSQL enums): adding a value
 * later is a one-line migration that never rewrites a table. The same arrays feed zod.
 */
export const ROLES = ["researcher", "supervisor", "admin"] as const;
export type Role = (typeof ROLES)[number];

/**
 * draft → submitted → countersigned; submitted → returned (editable) → submitted;
 * countersigned → amended (a new revision with a reason, editable) → submitted → countersigned.
 */
export const ENTRY_STATUSES = [
  "draft",
  "submitted",
  "countersigned",
  "returned",
  "amended",
] as const;
export type EntryStatus = (typeof ENTRY_STATUSES)[number];

/** What a countersignature means (our wording; labels in lib/contract/vocabulary.ts). */
export const SIGNATURE_MEANINGS = ["witnessed", "approved", "reviewed"] as const;
export type SignatureMeaning = (typeof SIGNATURE_MEANINGS)[number];

export const REVIEW_DECISIONS = ["countersigned", "returned"] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

/** photo: an image with thumbnails; trace: a parsed instrument export; file: anything else. */
export const ATTACHMENT_KINDS = ["photo", "trace", "file"] as const;
export type AttachmentKind = (typeof ATTACHMENT_KINDS)[number];

/** SQL list literal for a CHECK constraint, e.g. `('a','b')`. Values are our own constants. */
export function sqlList(values: readonly string[]): string {
  return `(${values.map((v) => `'${v.replace(/'/g, "''")}'`).join(",")})`;
}
