import type { EntryStatus, Role } from "@/lib/contract/vocabulary";
import { AppError } from "@/lib/errors";

/**
 * What a member may do with an entry now, from the entry's state and the member's role. The
 * one place this is decided: services call `assertEntryAllows` before they touch an entry,
 * pages and route handlers ask `entryActions` what to offer. Anything not allowed here is
 * refused on the server whatever the client shows.
 *
 * States: draft → submitted → countersigned; submitted → returned (editable) → submitted;
 * countersigned → amended (a new revision with a reason, editable) → submitted. Archived is
 * a flag beside the state; a submitted entry can never be archived, so archiving never takes
 * an entry out of the review queue.
 */
export const ENTRY_ACTIONS = [
  "view",
  "edit",
  "submit",
  "archive",
  "restore",
  "countersign",
  "return",
  "amend",
] as const;
export type EntryAction = (typeof ENTRY_ACTIONS)[number];

export interface EntryFacts {
  labId: string;
  authorId: string;
  status: EntryStatus;
  archived: boolean;
  /** Number of the newest revision; 0 before the first save. */
  currentRevisionNumber: number;
  /** The newest countersigned revision, or null. */
  signedRevisionNumber: number | null;
}

export interface MemberFacts {
  userId: string;
  labId: string;
  role: Role;
}

/** `forbidden` (403): the member's role or relation to the entry; `conflict` (409): its state. */
export type EntryDecision =
  | { allowed: true }
  | { allowed: false; code: "not_found" | "forbidden" | "conflict"; reason: string };

const ALLOW: EntryDecision = { allowed: true };
const forbidden = (reason: string): EntryDecision => ({
  allowed: false,
  code: "forbidden",
  reason,
});
const conflict = (reason: string): EntryDecision => ({ allowed: false, code: "conflict", reason });

/** States in which the author changes the content. */
const EDITABLE_STATES: readonly EntryStatus[] = ["draft", "returned", "amended"];

const STATE_REASONS: Record<EntryStatus, string> = {
  draft: "This entry is a draft.",
  submitted:
    "This entry waits for a countersignature; it is read-only until it is countersigned or returned.",
  countersigned: "This entry is countersigned; change it through an amendment.",
  returned: "This entry was returned to its author for changes.",
  amended: "An amendment of this entry is in progress.",
};

function authorOnly(member: MemberFacts, entry: EntryFacts, what: string): EntryDecision | null {
  return member.userId === entry.authorId ? null : forbidden(`Only the author ${what}.`);
}

function notArchived(entry: EntryFacts, what: string): EntryDecision | null {
  return entry.archived ? conflict(`This entry is archived; restore it before you ${what}.`) : null;
}

function reviewer(member: MemberFacts, entry: EntryFacts, what: string): EntryDecision {
  if (member.role !== "supervisor") return forbidden(`Only a supervisor of the lab can ${what}.`);
  if (member.userId === entry.authorId) return forbidden(`You cannot ${what} your own entry.`);
  if (entry.status !== "submitted")
    return conflict(`${STATE_REASONS[entry.status]} Only a submitted entry can be reviewed.`);
  return ALLOW;
}

const RULES: Record<EntryAction, (member: MemberFacts, entry: EntryFacts) => EntryDecision> = {
  view: () => ALLOW,
  edit: (member, entry) =>
    authorOnly(member, entry, "edits this entry") ??
    notArchived(entry, "edit it") ??
    (EDITABLE_STATES.includes(entry.status) ? ALLOW : conflict(STATE_REASONS[entry.status])),
  submit: (member, entry) =>
    authorOnly(member, entry, "submits this entry") ??
    notArchived(entry, "submit it") ??
    (!EDITABLE_STATES.includes(entry.status)
      ? conflict(STATE_REASONS[entry.status])
      : entry.currentRevisionNumber === 0
        ? conflict("Write something before submitting: the entry has no saved revision.")
        : entry.status === "amended" &&
            entry.currentRevisionNumber <= (entry.signedRevisionNumber ?? 0)
          ? conflict("Change something before submitting the amendment.")
          : ALLOW),
  archive: (member, entry) =>
    (member.userId === entry.authorId || member.role === "admin"
      ? null
      : forbidden("Only the author or a lab admin archives an entry.")) ??
    (entry.archived
      ? conflict("This entry is already archived.")
      : entry.status === "submitted"
        ? conflict(
            "This entry waits for a countersignature; it stays in the review queue until it is countersigned or returned.",
          )
        : ALLOW),
  restore: (member, entry) =>
    (member.userId === entry.authorId || member.role === "admin"
      ? null
      : forbidden("Only the author or a lab admin restores an entry.")) ??
    (entry.archived ? ALLOW : conflict("This entry is not archived.")),
  countersign: (member, entry) => reviewer(member, entry, "countersign"),
  return: (member, entry) => reviewer(member, entry, "return"),
  amend: (member, entry) =>
    authorOnly(member, entry, "amends this entry") ??
    notArchived(entry, "amend it") ??
    (entry.status === "countersigned"
      ? ALLOW
      : conflict(`${STATE_REASONS[entry.status]} Only a countersigned entry is amended.`)),
};

export function decideEntryAction(
  member: MemberFacts,
  entry: EntryFacts,
  action: EntryAction,
): EntryDecision {
  // Another lab's entry does not exist for this member (404, never 403).
  if (member.labId !== entry.labId)
    return { allowed: false, code: "not_found", reason: "Entry not found." };
  return RULES[action](member, entry);
}

/** Every action with its decision: what a page offers and what the API reports. */
export function entryActions(
  member: MemberFacts,
  entry: EntryFacts,
): Record<EntryAction, EntryDecision> {
  return Object.fromEntries(
    ENTRY_ACTIONS.map((action) => [action, decideEntryAction(member, entry, action)]),
  ) as Record<EntryAction, EntryDecision>;
}

/** Throws the decision's typed error (404, 403 or 409) when the action is not allowed. */
export function assertEntryAllows(
  member: MemberFacts,
  entry: EntryFacts,
  action: EntryAction,
): void {
  const decision = decideEntryAction(member, entry, action);
  if (!decision.allowed) {
    throw new AppError(decision.code, decision.reason, {
      details: { action, status: entry.status, archived: entry.archived },
    });
  }
}

/** The facts the rules read, from an entry row. */
export function entryFactsOf(row: {
  labId: string;
  authorId: string;
  status: EntryStatus;
  archivedAt: Date | null;
  currentRevisionNumber: number;
  signedRevisionNumber: number | null;
}): EntryFacts {
  return {
    labId: row.labId,
    authorId: row.authorId,
    status: row.status,
    archived: row.archivedAt !== null,
    currentRevisionNumber: row.currentRevisionNumber,
    signedRevisionNumber: row.signedRevisionNumber,
  };
}
