"use client";

import type { Editor } from "@tiptap/core";
import { useEditorState } from "@tiptap/react";
import type {
  CellBlockInput,
  SolutionBlockInput,
  TraceBlockInput,
} from "@/lib/document/block-schemas";

interface BlockAttrs {
  solutionBlock: SolutionBlockInput;
  cellBlock: CellBlockInput;
  traceBlock: TraceBlockInput;
}

/**
 * The entry's blocks of one kind, in document order. Re-renders the caller only when one of
 * them changes (their attributes are compared by identity), not on every keystroke.
 */
export function useEntryBlocks<K extends keyof BlockAttrs>(
  editor: Editor,
  type: K,
): BlockAttrs[K][] {
  return (
    useEditorState({
      editor,
      selector: ({ editor: e }) => {
        const found: BlockAttrs[K][] = [];
        e.state.doc.descendants((node) => {
          if (node.type.name === type) found.push(node.attrs as BlockAttrs[K]);
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
