import type { EntryStatus } from "./vocabulary";

/** One row of GET /api/entries and of the bench lists. Dates are ISO 8601 strings. */
export interface EntryListItem {
  id: string;
  title: string;
  status: EntryStatus;
  revision: number;
  projectId: string;
  projectName: string;
  authorId: string;
  authorName: string;
  createdAt: string;
  updatedAt: string;
  archived: boolean;
}

export interface EntryListResponse {
  entries: EntryListItem[];
}

/** PUT /api/entries/:id/content answers with this. */
export interface SaveResult {
  revision: number;
  contentHash: string;
  /** False when the document was identical to the current revision: nothing was written. */
  created: boolean;
  solutions: number;
  /** Solution rows this save wrote: zero when no solution block changed. */
  solutionRowsWritten: number;
}
