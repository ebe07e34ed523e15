import { z } from "@/lib/validation/zod";
import { ENTRY_STATUSES } from "@/lib/contract/vocabulary";

/**
 * The solution finder's query as it stands in the URL (`/solutions?iMin=0.09&species=NaCl`),
 * shared by the page's form, the API route, the CSV export and the tests. Every field is
 * optional text, because that is what a URL carries; each says in its own words what is
 * wrong with it, so a bad link gives a message by field, never a 500.
 */

const blankToUndefined = (v: unknown) =>
  v === "" || v === null || (typeof v === "string" && v.trim() === "") ? undefined : v;
const optional = <T extends z.ZodType>(schema: T) =>
  z.preprocess(blankToUndefined, schema.optional());

const number = (label: string, min: number, max: number, unit: string) =>
  optional(
    z
      .string()
      .trim()
      .max(30, `${label}: type a number, like ${min + 1}.`)
      .transform((v, ctx) => {
        const n = Number(v.replace(",", "."));
        if (!/^[-+]?(\d+([.,]\d*)?|[.,]\d+)([eE][-+]?\d+)?$/.test(v) || !Number.isFinite(n)) {
          ctx.addIssue({ code: "custom", message: `${label}: "${v}" is not a number.` });
          return z.NEVER;
        }
        if (n < min || n > max) {
          ctx.addIssue({
            code: "custom",
            message: `${label} must be between ${min} and ${max} ${unit}.`,
          });
          return z.NEVER;
        }
        return n;
      }),
  );

const day = (label: string) =>
  optional(
    z
      .string()
      .trim()
      .regex(/^\d{4}-\d{2}-\d{2}$/, `${label}: use a date as YYYY-MM-DD.`)
      .refine((s) => {
        const d = new Date(`${s}T00:00:00Z`);
        return (
          !Number.isNaN(d.getTime()) &&
          d.toISOString().slice(0, 10) === s &&
          d.getUTCFullYear() >= 2000 &&
          d.getUTCFullYear() <= 2200
        );
      }, `${label}: use a real date between 2000 and 2200.`),
  );

export const FINDER_SORT_KEYS = [
  "saved",
  "name",
  "ionicStrength",
  "debye",
  "temperature",
  "entry",
  "author",
  "status",
] as const;
export type FinderSortKey = (typeof FINDER_SORT_KEYS)[number];

/** Most species a query may name, and the longest full-text query. */
const FINDER_MAX_SPECIES = 8;
const FINDER_MAX_TEXT = 200;
export const FINDER_PAGE_SIZE = 50;

const MODEL_IDS = [
  "dh-limiting",
  "dh-extended",
  "guntelberg",
  "davies",
  "truesdell-jones",
  "pitzer",
  "sit",
] as const;

export const solutionFinderQuerySchema = z
  .object({
    q: optional(
      z
        .string()
        .trim()
        .max(FINDER_MAX_TEXT, `Keep the text search under ${FINDER_MAX_TEXT} characters.`),
    ),
    scale: optional(z.enum(["molal", "molar"], "Choose molal or molar.")).default("molal"),
    iMin: number("Lowest ionic strength", 0, 50, "mol/kg or mol/L"),
    iMax: number("Highest ionic strength", 0, 50, "mol/kg or mol/L"),
    species: optional(
      z
        .string()
        .max(400, "Name at most 8 species, each by formula or name.")
        .transform((v, ctx) => {
          const terms = [...new Set(v.split(/[,;]/).map((s) => s.trim()))].filter(Boolean);
          if (terms.length > FINDER_MAX_SPECIES) {
            ctx.addIssue({
              code: "custom",
              message: `Name at most ${FINDER_MAX_SPECIES} species.`,
            });
            return z.NEVER;
          }
          const long = terms.find((t) => t.length > 60);
          if (long) {
            ctx.addIssue({ code: "custom", message: `"${long.slice(0, 20)}…" is too long.` });
            return z.NEVER;
          }
          return terms;
        }),
    ).transform((v) => v ?? []),
    match: optional(z.enum(["all", "any"], "Choose all of or any of.")).default("all"),
    tMin: number("Lowest temperature", -50, 300, "°C"),
    tMax: number("Highest temperature", -50, 300, "°C"),
    solvent: optional(
      z
        .string()
        .trim()
        .max(40, "Choose a solvent from the list.")
        .regex(/^[\w ,()-]+$/, "Choose a solvent from the list."),
    ),
    model: optional(z.enum(MODEL_IDS, "Choose a model from the list.")),
    author: optional(
      z.union(
        [z.literal("me"), z.uuid("Choose a member of the lab.")],
        "Choose a member of the lab.",
      ),
    ),
    project: optional(z.uuid("Choose a project of the lab.")),
    status: optional(z.enum(ENTRY_STATUSES, "Choose an entry status from the list.")),
    from: day("Saved from"),
    to: day("Saved until"),
    history: optional(z.enum(["1", "0"], "Earlier revisions: 1 or 0.")).transform((v) => v === "1"),
    sort: optional(z.enum(FINDER_SORT_KEYS, "Sort by one of the table's columns.")).default(
      "saved",
    ),
    dir: optional(z.enum(["asc", "desc"], "Sort ascending or descending.")),
    page: optional(
      z
        .string()
        .trim()
        .regex(/^\d{1,6}$/, "Pages are whole numbers from 1.")
        .transform(Number)
        .refine((n) => n >= 1, "Pages are whole numbers from 1."),
    ).default(1),
  })
  .refine((q) => q.iMin === undefined || q.iMax === undefined || q.iMin <= q.iMax, {
    path: ["iMax"],
    message: "The highest ionic strength is below the lowest.",
  })
  .refine((q) => q.tMin === undefined || q.tMax === undefined || q.tMin <= q.tMax, {
    path: ["tMax"],
    message: "The highest temperature is below the lowest.",
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    path: ["to"],
    message: "The last date comes before the first.",
  })
  .transform((q) => ({
    ...q,
    // Dates and names read best oldest/A first; the newest solutions first by default.
    dir: q.dir ?? (q.sort === "saved" ? ("desc" as const) : ("asc" as const)),
  }));

export type SolutionFinderQuery = z.infer<typeof solutionFinderQuerySchema>;

/** The query's fields in URL order (the page's links and the form keep this order). */
export const FINDER_QUERY_KEYS = [
  "q",
  "scale",
  "iMin",
  "iMax",
  "species",
  "match",
  "tMin",
  "tMax",
  "solvent",
  "model",
  "author",
  "project",
  "status",
  "from",
  "to",
  "history",
  "sort",
  "dir",
  "page",
] as const;

/** Similar solutions of one block: the entry, the block, and optionally the revision. */
export const similarSolutionsQuerySchema = z.object({
  entry: z.uuid("Give the entry of the solution block."),
  block: z
    .string()
    .trim()
    .min(4, "Give the solution block's id.")
    .max(64, "Give the solution block's id.")
    .regex(/^[\w-]+$/, "Give the solution block's id."),
  revision: optional(
    z
      .string()
      .regex(/^\d{1,9}$/, "Revisions are whole numbers from 1.")
      .transform(Number)
      .refine((n) => n >= 1, "Revisions are whole numbers from 1."),
  ),
});

/** Type-ahead of species: what has been typed so far. */
export const speciesSuggestQuerySchema = z.object({
  q: z.string().trim().max(60, "Type at most 60 characters.").default(""),
});
