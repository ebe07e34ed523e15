import { and, desc, eq, gte, isNull, lte, sql, type SQL } from "drizzle-orm";
import type { Executor } from "../client";
import { blockResults, entries, users } from "../schema";

export interface SolutionFinderFilter {
  labId: string;
  ionicStrengthMin?: number;
  ionicStrengthMax?: number;
  species: string[];
  temperatureMin?: number;
  temperatureMax?: number;
  solvent?: string;
  authorId?: string;
  createdFrom?: Date;
  createdTo?: Date;
  limit: number;
}

/** Solutions as they stand in each entry's current revision: the open block rows. */
export async function findSolutions(db: Executor, f: SolutionFinderFilter) {
  const where: SQL[] = [
    eq(blockResults.labId, f.labId),
    isNull(blockResults.toRevision),
    isNull(entries.archivedAt),
  ];
  if (f.ionicStrengthMin !== undefined)
    where.push(gte(blockResults.ionicStrengthMolal, f.ionicStrengthMin));
  if (f.ionicStrengthMax !== undefined)
    where.push(lte(blockResults.ionicStrengthMolal, f.ionicStrengthMax));
  if (f.species.length) where.push(sql`${blockResults.species} @> ${sql.param(f.species)}::text[]`);
  if (f.temperatureMin !== undefined) where.push(gte(blockResults.temperatureC, f.temperatureMin));
  if (f.temperatureMax !== undefined) where.push(lte(blockResults.temperatureC, f.temperatureMax));
  if (f.solvent) where.push(eq(blockResults.solvent, f.solvent));
  if (f.authorId) where.push(eq(entries.authorId, f.authorId));
  if (f.createdFrom) where.push(gte(blockResults.createdAt, f.createdFrom));
  if (f.createdTo) where.push(lte(blockResults.createdAt, f.createdTo));
  return db
    .select({
      id: blockResults.id,
      name: blockResults.name,
      blockId: blockResults.blockId,
      entryId: entries.id,
      entryTitle: entries.title,
      ionicStrengthMolal: blockResults.ionicStrengthMolal,
      ionicStrengthMolar: blockResults.ionicStrengthMolar,
      debyeLengthNm: blockResults.debyeLengthNm,
      temperatureC: blockResults.temperatureC,
      solvent: blockResults.solvent,
      modelUsed: blockResults.modelUsed,
      species: blockResults.species,
      authorName: users.name,
      createdAt: blockResults.createdAt,
    })
    .from(blockResults)
    .innerJoin(entries, eq(entries.id, blockResults.entryId))
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(and(...where))
    .orderBy(desc(blockResults.createdAt))
    .limit(f.limit);
}
