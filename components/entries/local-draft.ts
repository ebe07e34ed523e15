/**
 * Unsaved edits kept in the browser until the server has them, so a reload or a crashed tab
 * loses nothing. One record per entry, written on every change, removed once saved.
 */
export interface LocalDraft {
  baseRevision: number;
  title: string;
  content: unknown;
  keptAt: string;
  /** Saves sent on this base whose answer never came (see UnansweredSaves). */
  unanswered?: UnansweredSaves;
}

/**
 * Saves sent against `base` whose answer was lost (network error or 5xx): the server may have
 * committed one of them as revision base + 1 before it went away. `hashes` are their content
 * hashes, newest last, so a later 409 can tell "my own save" from "someone else's".
 */
export interface UnansweredSaves {
  base: number;
  hashes: string[];
}

const key = (entryId: string) => `ionleaf:entry-draft:${entryId}`;

export function readLocalDraft(entryId: string): LocalDraft | null {
  try {
    const raw = window.localStorage.getItem(key(entryId));
    return raw ? (JSON.parse(raw) as LocalDraft) : null;
  } catch {
    return null;
  }
}

export function writeLocalDraft(entryId: string, draft: Omit<LocalDraft, "keptAt">): void {
  try {
    window.localStorage.setItem(
      key(entryId),
      JSON.stringify({ ...draft, keptAt: new Date().toISOString() }),
    );
  } catch {
    // Storage full or disabled: the server save still runs; nothing else to do here.
  }
}

export function clearLocalDraft(entryId: string): void {
  try {
    window.localStorage.removeItem(key(entryId));
  } catch {
    /* see writeLocalDraft */
  }
}
