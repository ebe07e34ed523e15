import "server-only";
import Papa from "papaparse";
import {
  findSolutionKeys,
  findSolutionPage,
  findSolutionRows,
  type FinderFilter,
  type FinderKeyset,
  type FinderSort,
} from "@/db/queries/solution-finder";
import { prefixTsquery } from "@/db/queries/solution-finder-text";
import { toFound, type FoundSolution } from "@/lib/finder/found-solution";
import { formulaAsText } from "@/lib/document/formula-text";
import { resolveSpeciesTerms } from "@/lib/finder/resolve-species";
import { AppError } from "@/lib/errors";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import {
  FINDER_PAGE_SIZE,
  solutionFinderQuerySchema,
  type SolutionFinderQuery,
} from "@/lib/validation/solution-finder";
import { parseInput } from "@/lib/validation/parse";

/**
 * Matches are counted up to this many; past it the page says "more than 1 000" and pages on
 * without a last page (counting a broad search to the end would cost more than the search).
 */
const FINDER_COUNT_CAP = 1_000;
const DAY_MS = 86_400_000;
/** The export reads this many matches' keys in order per statement … */
const CSV_KEYS = 10_000;
/** … and their rows by id, and writes them, this many at a time. */
const CSV_BATCH = 500;

/** Validates a raw query (422 by field) and turns it into the database filter. */
async function filterFor(
  actor: Actor,
  raw: unknown,
): Promise<{ q: SolutionFinderQuery; filter: FinderFilter }> {
  const q = parseInput(solutionFinderQuerySchema, raw);
  const tsquery = q.q ? prefixTsquery(q.q) : null;
  if (q.q && !tsquery) {
    throw new AppError("invalid_input", "Some fields need attention.", {
      fieldErrors: { q: ["Search for words: letters or digits."] },
    });
  }
  const species = await resolveSpeciesTerms(getDb(), actor.labId, q.species);
  return {
    q,
    filter: {
      labId: actor.labId,
      scale: q.scale,
      ionicStrengthMin: q.iMin,
      ionicStrengthMax: q.iMax,
      species,
      speciesMatch: q.match,
      temperatureMin: q.tMin,
      temperatureMax: q.tMax,
      solvent: q.solvent,
      modelUsed: q.model,
      authorId: q.author === "me" ? actor.userId : q.author,
      projectId: q.project,
      status: q.status,
      savedFrom: q.from ? new Date(`${q.from}T00:00:00Z`) : undefined,
      // "until" is a whole day: rows before the next midnight (UTC).
      savedBefore: q.to ? new Date(new Date(`${q.to}T00:00:00Z`).getTime() + DAY_MS) : undefined,
      tsquery: tsquery ?? undefined,
      includeHistory: q.history,
    },
  };
}

export interface SolutionSearchResult {
  solutions: FoundSolution[];
  /** Matches, counted up to FINDER_COUNT_CAP. */
  total: number;
  /** More matches than FINDER_COUNT_CAP: `pages` is then this page, plus one if it is full. */
  capped: boolean;
  page: number;
  pages: number;
  pageSize: number;
  /** The species searched, as formulas (names resolved). */
  species: string[];
}

/** One page of the lab's solutions under the query's filters and sort. */
export async function searchSolutions(actor: Actor, raw: unknown): Promise<SolutionSearchResult> {
  assertCan(actor, "solution.search");
  const { q, filter } = await filterFor(actor, raw);
  const db = getDb();
  const found = await findSolutionPage(
    db,
    filter,
    { column: q.sort, direction: q.dir },
    { limit: FINDER_PAGE_SIZE, offset: (q.page - 1) * FINDER_PAGE_SIZE },
    FINDER_COUNT_CAP,
  );
  // Past the count cap the number of pages is unknown: a page is past the end when it is empty.
  const pages = found.capped
    ? Math.max(q.page + (found.rows.length === FINDER_PAGE_SIZE ? 1 : 0), 1)
    : Math.max(1, Math.ceil(found.total / FINDER_PAGE_SIZE));
  if (q.page > pages || (found.capped && found.rows.length === 0 && q.page > 1)) {
    throw new AppError("invalid_input", "Some fields need attention.", {
      fieldErrors: {
        page: [
          found.capped
            ? `Page ${q.page} is past the end of this search.`
            : `This search has ${pages === 1 ? "one page" : `${pages} pages`}; page ${q.page} is past the end.`,
        ],
      },
    });
  }
  return {
    solutions: found.rows.map(toFound),
    total: found.total,
    capped: found.capped,
    page: q.page,
    pages,
    pageSize: FINDER_PAGE_SIZE,
    species: filter.species,
  };
}

const CSV_HEADER = [
  "solution",
  "composition",
  "species",
  "ionic_strength_mol_per_kg",
  "ionic_strength_mol_per_l",
  "debye_length_nm",
  "temperature_c",
  "solvent",
  "model",
  "entry",
  "entry_status",
  "project",
  "author",
  "saved_utc",
  "revisions",
  "link",
];

function csvCells(s: FoundSolution): (string | number)[] {
  return [
    s.name,
    s.composition,
    s.species.map(formulaAsText).join(" "),
    s.ionicStrengthMolal ?? "",
    s.ionicStrengthMolar ?? "",
    s.debyeLengthNm ?? "",
    s.temperatureC,
    s.solvent,
    s.modelUsed ?? "",
    s.entryTitle,
    s.entryStatus,
    s.projectName,
    s.authorName,
    s.savedAt,
    s.toRevision === null ? `${s.fromRevision}–` : `${s.fromRevision}–${s.toRevision - 1}`,
    s.href,
  ];
}

/**
 * Every match as CSV in the table's order (the query's sort and direction, as the finder's
 * pages list them), streamed, never built in memory: the matches' keys are read in order by
 * keyset on (sort key, id), 10 000 at a time (findSolutionKeys says why a keyset), and their
 * rows by id and written 500 at a time. The query is validated and its species resolved
 * before the first byte, so a bad query is still a 422; cells that a spreadsheet would run as
 * a formula are escaped. `keys` and `batch` are for tests.
 */
export async function solutionsCsvStream(
  actor: Actor,
  raw: unknown,
  { keys = CSV_KEYS, batch = CSV_BATCH }: { keys?: number; batch?: number } = {},
): Promise<ReadableStream<Uint8Array>> {
  assertCan(actor, "solution.search");
  const { q, filter } = await filterFor(actor, raw);
  const sort: FinderSort = { column: q.sort, direction: q.dir };
  const encoder = new TextEncoder();
  let pending: FinderKeyset[] = [];
  let after: FinderKeyset | null = null;
  let exhausted = false;
  let headerSent = false;
  return new ReadableStream<Uint8Array>({
    async pull(controller) {
      if (!headerSent) {
        headerSent = true;
        controller.enqueue(
          encoder.encode(`${Papa.unparse([CSV_HEADER], { newline: "\r\n" })}\r\n`),
        );
        return;
      }
      if (pending.length === 0 && !exhausted) {
        pending = await findSolutionKeys(getDb(), filter, sort, after, keys);
        // Fewer than asked for: the last of them (no statement is spent to learn that).
        exhausted = pending.length < keys;
        after = pending.at(-1) ?? after;
      }
      if (pending.length === 0) {
        controller.close();
        return;
      }
      const ids = pending.splice(0, batch).map((k) => k.id);
      const rows = await findSolutionRows(getDb(), filter.labId, ids);
      const csv = Papa.unparse(
        rows.map((r) => csvCells(toFound(r))),
        { newline: "\r\n", escapeFormulae: true },
      );
      controller.enqueue(encoder.encode(`${csv}\r\n`));
    },
  });
}
