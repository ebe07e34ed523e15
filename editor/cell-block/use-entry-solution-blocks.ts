"use client";

import type { Editor } from "@tiptap/core";
import { useEditorState } from "@tiptap/react";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";

/**
 * The solution blocks of the entry the editor holds, in document order. Re-renders the
 * caller only when one of them changes (compared by their attributes), not on every keystroke.
 */
export function useEntrySolutionBlocks(editor: Editor): SolutionBlockInput[] {
  return (
    useEditorState({
      editor,
      selector: ({ editor: e }) => {
        const found: SolutionBlockInput[] = [];
        e.state.doc.descendants((node) => {
          if (node.type.name === "solutionBlock") found.push(node.attrs as SolutionBlockInput);
          // Blocks live at the top level or inside containers; never inside text.
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
