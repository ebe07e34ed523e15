import "server-only";
import type { Executor } from "@/db/client";
import { findLabEntry } from "@/db/queries/entries";
import type { Actor } from "@/lib/rules/authorize";
import { assertEntryAllows, entryFactsOf, type EntryAction } from "@/lib/rules/entry-rules";
import { AppError } from "@/lib/errors";
import { parseRecordId } from "@/lib/validation/parse";

/**
 * Loads an entry of the actor's lab and checks the action against the entry rules, in one
 * step, so no service can read or change an entry without asking the rules first. With
 * `forUpdate` the row stays locked until the transaction ends, so the state the rules saw is
 * the state the write changes.
 */
export async function loadEntryFor(
  db: Executor,
  actor: Actor,
  rawEntryId: string,
  action: EntryAction,
  { forUpdate = false }: { forUpdate?: boolean } = {},
) {
  const entry = await findLabEntry(db, actor.labId, parseRecordId(rawEntryId, "Entry"), forUpdate);
  if (!entry) throw new AppError("not_found", "Entry not found.");
  assertEntryAllows(actor, entryFactsOf(entry), action);
  return entry;
}
