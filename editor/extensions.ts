import type { AnyExtension } from "@tiptap/core";
import StarterKit from "@tiptap/starter-kit";
import { TableKit } from "@tiptap/extension-table";
import { TaskItem, TaskList } from "@tiptap/extension-list";
import { Mathematics } from "@tiptap/extension-mathematics";
import { Placeholder } from "@tiptap/extensions";
import { BlockIdGuard } from "./block-id-guard";
import { CellBlock } from "./cell-block/cell-block-node";
import { EntryLink } from "./link-policy";
import { PasteSanitizer } from "./paste-sanitizer";
import { SolutionBlock } from "./solution-block/solution-block-node";
import { TraceBlock } from "./trace-block/trace-block-node";
import { AttachmentFigure } from "./attachments/attachment-figure-node";
import { AttachmentFile } from "./attachments/attachment-file-node";

export interface EditorExtensionOptions {
  placeholder?: string;
  /** Called when an equation is clicked, to edit its TeX. */
  onEditMath?: (kind: "inline" | "block", latex: string, pos: number) => void;
}

/** The editor's schema and behaviour. Node names here are the ones lib/entries allows. */
export function buildEditorExtensions({
  placeholder,
  onEditMath,
}: EditorExtensionOptions = {}): AnyExtension[] {
  return [
    StarterKit.configure({
      heading: { levels: [1, 2, 3, 4] },
      link: false, // EntryLink below: the same mark, storing only its href
    }),
    EntryLink,
    TableKit.configure({ table: { resizable: false } }),
    TaskList,
    TaskItem.configure({ nested: true }),
    Mathematics.configure({
      katexOptions: { throwOnError: false, strict: "ignore", trust: false },
      inlineOptions: {
        onClick: (node, pos) => onEditMath?.("inline", node.attrs.latex as string, pos),
      },
      blockOptions: {
        onClick: (node, pos) => onEditMath?.("block", node.attrs.latex as string, pos),
      },
    }),
    Placeholder.configure({
      placeholder: placeholder ?? "Write the entry. Type $$…$$ for an equation.",
    }),
    SolutionBlock,
    CellBlock,
    TraceBlock,
    AttachmentFigure,
    AttachmentFile,
    BlockIdGuard,
    PasteSanitizer,
  ];
}
