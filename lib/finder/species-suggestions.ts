import "server-only";
import { searchLabSpecies } from "@/db/queries/lab-species";
import { searchSpecies } from "@/lib/chem";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { speciesSuggestQuerySchema } from "@/lib/validation/solution-finder";
import { parseInput } from "@/lib/validation/parse";

export interface SpeciesSuggestion {
  formula: string;
  name: string;
  source: "lab" | "catalogue";
}

const LIMIT = 10;

/** The lab's own species first (they are what this lab works with), then the catalogue's. */
export async function suggestSpecies(actor: Actor, raw: unknown): Promise<SpeciesSuggestion[]> {
  assertCan(actor, "solution.search");
  const { q } = parseInput(speciesSuggestQuerySchema, raw);
  if (!q) return [];
  const own = await searchLabSpecies(getDb(), actor.labId, q, LIMIT);
  const seen = new Set(own.map((s) => s.formula));
  const catalogue = searchSpecies(q, LIMIT)
    .filter((s) => !seen.has(s.formula))
    .map((s) => ({ formula: s.formula, name: s.name, source: "catalogue" as const }));
  return [...own.map((s) => ({ ...s, source: "lab" as const })), ...catalogue].slice(0, LIMIT);
}
