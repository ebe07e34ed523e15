// @vitest-environment node
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { blockResults } from "@/db/schema";
import type { Actor } from "@/lib/access/actor";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { createEntry } from "@/lib/notebook/entries";
import { getRevisionWithSolutions } from "@/lib/notebook/revisions";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers } from "../support/db";

/**
 * Rows written per save. Before the storage redesign every save that changed an entry wrote a
 * solution row (with its results JSON) and component rows for every solution block: an entry
 * of 20 blocks autosaved 200 times wrote 4 000 solution rows. Now a save writes one block row
 * and (new content) one stored result per changed block, and nothing for an unchanged one.
 */
const BLOCKS = 20;
const SAVES = 200;

const blockAt = (index: number, millimolal: number): SolutionBlockInput =>
  defaultSolutionBlockInput({
    blockId: `blk-storage-${String(index).padStart(2, "0")}`,
    name: `Dilution ${index}`,
    components: [{ formula: "KNO3", amount: millimolal / 1000, unit: "mol/kg" }],
  });

const doc = (text: string, blocks: SolutionBlockInput[]) => ({
  type: "doc",
  content: [
    { type: "paragraph", content: [{ type: "text", text }] },
    ...blocks.map((attrs) => ({ type: "solutionBlock", attrs })),
  ],
});

describe("rows written per save", () => {
  let researcher: Actor;
  let projectId: string;

  beforeAll(async () => {
    const { members, lab } = await createLabWithMembers(["researcher"]);
    researcher = members.researcher;
    projectId = (
      await insertProject(getDb(), {
        labId: lab.id,
        name: "Autosave",
        createdById: researcher.userId,
      })
    ).id;
  });

  it(`an entry of ${BLOCKS} blocks saved ${SAVES} times, one block changed each time`, async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Twenty dilutions" });
    // Millimolal amounts: block i starts at 1000 + i; save n changes block n mod 20 to a value
    // no block has had, so every save computes one new result.
    const amounts = Array.from({ length: BLOCKS }, (_, i) => 1000 + i);
    const written: number[] = [];
    for (let save = 0; save < SAVES; save++) {
      if (save > 0) amounts[save % BLOCKS] = 2000 + save;
      const saved = await saveEntryContent(researcher, id, {
        baseRevision: save,
        title: "Twenty dilutions",
        content: doc(
          "Autosaved.",
          amounts.map((a, i) => blockAt(i, a)),
        ),
      });
      written.push(saved.solutionRowsWritten);
    }
    // First save: 20 block rows and 20 results. Every later one: one block row, one result.
    expect(written[0]).toBe(2 * BLOCKS);
    expect(new Set(written.slice(1))).toEqual(new Set([2]));
    const total = written.reduce((a, b) => a + b, 0);
    expect(total).toBe(2 * BLOCKS + 2 * (SAVES - 1)); // 438, against 4 000 before

    const counts = await getDb().execute<{ blocks: number; open: number; results: number }>(sql`
      select count(*)::int as blocks, count(*) filter (where b.to_revision is null)::int as open,
             count(distinct b.result_id)::int as results
        from block_results b where b.entry_id = ${id}`);
    expect(counts.rows[0]).toEqual({
      blocks: BLOCKS + SAVES - 1,
      open: BLOCKS,
      results: BLOCKS + SAVES - 1,
    });

    // The finder's species index (block_species, kept by triggers) holds exactly the open
    // rows' species with their values; the 199 rows closed by the saves left nothing there.
    const index = await getDb().execute<{ missing: number; extra: number; expected: number }>(sql`
      with expected as (
             select b.id, s.species, b.lab_id, b.ionic_strength_molal, b.ionic_strength_molar,
                    b.entry_id, b.created_at
               from block_results b cross join unnest(b.species) as s(species)
              where b.entry_id = ${id} and b.to_revision is null),
           actual as (
             select block_result_id, species, lab_id, ionic_strength_molal, ionic_strength_molar,
                    entry_id, created_at
               from block_species where entry_id = ${id})
      select (select count(*) from (select * from expected except select * from actual) x)::int as missing,
             (select count(*) from (select * from actual except select * from expected) x)::int as extra,
             (select count(*) from expected)::int as expected`);
    // KNO3, K+ and NO3- for each of the 20 open rows.
    expect(index.rows[0]).toEqual({ missing: 0, extra: 0, expected: 3 * BLOCKS });

    // A save that changes only the text writes a revision and no solution row at all.
    const textOnly = await saveEntryContent(researcher, id, {
      baseRevision: SAVES,
      title: "Twenty dilutions",
      content: doc(
        "Autosaved, then annotated.",
        amounts.map((a, i) => blockAt(i, a)),
      ),
    });
    expect(textOnly).toMatchObject({ revision: SAVES + 1, solutionRowsWritten: 0 });
    expect(await getDb().$count(blockResults, eq(blockResults.entryId, id))).toBe(
      BLOCKS + SAVES - 1,
    );

    // Revisions stay immutable and each shows its own numbers. Save n writes revision n + 1;
    // block 16 changes at saves 16, 36, 56…: revision 56 shows the amount of save 36,
    // revision 57 that of save 56.
    const r56 = await getRevisionWithSolutions(researcher, id, 56);
    const r57 = await getRevisionWithSolutions(researcher, id, 57);
    const molality = (r: typeof r56, blockId: string) =>
      r.solutions.find((s) => s.blockId === blockId)?.ionicStrengthMolal;
    expect(r56.solutions).toHaveLength(BLOCKS);
    expect(molality(r56, "blk-storage-16")).toBeCloseTo(2.036, 12); // set at save 36
    expect(molality(r57, "blk-storage-16")).toBeCloseTo(2.056, 12); // I = m for a 1:1 salt
  }, 120_000);
});
