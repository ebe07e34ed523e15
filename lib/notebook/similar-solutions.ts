import "server-only";
import { findBlockPoint, findSimilarCandidates } from "@/db/queries/similar-solutions";
import { findSolutionRows } from "@/db/queries/solution-finder";
import {
  compositionDistance,
  describeDifference,
  type DistancePoint,
} from "@/lib/finder/composition-distance";
import { toFound, type FoundSolution } from "@/lib/finder/found-solution";
import { AppError } from "@/lib/errors";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { similarSolutionsQuerySchema } from "@/lib/validation/solution-finder";
import { parseInput } from "@/lib/validation/parse";

/** How many similar solutions are listed, and how many candidates are ranked per side. */
const SHOWN = 10;
const CANDIDATES_PER_SIDE = 200;

interface SimilarSolution extends FoundSolution {
  /** compositionDistance from the target, in decades (lib/finder/composition-distance.ts). */
  distance: number;
  /** The difference in words: "same species, I 8 % higher, 3 °C colder". */
  difference: string;
}

export interface SimilarSolutionsResult {
  target: {
    entryId: string;
    blockId: string;
    name: string;
    ions: string[];
    ionicStrengthMolal: number | null;
    temperatureC: number;
    solvent: string;
  };
  similar: SimilarSolution[];
  /** Why there is no list, when there is none. */
  note: string | null;
}

/**
 * The lab's current solutions nearest to one solution block by composition distance, with
 * the difference in words. The block may be any revision's (`revision`), the candidates are
 * always current solutions of entries that are not archived.
 */
export async function findSimilarSolutions(
  actor: Actor,
  raw: unknown,
): Promise<SimilarSolutionsResult> {
  assertCan(actor, "solution.search");
  const q = parseInput(similarSolutionsQuerySchema, raw);
  const db = getDb();
  const target = await findBlockPoint(db, actor.labId, q.entry, q.block, q.revision);
  if (!target) throw new AppError("not_found", "No such solution block in this lab.");
  const ions = Object.keys(target.composition).filter((ion) => target.composition[ion] > 0);
  const summary = {
    entryId: target.entryId,
    blockId: target.blockId,
    name: target.name,
    ions,
    ionicStrengthMolal: target.ionicStrengthMolal,
    temperatureC: target.temperatureC,
    solvent: target.solvent,
  };
  if (target.ionicStrengthMolal === null || ions.length === 0) {
    return {
      target: summary,
      similar: [],
      note: "This block has no computed composition (its inputs were incomplete or refused), so nothing can be compared with it.",
    };
  }
  const from: DistancePoint = { ...target, ionicStrengthMolal: target.ionicStrengthMolal };
  const candidates = await findSimilarCandidates(
    db,
    actor.labId,
    {
      entryId: target.entryId,
      blockId: target.blockId,
      ionicStrengthMolal: from.ionicStrengthMolal,
      ions,
    },
    CANDIDATES_PER_SIDE,
  );
  const ranked = candidates
    .filter((c) => c.ionicStrengthMolal !== null)
    .map((c) => {
      const to: DistancePoint = { ...c, ionicStrengthMolal: c.ionicStrengthMolal! };
      return { id: c.id, to, distance: compositionDistance(from, to) };
    })
    .sort((a, b) => a.distance - b.distance || (a.id < b.id ? -1 : 1))
    .slice(0, SHOWN);
  const rows = await findSolutionRows(
    db,
    actor.labId,
    ranked.map((r) => r.id),
  );
  const byId = new Map(ranked.map((r) => [r.id, r]));
  return {
    target: summary,
    similar: rows.map((row) => {
      const r = byId.get(row.id)!;
      return {
        ...toFound(row),
        distance: r.distance,
        difference: describeDifference(from, r.to),
      };
    }),
    note: ranked.length ? null : "No other solution of the lab shares an ion with this one.",
  };
}
