"use client";
import type { JSONContent } from "@tiptap/core";
import { NotebookEditor } from "@/editor/notebook-editor";

/** A saved revision shown with the same editor, read-only: blocks still show their numbers. */
export function ReadOnlyDocument({ content }: { content: unknown }) {
  return (
    <NotebookEditor
      initialContent={content as JSONContent}
      editable={false}
      ariaLabel="Revision text (read-only)"
    />
  );
}
