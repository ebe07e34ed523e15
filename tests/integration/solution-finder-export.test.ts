// @vitest-environment node
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import type { Actor } from "@/lib/access/actor";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { createEntry } from "@/lib/notebook/entries";
import { submitEntry } from "@/lib/notebook/review";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { searchSolutions, solutionsCsvStream } from "@/lib/notebook/solution-finder";
import { getDb } from "@/lib/server/database";
import { FINDER_SORT_KEYS } from "@/lib/validation/solution-finder";
import { createLabWithMembers } from "../support/db";

/**
 * The CSV export lists the matches in the table's order: for every sortable column, either
 * way, its rows come in the order of the finder's pages for the same query, read by keyset in
 * stretches much shorter than a page (so they end inside runs of equal keys and across pages),
 * with blocks the engine refused (no ionic strength, no Debye length) among them.
 */

// Every column the table can sort by: a column added later is exported in order too.
const SORTS = FINDER_SORT_KEYS;
/** Keys read in order per statement, and rows written per batch: both end inside pages. */
const KEYS = 20;
const BATCH = 7;
const LINK = 15;
const IONIC_MOLAL = 3;
const DEBYE = 5;

const doc = (blocks: SolutionBlockInput[]) => ({
  type: "doc",
  content: [
    { type: "paragraph", content: [{ type: "text", text: "Export order." }] },
    ...blocks.map((attrs) => ({ type: "solutionBlock", attrs })),
  ],
});

/**
 * Block `i` of a series: names repeat (in two cases) so that names tie, amounts repeat so
 * that ionic strengths and Debye lengths tie, temperatures take three values, and every
 * seventh block names a species the engine does not know (stored with no I and no λD).
 */
function seriesBlock(tag: string, i: number, shift = 0): SolutionBlockInput {
  const refused = i % 7 === 3;
  return defaultSolutionBlockInput({
    blockId: `blk-${tag}-${i}`,
    name: ["Buffer", "buffer", `${tag} ${i}`, "Zeta"][i % 4],
    temperatureC: [20, 25, 37][i % 3],
    components: [
      refused
        ? { formula: "Qq", amount: 0.1, unit: "mol/kg" as const }
        : {
            formula: i % 2 ? "KCl" : "Na2SO4",
            amount: (1 + (i % 5) + shift) / 100,
            unit: "mol/kg" as const,
          },
    ],
  });
}

async function entryWith(
  actor: Actor,
  projectId: string,
  title: string,
  blocks: SolutionBlockInput[],
): Promise<string> {
  const { id } = await createEntry(actor, { projectId, title });
  await saveEntryContent(actor, id, { baseRevision: 0, title, content: doc(blocks) });
  return id;
}

/** The export's rows (without the header) and how many chunks the stream sent. */
async function exported(
  actor: Actor,
  query: Record<string, string>,
): Promise<{ rows: string[][]; chunks: number }> {
  const reader = (await solutionsCsvStream(actor, query, { keys: KEYS, batch: BATCH })).getReader();
  const decoder = new TextDecoder();
  let text = "";
  let chunks = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    chunks += 1;
    text += decoder.decode(value, { stream: true });
  }
  const rows = Papa.parse<string[]>(text.trim(), { newline: "\r\n" }).data;
  return { rows: rows.slice(1), chunks };
}

/** Every page of the table for the query, as the links of its rows, in order. */
async function tableLinks(actor: Actor, query: Record<string, string>): Promise<string[]> {
  const first = await searchSolutions(actor, query);
  const links = first.solutions.map((s) => s.href);
  for (let page = 2; page <= first.pages; page++) {
    const next = await searchSolutions(actor, { ...query, page: String(page) });
    links.push(...next.solutions.map((s) => s.href));
  }
  return links;
}

/** The header, then for each stretch of keys its batches of rows. */
function chunksFor(rows: number): number {
  let chunks = 1;
  for (let left = rows; left > 0; left -= KEYS) chunks += Math.ceil(Math.min(left, KEYS) / BATCH);
  return chunks;
}

/** Numbers of a column with the empty cells (nulls) where they stand. */
const numbers = (rows: string[][], column: number) =>
  rows.map((r) => (r[column] === "" ? null : Number(r[column])));

describe("the CSV export in the table's order", () => {
  let r1: Actor;
  let r2: Actor;
  let sup: Actor;
  let total: number;

  beforeAll(async () => {
    const lab = await createLabWithMembers(["supervisor", "researcher", "researcher"]);
    sup = lab.members.supervisor;
    r1 = lab.members.researcher;
    r2 = lab.members.researcher2;
    const project = (
      await insertProject(getDb(), { labId: r1.labId, name: "Order", createdById: r1.userId })
    ).id;
    const series = (tag: string, n: number) =>
      Array.from({ length: n }, (_, i) => seriesBlock(tag, i));
    await entryWith(r1, project, "Alpha series", series("a", 20));
    const beta = await entryWith(r2, project, "beta series", series("b", 20));
    await submitEntry(r2, beta);
    // Saved twice, five blocks stronger the second time: five closed rows for "include
    // earlier revisions" (block 3 is refused either way, so it is left as it was).
    const gamma = await entryWith(r1, project, "Gamma series", series("g", 20));
    const changed = new Set([0, 1, 2, 4, 5]);
    await saveEntryContent(r1, gamma, {
      baseRevision: 1,
      title: "Gamma series",
      content: doc(series("g", 20).map((b, i) => (changed.has(i) ? seriesBlock("g", i, 7) : b))),
    });
    // The same title as another entry's: entries tie too.
    await entryWith(sup, project, "Alpha series", series("s", 15));
    total = 75;
  });

  it("has rows without an ionic strength or a Debye length to sort", async () => {
    const { rows } = await exported(r1, {});
    expect(rows).toHaveLength(total);
    const nulls = numbers(rows, IONIC_MOLAL).filter((x) => x === null).length;
    expect(nulls).toBe(11);
    expect(numbers(rows, DEBYE).filter((x) => x === null).length).toBe(nulls);
  });

  for (const sort of SORTS) {
    for (const dir of ["asc", "desc"] as const) {
      it(`sorted by ${sort} ${dir}: the table's order, in several batches`, async () => {
        const query = { sort, dir };
        const { rows, chunks } = await exported(r1, query);
        expect(chunks).toBe(chunksFor(total));
        const links = rows.map((r) => r[LINK]);
        expect(new Set(links).size).toBe(total);
        expect(links).toEqual(await tableLinks(r1, query));
      });
    }
  }

  it("puts the rows without a value last, either way", async () => {
    for (const [sort, column] of [
      ["ionicStrength", IONIC_MOLAL],
      ["debye", DEBYE],
    ] as const) {
      for (const dir of ["asc", "desc"] as const) {
        const values = numbers((await exported(r1, { sort, dir })).rows, column);
        const present = values.filter((x) => x !== null);
        expect(values.slice(present.length).every((x) => x === null)).toBe(true);
        expect(present).toEqual([...present].sort((a, b) => (dir === "asc" ? a - b : b - a)));
      }
    }
  });

  it("keeps the order with filters and with earlier revisions (two branches merged)", async () => {
    // A species alone: the table's page reads block_species, the export block_results.
    const queries: Record<string, string>[] = [
      { species: "KCl" },
      { species: "K+", iMin: "0.02" },
      { species: "KCl", tMin: "21" },
      { history: "1" },
    ];
    for (const query of queries) {
      for (const sort of ["ionicStrength", "name", "saved", "author"]) {
        for (const dir of ["asc", "desc"]) {
          const full = { ...query, sort, dir };
          const links = (await exported(r1, full)).rows.map((r) => r[LINK]);
          expect(links.length).toBeGreaterThan(KEYS);
          expect(links).toEqual(await tableLinks(r1, full));
        }
      }
    }
    expect((await exported(r1, { history: "1" })).rows).toHaveLength(total + 5);
  });

  it("sends each row once when solutions are saved while it streams", async () => {
    const query = { sort: "ionicStrength", dir: "asc" };
    const before = await tableLinks(r1, query);
    const reader = (await solutionsCsvStream(r1, query, { keys: KEYS, batch: BATCH })).getReader();
    const decoder = new TextDecoder();
    let text = "";
    for (let i = 0; i < 3; i++) text += decoder.decode((await reader.read()).value);
    // One solution weaker than every other (before the rows sent), one stronger (after them).
    const project = (
      await insertProject(getDb(), { labId: r1.labId, name: "Late", createdById: r1.userId })
    ).id;
    const late = await entryWith(r1, project, "Late series", [
      defaultSolutionBlockInput({
        blockId: "blk-weak",
        name: "Weak",
        components: [{ formula: "KCl", amount: 0.0001, unit: "mol/kg" }],
      }),
      defaultSolutionBlockInput({
        blockId: "blk-strong",
        name: "Strong",
        components: [{ formula: "KCl", amount: 3, unit: "mol/kg" }],
      }),
    ]);
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      text += decoder.decode(value, { stream: true });
    }
    const links = Papa.parse<string[]>(text.trim(), { newline: "\r\n" })
      .data.slice(1)
      .map((r) => r[LINK]);
    const strong = `/entries/${late}#block-blk-strong`;
    const nullsFrom = before.length - 11;
    expect(links).toEqual([...before.slice(0, nullsFrom), strong, ...before.slice(nullsFrom)]);
  });
});
