"use client";

import { NodeViewWrapper, useEditorState, type ReactNodeViewProps } from "@tiptap/react";
import { useState } from "react";
import { TextField } from "../ui/text-field";

/** The photo's web-sized copy with its caption; a click opens it large, with the original a link away. */
export function AttachmentFigureView({ node, editor, updateAttributes }: ReactNodeViewProps) {
  const editable = useEditorState({ editor, selector: ({ editor: e }) => e.isEditable });
  const [open, setOpen] = useState(false);
  const id = node.attrs.attachmentId as string;
  const caption = node.attrs.caption as string;
  const src = `/api/attachments/${id}?variant=web`;
  return (
    <NodeViewWrapper contentEditable={false}>
      <figure className="my-4 space-y-2 rounded-lg border border-ink-faint/30 bg-white/70 p-3">
        <button
          type="button"
          className="block w-full cursor-zoom-in"
          onClick={() => setOpen(true)}
          aria-label={`Enlarge the photo${caption ? `: ${caption}` : ""}`}
        >
          {/* eslint-disable-next-line @next/next/no-img-element -- a private, authorised file route, not a static asset */}
          <img
            src={src}
            alt={caption || "Photo attached to the entry"}
            className="mx-auto max-h-96 rounded"
            loading="lazy"
          />
        </button>
        <figcaption>
          {editable ? (
            <TextField
              label="Caption"
              hideLabel
              maxLength={500}
              placeholder="Caption, e.g. cell before purging"
              value={caption}
              onValueChange={(next) => updateAttributes({ caption: next })}
            />
          ) : (
            <p className="text-sm text-ink-soft">{caption}</p>
          )}
        </figcaption>
      </figure>
      {open ? (
        <div
          role="dialog"
          aria-modal="true"
          aria-label={caption || "Photo"}
          className="fixed inset-0 z-50 flex items-center justify-center bg-ink/80 p-6"
          onClick={() => setOpen(false)}
          onKeyDown={(e) => e.key === "Escape" && setOpen(false)}
        >
          {/* eslint-disable-next-line @next/next/no-img-element -- see above */}
          <img
            src={src}
            alt={caption || "Photo attached to the entry"}
            className="max-h-full max-w-full rounded shadow-xl"
          />
          <div className="absolute top-4 right-4 flex gap-2">
            <a
              className="btn-quiet"
              href={`/api/attachments/${id}`}
              onClick={(e) => e.stopPropagation()}
            >
              Original
            </a>
            <button type="button" className="btn-quiet" autoFocus onClick={() => setOpen(false)}>
              Close
            </button>
          </div>
        </div>
      ) : null}
    </NodeViewWrapper>
  );
}
