import { AppError } from "@/lib/errors";
import { canonicalHash } from "./canonical-hash";
import { safeParseEntryDocument, type EntryDocument } from "./document-schema";
import { extractAttachmentIds, extractSolutionBlocks } from "./extract-blocks";
import { documentPlainText } from "./plain-text";
import type { SolutionBlockInput } from "./block-schemas";
import { solutionInputsHash } from "./solution-record";

/** Everything a save stores for one document, computed once from the validated tree. */
export interface PreparedRevision {
  title: string;
  content: EntryDocument;
  /** Hex SHA-256 of the canonical { title, content }: what a revision and a signature record. */
  contentHash: string;
  /** Plain text for full-text search. */
  contentText: string;
  /**
   * Every solution block in document order with the key of its computation. The server
   * computes a block (solutionRecordFor) only when no stored result has that key yet.
   */
  solutionBlocks: { block: SolutionBlockInput; inputsHash: string }[];
  /** Attachments the document refers to; the server checks they belong to the entry. */
  attachmentIds: string[];
}

/** The content hash a revision (and a signature) records: SHA-256 of canonical { title, content }. */
export function revisionHash(title: string, content: unknown): string {
  return canonicalHash({ title, content });
}

/**
 * Validates a document as the server accepts it and derives, once, what a revision stores.
 * A document the schema refuses raises `invalid_input` with the first problems listed; the
 * previous revision is untouched because nothing has been written yet.
 */
export function prepareRevision(title: string, rawContent: unknown): PreparedRevision {
  const parsed = safeParseEntryDocument(rawContent);
  if (!parsed.success) {
    throw new AppError(
      "invalid_input",
      "The document was refused; the previous revision is unchanged.",
      { details: { problems: parsed.problems.slice(0, 20) } },
    );
  }
  const content = parsed.data;
  return {
    title,
    content,
    contentHash: revisionHash(title, content),
    contentText: documentPlainText(content),
    solutionBlocks: extractSolutionBlocks(content).map((block) => ({
      block,
      inputsHash: solutionInputsHash(block),
    })),
    attachmentIds: extractAttachmentIds(content),
  };
}
