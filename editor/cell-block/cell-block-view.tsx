"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import type { CellBlockInput } from "@/lib/entries/block-schemas";
import { CellBlockPanel } from "./cell-block-panel";
import { useEntrySolutionBlocks } from "./use-entry-solution-blocks";

/** tiptap node view of a cell block; it reads the entry's solution blocks for the electrolyte link. */
export function CellBlockView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  const solutions = useEntrySolutionBlocks(editor);
  return (
    <NodeViewWrapper contentEditable={false}>
      <CellBlockPanel value={node.attrs as CellBlockInput} solutions={solutions} editable={editable} onChange={(next) => updateAttributes(next)} />
    </NodeViewWrapper>
  );
}
