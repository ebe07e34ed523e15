import "server-only";
import { and, eq } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { attachments } from "@/db/schema";
import type { SignedAttachment } from "@/lib/document/signed-content";

/**
 * The attachments a signature of this revision covers: the entry's files, by SHA-256 and
 * original name. Their hashes are part of the signed content, so a file changed or swapped on
 * disk after signing makes the signature fail verification.
 */
export async function revisionAttachmentsForSignature(
  db: Executor,
  labId: string,
  entryId: string,
  _revisionNumber: number,
): Promise<SignedAttachment[]> {
  const rows = await db
    .select({ sha256: attachments.sha256, name: attachments.originalName })
    .from(attachments)
    .where(and(eq(attachments.labId, labId), eq(attachments.entryId, entryId)));
  return rows;
}
