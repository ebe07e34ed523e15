"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { ApiError, apiFetch } from "@/lib/ui/api-client";
import { clearLocalDraft, writeLocalDraft } from "./local-draft";

type SaveStatus = "saved" | "unsaved" | "saving" | "offline" | "conflict" | "refused";

export interface AutosaveState {
  status: SaveStatus;
  revision: number;
  message?: string;
  problems?: string[];
  /** Why the last conflict choice could not be carried out (e.g. offline). */
  choiceFailed?: string;
}

export interface AutosaveStart {
  /** The revision the content below is based on. */
  revision: number;
  title: string;
  content: unknown;
  /** True when the content came back from this browser and is not on the server yet. */
  unsaved: boolean;
}

const DEBOUNCE_MS = 1200;
const RETRY_MS = 5000;

/**
 * Debounced autosave against the revision the editor started from. The newest edit always
 * lives in localStorage first; the server's answer decides what happens next: saved (clear
 * the local copy), 409 (the user chooses), 422 (refused, local copy kept), offline (retry).
 */
export function useAutosave(entryId: string, start: AutosaveStart) {
  const [state, setState] = useState<AutosaveState>({
    status: start.unsaved ? "unsaved" : "saved",
    revision: start.revision,
  });
  const latest = useRef({ title: start.title, content: start.content });
  const base = useRef(start.revision);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef(false);
  const dirty = useRef(start.unsaved);
  // While a conflict waits for the user's choice, autosave holds back (no PUT every 1.2 s).
  const inConflict = useRef(false);

  const save = useCallback(
    async (force = false) => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
      if (inFlight.current || !dirty.current || (inConflict.current && !force)) return;
      inConflict.current = false;
      inFlight.current = true;
      dirty.current = false;
      const sent = latest.current;
      setState((s) => ({ ...s, status: "saving", message: undefined, choiceFailed: undefined }));
      let retryIn: number | null = null;
      try {
        const result = await apiFetch<{ revision: number }>(`/api/entries/${entryId}/content`, {
          method: "PUT",
          body: JSON.stringify({
            baseRevision: base.current,
            title: sent.title,
            content: sent.content,
          }),
        });
        base.current = result.revision;
        if (dirty.current)
          writeLocalDraft(entryId, { baseRevision: base.current, ...latest.current });
        else clearLocalDraft(entryId);
        setState({ status: dirty.current ? "unsaved" : "saved", revision: result.revision });
        if (dirty.current) retryIn = DEBOUNCE_MS;
      } catch (error) {
        dirty.current = true; // what was sent is not on the server: it must go again
        const e =
          error instanceof ApiError
            ? error
            : new ApiError(0, "offline", "The server cannot be reached.");
        if (e.status === 409 && e.details && "currentRevision" in e.details) {
          inConflict.current = true;
          setState((s) => ({ ...s, status: "conflict", message: e.message }));
        } else if (e.status === 0 || e.status >= 500) {
          setState((s) => ({ ...s, status: "offline", message: e.message }));
          retryIn = RETRY_MS;
        } else {
          const problems = Array.isArray(e.details?.problems)
            ? (e.details.problems as string[])
            : undefined;
          setState((s) => ({ ...s, status: "refused", message: e.message, problems }));
        }
      } finally {
        inFlight.current = false;
      }
      if (retryIn !== null) timer.current = setTimeout(() => void save(), retryIn);
    },
    [entryId],
  );

  const change = useCallback(
    (next: { title?: string; content?: unknown }) => {
      latest.current = { ...latest.current, ...next };
      dirty.current = true;
      writeLocalDraft(entryId, { baseRevision: base.current, ...latest.current });
      // Same object when nothing changes, so a keystroke does not re-render the page.
      setState((s) =>
        s.status === "conflict" || s.status === "unsaved" ? s : { ...s, status: "unsaved" },
      );
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void save(), DEBOUNCE_MS);
    },
    [entryId, save],
  );

  /** After a 409: put my version on top of the newer revision (it becomes the next revision). */
  const keepMine = useCallback(async () => {
    try {
      const current = await apiFetch<{ entry: { revision: number } }>(`/api/entries/${entryId}`);
      base.current = current.entry.revision;
    } catch (error) {
      setState((s) => ({
        ...s,
        choiceFailed: error instanceof Error ? error.message : "The server cannot be reached.",
      }));
      return; // still in conflict: the choice stays on screen
    }
    dirty.current = true;
    await save(true);
  }, [entryId, save]);

  /** After a 409: drop my edits and load the newer revision. */
  const discardMine = useCallback(() => {
    clearLocalDraft(entryId);
    window.location.reload();
  }, [entryId]);

  useEffect(() => {
    if (dirty.current) void save(); // content restored from this browser goes to the server first
    const online = () => {
      if (dirty.current) void save();
    };
    const beforeUnload = (event: BeforeUnloadEvent) => {
      if (dirty.current || inFlight.current) event.preventDefault();
    };
    window.addEventListener("online", online);
    window.addEventListener("beforeunload", beforeUnload);
    return () => {
      window.removeEventListener("online", online);
      window.removeEventListener("beforeunload", beforeUnload);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [save]);

  return { state, change, keepMine, discardMine };
}
