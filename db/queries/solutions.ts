import { and, asc, eq, inArray } from "drizzle-orm";
import type { Executor } from "../client";
import { solutionComponents, solutions } from "../schema";

export async function insertSolutionWithComponents(
  db: Executor,
  solution: typeof solutions.$inferInsert,
  components: Omit<typeof solutionComponents.$inferInsert, "solutionId">[],
) {
  const [row] = await db.insert(solutions).values(solution).returning({ id: solutions.id });
  if (components.length)
    await db
      .insert(solutionComponents)
      .values(components.map((c) => ({ ...c, solutionId: row.id })));
  return row.id;
}

export async function listRevisionSolutions(db: Executor, labId: string, revisionId: string) {
  return db
    .select()
    .from(solutions)
    .where(and(eq(solutions.labId, labId), eq(solutions.revisionId, revisionId)))
    .orderBy(asc(solutions.createdAt));
}

export async function listComponentsOf(db: Executor, solutionIds: string[]) {
  if (!solutionIds.length) return [];
  return db
    .select()
    .from(solutionComponents)
    .where(inArray(solutionComponents.solutionId, solutionIds))
    .orderBy(asc(solutionComponents.position));
}
