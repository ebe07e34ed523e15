import { and, asc, desc, eq, ilike, isNull, isNotNull, sql, type SQL } from "drizzle-orm";
import type { Executor } from "../client";
import { entries, projects, revisions, users, type EntryStatus } from "../schema";

export interface EntryListFilter {
  labId: string;
  projectId?: string;
  status?: EntryStatus;
  authorId?: string;
  search?: string;
  archived?: boolean;
  sort: "updatedAt" | "createdAt" | "title" | "status";
  order: "asc" | "desc";
  limit: number;
}

const SORT_COLUMNS = {
  updatedAt: entries.updatedAt,
  createdAt: entries.createdAt,
  title: entries.title,
  status: entries.status,
};

export async function listEntries(db: Executor, f: EntryListFilter) {
  const where: SQL[] = [
    eq(entries.labId, f.labId),
    f.archived ? isNotNull(entries.archivedAt) : isNull(entries.archivedAt),
  ];
  if (f.projectId) where.push(eq(entries.projectId, f.projectId));
  if (f.status) where.push(eq(entries.status, f.status));
  if (f.authorId) where.push(eq(entries.authorId, f.authorId));
  if (f.search)
    where.push(ilike(entries.title, `%${f.search.replace(/[%_\\]/g, (c) => `\\${c}`)}%`));
  const column = SORT_COLUMNS[f.sort];
  return db
    .select({
      id: entries.id,
      title: entries.title,
      status: entries.status,
      revision: entries.currentRevisionNumber,
      createdAt: entries.createdAt,
      updatedAt: entries.updatedAt,
      archivedAt: entries.archivedAt,
      authorId: entries.authorId,
      authorName: users.name,
      projectId: entries.projectId,
      projectName: projects.name,
    })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.authorId))
    .innerJoin(projects, eq(projects.id, entries.projectId))
    .where(and(...where))
    .orderBy(f.order === "asc" ? asc(column) : desc(column), desc(entries.id))
    .limit(f.limit);
}

export async function countEntriesByStatus(db: Executor, labId: string, status: EntryStatus) {
  const rows = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(entries)
    .where(and(eq(entries.labId, labId), eq(entries.status, status), isNull(entries.archivedAt)));
  return rows[0]?.n ?? 0;
}

/** The entry row, scoped to a lab; `forUpdate` locks it for the rest of the transaction. */
export async function findLabEntry(
  db: Executor,
  labId: string,
  entryId: string,
  forUpdate = false,
) {
  const query = db
    .select()
    .from(entries)
    .where(and(eq(entries.labId, labId), eq(entries.id, entryId)))
    .limit(1);
  const rows = forUpdate ? await query.for("update") : await query;
  return rows[0] ?? null;
}

export async function findEntryHeader(db: Executor, labId: string, entryId: string) {
  const rows = await db
    .select({ entry: entries, authorName: users.name, projectName: projects.name })
    .from(entries)
    .innerJoin(users, eq(users.id, entries.authorId))
    .innerJoin(projects, eq(projects.id, entries.projectId))
    .where(and(eq(entries.labId, labId), eq(entries.id, entryId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function insertEntry(db: Executor, values: typeof entries.$inferInsert) {
  const rows = await db.insert(entries).values(values).returning();
  return rows[0];
}

export async function updateEntry(
  db: Executor,
  labId: string,
  entryId: string,
  values: Partial<typeof entries.$inferInsert>,
) {
  const rows = await db
    .update(entries)
    .set(values)
    .where(and(eq(entries.labId, labId), eq(entries.id, entryId)))
    .returning();
  return rows[0] ?? null;
}

export async function insertRevision(db: Executor, values: typeof revisions.$inferInsert) {
  const rows = await db.insert(revisions).values(values).returning();
  return rows[0];
}

export async function findRevision(db: Executor, entryId: string, number: number) {
  const rows = await db
    .select({ revision: revisions, authorName: users.name })
    .from(revisions)
    .innerJoin(users, eq(users.id, revisions.authorId))
    .where(and(eq(revisions.entryId, entryId), eq(revisions.number, number)))
    .limit(1);
  return rows[0] ?? null;
}

export async function listRevisions(db: Executor, entryId: string) {
  return db
    .select({
      id: revisions.id,
      number: revisions.number,
      title: revisions.title,
      content: revisions.content,
      contentHash: revisions.contentHash,
      amendsRevisionNumber: revisions.amendsRevisionNumber,
      amendmentReason: revisions.amendmentReason,
      createdAt: revisions.createdAt,
      authorName: users.name,
    })
    .from(revisions)
    .innerJoin(users, eq(users.id, revisions.authorId))
    .where(eq(revisions.entryId, entryId))
    .orderBy(desc(revisions.number));
}
