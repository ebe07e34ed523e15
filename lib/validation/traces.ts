import { z } from "@/lib/validation/zod";

const entry = z.strictObject({
  column: z.union([z.string().trim().min(1).max(200), z.number().int().min(0).max(10_000)]),
  unit: z.string().trim().max(20).optional(),
});

/** The mapping dialog's answer: which column holds which quantity, in which unit. */
export const traceMappingSchema = z.object({
  mapping: z
    .strictObject({
      potential: entry.optional(),
      current: entry.optional(),
      currentDensity: entry.optional(),
      time: entry.optional(),
      charge: entry.optional(),
      impedanceReal: entry.optional(),
      impedanceImaginaryNegated: entry.optional(),
      impedanceModulus: entry.optional(),
      frequency: entry.optional(),
      phase: entry.optional(),
      cycle: entry.optional(),
    })
    .refine((m) => Object.keys(m).length > 0, "Map at least one column."),
});
