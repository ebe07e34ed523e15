import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { listLabProjects, insertProject } from "@/db/queries/projects";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import { createProjectSchema } from "@/lib/validation/projects";
import { parseInput } from "@/lib/validation/parse";

export interface ProjectDto {
  id: string;
  name: string;
  description: string;
}

export async function listProjects(actor: Actor): Promise<ProjectDto[]> {
  assertCan(actor, "entry.read");
  const rows = await listLabProjects(getDb(), actor.labId);
  return rows.map(({ id, name, description }) => ({ id, name, description }));
}

export async function createProject(actor: Actor, raw: unknown): Promise<ProjectDto> {
  assertCan(actor, "entry.write");
  const input = parseInput(createProjectSchema, raw);
  try {
    return await getDb().transaction(async (tx) => {
      const row = await insertProject(tx, {
        labId: actor.labId,
        name: input.name,
        description: input.description,
        createdById: actor.userId,
      });
      await insertAuditEvent(tx, {
        labId: actor.labId,
        actorId: actor.userId,
        action: "project.created",
        targetType: "project",
        targetId: row.id,
      });
      return { id: row.id, name: row.name, description: row.description };
    });
  } catch (error) {
    if ((error as { code?: string }).code === "23505") {
      throw new AppError("conflict", "Your lab already has a project with that name.", {
        fieldErrors: { name: ["Already used in this lab."] },
      });
    }
    throw error;
  }
}
