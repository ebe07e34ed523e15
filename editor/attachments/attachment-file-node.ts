import { Node, mergeAttributes } from "@tiptap/core";
import { insertBlockContent } from "../insert-block";

declare module "@tiptap/core" {
  interface Commands<ReturnType> {
    attachmentFile: {
      /** Inserts a link to an attached file. */
      insertAttachmentFile: (attrs: { attachmentId: string; name: string }) => ReturnType;
    };
  }
}

/** Any other attached file (a PDF, an archive…): a download link in the text. */
export const AttachmentFile = Node.create({
  name: "attachmentFile",
  group: "block",
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      attachmentId: { default: null, rendered: false },
      name: { default: "", rendered: false },
    };
  },

  parseHTML() {
    return [
      {
        tag: 'p[data-type="attachment-file"]',
        getAttrs: (el) => ({
          attachmentId: el.getAttribute("data-attachment"),
          name: el.textContent ?? "",
        }),
      },
    ];
  },

  renderHTML({ node, HTMLAttributes }) {
    const id = node.attrs.attachmentId as string;
    return [
      "p",
      mergeAttributes(HTMLAttributes, {
        "data-type": "attachment-file",
        "data-attachment": id,
        class: "attachment-file",
      }),
      ["a", { href: `/api/attachments/${id}`, download: "" }, `↓ ${node.attrs.name as string}`],
    ];
  },

  addCommands() {
    return {
      insertAttachmentFile: (attrs) => (props) =>
        insertBlockContent(props, { type: this.name, attrs }),
    };
  },
});
