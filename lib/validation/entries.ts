import { z } from "@/lib/validation/zod";
import { ENTRY_STATUSES } from "@/db/schema/enums";

const entryTitleSchema = z
  .string()
  .trim()
  .min(1, "Give the entry a title.")
  .max(200, "Use at most 200 characters.");

export const createEntrySchema = z.object({
  projectId: z.string().uuid("Choose a project."),
  title: entryTitleSchema,
  template: z.string().max(60).optional().nullable(),
});

/** An autosave: the revision the editor started from, and the whole document. */
export const saveEntrySchema = z.object({
  baseRevision: z.number().int().min(0),
  title: entryTitleSchema,
  content: z.unknown(),
});

export const entryListQuerySchema = z.object({
  projectId: z.string().uuid().optional(),
  status: z.enum(ENTRY_STATUSES).optional(),
  author: z.enum(["me", "anyone"]).default("anyone"),
  q: z.string().trim().max(100).optional(),
  archived: z
    .enum(["true", "false"])
    .default("false")
    .transform((v) => v === "true"),
  sort: z.enum(["updatedAt", "createdAt", "title", "status"]).default("updatedAt"),
  order: z.enum(["asc", "desc"]).default("desc"),
  limit: z.coerce.number().int().min(1).max(200).default(100),
});

export const archiveEntrySchema = z.object({ archived: z.boolean() });
