import "server-only";
import { findSolutions } from "@/db/queries/solution-finder";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { solutionFinderQuerySchema } from "@/lib/validation/solution-finder";
import { parseInput } from "@/lib/validation/parse";

export async function searchSolutions(actor: Actor, rawQuery: unknown) {
  assertCan(actor, "solution.search");
  const q = parseInput(solutionFinderQuerySchema, rawQuery);
  const rows = await findSolutions(getDb(), {
    labId: actor.labId,
    ionicStrengthMin: q.iMin,
    ionicStrengthMax: q.iMax,
    species: q.species,
    temperatureMin: q.tMin,
    temperatureMax: q.tMax,
    solvent: q.solvent,
    authorId: q.author === "me" ? actor.userId : undefined,
    createdFrom: q.from,
    createdTo: q.to,
    limit: 200,
  });
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}
