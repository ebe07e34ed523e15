import { Node, mergeAttributes } from "@tiptap/core";
import { ReactNodeViewRenderer } from "@tiptap/react";
import { defaultCellBlockInput } from "@/lib/document/block-defaults";
import { newBlockId } from "@/lib/document/block-id";
import { cellBlockInputSchema, type CellBlockInput } from "@/lib/document/block-schemas";
import { blockAttributes } from "../block-node-html";
import { insertBlockContent } from "../insert-block";
import { CellBlockView } from "./cell-block-view";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    cellBlock: {
      /** Inserts a cell block; its electrolyte defaults to the entry's last solution block. */
      insertCellBlock: (input?: Partial<CellBlockInput>) => ReturnType;
    };
  }
}

/** A cell preparation block: electrodes, reference, electrolyte link, purge, instrument. */
export const CellBlock = Node.create({
  name: "cellBlock",
  group: "block",
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return blockAttributes(() => defaultCellBlockInput(), cellBlockInputSchema);
  },

  parseHTML() {
    return [{ tag: 'div[data-type="cell-block"]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    return [
      "div",
      mergeAttributes(HTMLAttributes, {
        "data-type": "cell-block",
        "data-block": JSON.stringify(node.attrs),
      }),
    ];
  },

  addCommands() {
    return {
      insertCellBlock:
        (input = {}) =>
        (props) => {
          let lastSolution: string | null = null;
          props.state.doc.descendants((node) => {
            if (node.type.name === "solutionBlock") lastSolution = node.attrs.blockId as string;
            return node.isBlock;
          });
          return insertBlockContent(props, {
            type: this.name,
            attrs: defaultCellBlockInput({
              electrolyteBlockId: lastSolution,
              ...input,
              blockId: newBlockId(),
            }),
          });
        },
    };
  },

  addNodeView() {
    return ReactNodeViewRenderer(CellBlockView);
  },
});
