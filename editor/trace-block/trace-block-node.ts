import { Node, mergeAttributes } from "@tiptap/core";
import { ReactNodeViewRenderer } from "@tiptap/react";
import { defaultTraceBlockInput } from "@/lib/document/block-defaults";
import { newBlockId } from "@/lib/document/block-id";
import { traceBlockInputSchema, type TraceBlockInput } from "@/lib/document/block-schemas";
import { blockAttributes } from "../block-node-html";
import { insertBlockContent } from "../insert-block";
import { TraceBlockView } from "./trace-block-view";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    traceBlock: {
      /** Inserts a trace block for an uploaded instrument export. */
      insertTraceBlock: (input: Partial<TraceBlockInput> & { attachmentId: string }) => ReturnType;
    };
  }
}

/**
 * A trace block: an attached instrument export, plotted. Its attributes say which file and how
 * to show it; the data are read back from the file by the server when the block is shown.
 */
export const TraceBlock = Node.create({
  name: "traceBlock",
  group: "block",
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return blockAttributes(
      () => defaultTraceBlockInput({ attachmentId: "00000000-0000-4000-8000-000000000000" }),
      traceBlockInputSchema,
    );
  },

  parseHTML() {
    return [{ tag: 'div[data-type="trace-block"]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    return [
      "div",
      mergeAttributes(HTMLAttributes, {
        "data-type": "trace-block",
        "data-block": JSON.stringify(node.attrs),
      }),
    ];
  },

  addCommands() {
    return {
      insertTraceBlock: (input) => (props) =>
        insertBlockContent(props, {
          type: this.name,
          attrs: defaultTraceBlockInput({ ...input, blockId: newBlockId() }),
        }),
    };
  },

  addNodeView() {
    return ReactNodeViewRenderer(TraceBlockView);
  },
});
