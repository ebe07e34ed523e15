import { and, asc, desc, eq, gt, inArray, isNull, lte, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Executor } from "../client";
import {
  blockResults,
  entries,
  revisions,
  solutionParents,
  solutionResults,
  users,
} from "../schema";

export interface StockRefKey {
  entryId: string;
  blockId: string;
  revision: number;
}

/**
 * The stored result each referenced solution block showed at the referenced revision, for
 * the lab's own entries only: the block row whose interval covers that revision, in an entry
 * that has reached it. A reference to another lab's entry, a revision not saved yet or a block
 * the revision did not show finds nothing.
 */
export async function findStockResults(db: Executor, labId: string, refs: StockRefKey[]) {
  if (!refs.length) return [];
  const matches = refs.map((r) =>
    and(
      eq(blockResults.entryId, r.entryId),
      eq(blockResults.blockId, r.blockId),
      lte(blockResults.fromRevision, r.revision),
      or(isNull(blockResults.toRevision), gt(blockResults.toRevision, r.revision)),
      sql`${entries.currentRevisionNumber} >= ${r.revision}`,
    ),
  );
  const rows = await db
    .select({
      entryId: blockResults.entryId,
      blockId: blockResults.blockId,
      fromRevision: blockResults.fromRevision,
      toRevision: blockResults.toRevision,
      resultId: solutionResults.id,
      results: solutionResults.results,
      name: solutionResults.name,
      solvent: solutionResults.solvent,
      temperatureC: solutionResults.temperatureC,
      entryTitle: entries.title,
    })
    .from(blockResults)
    .innerJoin(
      entries,
      and(eq(entries.id, blockResults.entryId), eq(entries.labId, blockResults.labId)),
    )
    .innerJoin(solutionResults, eq(solutionResults.id, blockResults.resultId))
    .where(and(eq(blockResults.labId, labId), eq(entries.labId, labId), or(...matches)));
  // Each row covers an interval; pair it back with every reference it answers.
  return refs.flatMap((r) => {
    const row = rows.find(
      (x) =>
        x.entryId === r.entryId &&
        x.blockId === r.blockId &&
        x.fromRevision <= r.revision &&
        (x.toRevision === null || x.toRevision > r.revision),
    );
    return row ? [{ ...row, revision: r.revision }] : [];
  });
}

export async function insertParentLinks(
  db: Executor,
  rows: (typeof solutionParents.$inferInsert)[],
) {
  if (rows.length) await db.insert(solutionParents).values(rows);
}

const parentEntries = alias(entries, "parent_entries");
const childEntries = alias(entries, "child_entries");
const parentRows = alias(blockResults, "parent_rows");
const parentResults = alias(solutionResults, "parent_results");
const parentRevisions = alias(revisions, "parent_revisions");
const childRows = alias(blockResults, "child_rows");
/** A link's stock entry, in the link's own lab (the lab id is part of every join). */
const stockEntryOfLink = and(
  eq(parentEntries.id, solutionParents.parentEntryId),
  eq(parentEntries.labId, solutionParents.labId),
);

/**
 * Every use of a solution block of the lab as a stock: the stock (entry, block, revision used,
 * its name, who saved that revision and when) and the child that used it (entry, block,
 * revisions covered). Newest stock revisions first.
 */
export async function listStockUses(db: Executor, labId: string) {
  return db
    .select({
      parentEntryId: solutionParents.parentEntryId,
      parentEntryTitle: parentEntries.title,
      parentBlockId: solutionParents.parentBlockId,
      parentRevision: solutionParents.parentRevision,
      parentCurrentRevision: parentEntries.currentRevisionNumber,
      stockName: parentResults.name,
      stockSpecies: parentResults.species,
      stockHazards: sql<string[]>`coalesce(${parentResults.results} -> 'hazards', '[]'::jsonb)`.as(
        "stock_hazards",
      ),
      madeById: parentRevisions.authorId,
      madeByName: users.name,
      madeAt: parentRevisions.createdAt,
      childEntryId: solutionParents.entryId,
      childEntryTitle: childEntries.title,
      childBlockId: solutionParents.blockId,
      childFromRevision: childRows.fromRevision,
      childToRevision: childRows.toRevision,
      volumeMl: solutionParents.volumeMl,
      finalVolumeMl: solutionParents.finalVolumeMl,
    })
    .from(solutionParents)
    .innerJoin(parentEntries, stockEntryOfLink)
    .innerJoin(
      childEntries,
      and(
        eq(childEntries.id, solutionParents.entryId),
        eq(childEntries.labId, solutionParents.labId),
      ),
    )
    .innerJoin(parentResults, eq(parentResults.id, solutionParents.parentResultId))
    .innerJoin(childRows, eq(childRows.id, solutionParents.blockResultId))
    .innerJoin(
      parentRevisions,
      and(
        eq(parentRevisions.entryId, solutionParents.parentEntryId),
        eq(parentRevisions.number, solutionParents.parentRevision),
      ),
    )
    .innerJoin(users, eq(users.id, parentRevisions.authorId))
    .where(eq(solutionParents.labId, labId))
    .orderBy(
      desc(parentRevisions.createdAt),
      asc(solutionParents.parentBlockId),
      asc(childEntries.title),
      asc(childRows.fromRevision),
    );
}

/**
 * The stocks of an entry's current solution blocks, each with the stock block's state now: the
 * result its entry's current revision shows (null when the block left the document) and that
 * entry's current revision, so a newer stock revision can be told.
 */
export async function listCurrentStockLinks(db: Executor, labId: string, entryId: string) {
  return db
    .select({
      blockId: solutionParents.blockId,
      childBlockName: childRows.name,
      position: solutionParents.position,
      parentEntryId: solutionParents.parentEntryId,
      parentEntryTitle: parentEntries.title,
      parentBlockId: solutionParents.parentBlockId,
      parentRevision: solutionParents.parentRevision,
      parentResultId: solutionParents.parentResultId,
      parentCurrentRevision: parentEntries.currentRevisionNumber,
      parentCurrentResultId: parentRows.resultId,
      parentCurrentName: parentRows.name,
    })
    .from(solutionParents)
    .innerJoin(
      childRows,
      and(eq(childRows.id, solutionParents.blockResultId), isNull(childRows.toRevision)),
    )
    .innerJoin(parentEntries, stockEntryOfLink)
    .leftJoin(
      parentRows,
      and(
        eq(parentRows.labId, solutionParents.labId),
        eq(parentRows.entryId, solutionParents.parentEntryId),
        eq(parentRows.blockId, solutionParents.parentBlockId),
        isNull(parentRows.toRevision),
      ),
    )
    .where(and(eq(solutionParents.labId, labId), eq(solutionParents.entryId, entryId)))
    .orderBy(asc(childRows.position), asc(solutionParents.position));
}

/** The first revision after `after` in which a block's stored result changed (or it left). */
export async function findBlockChangeRevision(
  db: Executor,
  labId: string,
  entryId: string,
  blockId: string,
  after: number,
) {
  const [row] = await db
    .select({ toRevision: blockResults.toRevision })
    .from(blockResults)
    .where(
      and(
        eq(blockResults.labId, labId),
        eq(blockResults.entryId, entryId),
        eq(blockResults.blockId, blockId),
        lte(blockResults.fromRevision, after),
        or(isNull(blockResults.toRevision), gt(blockResults.toRevision, after)),
      ),
    )
    .limit(1);
  return row?.toRevision ?? null;
}

/** Amendment facts of a few revisions of one entry (for "amended: reason"). */
export async function findRevisionsMeta(
  db: Executor,
  labId: string,
  entryId: string,
  numbers: number[],
) {
  if (!numbers.length) return [];
  return db
    .select({
      number: revisions.number,
      amendmentReason: revisions.amendmentReason,
      createdAt: revisions.createdAt,
    })
    .from(revisions)
    .innerJoin(entries, eq(entries.id, revisions.entryId))
    .where(
      and(
        eq(entries.labId, labId),
        eq(revisions.entryId, entryId),
        inArray(revisions.number, numbers),
      ),
    );
}
