"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import { lazy, Suspense } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { TracePreview } from "@/components/traces/trace-preview";
import { traceViewQueryKey, type TraceViewDto } from "@/lib/contract/traces";
import type { TraceBlockInput } from "@/lib/document/block-schemas";
import { BlockLoading } from "../block-loading";

// The panel brings the plotting library; it loads with the first trace block only (or
// earlier, when the entry page knows it holds traces).
// import() of a module already asked for answers the same promise: calling it again is free.
export const preloadTraceBlock = () => import("./trace-block-panel");
const TraceBlockPanel = lazy(() =>
  preloadTraceBlock().then((m) => ({ default: m.TraceBlockPanel })),
);

/** tiptap node view of a trace block, writing back through updateAttributes. */
export function TraceBlockView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  // The view sent with the page keeps the still picture on screen while the plot code loads.
  const cached = useQueryClient().getQueryData<TraceViewDto>(
    traceViewQueryKey((node.attrs as TraceBlockInput).attachmentId),
  );
  return (
    <NodeViewWrapper contentEditable={false}>
      <Suspense
        fallback={
          cached ? (
            <div data-live-block="trace" aria-busy="true" className="my-4">
              <TracePreview view={cached} />
            </div>
          ) : (
            <BlockLoading kind="trace" />
          )
        }
      >
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
