"use client";

import type { Editor } from "@tiptap/core";
import { useEditorState } from "@tiptap/react";
import type { TraceBlockInput } from "@/lib/document/block-schemas";

/** The trace blocks of the entry, in document order; re-renders only when one of them changes. */
export function useEntryTraceBlocks(editor: Editor): TraceBlockInput[] {
  return (
    useEditorState({
      editor,
      selector: ({ editor: e }) => {
        const found: TraceBlockInput[] = [];
        e.state.doc.descendants((node) => {
          if (node.type.name === "traceBlock") found.push(node.attrs as TraceBlockInput);
          return !node.isTextblock;
        });
        return found;
      },
      equalityFn: (a, b) =>
        a === b ||
        (a !== null &&
          b !== null &&
          a.length === b.length &&
          a.every((block, i) => block === b[i])),
    }) ?? []
  );
}
