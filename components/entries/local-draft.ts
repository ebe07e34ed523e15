/**
 * Unsaved edits kept in the browser until the server has them, so a reload or a crashed tab
 * loses nothing. One record per entry, written on every change, removed once saved.
 */
export interface LocalDraft {
  baseRevision: number;
  title: string;
  content: unknown;
  keptAt: string;
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
