import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { EntryWorkspace } from "@/components/entries/entry-workspace";
import { StatusChip } from "@/components/entries/status-chip";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { openEntry } from "@/lib/notebook/revisions";
import { archiveEntryAction, submitEntryAction } from "./actions";
import { EntryActions } from "./entry-actions";

export const metadata: Metadata = { title: "Entry" };

async function load(id: string) {
  const actor = await requireActor();
  try {
    const { current, ...header } = await openEntry(actor, id);
    return { actor, header, current };
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
}

export default async function EntryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { actor, header, current } = await load(id);
  const { entry, authorName, projectName } = header;
  const isAuthor = entry.authorId === actor.userId;
  const editable =
    isAuthor && (entry.status === "draft" || entry.status === "returned") && !entry.archivedAt;
  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_16rem]">
      <div className="min-w-0">
        <EntryWorkspace
          key={`${entry.id}:${current.number}`}
          entryId={entry.id}
          title={current.title}
          content={current.content}
          revision={current.number}
          editable={editable}
        />
      </div>
      <aside className="space-y-5 text-sm" aria-label="About this entry">
        <div className="space-y-3 card p-4">
          <div className="flex items-center justify-between">
            <span className="text-ink-soft">Status</span>
            <StatusChip status={entry.status} />
          </div>
          <div className="flex justify-between gap-2">
            <span className="text-ink-soft">Project</span>
            <span className="text-right">{projectName}</span>
          </div>
          <div className="flex justify-between gap-2">
            <span className="text-ink-soft">Author</span>
            <span className="text-right">{authorName}</span>
          </div>
          <div className="flex justify-between gap-2">
            <span className="text-ink-soft">Revision</span>
            <span className="font-mono tabular">{entry.currentRevisionNumber}</span>
          </div>
          {entry.archivedAt ? <p className="chip bg-ink/5 text-ink-soft">archived</p> : null}
          <Link href={`/entries/${entry.id}/revisions`} className="btn-quiet w-full">
            Revision history
          </Link>
        </div>
        <EntryActions
          entryId={entry.id}
          canSubmit={
            isAuthor &&
            (entry.status === "draft" || entry.status === "returned") &&
            entry.currentRevisionNumber > 0
          }
          canArchive={isAuthor || actor.role === "admin"}
          archived={entry.archivedAt !== null}
          submit={submitEntryAction}
          archive={archiveEntryAction}
        />
        {!editable && isAuthor && entry.status === "submitted" ? (
          <p className="text-xs text-ink-soft">
            Submitted entries are read-only while they wait for a countersignature.
          </p>
        ) : null}
      </aside>
    </div>
  );
}
