// @vitest-environment node
import { and, eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { blockResults, entries, solutionParents, solutionResults } from "@/db/schema";
import type { Actor } from "@/lib/access/actor";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { stockKey } from "@/lib/document/dilution";
import { evaluateSolutionBlock } from "@/lib/document/evaluate-solution-block";
import { AppError } from "@/lib/errors";
import { createEntry } from "@/lib/notebook/entries";
import {
  getStockComposition,
  listLabStocks,
  newerStocksOf,
  updateStock,
} from "@/lib/notebook/lineage/stocks";
import { countersignEntry, startAmendment, submitEntry } from "@/lib/notebook/review";
import { getRevisionComparison } from "@/lib/notebook/review-view";
import { getCurrentContent } from "@/lib/notebook/revisions";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { searchSolutions } from "@/lib/notebook/solution-finder";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers, ownerDb, TEST_PASSWORD } from "../support/db";

const doc = (...nodes: unknown[]) => ({ type: "doc", content: nodes });
const block = (attrs: SolutionBlockInput) => ({ type: "solutionBlock", attrs });

async function errorOf(promise: Promise<unknown>): Promise<AppError> {
  const e = await promise.then(
    () => null,
    (x: unknown) => x,
  );
  expect(e).toBeInstanceOf(AppError);
  return e as AppError;
}

const kclStock = (molarity: number) =>
  defaultSolutionBlockInput({
    blockId: "stock-kcl",
    name: "KCl stock",
    components: [{ formula: "KCl", amount: molarity, unit: "mol/L" }],
  });

const dilution = (
  name: string,
  blockId: string,
  stock: { entryId: string; blockId: string; revision: number },
  volumeMl: number,
  finalMl: number,
) =>
  defaultSolutionBlockInput({
    blockId,
    name,
    components: [],
    dilution: {
      stocks: [{ ...stock, volume: volumeMl, volumeUnit: "mL" }],
      finalVolume: finalMl,
      finalVolumeUnit: "mL",
    },
  });

async function currentRow(entryId: string, blockId: string) {
  const [row] = await getDb()
    .select({ block: blockResults, result: solutionResults })
    .from(blockResults)
    .innerJoin(solutionResults, eq(solutionResults.id, blockResults.resultId))
    .where(
      and(
        eq(blockResults.entryId, entryId),
        eq(blockResults.blockId, blockId),
        sql`${blockResults.toRevision} is null`,
      ),
    );
  return row;
}

const sign = (revision: number) => ({
  revision,
  password: TEST_PASSWORD,
  meaning: "witnessed" as const,
  comment: "Seen.",
});

describe("stocks and lineage", () => {
  let author: Actor;
  let supervisor: Actor;
  let outsider: Actor;
  let projectId: string;
  let stockEntry: string;
  let workEntry: string;

  beforeAll(async () => {
    const { members, lab } = await createLabWithMembers(["admin", "supervisor", "researcher"]);
    author = members.researcher;
    supervisor = members.supervisor;
    projectId = (
      await insertProject(getDb(), { labId: lab.id, name: "Lineage", createdById: author.userId })
    ).id;
    outsider = (await createLabWithMembers(["researcher"])).members.researcher;
    stockEntry = (await createEntry(author, { projectId, title: "Stock solutions" })).id;
    workEntry = (await createEntry(author, { projectId, title: "Working electrolytes" })).id;
    await saveEntryContent(author, stockEntry, {
      baseRevision: 0,
      title: "Stock solutions",
      content: doc(block(kclStock(1))),
    });
  });

  it("computes a dilution chain across two entries from the stored stock, as the editor does", async () => {
    // Revision 1: 10 mL of the 1 mol/L KCl stock (entry "Stock solutions", revision 1)
    // made up to 100 mL.
    const mid = dilution(
      "KCl 0.1 M",
      "mid-kcl",
      { entryId: stockEntry, blockId: "stock-kcl", revision: 1 },
      10,
      100,
    );
    const first = await saveEntryContent(author, workEntry, {
      baseRevision: 0,
      title: "Working electrolytes",
      content: doc(block(mid)),
    });
    expect(first).toMatchObject({ revision: 1, created: true, solutionRowsWritten: 2 });
    const midRow = await currentRow(workEntry, "mid-kcl");
    // c₂ = c₁·V₁/V₂ = 1 mol/L × 10 mL / 100 mL = 0.1 mol/L (common practice); for a 1:1 salt
    // the molar ionic strength equals c.
    expect(midRow.block.ionicStrengthMolar).toBeCloseTo(0.1, 12);

    // Revision 2: 5 mL of that 0.1 mol/L solution (this entry, revision 1) made up to 50 mL.
    const final = dilution(
      "KCl 10 mM",
      "final-kcl",
      { entryId: workEntry, blockId: "mid-kcl", revision: 1 },
      5,
      50,
    );
    const second = await saveEntryContent(author, workEntry, {
      baseRevision: 1,
      title: "Working electrolytes",
      content: doc(block(mid), block(final)),
    });
    // One new block row and its result; the unchanged block writes nothing.
    expect(second).toMatchObject({ revision: 2, solutionRowsWritten: 2 });
    const finalRow = await currentRow(workEntry, "final-kcl");
    // 0.1 mol/L × 5 mL / 50 mL = 0.01 mol/L (common practice).
    expect(finalRow.block.ionicStrengthMolar).toBeCloseTo(0.01, 12);
    // Molality uses the density lib/chem models for KCl (Laliberté & Cooper 2004), and says so.
    expect((finalRow.result.results.density as { source: string }).source).toBe("laliberte-cooper");
    // The finder shows what a solution made from stocks contains, not an empty recipe.
    const found = await searchSolutions(author, { species: "KCl", sort: "name", dir: "asc" });
    expect(
      found.solutions.filter((s) => s.entryId === workEntry).map((s) => [s.blockId, s.composition]),
    ).toEqual([
      ["mid-kcl", "0.1 mol/L KCl"],
      ["final-kcl", "0.01 mol/L KCl"],
    ]);

    // The editor's reading of the stock (the same route the block fetches) evaluates to the
    // very numbers the server stored.
    const lookup = await getStockComposition(author, {
      entry: workEntry,
      block: "mid-kcl",
      revision: "1",
    });
    expect(lookup.status).toBe("ok");
    const live = evaluateSolutionBlock(
      final,
      new Map([[stockKey(final.dilution!.stocks[0]), lookup]]),
    );
    expect(live.status === "ok" && live.result.ionicStrength.molal).toBe(
      finalRow.block.ionicStrengthMolal,
    );

    const links = await getDb()
      .select()
      .from(solutionParents)
      .where(eq(solutionParents.entryId, workEntry));
    expect(links).toHaveLength(2);
    expect(links.find((l) => l.blockId === "final-kcl")).toMatchObject({
      revision: 2,
      parentEntryId: workEntry,
      parentBlockId: "mid-kcl",
      parentRevision: 1,
      volumeMl: 5,
      finalVolumeMl: 50,
    });
  });

  it("lists every stock with where and by whom it was made, and every use", async () => {
    const stocks = await listLabStocks(supervisor);
    expect(stocks).toHaveLength(2);
    const kcl = stocks.find((s) => s.blockId === "stock-kcl")!;
    expect(kcl).toMatchObject({
      entryId: stockEntry,
      entryTitle: "Stock solutions",
      name: "KCl stock",
      href: `/entries/${stockEntry}#block-stock-kcl`,
      made: [{ revision: 1, byName: author.name }],
    });
    expect(kcl.uses).toEqual([
      expect.objectContaining({
        entryId: workEntry,
        blockId: "mid-kcl",
        fromRevision: 1,
        toRevision: null,
        stockRevision: 1,
      }),
    ]);
    const mid = stocks.find((s) => s.blockId === "mid-kcl")!;
    expect(mid.uses.map((u) => [u.blockId, u.stockRevision])).toEqual([["final-kcl", 1]]);
    // Another lab sees none of it.
    expect(await listLabStocks(outsider)).toEqual([]);
  });

  it("shows a notice once the stock is amended, and the update is a new (amending) revision", async () => {
    await submitEntry(author, workEntry);
    await countersignEntry(supervisor, workEntry, sign(2));
    await submitEntry(author, stockEntry);
    await countersignEntry(supervisor, stockEntry, sign(1));
    expect(await newerStocksOf(author, workEntry)).toEqual([]);

    await startAmendment(author, stockEntry, { reason: "KCl stock remade at 0.5 M" });
    await saveEntryContent(author, stockEntry, {
      baseRevision: 1,
      title: "Stock solutions",
      content: doc(block(kclStock(0.5))),
    });
    const notices = await newerStocksOf(supervisor, workEntry);
    expect(notices).toEqual([
      expect.objectContaining({
        blockId: "mid-kcl",
        parentEntryId: stockEntry,
        usedRevision: 1,
        currentRevision: 2,
        changedInRevision: 2,
        amendmentReason: "KCl stock remade at 0.5 M",
        removed: false,
        diffHref: `/entries/${stockEntry}/revisions/compare?from=1&to=2`,
      }),
    ]);

    // The notice's link: the stock entry's revisions 1 → 2, with the stored numbers.
    const change = await getRevisionComparison(author, stockEntry, 1, 2);
    const stockDiff = change.comparison.blocks.find((b) => b.blockId === "stock-kcl")!;
    expect(stockDiff.status).toBe("changed");
    expect((await errorOf(getRevisionComparison(outsider, stockEntry, 1, 2))).status).toBe(404);

    const offer = {
      blockId: "mid-kcl",
      parentEntryId: stockEntry,
      parentBlockId: "stock-kcl",
      toRevision: 2,
      baseRevision: 2,
    };
    // The child is countersigned: the update is an amendment and needs its reason.
    const noReason = await errorOf(updateStock(author, workEntry, offer));
    expect(noReason.status).toBe(422);
    expect(noReason.fieldErrors?.reason).toBeDefined();
    // Only the author may change the entry.
    expect(
      (await errorOf(updateStock(supervisor, workEntry, { ...offer, reason: "x y z" }))).status,
    ).toBe(403);

    const saved = await updateStock(author, workEntry, {
      ...offer,
      reason: "Use the remade KCl stock",
    });
    expect(saved).toMatchObject({ revision: 3, created: true });
    const [entry] = await getDb().select().from(entries).where(eq(entries.id, workEntry));
    expect(entry).toMatchObject({ status: "amended", currentRevisionNumber: 3 });
    const current = await getCurrentContent(author, workEntry);
    expect(current).toMatchObject({ number: 3, amendsRevisionNumber: 2 });
    // 0.5 mol/L × 10 mL / 100 mL = 0.05 mol/L (common practice).
    expect((await currentRow(workEntry, "mid-kcl")).block.ionicStrengthMolar).toBeCloseTo(0.05, 12);
    // Revision 2 keeps the numbers and the links it was signed with.
    const oldLinks = await getDb()
      .select()
      .from(solutionParents)
      .where(and(eq(solutionParents.entryId, workEntry), eq(solutionParents.blockId, "mid-kcl")));
    expect(oldLinks.map((l) => l.parentRevision).sort()).toEqual([1, 2]);

    // The chain: the block made from "KCl 0.1 M" now has a newer stock revision itself.
    const next = await newerStocksOf(author, workEntry);
    expect(next.map((n) => [n.blockId, n.usedRevision, n.currentRevision])).toEqual([
      ["final-kcl", 1, 3],
    ]);
  });

  it("refuses another lab's solution as a stock, with the answer a missing one gets", async () => {
    const theirs = (
      await createEntry(outsider, { projectId: await outsiderProject(), title: "Theirs" })
    ).id;
    await saveEntryContent(outsider, theirs, {
      baseRevision: 0,
      title: "Theirs",
      content: doc(block(kclStock(2))),
    });
    const entry = (await createEntry(author, { projectId, title: "Borrowing" })).id;
    const borrow = (entryId: string) =>
      saveEntryContent(author, entry, {
        baseRevision: 0,
        title: "Borrowing",
        content: doc(
          block(
            dilution("Borrowed", "borrowed", { entryId, blockId: "stock-kcl", revision: 1 }, 1, 10),
          ),
        ),
      });
    const foreign = await errorOf(borrow(theirs));
    const missing = await errorOf(borrow("00000000-0000-4000-8000-000000000000"));
    expect(foreign.status).toBe(422);
    expect(foreign.message).toBe(missing.message);
    expect(foreign.fieldErrors).toEqual(missing.fieldErrors);
    // A revision the stock's entry has not reached yet is refused the same way.
    const future = await errorOf(
      saveEntryContent(author, entry, {
        baseRevision: 0,
        title: "Borrowing",
        content: doc(
          block(
            dilution(
              "Later",
              "later",
              { entryId: stockEntry, blockId: "stock-kcl", revision: 9 },
              1,
              10,
            ),
          ),
        ),
      }),
    );
    expect(future.message).toBe(missing.message);
    expect((await getCurrentContent(author, entry)).number).toBe(0);
    // The editor's stock reading: 404, as for any entry of another lab.
    expect(
      (await errorOf(getStockComposition(author, { entry: theirs, block: "stock-kcl" }))).status,
    ).toBe(404);
    expect(
      (await errorOf(getStockComposition(author, { entry: stockEntry, block: "../x" }))).status,
    ).toBe(422);

    async function outsiderProject() {
      return (
        await insertProject(getDb(), {
          labId: outsider.labId,
          name: "Elsewhere",
          createdById: outsider.userId,
        })
      ).id;
    }
  });

  it("guards the links in the database: never changed, never across labs", async () => {
    // As the owner: the app's own role may not even issue an UPDATE or DELETE here
    // (db/app-role-privileges.ts); the triggers are the guard that holds for everyone else.
    const db = ownerDb();
    // Drizzle wraps the server's error; PostgreSQL's own message is its cause.
    const attempt = (run: Promise<unknown>) =>
      run.then(
        () => "applied",
        (e: unknown) => String((e as { cause?: Error }).cause?.message ?? (e as Error).message),
      );
    const [link] = await db
      .select()
      .from(solutionParents)
      .where(eq(solutionParents.entryId, workEntry))
      .limit(1);
    expect(
      await attempt(
        db.execute(sql`update solution_parents set volume_ml = 1 where id = ${link.id}`),
      ),
    ).toMatch(/solution_parents rows are immutable \(UPDATE refused\)/);
    expect(
      await attempt(db.execute(sql`delete from solution_parents where id = ${link.id}`)),
    ).toMatch(/solution_parents rows are immutable \(DELETE refused\)/);
    const { id: _id, createdAt: _c, ...copy } = link;
    expect(
      await attempt(
        db.insert(solutionParents).values({ ...copy, position: 99, labId: outsider.labId }),
      ),
    ).toMatch(/same lab/);
  });
});
