import "server-only";
import type { Executor } from "@/db/client";
import { findEntryAttachments } from "@/db/queries/attachments";
import { extractAttachmentIds } from "@/lib/document/extract-blocks";
import type { SignedAttachment } from "@/lib/document/signed-content";

/**
 * The attachments a revision includes: the files its document refers to (photo figures, file
 * links, trace blocks), by SHA-256 and original name. Their hashes are part of the signed
 * content, so a file changed or swapped on disk after signing fails verification.
 */
export async function revisionAttachmentsForSignature(
  db: Executor,
  labId: string,
  entryId: string,
  content: unknown,
): Promise<SignedAttachment[]> {
  const rows = await findEntryAttachments(db, labId, entryId, extractAttachmentIds(content));
  return rows.map((r) => ({ sha256: r.sha256, name: r.originalName }));
}
