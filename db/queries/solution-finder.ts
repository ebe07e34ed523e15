import { and, desc, eq, gte, isNull, lte, sql, type SQL } from "drizzle-orm";
import type { Executor } from "../client";
import { entries, revisions, solutions, users } from "../schema";

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

/** Solutions as they stand in each entry's current revision (older revisions are history). */
export async function findSolutions(db: Executor, f: SolutionFinderFilter) {
  const where: SQL[] = [
    eq(solutions.labId, f.labId),
    isNull(entries.archivedAt),
    sql`${revisions.number} = ${entries.currentRevisionNumber}`,
  ];
  if (f.ionicStrengthMin !== undefined)
    where.push(gte(solutions.ionicStrengthMolal, f.ionicStrengthMin));
  if (f.ionicStrengthMax !== undefined)
    where.push(lte(solutions.ionicStrengthMolal, f.ionicStrengthMax));
  if (f.species.length) where.push(sql`${solutions.species} @> ${sql.param(f.species)}::text[]`);
  if (f.temperatureMin !== undefined) where.push(gte(solutions.temperatureC, f.temperatureMin));
  if (f.temperatureMax !== undefined) where.push(lte(solutions.temperatureC, f.temperatureMax));
  if (f.solvent) where.push(eq(solutions.solvent, f.solvent));
  if (f.authorId) where.push(eq(entries.authorId, f.authorId));
  if (f.createdFrom) where.push(gte(solutions.createdAt, f.createdFrom));
  if (f.createdTo) where.push(lte(solutions.createdAt, f.createdTo));
  return db
    .select({
      id: solutions.id,
      name: solutions.name,
      blockId: solutions.blockId,
      entryId: entries.id,
      entryTitle: entries.title,
      ionicStrengthMolal: solutions.ionicStrengthMolal,
      ionicStrengthMolar: solutions.ionicStrengthMolar,
      debyeLengthNm: solutions.debyeLengthNm,
      temperatureC: solutions.temperatureC,
      solvent: solutions.solvent,
      modelUsed: solutions.modelUsed,
      species: solutions.species,
      authorName: users.name,
      createdAt: solutions.createdAt,
    })
    .from(solutions)
    .innerJoin(revisions, eq(revisions.id, solutions.revisionId))
    .innerJoin(entries, eq(entries.id, solutions.entryId))
    .innerJoin(users, eq(users.id, entries.authorId))
    .where(and(...where))
    .orderBy(desc(solutions.createdAt))
    .limit(f.limit);
}
