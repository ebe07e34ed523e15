import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ReadOnlyDocument } from "@/components/entries/read-only-document";
import { IntegrityBadge } from "@/components/review/integrity-badge";
import { SignatureManifest } from "@/components/review/signature-manifest";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { getRevisionPage } from "@/lib/notebook/revisions";
import { parseRevisionNumber } from "@/lib/validation/parse";

export const metadata: Metadata = { title: "Revision" };

export default async function RevisionPage({
  params,
}: {
  params: Promise<{ id: string; number: string }>;
}) {
  const { id, number } = await params;
  const actor = await requireActor();
  let page;
  try {
    page = await getRevisionPage(actor, id, parseRevisionNumber(number));
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
  const { revision, storedResults, verification } = page;
  return (
    <div className="space-y-4">
      <Link href={`/entries/${id}/revisions`} className="text-sm text-copper-700 hover:underline">
        ← History
      </Link>
      <div className="flex flex-wrap items-center gap-2 rounded-md border border-ink/10 bg-paper-deep px-4 py-2 text-sm">
        <span>
          Revision {revision.number} by {revision.authorName},{" "}
          {new Date(revision.createdAt).toLocaleString("en-GB", {
            dateStyle: "medium",
            timeStyle: "medium",
          })}{" "}
          — read-only.
        </span>
        <IntegrityBadge
          intact={verification.intact}
          chainUnbroken={verification.chain.unbroken}
          href={`/api/entries/${id}/revisions/${revision.number}/verification`}
        />
        <code className="font-mono text-xs break-all text-ink-faint">
          sha256 {revision.contentHash}
        </code>
      </div>
      <h1 className="text-2xl font-semibold tracking-tight">{revision.title}</h1>
      <ReadOnlyDocument content={revision.content} storedResults={storedResults} />
      <SignatureManifest
        signatures={verification.signatures.map((s) => ({
          ...s,
          revision: revision.number,
        }))}
      />
    </div>
  );
}
