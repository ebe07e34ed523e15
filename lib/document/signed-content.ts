import { canonicalHash } from "./canonical-hash";
import { revisionHash } from "./prepare-revision";

export interface SignedAttachment {
  sha256: string;
  name: string;
}

/**
 * What a countersignature covers: the revision's content hash (its title and document) and
 * the SHA-256 of every attachment of that revision, in a fixed order. Recomputed from the
 * stored content when a signature is verified, so a changed byte anywhere shows.
 */
export function signedContentHash(input: {
  title: string;
  content: unknown;
  attachments: readonly SignedAttachment[];
}): string {
  const attachments = [...input.attachments]
    .map((a) => ({ sha256: a.sha256, name: a.name }))
    .sort((a, b) => (a.sha256 + a.name).localeCompare(b.sha256 + b.name));
  return canonicalHash({ revision: revisionHash(input.title, input.content), attachments });
}
