import { z } from "@/lib/validation/zod";

const day = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date as YYYY-MM-DD.")
  .refine((s) => {
    const d = new Date(`${s}T00:00:00Z`);
    return !Number.isNaN(d.getTime()) && d.getUTCFullYear() >= 2000 && d.getUTCFullYear() <= 2200;
  }, "Use a real date between 2000 and 2200.");

const optional = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (v === "" || v === null ? undefined : v), schema.optional());

/** The lab audit view's filters, as they stand in the URL. */
export const auditQuerySchema = z
  .object({
    actor: optional(z.uuid("Choose a member of the lab.")),
    action: optional(
      z
        .string()
        .trim()
        .max(60)
        .regex(/^[a-z_.]+$/, "Choose an action from the list."),
    ),
    entry: optional(z.uuid("Give an entry id.")),
    from: optional(day),
    to: optional(day),
    page: optional(z.coerce.number().int("Pages are whole numbers.").min(1).max(100_000)).default(
      1,
    ),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    message: "The first date comes before the last.",
    path: ["to"],
  });
