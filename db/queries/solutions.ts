import { and, asc, eq, gt, inArray, isNull, lte, or } from "drizzle-orm";
import type { Executor } from "../client";
import { blockResults, solutionResults } from "../schema";

type NewSolutionResult = typeof solutionResults.$inferInsert;

/** Stored results of a lab by their input keys. */
export async function findResultsByHash(db: Executor, labId: string, hashes: string[]) {
  if (!hashes.length) return [];
  return db
    .select({
      id: solutionResults.id,
      inputsHash: solutionResults.inputsHash,
      name: solutionResults.name,
      temperatureC: solutionResults.temperatureC,
      solvent: solutionResults.solvent,
      modelUsed: solutionResults.modelUsed,
      ionicStrengthMolal: solutionResults.ionicStrengthMolal,
      ionicStrengthMolar: solutionResults.ionicStrengthMolar,
      debyeLengthNm: solutionResults.debyeLengthNm,
      species: solutionResults.species,
    })
    .from(solutionResults)
    .where(and(eq(solutionResults.labId, labId), inArray(solutionResults.inputsHash, hashes)));
}

/** Inserts a result unless the lab already has one with its key (a concurrent save may). */
export async function insertResult(db: Executor, row: NewSolutionResult): Promise<string> {
  const [inserted] = await db
    .insert(solutionResults)
    .values(row)
    .onConflictDoNothing({ target: [solutionResults.labId, solutionResults.inputsHash] })
    .returning({ id: solutionResults.id });
  if (inserted) return inserted.id;
  const [existing] = await findResultsByHash(db, row.labId, [row.inputsHash]);
  return existing.id;
}

/** The entry's open block rows (its current solutions) with the key of each result. */
export async function openBlockRows(db: Executor, labId: string, entryId: string) {
  return db
    .select({
      id: blockResults.id,
      blockId: blockResults.blockId,
      position: blockResults.position,
      inputsHash: solutionResults.inputsHash,
    })
    .from(blockResults)
    .innerJoin(solutionResults, eq(solutionResults.id, blockResults.resultId))
    .where(
      and(
        eq(blockResults.labId, labId),
        eq(blockResults.entryId, entryId),
        isNull(blockResults.toRevision),
      ),
    );
}

/** Inserts block rows; returns the id of each, by block id. */
export async function insertBlockRows(db: Executor, rows: (typeof blockResults.$inferInsert)[]) {
  if (!rows.length) return new Map<string, string>();
  const inserted = await db
    .insert(blockResults)
    .values(rows)
    .returning({ id: blockResults.id, blockId: blockResults.blockId });
  return new Map(inserted.map((r) => [r.blockId, r.id]));
}

/** Closes open rows at a revision (the only change the database allows on them). */
export async function closeBlockRows(
  db: Executor,
  labId: string,
  ids: string[],
  toRevision: number,
) {
  if (!ids.length) return;
  await db
    .update(blockResults)
    .set({ toRevision })
    .where(
      and(
        eq(blockResults.labId, labId),
        inArray(blockResults.id, ids),
        isNull(blockResults.toRevision),
      ),
    );
}

/** The solutions a revision showed: the block rows whose interval covers it, with results. */
export async function listRevisionSolutions(
  db: Executor,
  labId: string,
  entryId: string,
  revisionNumber: number,
) {
  return db
    .select({ block: blockResults, result: solutionResults })
    .from(blockResults)
    .innerJoin(solutionResults, eq(solutionResults.id, blockResults.resultId))
    .where(
      and(
        eq(blockResults.labId, labId),
        eq(blockResults.entryId, entryId),
        lte(blockResults.fromRevision, revisionNumber),
        or(isNull(blockResults.toRevision), gt(blockResults.toRevision, revisionNumber)),
      ),
    )
    .orderBy(asc(blockResults.position));
}
