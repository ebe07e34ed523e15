"use client";

import type { Editor } from "@tiptap/core";
import { useCallback, useRef, useState } from "react";
import type { AttachmentDto } from "@/lib/contract/traces";

export interface UploadItem {
  key: number;
  name: string;
  /** 0–1 while sending. */
  progress: number;
  status: "sending" | "processing" | "done" | "failed" | "cancelled";
  message?: string;
}

/** The node an uploaded file becomes at the cursor: a figure, a trace block, or a file link. */
function insertFor(editor: Editor, file: AttachmentDto) {
  const chain = editor.chain().focus();
  if (file.kind === "photo") chain.insertAttachmentFigure({ attachmentId: file.id }).run();
  else if (file.kind === "trace")
    chain
      .insertTraceBlock({ attachmentId: file.id, name: file.name.replace(/\.[^.]*$/, "") })
      .run();
  else chain.insertAttachmentFile({ attachmentId: file.id, name: file.name }).run();
}

/**
 * Uploads files to the entry one request each (XMLHttpRequest: fetch reports no upload
 * progress), each with its progress and a cancel, and inserts each finished file at the cursor.
 */
export function useUploads(entryId: string, editor: Editor | null) {
  const [items, setItems] = useState<UploadItem[]>([]);
  const requests = useRef(new Map<number, XMLHttpRequest>());
  const next = useRef(1);

  const update = (key: number, patch: Partial<UploadItem>) =>
    setItems((list) => list.map((i) => (i.key === key ? { ...i, ...patch } : i)));

  const upload = useCallback(
    (files: File[]) => {
      for (const file of files) {
        const key = next.current++;
        setItems((list) => [...list, { key, name: file.name, progress: 0, status: "sending" }]);
        const xhr = new XMLHttpRequest();
        requests.current.set(key, xhr);
        xhr.open("POST", `/api/entries/${entryId}/attachments`);
        xhr.responseType = "json";
        xhr.upload.onprogress = (e) => {
          if (e.lengthComputable) update(key, { progress: e.loaded / e.total });
        };
        xhr.upload.onload = () => update(key, { progress: 1, status: "processing" });
        xhr.onload = () => {
          requests.current.delete(key);
          const body = xhr.response as {
            attachments?: AttachmentDto[];
            error?: { message: string };
          } | null;
          if (xhr.status === 201 && body?.attachments) {
            update(key, {
              status: "done",
              message: body.attachments[0]?.duplicate
                ? "already attached: inserted again"
                : undefined,
            });
            if (editor) for (const f of body.attachments) insertFor(editor, f);
          } else {
            update(key, {
              status: "failed",
              message: body?.error?.message ?? `The server answered ${xhr.status}.`,
            });
          }
        };
        xhr.onerror = () => {
          requests.current.delete(key);
          update(key, { status: "failed", message: "The server cannot be reached." });
        };
        xhr.onabort = () => {
          requests.current.delete(key);
          update(key, { status: "cancelled" });
        };
        const form = new FormData();
        form.append("file", file, file.name);
        xhr.send(form);
      }
    },
    [entryId, editor],
  );

  const cancel = useCallback((key: number) => requests.current.get(key)?.abort(), []);
  const dismiss = useCallback(
    (key: number) => setItems((list) => list.filter((i) => i.key !== key)),
    [],
  );
  return { items, upload, cancel, dismiss };
}
