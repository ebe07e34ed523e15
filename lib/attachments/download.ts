import "server-only";
import type { Readable } from "node:stream";
import { findLabAttachment, listEntryAttachments } from "@/db/queries/attachments";
import { insertAuditEvent } from "@/db/queries/audit";
import { AppError } from "@/lib/errors";
import { loadEntryFor } from "@/lib/notebook/entry-access";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { getStorage } from "@/lib/storage";
import { toAttachmentDto } from "./upload";

const INLINE_TYPES = new Set([
  "image/png",
  "image/jpeg",
  "image/webp",
  "image/gif",
  "application/pdf",
]);

export interface Download {
  stream: Readable;
  contentType: string;
  sizeBytes: number;
  /** Of the whole object; a range response says which part it carries. */
  totalBytes: number;
  range: { start: number; end: number } | null;
  disposition: string;
}

/** "bytes=0-99", "bytes=100-", "bytes=-500" → an inclusive range, or null when absent; 416 if unsatisfiable. */
function parseRange(header: string | null, total: number): { start: number; end: number } | null {
  if (!header) return null;
  const m = /^bytes=(\d*)-(\d*)$/.exec(header.trim());
  if (!m || (m[1] === "" && m[2] === "")) return null; // unknown forms are ignored: whole file
  let start: number;
  let end: number;
  if (m[1] === "") {
    const suffix = Number(m[2]);
    start = Math.max(0, total - suffix);
    end = total - 1;
  } else {
    start = Number(m[1]);
    end = m[2] === "" ? total - 1 : Math.min(Number(m[2]), total - 1);
  }
  if (!Number.isSafeInteger(start) || start >= total || end < start) {
    throw new AppError("range_not_satisfiable", "That byte range is outside the file.", {
      details: { size: total },
    });
  }
  return { start, end };
}

function contentDisposition(kind: "inline" | "attachment", name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, "_").replace(/["\\]/g, "_");
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

/**
 * A stored file for a member of its lab: the original (or a photo's thumbnail or web copy),
 * whole or a byte range. Another lab's files do not exist for the member (404).
 */
export async function openAttachment(
  actor: Actor,
  rawId: string,
  variant: string | null,
  rangeHeader: string | null,
): Promise<Download> {
  assertCan(actor, "entry.read");
  if (!/^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(rawId))
    throw new AppError("not_found", "Attachment not found.");
  const row = await findLabAttachment(getDb(), actor.labId, rawId);
  if (!row) throw new AppError("not_found", "Attachment not found.");
  await loadEntryFor(getDb(), actor, row.entryId, "view");
  let key = row.storedPath;
  let contentType = row.detectedType;
  let name = row.originalName;
  if (variant === "thumb" || variant === "web") {
    const copies = (row.derivatives.copies ?? []) as { name: string; key: string }[];
    const copy = copies.find((c) => c.name === `${variant}.webp`);
    if (!copy) throw new AppError("not_found", "This attachment has no such copy.");
    key = copy.key;
    contentType = "image/webp";
    name = `${row.originalName.replace(/\.[^.]*$/, "")}-${variant}.webp`;
  } else if (variant !== null && variant !== "original") {
    throw new AppError("invalid_input", "Ask for variant original, web or thumb.");
  }
  const storage = getStorage();
  const total = await storage.size(key);
  if (total === null) throw new AppError("not_found", "The stored file is missing.");
  const range = parseRange(rangeHeader, total);
  const stream = await storage.read(key, range ?? undefined);
  return {
    stream,
    contentType,
    totalBytes: total,
    sizeBytes: range ? range.end - range.start + 1 : total,
    range,
    disposition: contentDisposition(INLINE_TYPES.has(contentType) ? "inline" : "attachment", name),
  };
}

/** The entry's attachments for its editor and page. */
export async function listAttachments(actor: Actor, entryId: string) {
  assertCan(actor, "entry.read");
  const entry = await loadEntryFor(getDb(), actor, entryId, "view");
  const rows = await listEntryAttachments(getDb(), actor.labId, entry.id);
  return rows.map((r) => toAttachmentDto(r));
}

/** Downloads of originals are part of the audit trail (thumbnails are not). */
export async function recordDownload(actor: Actor, attachmentId: string): Promise<void> {
  await insertAuditEvent(getDb(), {
    labId: actor.labId,
    actorId: actor.userId,
    action: "attachment.downloaded",
    targetType: "attachment",
    targetId: attachmentId,
  });
}
