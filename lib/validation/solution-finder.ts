import { z } from "zod";

const optionalNumber = (label: string, min: number, max: number) =>
  z
    .string()
    .trim()
    .optional()
    .transform((v, ctx) => {
      if (!v) return undefined;
      const n = Number(v);
      if (!Number.isFinite(n)) {
        ctx.addIssue({ code: "custom", message: `${label} must be a number.` });
        return z.NEVER;
      }
      if (n < min || n > max) {
        ctx.addIssue({ code: "custom", message: `${label} must be between ${min} and ${max}.` });
        return z.NEVER;
      }
      return n;
    });

const optionalDate = z
  .string()
  .trim()
  .optional()
  .transform((v, ctx) => {
    if (!v) return undefined;
    const d = new Date(v);
    if (Number.isNaN(d.getTime())) {
      ctx.addIssue({ code: "custom", message: "Use a date like 2026-11-30." });
      return z.NEVER;
    }
    return d;
  });

/** The solution finder's query string, shared by the page's form and the API route. */
export const solutionFinderQuerySchema = z
  .object({
    iMin: optionalNumber("Lowest ionic strength", 0, 50),
    iMax: optionalNumber("Highest ionic strength", 0, 50),
    species: z
      .string()
      .trim()
      .max(200)
      .optional()
      .transform((v) =>
        v
          ? v
              .split(/[,\s]+/)
              .filter(Boolean)
              .slice(0, 8)
          : [],
      ),
    tMin: optionalNumber("Lowest temperature", -50, 300),
    tMax: optionalNumber("Highest temperature", -50, 300),
    solvent: z
      .string()
      .trim()
      .max(40)
      .optional()
      .transform((v) => v || undefined),
    author: z.enum(["anyone", "me"]).default("anyone"),
    from: optionalDate,
    to: optionalDate,
  })
  .refine((q) => q.iMin === undefined || q.iMax === undefined || q.iMin <= q.iMax, {
    path: ["iMax"],
    message: "The highest ionic strength is below the lowest.",
  })
  .refine((q) => q.tMin === undefined || q.tMax === undefined || q.tMin <= q.tMax, {
    path: ["tMax"],
    message: "The highest temperature is below the lowest.",
  });
