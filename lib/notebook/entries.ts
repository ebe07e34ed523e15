import "server-only";
import type { EntryListItem } from "@/lib/contract/entries";
import { assertEntryAllows, entryActions, entryFactsOf } from "@/lib/rules/entry-rules";
import { roleCan } from "@/lib/rules/role-permissions";
import { loadEntryFor } from "./entry-access";
import { insertAuditEvent } from "@/db/queries/audit";
import {
  countEntriesByStatus,
  findEntryHeader,
  insertEntry,
  listEntries as queryEntries,
  updateEntry,
} from "@/db/queries/entries";
import { findLabProject } from "@/db/queries/projects";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { findTemplate } from "@/lib/document/templates";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import { createEntrySchema, entryListQuerySchema } from "@/lib/validation/entries";
import { parseInput, parseRecordId } from "@/lib/validation/parse";
import { appendRevision } from "./append-revision";
import { prepareRevision } from "@/lib/document/prepare-revision";

export const EMPTY_DOCUMENT = { type: "doc", content: [{ type: "paragraph" }] };

export async function listEntries(actor: Actor, rawQuery: unknown): Promise<EntryListItem[]> {
  assertCan(actor, "entry.read");
  const q = parseInput(entryListQuerySchema, rawQuery);
  const rows = await queryEntries(getDb(), {
    labId: actor.labId,
    projectId: q.projectId,
    status: q.status,
    authorId: q.author === "me" ? actor.userId : undefined,
    search: q.q || undefined,
    archived: q.archived,
    sort: q.sort,
    order: q.order,
    limit: q.limit,
  });
  return rows.map((r) => ({
    id: r.id,
    title: r.title,
    status: r.status,
    revision: r.revision,
    projectId: r.projectId,
    projectName: r.projectName,
    authorId: r.authorId,
    authorName: r.authorName,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    archived: r.archivedAt !== null,
  }));
}

export async function countReviewQueue(actor: Actor): Promise<number> {
  if (!roleCan(actor.role, "review.read")) return 0;
  return countEntriesByStatus(getDb(), actor.labId, "submitted");
}

/** Creates an entry and, from a template, its first revision, in one transaction. */
export async function createEntry(actor: Actor, raw: unknown): Promise<{ id: string }> {
  assertCan(actor, "entry.write");
  const input = parseInput(createEntrySchema, raw);
  const template = input.template ? findTemplate(input.template) : undefined;
  if (input.template && !template)
    throw new AppError("invalid_input", "Unknown template.", {
      fieldErrors: { template: ["Choose one of the listed templates."] },
    });
  return getDb().transaction(async (tx) => {
    const project = await findLabProject(tx, actor.labId, input.projectId);
    if (!project || project.archivedAt)
      throw new AppError("invalid_input", "Choose a project of your lab.", {
        fieldErrors: { projectId: ["Choose a project of your lab."] },
      });
    const entry = await insertEntry(tx, {
      labId: actor.labId,
      projectId: project.id,
      title: input.title,
      authorId: actor.userId,
      template: template?.id ?? null,
    });
    if (template) {
      await appendRevision(tx, {
        labId: actor.labId,
        entryId: entry.id,
        number: 1,
        authorId: actor.userId,
        prepared: prepareRevision(input.title, template.build()),
      });
    }
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "entry.created",
      targetType: "entry",
      targetId: entry.id,
      details: { template: template?.id ?? null },
    });
    return { id: entry.id };
  });
}

/** Archive or restore: the entry and every revision stay; it leaves the default lists. */
export async function setEntryArchived(
  actor: Actor,
  entryId: string,
  archived: boolean,
): Promise<void> {
  assertCan(actor, "entry.write");
  await getDb().transaction(async (tx) => {
    const entry = await loadEntryFor(tx, actor, entryId, archived ? "archive" : "restore", {
      forUpdate: true,
    });
    await updateEntry(tx, actor.labId, entry.id, { archivedAt: archived ? new Date() : null });
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: archived ? "entry.archived" : "entry.restored",
      targetType: "entry",
      targetId: entryId,
    });
  });
}

export async function getEntryHeader(actor: Actor, entryId: string) {
  assertCan(actor, "entry.read");
  const found = await findEntryHeader(getDb(), actor.labId, parseRecordId(entryId, "Entry"));
  if (!found) throw new AppError("not_found", "Entry not found.");
  const facts = entryFactsOf(found.entry);
  assertEntryAllows(actor, facts, "view");
  return { ...found, actions: entryActions(actor, facts) };
}
