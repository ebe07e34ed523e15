"use client";
import type { JSONContent } from "@tiptap/core";
import { useEffect, useRef, useState, type ReactNode } from "react";
import { NotebookEditor } from "@/editor/notebook-editor";
import { preloadTraceBlock } from "@/editor/trace-block/trace-block-view";
import { extractTraceAttachmentIds } from "@/lib/document/extract-blocks";
import { StoredResultsProvider } from "@/editor/stored-results";
import type { StoredSolution } from "@/lib/document/stored-evaluation";
import { ConflictPanel } from "./conflict-panel";
import { readLocalDraft } from "./local-draft";
import { SaveIndicator } from "./save-indicator";
import { useAutosave, type AutosaveStart } from "./use-autosave";

export interface EntryWorkspaceProps {
  entryId: string;
  title: string;
  content: unknown;
  revision: number;
  editable: boolean;
  /** The stored numbers of the shown revision's solution blocks, when it is read-only. */
  storedResults?: Readonly<Record<string, StoredSolution>> | null;
  /** The document drawn on the server, shown until the editor is ready. */
  preview?: ReactNode;
}

/**
 * The entry's editing surface. It first looks for edits this browser kept and the server
 * does not have (a reload or a crashed tab), and starts from those when present.
 */
export function EntryWorkspace(props: EntryWorkspaceProps) {
  const [start, setStart] = useState<AutosaveStart | null>(null);

  // Once per mount: the page gives this component a key of entry id and revision, so a new
  // revision remounts it; a server refresh with the same revision must not restart the session.
  const initial = useRef(props);
  useEffect(() => {
    const props = initial.current;
    // An entry with traces starts loading the plotting code now, before the editor exists.
    if (extractTraceAttachmentIds(props.content).length > 0) void preloadTraceBlock();
    const draft = props.editable ? readLocalDraft(props.entryId) : null;
    if (draft && draft.baseRevision <= props.revision) {
      setStart({
        revision: draft.baseRevision,
        title: draft.title,
        content: draft.content,
        unsaved: true,
        unanswered: draft.unanswered,
      });
    } else {
      setStart({
        revision: props.revision,
        title: props.title,
        content: props.content,
        unsaved: false,
      });
    }
  }, []);

  if (!start)
    return props.preview ? (
      // Laid out as the session below lays out its title and editor, so nothing moves.
      <div className="space-y-4">
        <p className="py-[3px] text-2xl font-semibold tracking-tight">{props.title}</p>
        {props.preview}
      </div>
    ) : (
      <div className="h-96 animate-pulse card bg-paper-deep" aria-label="Loading the editor" />
    );
  return <EntrySession {...props} start={start} />;
}

function EntrySession({
  entryId,
  editable,
  start,
  storedResults,
  preview,
}: EntryWorkspaceProps & { start: AutosaveStart }) {
  const restored = start.unsaved;
  // The server's drawing stays until the editor exists (its first render is empty).
  const [editorReady, setEditorReady] = useState(false);
  const { state, change, keepMine, discardMine } = useAutosave(entryId, start);
  const [title, setTitle] = useState(start.title);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <label htmlFor="entry-title" className="sr-only">
          Entry title
        </label>
        <input
          id="entry-title"
          className="min-w-0 flex-1 border-0 bg-transparent text-2xl font-semibold tracking-tight focus:ring-0 focus:outline-none disabled:text-ink"
          value={title}
          disabled={!editable}
          maxLength={200}
          onChange={(e) => {
            setTitle(e.target.value);
            if (e.target.value.trim()) change({ title: e.target.value });
          }}
        />
        {editable ? <SaveIndicator state={state} /> : null}
      </div>
      {restored ? (
        <p
          role="status"
          className="rounded-md border border-copper-100 bg-copper-50 px-3 py-2 text-xs text-copper-700"
        >
          Restored edits this browser kept from your last visit; they are being saved now.
        </p>
      ) : null}
      {!title.trim() && editable ? (
        <p role="alert" className="text-xs text-red-700">
          An entry needs a title; the last title is kept until you type one.
        </p>
      ) : null}
      {state.status === "conflict" ? (
        <ConflictPanel
          onKeepMine={() => void keepMine()}
          onDiscardMine={discardMine}
          choiceFailed={state.choiceFailed}
        />
      ) : null}
      {state.status === "refused" ? (
        <div
          role="alert"
          className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-sm text-red-800"
        >
          <p>{state.message} Your edits stay in this browser.</p>
          {state.problems?.length ? (
            <ul className="mt-1 list-disc pl-5 text-xs">
              {state.problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <StoredResultsProvider results={editable || start.unsaved ? null : (storedResults ?? null)}>
        {editorReady ? null : preview}
        <NotebookEditor
          className={editorReady || !preview ? undefined : "hidden"}
          onEditorReady={() => setEditorReady(true)}
          initialContent={start.content as JSONContent}
          editable={editable}
          ariaLabel={`Text of ${start.title}`}
          onChange={(doc) => change({ content: doc })}
          uploadEntryId={editable ? entryId : undefined}
        />
      </StoredResultsProvider>
    </div>
  );
}
