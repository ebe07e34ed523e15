import { and, asc, eq, isNull } from "drizzle-orm";
import type { Executor } from "../client";
import { projects } from "../schema";

export async function listLabProjects(db: Executor, labId: string) {
  return db
    .select({
      id: projects.id,
      name: projects.name,
      description: projects.description,
      createdAt: projects.createdAt,
    })
    .from(projects)
    .where(and(eq(projects.labId, labId), isNull(projects.archivedAt)))
    .orderBy(asc(projects.name));
}

export async function findLabProject(db: Executor, labId: string, projectId: string) {
  const rows = await db
    .select()
    .from(projects)
    .where(and(eq(projects.labId, labId), eq(projects.id, projectId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function insertProject(db: Executor, values: typeof projects.$inferInsert) {
  const rows = await db.insert(projects).values(values).returning();
  return rows[0];
}
