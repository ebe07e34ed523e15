"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import { lazy, Suspense } from "react";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { BlockLoading } from "../block-loading";

// The panel brings lib/chem (about 110 kB gzip with its unit parser): fetched with the first
// block, so an entry of plain text opens without it.
const SolutionBlockPanel = lazy(() =>
  import("./solution-block-panel").then((m) => ({ default: m.SolutionBlockPanel })),
);

/** tiptap node view: the panel inside a non-editable wrapper, writing back through updateAttributes. */
export function SolutionBlockView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  return (
    <NodeViewWrapper contentEditable={false}>
      <Suspense fallback={<BlockLoading kind="solution" />}>
        <SolutionBlockPanel
          value={node.attrs as SolutionBlockInput}
          editable={editable}
          onChange={(next) => updateAttributes(next)}
        />
      </Suspense>
    </NodeViewWrapper>
  );
}
