import { and, eq, ilike, inArray, or, sql } from "drizzle-orm";
import type { Executor } from "../client";
import { species } from "../schema";

/** The lab's own species whose formula or name (any case) is one of `terms`. */
export async function findLabSpeciesByTerms(db: Executor, labId: string, terms: string[]) {
  if (!terms.length) return [];
  const lowered = terms.map((t) => t.toLowerCase());
  return db
    .select({ formula: species.formula, name: species.name })
    .from(species)
    .where(
      and(
        eq(species.labId, labId),
        or(inArray(species.formula, terms), inArray(sql`lower(${species.name})`, lowered)),
      ),
    );
}

/** Type-ahead over the lab's own species: formula or name beginning with `prefix`. */
export async function searchLabSpecies(db: Executor, labId: string, prefix: string, limit: number) {
  const pattern = `${prefix.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  return db
    .select({ formula: species.formula, name: species.name })
    .from(species)
    .where(
      and(
        eq(species.labId, labId),
        or(ilike(species.formula, pattern), ilike(species.name, pattern)),
      ),
    )
    .orderBy(species.formula)
    .limit(limit);
}
