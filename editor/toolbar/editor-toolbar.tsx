"use client";

import type { Editor } from "@tiptap/core";
import { useEditorState } from "@tiptap/react";
import { useRef, type KeyboardEvent } from "react";
import { ToolbarButton, ToolbarDivider } from "./toolbar-button";

export type ToolbarPrompt =
  { kind: "link" } | { kind: "math"; display: boolean; latex: string; pos?: number };

interface EditorToolbarProps {
  editor: Editor;
  onPrompt: (prompt: ToolbarPrompt) => void;
  /** Uploads chosen files to the entry; absent when the entry takes no files. */
  onAttach?: (files: File[]) => void;
}

/** Ionleaf's compact toolbar: text structure on the left, live blocks on the right in copper. */
export function EditorToolbar({ editor, onPrompt, onAttach }: EditorToolbarProps) {
  const state = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      h1: e.isActive("heading", { level: 1 }),
      h2: e.isActive("heading", { level: 2 }),
      h3: e.isActive("heading", { level: 3 }),
      bold: e.isActive("bold"),
      italic: e.isActive("italic"),
      code: e.isActive("code"),
      codeBlock: e.isActive("codeBlock"),
      bulletList: e.isActive("bulletList"),
      orderedList: e.isActive("orderedList"),
      taskList: e.isActive("taskList"),
      link: e.isActive("link"),
      inTable: e.isActive("table"),
    }),
  });
  const chain = () => editor.chain().focus();
  return (
    <div
      role="toolbar"
      aria-label="Entry formatting"
      onKeyDown={moveFocusWithArrows}
      className="flex flex-wrap items-center gap-0.5 border-b border-ink-faint/30 bg-paper px-2 py-1"
    >
      {([1, 2, 3] as const).map((level) => (
        <ToolbarButton
          key={level}
          label={`Heading ${level}`}
          shortcut={`Ctrl+Alt+${level}`}
          active={state[`h${level}`]}
          onClick={() => chain().toggleHeading({ level }).run()}
        >
          H{level}
        </ToolbarButton>
      ))}
      <ToolbarDivider />
      <ToolbarButton
        label="Bold"
        shortcut="Ctrl+B"
        active={state.bold}
        onClick={() => chain().toggleBold().run()}
      >
        <strong>B</strong>
      </ToolbarButton>
      <ToolbarButton
        label="Italic"
        shortcut="Ctrl+I"
        active={state.italic}
        onClick={() => chain().toggleItalic().run()}
      >
        <em className="font-serif">I</em>
      </ToolbarButton>
      <ToolbarButton
        label="Inline code"
        shortcut="Ctrl+E"
        active={state.code}
        onClick={() => chain().toggleCode().run()}
      >
        <span className="font-mono">`a`</span>
      </ToolbarButton>
      <ToolbarButton
        label="Code block"
        shortcut="Ctrl+Alt+C"
        active={state.codeBlock}
        onClick={() => chain().toggleCodeBlock().run()}
      >
        <span className="font-mono">{"{ }"}</span>
      </ToolbarButton>
      <ToolbarDivider />
      <ToolbarButton
        label="Bulleted list"
        active={state.bulletList}
        onClick={() => chain().toggleBulletList().run()}
      >
        • List
      </ToolbarButton>
      <ToolbarButton
        label="Numbered list"
        active={state.orderedList}
        onClick={() => chain().toggleOrderedList().run()}
      >
        1. List
      </ToolbarButton>
      <ToolbarButton
        label="Checklist"
        active={state.taskList}
        onClick={() => chain().toggleTaskList().run()}
      >
        ☐ Checklist
      </ToolbarButton>
      {state.inTable ? (
        <>
          <ToolbarButton label="Add table row below" onClick={() => chain().addRowAfter().run()}>
            + Row
          </ToolbarButton>
          <ToolbarButton
            label="Add table column right"
            onClick={() => chain().addColumnAfter().run()}
          >
            + Col
          </ToolbarButton>
          <ToolbarButton label="Delete table row" onClick={() => chain().deleteRow().run()}>
            − Row
          </ToolbarButton>
          <ToolbarButton label="Delete table column" onClick={() => chain().deleteColumn().run()}>
            − Col
          </ToolbarButton>
          <ToolbarButton label="Delete table" onClick={() => chain().deleteTable().run()}>
            − Table
          </ToolbarButton>
        </>
      ) : (
        <ToolbarButton
          label="Insert table"
          onClick={() => chain().insertTable({ rows: 3, cols: 3, withHeaderRow: true }).run()}
        >
          Table
        </ToolbarButton>
      )}
      <ToolbarDivider />
      <ToolbarButton
        label="Link"
        shortcut="Ctrl+K"
        active={state.link}
        onClick={() => onPrompt({ kind: "link" })}
      >
        Link
      </ToolbarButton>
      <ToolbarButton
        label="Inline equation (TeX)"
        onClick={() => onPrompt({ kind: "math", display: false, latex: "" })}
      >
        <span className="font-serif italic">x²</span>
      </ToolbarButton>
      <ToolbarButton
        label="Display equation (TeX)"
        onClick={() => onPrompt({ kind: "math", display: true, latex: "" })}
      >
        <span className="font-serif">∑</span>
      </ToolbarButton>
      <span className="ml-auto" />
      <ToolbarButton
        accent
        label="Insert solution block"
        onClick={() => chain().insertSolutionBlock().run()}
      >
        + Solution
      </ToolbarButton>
      <ToolbarButton
        accent
        label="Insert cell block"
        onClick={() => chain().insertCellBlock().run()}
      >
        + Cell
      </ToolbarButton>
      {onAttach ? <AttachButtons onAttach={onAttach} /> : null}
    </div>
  );
}

/** Arrow keys, Home and End move between the toolbar's buttons (ARIA toolbar pattern). */
function moveFocusWithArrows(event: KeyboardEvent<HTMLDivElement>) {
  const buttons = Array.from(
    event.currentTarget.querySelectorAll<HTMLButtonElement>("button:not(:disabled)"),
  );
  const index = buttons.indexOf(document.activeElement as HTMLButtonElement);
  if (index < 0) return;
  const next =
    event.key === "ArrowRight"
      ? (index + 1) % buttons.length
      : event.key === "ArrowLeft"
        ? (index - 1 + buttons.length) % buttons.length
        : event.key === "Home"
          ? 0
          : event.key === "End"
            ? buttons.length - 1
            : null;
  if (next === null) return;
  event.preventDefault();
  buttons[next].focus();
}

/**
 * Attach files through the system picker (several at once), or take a photo: on a phone or a
 * tablet the second button opens the camera.
 */
function AttachButtons({ onAttach }: { onAttach: (files: File[]) => void }) {
  const files = useRef<HTMLInputElement>(null);
  const camera = useRef<HTMLInputElement>(null);
  const take = (input: HTMLInputElement | null) => {
    if (!input?.files?.length) return;
    onAttach([...input.files]);
    input.value = "";
  };
  return (
    <>
      <ToolbarButton accent label="Attach files" onClick={() => files.current?.click()}>
        + Files
      </ToolbarButton>
      <ToolbarButton accent label="Take a photo" onClick={() => camera.current?.click()}>
        + Photo
      </ToolbarButton>
      <input
        ref={files}
        type="file"
        multiple
        hidden
        aria-label="Files to attach"
        data-testid="attach-input"
        onChange={(e) => take(e.currentTarget)}
      />
      <input
        ref={camera}
        type="file"
        accept="image/*"
        capture="environment"
        hidden
        aria-label="Photo to attach"
        onChange={(e) => take(e.currentTarget)}
      />
    </>
  );
}
