import { z } from "@/lib/validation/zod";
import { similarSolutionsQuerySchema } from "./solution-finder";

/** One stock for the editor: the entry, the solution block and (default: current) revision. */
export const stockQuerySchema = similarSolutionsQuerySchema;

const blockId = z
  .string()
  .trim()
  .min(4, "Give the solution block's id.")
  .max(64, "Give the solution block's id.")
  .regex(/^[\w-]+$/, "Give the solution block's id.");

/**
 * "Use the newer revision of this stock": which block of the entry, which stock, the revision
 * to move to, the entry revision the offer was made against, and, for a countersigned entry,
 * the reason of the amendment this becomes.
 */
export const updateStockSchema = z.object({
  blockId,
  parentEntryId: z.uuid("Give the stock's entry."),
  parentBlockId: blockId,
  toRevision: z.coerce
    .number("Revisions are whole numbers from 1.")
    .int("Revisions are whole numbers from 1.")
    .min(1, "Revisions are whole numbers from 1.")
    .max(1_000_000_000, "Revisions are whole numbers from 1."),
  baseRevision: z.coerce
    .number("Revisions are whole numbers from 0.")
    .int("Revisions are whole numbers from 0.")
    .min(0, "Revisions are whole numbers from 0.")
    .max(1_000_000_000, "Revisions are whole numbers from 0."),
  reason: z
    .string()
    .trim()
    .max(2000, "Use at most 2000 characters.")
    .optional()
    .transform((r) => (r ? r : undefined)),
});
