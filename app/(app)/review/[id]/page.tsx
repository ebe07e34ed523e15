import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ReadOnlyDocument } from "@/components/entries/read-only-document";
import { StatusChip } from "@/components/entries/status-chip";
import { RevisionComparisonView } from "@/components/review/revision-comparison";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { getReviewView } from "@/lib/notebook/review-view";
import { getRevisionPage } from "@/lib/notebook/revisions";
import { countersignAction, returnAction } from "./actions";
import { ReviewForms } from "./review-forms";

export const metadata: Metadata = { title: "Review" };

export default async function ReviewPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await requireActor();
  let view;
  let page;
  try {
    view = await getReviewView(actor, id);
    page = await getRevisionPage(actor, id, view.revision);
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
  const { entry, actions } = view;
  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="min-w-0 space-y-5">
        <div>
          <Link href="/review" className="text-sm text-copper-700 hover:underline">
            ← Review queue
          </Link>
          <h1 className="mt-1 text-2xl font-semibold tracking-tight">{entry.title}</h1>
          <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
            {view.authorName} · {view.projectName} · revision {view.revision}
            <StatusChip status={entry.status} />
          </p>
        </div>
        <RevisionComparisonView
          comparison={view.comparison}
          baselineRevision={view.baselineRevision}
        />
        <section aria-labelledby="submitted-heading" className="space-y-2">
          <h2 id="submitted-heading" className="text-base font-semibold">
            The submitted revision
          </h2>
          <ReadOnlyDocument content={page.revision.content} storedResults={page.storedResults} />
        </section>
      </div>
      <aside aria-label="Review actions" className="space-y-4">
        {actions.countersign.allowed ? (
          <ReviewForms
            entryId={entry.id}
            revision={view.revision}
            countersign={countersignAction}
            returnEntry={returnAction}
          />
        ) : (
          <p className="card p-4 text-sm text-ink-soft" role="status">
            {actions.countersign.allowed === false ? actions.countersign.reason : null}
          </p>
        )}
      </aside>
    </div>
  );
}
