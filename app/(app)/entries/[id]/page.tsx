import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { EntryWorkspace } from "@/components/entries/entry-workspace";
import { DocumentPreview } from "@/components/entries/document-preview";
import { StatusChip } from "@/components/entries/status-chip";
import { IntegrityBadge } from "@/components/review/integrity-badge";
import { SignatureManifest } from "@/components/review/signature-manifest";
import { requireActor } from "@/lib/access/actor";
import { revisionHash } from "@/lib/document/prepare-revision";
import { readyTraceViews } from "@/lib/attachments/trace-view";
import { extractTraceAttachmentIds } from "@/lib/document/extract-blocks";
import { isAppError } from "@/lib/errors";
import { traceViewQueryKey, type TraceViewDto } from "@/lib/contract/traces";
import { NewerStockNotice } from "@/components/lineage/newer-stock-notice";
import { newerStocksOf } from "@/lib/notebook/lineage/stocks";
import { listPossibleReviewers } from "@/lib/notebook/review";
import { openEntry } from "@/lib/notebook/revisions";
import {
  amendEntryAction,
  archiveEntryAction,
  submitEntryAction,
  updateStockAction,
} from "./actions";
import { EntryActions } from "./entry-actions";

export const metadata: Metadata = { title: "Entry" };

/** A query cache holding the entry's trace views, to be sent with the page. */
function traceViewCache(views: readonly TraceViewDto[]): QueryClient {
  const cache = new QueryClient();
  for (const view of views) cache.setQueryData(traceViewQueryKey(view.attachmentId), view);
  return cache;
}

async function load(id: string) {
  const actor = await requireActor();
  try {
    const opened = await openEntry(actor, id);
    const [reviewers, newerStocks, traceViews] = await Promise.all([
      opened.actions.submit.allowed ? listPossibleReviewers(actor) : Promise.resolve([]),
      newerStocksOf(actor, id),
      // Sent with the page, so trace blocks draw without waiting for a request of their own.
      readyTraceViews(actor, extractTraceAttachmentIds(opened.current.content)),
    ]);
    return {
      opened,
      reviewers,
      newerStocks,
      traceViews,
      isAuthor: opened.entry.authorId === actor.userId,
    };
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
}

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-2">
      <span className="text-ink-soft">{label}</span>
      <span className="text-right">{children}</span>
    </div>
  );
}

export default async function EntryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { opened, reviewers, newerStocks, traceViews, isAuthor } = await load(id);
  const { entry, authorName, projectName, actions, current, storedResults, signatures } = opened;
  const editable = actions.edit.allowed;
  const intact =
    current.number === 0 || revisionHash(current.title, current.content) === current.contentHash;
  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_17rem]">
      <div className="min-w-0 space-y-4">
        {entry.status === "amended" && entry.amendmentReason ? (
          <p className="rounded-md border border-amber-200 bg-amber-50 px-3 py-2 text-sm text-amber-900">
            Amendment of countersigned revision {entry.signedRevisionNumber}:{" "}
            {entry.amendmentReason}
          </p>
        ) : null}
        <NewerStockNotice
          entryId={entry.id}
          revision={entry.currentRevisionNumber}
          items={newerStocks}
          canUpdate={actions.edit.allowed || actions.amend.allowed}
          needsReason={entry.status === "countersigned"}
          whyNot={
            isAuthor
              ? ((actions.edit.allowed ? null : actions.edit.reason) ?? null)
              : "Only the author can update the entry to the newer stock."
          }
          update={updateStockAction}
        />
        {/* The trace views go into the query cache the trace blocks read (no request of their own). */}
        <HydrationBoundary state={dehydrate(traceViewCache(traceViews))}>
          <EntryWorkspace
            key={`${entry.id}:${current.number}`}
            entryId={entry.id}
            title={current.title}
            content={current.content}
            revision={current.number}
            editable={editable}
            storedResults={storedResults}
            preview={<DocumentPreview content={current.content} traceViews={traceViews} />}
          />
        </HydrationBoundary>
      </div>
      <aside className="space-y-5 text-sm" aria-label="About this entry">
        <div className="space-y-3 card p-4">
          <div className="flex items-center justify-between">
            <span className="text-ink-soft">Status</span>
            <StatusChip status={entry.status} />
          </div>
          {opened.amendedAfterCountersignature ? (
            <p className="chip bg-amber-50 text-amber-800" data-testid="amended-after">
              amended after countersignature
            </p>
          ) : null}
          <Row label="Project">{projectName}</Row>
          <Row label="Author">{authorName}</Row>
          <Row label="Revision">
            <span className="font-mono tabular-nums">{entry.currentRevisionNumber}</span>
          </Row>
          {current.number > 0 ? (
            <Row label="Content">
              <IntegrityBadge
                intact={intact}
                chainUnbroken
                href={`/api/entries/${entry.id}/revisions/${current.number}/verification`}
              />
            </Row>
          ) : null}
          {entry.archivedAt ? <p className="chip bg-ink/5 text-ink-soft">archived</p> : null}
          <Link href={`/entries/${entry.id}/revisions`} className="btn-quiet w-full">
            History
          </Link>
          {actions.countersign.allowed ? (
            <Link href={`/review/${entry.id}`} className="btn-primary w-full">
              Review this entry
            </Link>
          ) : null}
        </div>
        <EntryActions
          entryId={entry.id}
          canSubmit={actions.submit.allowed}
          canArchive={actions.archive.allowed || actions.restore.allowed}
          canAmend={actions.amend.allowed}
          archived={entry.archivedAt !== null}
          reviewers={reviewers}
          submit={submitEntryAction}
          archive={archiveEntryAction}
          amend={amendEntryAction}
        />
        {!actions.edit.allowed && actions.edit.code === "conflict" ? (
          <p className="text-xs text-ink-soft">{actions.edit.reason}</p>
        ) : null}
        {signatures.length > 0 ? (
          <div className="space-y-2 card p-4">
            <p className="font-medium">Export the signed record</p>
            <a className="btn-quiet w-full" href={`/api/entries/${entry.id}/export?format=pdf`}>
              PDF with signature manifest
            </a>
            <a className="btn-quiet w-full" href={`/api/entries/${entry.id}/export?format=json`}>
              JSON archive
            </a>
          </div>
        ) : null}
        <SignatureManifest signatures={signatures} />
      </aside>
    </div>
  );
}
