import { Node, mergeAttributes } from "@tiptap/core";
import { insertBlockContent } from "../insert-block";
import { ReactNodeViewRenderer } from "@tiptap/react";
import { AttachmentFigureView } from "./attachment-figure-view";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    attachmentFigure: {
      /** Inserts an uploaded photo as a figure. */
      insertAttachmentFigure: (attrs: { attachmentId: string; caption?: string }) => ReturnType;
    };
  }
}

/** A photo attached to the entry, shown as a figure with its caption; click to enlarge. */
export const AttachmentFigure = Node.create({
  name: "attachmentFigure",
  group: "block",
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      attachmentId: { default: null, rendered: false },
      caption: { default: "", rendered: false },
    };
  },

  parseHTML() {
    return [
      {
        tag: 'figure[data-type="attachment-figure"]',
        getAttrs: (el) => ({
          attachmentId: el.getAttribute("data-attachment"),
          caption: el.getAttribute("data-caption") ?? "",
        }),
      },
    ];
  },

  renderHTML({ node, HTMLAttributes }) {
    return [
      "figure",
      mergeAttributes(HTMLAttributes, {
        "data-type": "attachment-figure",
        "data-attachment": node.attrs.attachmentId as string,
        "data-caption": node.attrs.caption as string,
      }),
    ];
  },

  addCommands() {
    return {
      insertAttachmentFigure:
        ({ attachmentId, caption = "" }) =>
        (props) =>
          insertBlockContent(props, { type: this.name, attrs: { attachmentId, caption } }),
    };
  },

  addNodeView() {
    return ReactNodeViewRenderer(AttachmentFigureView);
  },
});
