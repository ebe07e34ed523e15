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
    return { header, current };
  } catch (error) {
    if (isAppError(error) && error.code === "not_found") notFound();
    throw error;
  }
}

export default async function EntryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { header, current } = await load(id);
  const { entry, authorName, projectName, actions } = header;
  const editable = actions.edit.allowed;
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
          canSubmit={actions.submit.allowed}
          canArchive={actions.archive.allowed || actions.restore.allowed}
          archived={entry.archivedAt !== null}
          submit={submitEntryAction}
          archive={archiveEntryAction}
        />
        {!actions.edit.allowed && actions.edit.code === "conflict" ? (
          <p className="text-xs text-ink-soft">{actions.edit.reason}</p>
        ) : null}
      </aside>
    </div>
  );
}
