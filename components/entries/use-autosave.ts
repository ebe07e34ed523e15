"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { canonicalHash } from "@/lib/document/canonical-hash";
import { safeParseEntryDocument } from "@/lib/document/document-schema";
import { ApiError, apiFetch } from "@/lib/ui/api-client";
import { clearLocalDraft, writeLocalDraft, type UnansweredSaves } from "./local-draft";

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
  /** Saves on this base that were sent but never answered (kept with the local copy). */
  unanswered?: UnansweredSaves;
}

const DEBOUNCE_MS = 1200;
const RETRY_MS = 5000;
const MAX_UNANSWERED = 20;

/** The content hash the server would record for this save (as lib/document/prepare-revision). */
function saveHash(title: string, content: unknown): string | null {
  const parsed = safeParseEntryDocument(content);
  return parsed.success ? canonicalHash({ title: title.trim(), content: parsed.data }) : null;
}

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
  // A save whose answer was lost may still have been committed (the server died between the
  // commit and the reply). A later 409 naming exactly base + 1 with one of these hashes is
  // that save, not someone else's: the editor adopts it instead of asking the user.
  const unanswered = useRef<UnansweredSaves | null>(start.unanswered ?? null);
  const keepLocal = useCallback(() => {
    writeLocalDraft(entryId, {
      baseRevision: base.current,
      ...latest.current,
      unanswered: unanswered.current ?? undefined,
    });
  }, [entryId]);

  const save = useCallback(
    async (force = false) => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = null;
      if (inFlight.current || !dirty.current || (inConflict.current && !force)) return;
      inConflict.current = false;
      inFlight.current = true;
      dirty.current = false;
      const sent = latest.current;
      const sentBase = base.current;
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
        unanswered.current = null;
        if (dirty.current) keepLocal();
        else clearLocalDraft(entryId);
        setState({ status: dirty.current ? "unsaved" : "saved", revision: result.revision });
        if (dirty.current) retryIn = DEBOUNCE_MS;
      } catch (error) {
        dirty.current = true; // what was sent is not on the server: it must go again
        const e =
          error instanceof ApiError
            ? error
            : new ApiError(0, "offline", "The server cannot be reached.");
        const lost = unanswered.current;
        if (
          e.status === 409 &&
          lost !== null &&
          e.details?.currentRevision === lost.base + 1 &&
          typeof e.details.currentContentHash === "string" &&
          lost.hashes.includes(e.details.currentContentHash)
        ) {
          // Our own save, committed before the server went away: build on it and save again.
          base.current = lost.base + 1;
          unanswered.current = null;
          keepLocal();
          setState({ status: "unsaved", revision: base.current });
          retryIn = 0;
        } else if (e.status === 409 && e.details && "currentRevision" in e.details) {
          inConflict.current = true;
          setState((s) => ({ ...s, status: "conflict", message: e.message }));
        } else if (e.status === 0 || e.status >= 500) {
          const hash = saveHash(sent.title, sent.content);
          if (hash !== null) {
            const kept = unanswered.current?.base === sentBase ? unanswered.current.hashes : [];
            unanswered.current = {
              base: sentBase,
              hashes: [...kept.filter((h) => h !== hash), hash].slice(-MAX_UNANSWERED),
            };
            keepLocal();
          }
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
    [entryId, keepLocal],
  );

  const change = useCallback(
    (next: { title?: string; content?: unknown }) => {
      latest.current = { ...latest.current, ...next };
      dirty.current = true;
      keepLocal();
      // Same object when nothing changes, so a keystroke does not re-render the page.
      setState((s) =>
        s.status === "conflict" || s.status === "unsaved" ? s : { ...s, status: "unsaved" },
      );
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void save(), DEBOUNCE_MS);
    },
    [keepLocal, save],
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
