"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import type { SolutionBlockInput } from "@/lib/entries/block-schemas";
import { SolutionBlockPanel } from "./solution-block-panel";

/** tiptap node view: the panel inside a non-editable wrapper, writing back through updateAttributes. */
export function SolutionBlockView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  return (
    <NodeViewWrapper contentEditable={false}>
      <SolutionBlockPanel
        value={node.attrs as SolutionBlockInput}
        editable={editable}
        onChange={(next) => updateAttributes(next)}
      />
    </NodeViewWrapper>
  );
}
