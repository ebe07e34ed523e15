// @vitest-environment node
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { blockResults, solutionResults } from "@/db/schema";
import type { Actor } from "@/lib/access/actor";
import { computeSolution, ENGINE_VERSION } from "@/lib/chem";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { canonicalHash } from "@/lib/document/canonical-hash";
import { extractSolutionBlocks } from "@/lib/document/extract-blocks";
import { findTemplate } from "@/lib/document/templates";
import { AppError } from "@/lib/errors";
import { createEntry, listEntries, setEntryArchived } from "@/lib/notebook/entries";
import { submitEntry } from "@/lib/notebook/review";
import {
  getCurrentContent,
  getRevisionHistory,
  getRevisionWithSolutions,
} from "@/lib/notebook/revisions";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers, ownerDb } from "../support/db";

const paragraph = (text: string) => ({ type: "paragraph", content: [{ type: "text", text }] });
const nacl = (molality: number) =>
  defaultSolutionBlockInput({
    blockId: "blk-nacl-a",
    name: "Supporting electrolyte A",
    temperatureC: 25,
    solvent: "water",
    model: "auto",
    components: [{ formula: "NaCl", amount: molality, unit: "mol/kg" }],
  });
const docWith = (...nodes: unknown[]) => ({ type: "doc", content: nodes });

async function errorOf(promise: Promise<unknown>): Promise<AppError> {
  const e = await promise.then(
    () => null,
    (x: unknown) => x,
  );
  expect(e).toBeInstanceOf(AppError);
  return e as AppError;
}

describe("entries, revisions and server-computed solutions", () => {
  let researcher: Actor;
  let supervisor: Actor;
  let projectId: string;

  beforeAll(async () => {
    const { members, lab } = await createLabWithMembers(["admin", "supervisor", "researcher"]);
    researcher = members.researcher;
    supervisor = members.supervisor;
    projectId = (
      await insertProject(getDb(), {
        labId: lab.id,
        name: "Chloride series",
        createdById: researcher.userId,
      })
    ).id;
  });

  it("saves a first revision, and each changed save adds one; an unchanged save writes nothing", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Blank start" });
    const first = await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Blank start",
      content: docWith(paragraph("Rinsed the cell.")),
    });
    expect(first).toMatchObject({ revision: 1, created: true });
    const same = await saveEntryContent(researcher, id, {
      baseRevision: 1,
      title: "Blank start",
      content: docWith(paragraph("Rinsed the cell.")),
    });
    expect(same).toMatchObject({ revision: 1, created: false });
    const second = await saveEntryContent(researcher, id, {
      baseRevision: 1,
      title: "Blank start",
      content: docWith(paragraph("Rinsed the cell twice.")),
    });
    expect(second.revision).toBe(2);
    const history = await getRevisionHistory(researcher, id);
    expect(history.map((r) => r.number)).toEqual([2, 1]);
    expect(history[0].changes).toEqual(["Text: +1 word"]);
    expect(history[1].changes).toEqual(["First saved version"]);
    expect(history[0].contentHash).toBe(
      canonicalHash({
        title: "Blank start",
        content: docWith(paragraph("Rinsed the cell twice.")),
      }),
    );
  });

  it("refuses a save against a stale revision with 409 and keeps the newer one", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Two tabs" });
    await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Two tabs",
      content: docWith(paragraph("tab A")),
    });
    await saveEntryContent(researcher, id, {
      baseRevision: 1,
      title: "Two tabs",
      content: docWith(paragraph("tab A again")),
    });
    const conflict = await errorOf(
      saveEntryContent(researcher, id, {
        baseRevision: 1,
        title: "Two tabs",
        content: docWith(paragraph("tab B")),
      }),
    );
    expect(conflict.status).toBe(409);
    expect(conflict.details).toMatchObject({ currentRevision: 2 });
    expect((await getCurrentContent(researcher, id)).content).toEqual(
      docWith(paragraph("tab A again")),
    );
  });

  it("refuses a document that fails the schema; the previous revision stays intact", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Bad paste" });
    await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Bad paste",
      content: docWith(paragraph("good")),
    });
    const bad = docWith({ type: "script", content: [{ type: "text", text: "alert(1)" }] });
    const refused = await errorOf(
      saveEntryContent(researcher, id, { baseRevision: 1, title: "Bad paste", content: bad }),
    );
    expect(refused.status).toBe(422);
    const badLink = docWith({
      type: "paragraph",
      content: [
        {
          type: "text",
          text: "x",
          marks: [{ type: "link", attrs: { href: "javascript:alert(1)" } }],
        },
      ],
    });
    expect(
      (
        await errorOf(
          saveEntryContent(researcher, id, {
            baseRevision: 1,
            title: "Bad paste",
            content: badLink,
          }),
        )
      ).status,
    ).toBe(422);
    const current = await getCurrentContent(researcher, id);
    expect(current.number).toBe(1);
    expect(current.content).toEqual(docWith(paragraph("good")));
  });

  it("recomputes every solution block on the server and stores its result once", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "NaCl 0.1 m" });
    const block = nacl(0.1);
    const saved = await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "NaCl 0.1 m",
      content: docWith(paragraph("Electrolyte:"), { type: "solutionBlock", attrs: block }),
    });
    expect(saved.solutions).toBe(1);
    const rows = await getDb()
      .select({ block: blockResults, result: solutionResults })
      .from(blockResults)
      .innerJoin(solutionResults, eq(solutionResults.id, blockResults.resultId))
      .where(eq(blockResults.entryId, id));
    expect(rows).toHaveLength(1);
    const [{ block: row, result }] = rows;
    expect(row).toMatchObject({ blockId: block.blockId, fromRevision: 1, toRevision: null });
    // The browser runs the same engine on the same inputs: the stored numbers must equal it.
    const client = computeSolution({
      temperatureC: 25,
      solvent: "water",
      model: "auto",
      components: [{ formula: "NaCl", amount: 0.1, unit: "mol/kg" }],
    });
    expect(result.ionicStrengthMolal).toBeCloseTo(client.ionicStrength.molal, 12);
    expect(result.ionicStrengthMolal).toBeCloseTo(0.1, 12); // I = ½ Σ m z² = 0.1 for a 1:1 salt (definition)
    expect(row.ionicStrengthMolal).toBe(result.ionicStrengthMolal);
    expect(result.debyeLengthNm).toBeCloseTo(client.debyeLengthNm ?? NaN, 12);
    expect(result.modelUsed).toBe(client.model.used);
    expect(result.engineVersion).toBe(ENGINE_VERSION);
    expect(result.species).toEqual(expect.arrayContaining(["NaCl", "Na+", "Cl-"]));
    expect(result.composition).toEqual({ "Na+": 0.1, "Cl-": 0.1 });
    const stored = result.results as { components: { molality: number }[] };
    expect(stored.components[0].molality).toBeCloseTo(0.1, 12);
  });

  it("writes nothing for an unchanged block, closes a changed or removed one, and each revision keeps its own numbers", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Three blocks" });
    // Amounts no other test of this lab uses, so no stored result is shared with them.
    const a = nacl(0.101);
    const b = { ...nacl(0.202), blockId: "blk-nacl-b" };
    const c = { ...nacl(0.303), blockId: "blk-nacl-c" };
    const solution = (attrs: unknown) => ({ type: "solutionBlock", attrs });
    const first = await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Three blocks",
      content: docWith(solution(a), solution(b), solution(c)),
    });
    expect(first.solutionRowsWritten).toBe(6); // three block rows, three computed results
    // Text changes only: no solution row at all.
    const second = await saveEntryContent(researcher, id, {
      baseRevision: 1,
      title: "Three blocks",
      content: docWith(paragraph("note"), solution(a), solution(b), solution(c)),
    });
    expect(second.solutionRowsWritten).toBe(0);
    // Block b changes, block c is removed: one new result, one new block row, two rows closed.
    const bChanged = { ...b, components: [{ ...b.components[0], amount: 0.252 }] };
    const third = await saveEntryContent(researcher, id, {
      baseRevision: 2,
      title: "Three blocks",
      content: docWith(solution(a), solution(bChanged)),
    });
    expect(third.solutionRowsWritten).toBe(2);
    const rows = await getDb().select().from(blockResults).where(eq(blockResults.entryId, id));
    const interval = (blockId: string) =>
      rows
        .filter((r) => r.blockId === blockId)
        .map((r) => [r.fromRevision, r.toRevision])
        .sort();
    expect(interval("blk-nacl-a")).toEqual([[1, null]]);
    expect(interval("blk-nacl-b")).toEqual([
      [1, 3],
      [3, null],
    ]);
    expect(interval("blk-nacl-c")).toEqual([[1, 3]]);
    // I = m for a 1:1 salt (definition of ionic strength); 4 decimals hide float rounding.
    const ionic = async (n: number) =>
      (await getRevisionWithSolutions(researcher, id, n)).solutions
        .map((s) => `${s.blockId} ${s.ionicStrengthMolal?.toFixed(4)}`)
        .sort();
    expect(await ionic(2)).toEqual(["blk-nacl-a 0.1010", "blk-nacl-b 0.2020", "blk-nacl-c 0.3030"]);
    expect(await ionic(3)).toEqual(["blk-nacl-a 0.1010", "blk-nacl-b 0.2520"]);
  });

  it("ignores numbers a client put into the document: only inputs are read", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Tampered" });
    const tampered = { ...nacl(0.1), ionicStrength: 42 };
    const refused = await errorOf(
      saveEntryContent(researcher, id, {
        baseRevision: 0,
        title: "Tampered",
        content: docWith({ type: "solutionBlock", attrs: tampered }),
      }),
    );
    expect(refused.status).toBe(422);
  });

  it("records a block the engine refuses, with its message, and still saves the entry", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Typo" });
    const bad = defaultSolutionBlockInput({
      blockId: "blk-bad-1",
      name: "Typo",
      temperatureC: 25,
      solvent: "water",
      model: "auto",
      components: [{ formula: "NaCl", amount: -1, unit: "mol/kg" }],
    });
    const saved = await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Typo",
      content: docWith({ type: "solutionBlock", attrs: bad }),
    });
    expect(saved.created).toBe(true);
    const [{ row }] = await getDb()
      .select({ row: solutionResults })
      .from(blockResults)
      .innerJoin(solutionResults, eq(solutionResults.id, blockResults.resultId))
      .where(eq(blockResults.entryId, id));
    expect(row.ionicStrengthMolal).toBeNull();
    expect(row.results).toMatchObject({ status: "error" });
  });

  it("creates an entry from the cell-preparation template with its first revision and solutions", async () => {
    const { id } = await createEntry(researcher, {
      projectId,
      title: "Cu disc run 1",
      template: "cell-preparation",
    });
    const current = await getCurrentContent(researcher, id);
    expect(current.number).toBe(1);
    const rows = await getDb().select().from(blockResults).where(eq(blockResults.entryId, id));
    const template = findTemplate("cell-preparation")!;
    expect(rows).toHaveLength(extractSolutionBlocks(template.build()).length);
    expect(rows.length).toBeGreaterThanOrEqual(1);
  });

  it("lets only the author edit, and locks a submitted entry", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Mine" });
    await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Mine",
      content: docWith(paragraph("v1")),
    });
    expect(
      (
        await errorOf(
          saveEntryContent(supervisor, id, {
            baseRevision: 1,
            title: "Mine",
            content: docWith(paragraph("not yours")),
          }),
        )
      ).status,
    ).toBe(403);
    await submitEntry(researcher, id);
    expect(
      (
        await errorOf(
          saveEntryContent(researcher, id, {
            baseRevision: 1,
            title: "Mine",
            content: docWith(paragraph("v2")),
          }),
        )
      ).status,
    ).toBe(409);
    const mine = await listEntries(researcher, { author: "me", status: "submitted" });
    expect(mine.map((e) => e.id)).toContain(id);
  });

  it("refuses to save or submit an archived entry (409) and never archives one under review", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Archived draft" });
    await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Archived draft",
      content: docWith(paragraph("before archiving")),
    });
    await setEntryArchived(researcher, id, true);
    const save = await errorOf(
      saveEntryContent(researcher, id, {
        baseRevision: 1,
        title: "Archived draft",
        content: docWith(paragraph("after archiving")),
      }),
    );
    expect(save.status).toBe(409);
    expect(save.message).toBe("This entry is archived; restore it before you edit it.");
    const submit = await errorOf(submitEntry(researcher, id));
    expect(submit.status).toBe(409);
    expect(submit.message).toBe("This entry is archived; restore it before you submit it.");
    expect((await getCurrentContent(researcher, id)).number).toBe(1);

    await setEntryArchived(researcher, id, false);
    await submitEntry(researcher, id);
    const archive = await errorOf(setEntryArchived(researcher, id, true));
    expect(archive.status).toBe(409);
    expect(archive.message).toMatch(/stays in the review queue/);
    const queue = await listEntries(supervisor, { status: "submitted" });
    expect(queue.map((e) => e.id)).toContain(id);
  });

  it("the database itself refuses to change or delete a revision", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Immutable" });
    await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Immutable",
      content: docWith(paragraph("as written")),
    });
    // Drizzle wraps the server's error; PostgreSQL's own message is its cause.
    const serverMessage = (e: unknown) =>
      String((e as { cause?: Error }).cause?.message ?? (e as Error).message);
    // As the owner: the app's own role may not even issue these (database-role.test.ts);
    // the triggers are the guard that holds for everyone else.
    const update = await ownerDb()
      .execute(sql`update revisions set title = 'rewritten' where entry_id = ${id}`)
      .then(() => "applied", serverMessage);
    expect(update).toMatch(/revisions rows are immutable \(UPDATE refused\)/);
    const del = await ownerDb()
      .execute(sql`delete from revisions where entry_id = ${id}`)
      .then(() => "applied", serverMessage);
    expect(del).toMatch(/revisions rows are immutable \(DELETE refused\)/);
  });

  it("the database refuses to change stored results and allows only closing a block row", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Guarded results" });
    await saveEntryContent(researcher, id, {
      baseRevision: 0,
      title: "Guarded results",
      content: docWith({ type: "solutionBlock", attrs: nacl(0.1) }),
    });
    const serverMessage = (e: unknown) =>
      String((e as { cause?: Error }).cause?.message ?? (e as Error).message);
    const attempt = (statement: ReturnType<typeof sql>) =>
      ownerDb()
        .execute(statement)
        .then(() => "applied", serverMessage);
    expect(
      await attempt(
        sql`update solution_results set ionic_strength_molal = 9 where lab_id = ${researcher.labId}`,
      ),
    ).toMatch(/solution_results rows are immutable/);
    expect(
      await attempt(sql`delete from solution_results where lab_id = ${researcher.labId}`),
    ).toMatch(/solution_results rows are immutable/);
    expect(
      await attempt(sql`update block_results set ionic_strength_molal = 9 where entry_id = ${id}`),
    ).toMatch(/immutable except closing/);
    expect(await attempt(sql`delete from block_results where entry_id = ${id}`)).toMatch(
      /immutable except closing/,
    );
    expect(
      await attempt(sql`update block_results set to_revision = 2 where entry_id = ${id}`),
    ).toBe("applied");
    expect(
      await attempt(sql`update block_results set to_revision = 3 where entry_id = ${id}`),
    ).toMatch(/immutable except closing/);
  });

  it("never shows or saves another lab's entry", async () => {
    const { id } = await createEntry(researcher, { projectId, title: "Private to my lab" });
    const other = await createLabWithMembers(["admin", "researcher"]);
    expect((await errorOf(getCurrentContent(other.members.researcher, id))).status).toBe(404);
    expect(
      (
        await errorOf(
          saveEntryContent(other.members.researcher, id, {
            baseRevision: 0,
            title: "x",
            content: docWith(paragraph("x")),
          }),
        )
      ).status,
    ).toBe(404);
    expect((await listEntries(other.members.researcher, {})).map((e) => e.id)).not.toContain(id);
    expect(
      (
        await errorOf(
          createEntry(other.members.researcher, { projectId, title: "Into their project" }),
        )
      ).fieldErrors?.projectId,
    ).toBeDefined();
  });
});
