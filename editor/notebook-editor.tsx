"use client";

import "katex/dist/katex.min.css";
import "./notebook-editor.css";
import type { Editor, JSONContent } from "@tiptap/core";
import { EditorContent, useEditor } from "@tiptap/react";
import { useEffect, useMemo, useRef, useState } from "react";
import { cx } from "@/lib/ui/class-names";
import { buildEditorExtensions } from "./extensions";
import { EditorPrompts } from "./toolbar/editor-prompts";
import { EditorToolbar, type ToolbarPrompt } from "./toolbar/editor-toolbar";
import { looksLikeExport } from "./attachments/looks-like-export";
import { UploadPanel } from "./attachments/upload-panel";
import { useUploads } from "./attachments/use-uploads";
import { useBlockHighlight } from "./use-block-highlight";

export interface NotebookEditorProps {
  /** The entry's tiptap JSON as saved (a revision's document). Read once, at mount. */
  initialContent?: JSONContent;
  /** False for submitted or countersigned entries: text and blocks are read-only. */
  editable?: boolean;
  /** Called with the whole document after every change (debounce in the caller for autosave). */
  onChange?: (doc: JSONContent) => void;
  placeholder?: string;
  /** Accessible name of the editing area, e.g. the entry title. */
  ariaLabel?: string;
  className?: string;
  /** Receives the tiptap editor once it exists (focus, tests); most pages do not need it. */
  onEditorReady?: (editor: Editor) => void;
  /** The entry files are uploaded to (drop, paste, the toolbar's Attach); none: no uploads. */
  uploadEntryId?: string;
}

/**
 * The notebook editor: rich text with tables, checklists, links and TeX equations, plus the
 * live solution and cell blocks. It owns no saving: the page passes the saved document in
 * and receives every change through `onChange`.
 */
export function NotebookEditor({
  initialContent,
  editable = true,
  onChange,
  placeholder,
  ariaLabel = "Entry text",
  className,
  onEditorReady,
  uploadEntryId,
}: NotebookEditorProps) {
  const [prompt, setPrompt] = useState<ToolbarPrompt | null>(null);
  const onChangeRef = useRef(onChange);
  onChangeRef.current = onChange;
  const promptRef = useRef(setPrompt);
  const uploadRef = useRef<((files: File[]) => void) | null>(null);

  // The schema (and its placeholder) is fixed for the editor's lifetime.
  const initialPlaceholder = useRef(placeholder);
  const extensions = useMemo(
    () =>
      buildEditorExtensions({
        placeholder: initialPlaceholder.current,
        onEditMath: (kind, latex, pos) =>
          promptRef.current({ kind: "math", display: kind === "block", latex, pos }),
      }),
    [],
  );

  // A new editorProps object on every render would make tiptap re-apply its options on
  // every keystroke of the parent's state; build it once per label.
  const editorProps = useMemo(
    () => ({
      attributes: {
        "aria-label": ariaLabel,
        "aria-multiline": "true",
        role: "textbox",
        class: "ionleaf-prose",
      },
      // Files dropped or pasted into the text are uploaded to the entry and inserted where
      // they land; pasted text that is an instrument export becomes a file and a trace block.
      handleDrop: (_view: unknown, event: DragEvent) => {
        const files = [...(event.dataTransfer?.files ?? [])];
        if (!files.length || !uploadRef.current) return false;
        event.preventDefault();
        uploadRef.current(files);
        return true;
      },
      handlePaste: (_view: unknown, event: ClipboardEvent) => {
        if (!uploadRef.current) return false;
        const files = [...(event.clipboardData?.files ?? [])];
        if (files.length) {
          uploadRef.current(files);
          return true;
        }
        const text = event.clipboardData?.getData("text/plain") ?? "";
        if (looksLikeExport(text)) {
          const stamp = new Date().toISOString().slice(0, 19).replace(/[:T]/g, "-");
          uploadRef.current([
            new File([text], `pasted-export-${stamp}.txt`, { type: "text/plain" }),
          ]);
          return true;
        }
        return false;
      },
      handleKeyDown: (_view: unknown, event: KeyboardEvent) => {
        if ((event.ctrlKey || event.metaKey) && event.key.toLowerCase() === "k") {
          event.preventDefault();
          promptRef.current({ kind: "link" });
          return true;
        }
        return false;
      },
    }),
    [ariaLabel],
  );

  const editor = useEditor({
    immediatelyRender: false,
    extensions,
    content: initialContent ?? { type: "doc", content: [{ type: "paragraph" }] },
    editable,
    editorProps,
    onUpdate: ({ editor: e }) => onChangeRef.current?.(e.getJSON()),
  });

  // Once per editor instance; a new callback identity must not re-announce it.
  const onEditorReadyRef = useRef(onEditorReady);
  onEditorReadyRef.current = onEditorReady;
  useEffect(() => {
    if (editor) onEditorReadyRef.current?.(editor);
  }, [editor]);

  useEffect(() => {
    if (editor && editor.isEditable !== editable) editor.setEditable(editable, false);
  }, [editor, editable]);

  const uploads = useUploads(uploadEntryId ?? "", editor);
  const canUpload = Boolean(uploadEntryId) && editable;
  uploadRef.current = canUpload ? uploads.upload : null;

  useBlockHighlight(editor !== null);

  return (
    <div
      className={cx(
        "ionleaf-editor relative rounded-lg border border-ink-faint/40 bg-paper text-ink",
        className,
      )}
    >
      {editor && editable ? (
        <div className="sticky top-0 z-10 rounded-t-lg">
          <EditorToolbar
            editor={editor}
            onPrompt={setPrompt}
            onAttach={canUpload ? uploads.upload : undefined}
          />
          <UploadPanel
            items={uploads.items}
            onCancel={uploads.cancel}
            onDismiss={uploads.dismiss}
          />
          {prompt ? (
            <EditorPrompts editor={editor} prompt={prompt} onClose={() => setPrompt(null)} />
          ) : null}
        </div>
      ) : null}
      <EditorContent editor={editor} className="px-6 py-4" />
    </div>
  );
}
