import { and, eq, inArray } from "drizzle-orm";
import type { Executor } from "../client";
import { attachments, traceMappings } from "../schema";

/** Inserts the row unless the entry already has that content; returns the entry's row either way. */
export async function insertAttachment(db: Executor, row: typeof attachments.$inferInsert) {
  const [inserted] = await db
    .insert(attachments)
    .values(row)
    .onConflictDoNothing({ target: [attachments.entryId, attachments.sha256] })
    .returning();
  if (inserted) return { row: inserted, created: true };
  const [existing] = await db
    .select()
    .from(attachments)
    .where(
      and(
        eq(attachments.labId, row.labId),
        eq(attachments.entryId, row.entryId),
        eq(attachments.sha256, row.sha256),
      ),
    );
  return { row: existing, created: false };
}

export async function findLabAttachment(db: Executor, labId: string, id: string) {
  const [row] = await db
    .select()
    .from(attachments)
    .where(and(eq(attachments.labId, labId), eq(attachments.id, id)));
  return row ?? null;
}

export async function listEntryAttachments(db: Executor, labId: string, entryId: string) {
  return db
    .select()
    .from(attachments)
    .where(and(eq(attachments.labId, labId), eq(attachments.entryId, entryId)))
    .orderBy(attachments.createdAt);
}

/** The entry's attachments among the given ids (a document may reference only its own). */
export async function findEntryAttachments(
  db: Executor,
  labId: string,
  entryId: string,
  ids: string[],
) {
  if (!ids.length) return [];
  return db
    .select()
    .from(attachments)
    .where(
      and(
        eq(attachments.labId, labId),
        eq(attachments.entryId, entryId),
        inArray(attachments.id, ids),
      ),
    );
}

export async function findTraceMapping(db: Executor, labId: string, layoutKey: string) {
  const [row] = await db
    .select()
    .from(traceMappings)
    .where(and(eq(traceMappings.labId, labId), eq(traceMappings.layoutKey, layoutKey)));
  return row ?? null;
}

export async function saveTraceMapping(db: Executor, row: typeof traceMappings.$inferInsert) {
  await db
    .insert(traceMappings)
    .values(row)
    .onConflictDoUpdate({
      target: [traceMappings.labId, traceMappings.layoutKey],
      set: {
        mapping: row.mapping,
        columns: row.columns,
        createdById: row.createdById,
        updatedAt: new Date(),
      },
    });
}
