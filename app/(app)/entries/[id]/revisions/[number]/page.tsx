import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ReadOnlyDocument } from "@/components/entries/read-only-document";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { getRevision } from "@/lib/notebook/revisions";

export const metadata: Metadata = { title: "Earlier revision" };

export default async function RevisionPage({
  params,
}: {
  params: Promise<{ id: string; number: string }>;
}) {
  const { id, number } = await params;
  const actor = await requireActor();
  let revision;
  try {
    revision = await getRevision(actor, id, Number(number));
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
  return (
    <div className="space-y-4">
      <Link href={`/entries/${id}/revisions`} className="text-sm text-copper-700 hover:underline">
        ← All revisions
      </Link>
      <div className="rounded-md border border-ink/10 bg-paper-deep px-4 py-2 text-sm">
        Revision {revision.number} by {revision.authorName},{" "}
        {new Date(revision.createdAt).toLocaleString("en-GB", {
          dateStyle: "medium",
          timeStyle: "medium",
        })}{" "}
        — read-only.
        <code className="ml-2 font-mono text-xs text-ink-faint">sha256 {revision.contentHash}</code>
      </div>
      <h1 className="text-2xl font-semibold tracking-tight">{revision.title}</h1>
      <ReadOnlyDocument content={revision.content} />
    </div>
  );
}
