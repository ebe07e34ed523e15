import { z } from "@/lib/validation/zod";

export const createProjectSchema = z.object({
  name: z
    .string()
    .trim()
    .min(2, "Give the project a name of at least 2 characters.")
    .max(120, "Use at most 120 characters."),
  description: z.string().trim().max(2000, "Use at most 2000 characters.").default(""),
});
