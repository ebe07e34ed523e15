"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import { lazy, Suspense } from "react";
import type { TraceBlockInput } from "@/lib/document/block-schemas";
import { BlockLoading } from "../block-loading";

// The panel brings the plotting library; it loads with the first trace block only (or
// earlier, when the entry page knows it holds traces).
const importPanel = () => import("./trace-block-panel");
let panelModule: ReturnType<typeof importPanel> | null = null;
export const preloadTraceBlock = () => (panelModule ??= importPanel());
const TraceBlockPanel = lazy(() =>
  preloadTraceBlock().then((m) => ({ default: m.TraceBlockPanel })),
);

/** tiptap node view of a trace block, writing back through updateAttributes. */
export function TraceBlockView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  return (
    <NodeViewWrapper contentEditable={false}>
      <Suspense fallback={<BlockLoading kind="trace" />}>
        <TraceBlockPanel
          editor={editor}
          value={node.attrs as TraceBlockInput}
          editable={editable}
          onChange={(next) => updateAttributes(next)}
        />
      </Suspense>
    </NodeViewWrapper>
  );
}
