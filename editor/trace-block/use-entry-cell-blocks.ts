"use client";

import type { Editor } from "@tiptap/core";
import { useEditorState } from "@tiptap/react";
import type { CellBlockInput } from "@/lib/document/block-schemas";

/** The cell blocks of the entry, in document order; re-renders only when one of them changes. */
export function useEntryCellBlocks(editor: Editor): CellBlockInput[] {
  return (
    useEditorState({
      editor,
      selector: ({ editor: e }) => {
        const found: CellBlockInput[] = [];
        e.state.doc.descendants((node) => {
          if (node.type.name === "cellBlock") found.push(node.attrs as CellBlockInput);
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
