"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import { lazy, Suspense } from "react";
import type { CellBlockInput } from "@/lib/document/block-schemas";
import { BlockLoading } from "../block-loading";
import { useEntryBlocks } from "../use-entry-blocks";

// Fetched with the first block, like the solution panel (it needs lib/chem too).
const CellBlockPanel = lazy(() =>
  import("./cell-block-panel").then((m) => ({ default: m.CellBlockPanel })),
);

/** tiptap node view of a cell block; it reads the entry's solution blocks for the electrolyte link. */
export function CellBlockView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  const solutions = useEntryBlocks(editor, "solutionBlock");
  return (
    <NodeViewWrapper contentEditable={false}>
      <Suspense fallback={<BlockLoading kind="cell" />}>
        <CellBlockPanel
          value={node.attrs as CellBlockInput}
          solutions={solutions}
          editable={editable}
          onChange={(next) => updateAttributes(next)}
        />
      </Suspense>
    </NodeViewWrapper>
  );
}
