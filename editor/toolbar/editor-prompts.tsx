"use client";

import type { Editor } from "@tiptap/core";
import { isSafeHref } from "@/lib/document/safe-href";
import { Tex } from "../ui/tex";
import type { ToolbarPrompt } from "./editor-toolbar";
import { PromptPopover } from "./prompt-popover";

interface EditorPromptsProps {
  editor: Editor;
  prompt: ToolbarPrompt;
  onClose: () => void;
}

/** The link and equation dialogs opened from the toolbar (or by clicking an equation). */
export function EditorPrompts({ editor, prompt, onClose }: EditorPromptsProps) {
  if (prompt.kind === "link") {
    const current = (editor.getAttributes("link").href as string | undefined) ?? "";
    return (
      <PromptPopover
        title="Link"
        label="Address"
        initialValue={current}
        submitLabel={current ? "Update link" : "Add link"}
        validate={(value) =>
          value.trim() === "" || isSafeHref(normaliseHref(value))
            ? undefined
            : "Only http, https and mailto links are allowed."
        }
        onCancel={onClose}
        onRemove={
          current
            ? () => (editor.chain().focus().extendMarkRange("link").unsetLink().run(), onClose())
            : undefined
        }
        onSubmit={(value) => {
          const href = normaliseHref(value);
          const chain = editor.chain().focus().extendMarkRange("link");
          if (href === "") chain.unsetLink().run();
          else if (editor.state.selection.empty && !current)
            chain
              .insertContent({
                type: "text",
                text: href,
                marks: [{ type: "link", attrs: { href } }],
              })
              .run();
          else chain.setLink({ href }).run();
          onClose();
        }}
      />
    );
  }
  const editing = prompt.pos !== undefined;
  return (
    <PromptPopover
      title={prompt.display ? "Display equation" : "Inline equation"}
      label="TeX"
      multiline
      initialValue={prompt.latex}
      submitLabel={editing ? "Update equation" : "Insert equation"}
      validate={(value) =>
        value.trim() === ""
          ? "Type the equation in TeX, e.g. E = E^\\circ - \\frac{RT}{nF}\\ln Q"
          : undefined
      }
      onCancel={onClose}
      onRemove={
        editing
          ? () => {
              const chain = editor.chain().focus();
              (prompt.display
                ? chain.deleteBlockMath({ pos: prompt.pos })
                : chain.deleteInlineMath({ pos: prompt.pos })
              ).run();
              onClose();
            }
          : undefined
      }
      onSubmit={(latex) => {
        const chain = editor.chain().focus();
        if (prompt.display)
          (editing
            ? chain.updateBlockMath({ latex, pos: prompt.pos })
            : chain.insertBlockMath({ latex })
          ).run();
        else
          (editing
            ? chain.updateInlineMath({ latex, pos: prompt.pos })
            : chain.insertInlineMath({ latex })
          ).run();
        onClose();
      }}
    >
      {(value) => (
        <div
          className="mt-2 min-h-10 overflow-x-auto rounded border border-ink-faint/30 bg-paper px-2 py-1"
          aria-label="Preview"
        >
          {value.trim() ? (
            <Tex tex={value} display={prompt.display} />
          ) : (
            <span className="text-xs text-ink-faint">Preview</span>
          )}
        </div>
      )}
    </PromptPopover>
  );
}

/** "example.org/x" → "https://example.org/x"; in-app paths, anchors and mailto stay as typed. */
function normaliseHref(value: string): string {
  const trimmed = value.trim();
  if (
    trimmed === "" ||
    /^[a-z][a-z0-9+.-]*:/i.test(trimmed) ||
    trimmed.startsWith("/") ||
    trimmed.startsWith("#")
  )
    return trimmed;
  return `https://${trimmed}`;
}
