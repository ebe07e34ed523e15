import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { RevisionComparisonView } from "@/components/review/revision-comparison";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { getRevisionComparison } from "@/lib/notebook/review-view";
import { parseRevisionNumber } from "@/lib/validation/parse";

export const metadata: Metadata = { title: "Compare revisions" };

/** `?from=&to=`: what changed in an entry between two revisions (stored numbers only). */
export default async function CompareRevisionsPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ from?: string; to?: string }>;
}) {
  const { id } = await params;
  const query = await searchParams;
  const actor = await requireActor();
  let view;
  try {
    view = await getRevisionComparison(
      actor,
      id,
      parseRevisionNumber(query.from ?? ""),
      parseRevisionNumber(query.to ?? ""),
    );
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
  return (
    <div className="space-y-4">
      <Link href={`/entries/${id}/revisions`} className="text-sm text-copper-700 hover:underline">
        ← History
      </Link>
      <h1 className="text-2xl font-semibold tracking-tight">{view.entry.title}</h1>
      <p className="text-sm text-ink-soft">
        {view.authorName} · {view.projectName} ·{" "}
        <Link
          className="text-copper-700 hover:underline"
          href={`/entries/${id}/revisions/${view.from}`}
        >
          revision {view.from}
        </Link>{" "}
        →{" "}
        <Link
          className="text-copper-700 hover:underline"
          href={`/entries/${id}/revisions/${view.to}`}
        >
          revision {view.to}
        </Link>
      </p>
      <RevisionComparisonView
        comparison={view.comparison}
        baselineRevision={view.from}
        heading={`What changed from revision ${view.from} to revision ${view.to}`}
        labels={{ before: `Revision ${view.from}`, after: `Revision ${view.to}` }}
      />
    </div>
  );
}
