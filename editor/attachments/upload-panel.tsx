"use client";

import type { UploadItem } from "./use-uploads";

/** One line per file: a progress bar while it travels, then done or why it failed. */
export function UploadPanel({
  items,
  onCancel,
  onDismiss,
}: {
  items: UploadItem[];
  onCancel: (key: number) => void;
  onDismiss: (key: number) => void;
}) {
  if (items.length === 0) return null;
  return (
    <ul
      className="space-y-1.5 border-b border-ink-faint/30 bg-paper-deep/70 px-3 py-2 text-xs"
      aria-label="Uploads"
    >
      {items.map((item) => (
        <li
          key={item.key}
          className="flex flex-wrap items-center gap-3"
          data-testid="upload-item"
          data-status={item.status}
        >
          <span className="min-w-0 flex-1 truncate font-medium">{item.name}</span>
          {item.status === "sending" || item.status === "processing" ? (
            <>
              <progress
                className="h-2 w-40 accent-lagoon-600"
                max={1}
                value={item.status === "processing" ? undefined : item.progress}
                aria-label={`Upload of ${item.name}`}
              />
              <span className="text-ink-soft" aria-live="polite">
                {item.status === "processing" ? "reading…" : `${Math.round(item.progress * 100)} %`}
              </span>
              <button
                type="button"
                className="text-copper-700 hover:underline"
                onClick={() => onCancel(item.key)}
              >
                Cancel<span className="sr-only"> the upload of {item.name}</span>
              </button>
            </>
          ) : (
            <>
              <span
                role={item.status === "failed" ? "alert" : "status"}
                className={item.status === "failed" ? "text-red-700" : "text-ink-soft"}
              >
                {item.status === "done"
                  ? `attached${item.message ? ` (${item.message})` : ""}`
                  : item.status === "cancelled"
                    ? "cancelled"
                    : item.message}
              </span>
              <button
                type="button"
                className="text-ink-soft hover:underline"
                onClick={() => onDismiss(item.key)}
              >
                Dismiss<span className="sr-only"> the line for {item.name}</span>
              </button>
            </>
          )}
        </li>
      ))}
    </ul>
  );
}
