"use client";
import type { JSONContent } from "@tiptap/core";
import { NotebookEditor } from "@/editor/notebook-editor";
import { StoredResultsProvider } from "@/editor/stored-results";
import type { StoredSolution } from "@/lib/document/stored-evaluation";

/**
 * A saved revision shown with the same editor, read-only. Its solution blocks show the numbers
 * stored when it was saved (and say where today's engine would differ).
 */
export function ReadOnlyDocument({
  content,
  storedResults,
}: {
  content: unknown;
  storedResults: Readonly<Record<string, StoredSolution>>;
}) {
  return (
    <StoredResultsProvider results={storedResults}>
      <NotebookEditor
        initialContent={content as JSONContent}
        editable={false}
        ariaLabel="Revision text (read-only)"
      />
    </StoredResultsProvider>
  );
}
