import { Node, mergeAttributes } from "@tiptap/core";
import { ReactNodeViewRenderer } from "@tiptap/react";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { newBlockId } from "@/lib/document/block-id";
import { solutionBlockInputSchema, type SolutionBlockInput } from "@/lib/document/block-schemas";
import { blockAttributes } from "../block-node-html";
import { insertBlockContent } from "../insert-block";
import { SolutionBlockView } from "./solution-block-view";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    solutionBlock: {
      /** Inserts a solution block at the selection, with a new id. */
      insertSolutionBlock: (input?: Partial<SolutionBlockInput>) => ReturnType;
    };
  }
}

/**
 * A live solution block. Its attributes hold only the inputs (components, solvent,
 * temperature, density, model); results are recomputed from them in the node view and,
 * on save, by the server.
 */
export const SolutionBlock = Node.create({
  name: "solutionBlock",
  group: "block",
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return blockAttributes(() => defaultSolutionBlockInput(), solutionBlockInputSchema);
  },

  parseHTML() {
    return [{ tag: 'div[data-type="solution-block"]' }];
  },

  renderHTML({ node, HTMLAttributes }) {
    return [
      "div",
      mergeAttributes(HTMLAttributes, {
        "data-type": "solution-block",
        "data-block": JSON.stringify(node.attrs),
      }),
    ];
  },

  addCommands() {
    return {
      insertSolutionBlock:
        (input = {}) =>
        (props) =>
          insertBlockContent(props, {
            type: this.name,
            attrs: defaultSolutionBlockInput({ ...input, blockId: newBlockId() }),
          }),
    };
  },

  addNodeView() {
    return ReactNodeViewRenderer(SolutionBlockView);
  },
});
