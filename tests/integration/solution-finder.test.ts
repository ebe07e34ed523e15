// @vitest-environment node
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import type { Actor } from "@/lib/access/actor";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { AppError } from "@/lib/errors";
import { createEntry, setEntryArchived } from "@/lib/notebook/entries";
import { submitEntry } from "@/lib/notebook/review";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { findSimilarSolutions } from "@/lib/notebook/similar-solutions";
import { species as labSpecies } from "@/db/schema";
import { suggestSpecies } from "@/lib/finder/species-suggestions";
import { searchSolutions, solutionsCsvStream } from "@/lib/notebook/solution-finder";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers } from "../support/db";

type Component = { formula: string; amount: number };

const block = (
  blockId: string,
  name: string,
  components: Component[],
  extra: Partial<SolutionBlockInput> = {},
) =>
  defaultSolutionBlockInput({
    blockId,
    name,
    temperatureC: 25,
    components: components.map((c) => ({ ...c, unit: "mol/kg" as const })),
    ...extra,
  });

const doc = (text: string, blocks: SolutionBlockInput[]) => ({
  type: "doc",
  content: [
    { type: "paragraph", content: [{ type: "text", text }] },
    ...blocks.map((attrs) => ({ type: "solutionBlock", attrs })),
  ],
});

async function entryWith(
  actor: Actor,
  projectId: string,
  title: string,
  text: string,
  blocks: SolutionBlockInput[],
): Promise<string> {
  const { id } = await createEntry(actor, { projectId, title });
  await saveEntryContent(actor, id, { baseRevision: 0, title, content: doc(text, blocks) });
  return id;
}

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

const today = new Date().toISOString().slice(0, 10);
const dayOffset = (days: number) =>
  new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

describe("the solution finder", () => {
  let r1: Actor;
  let r2: Actor;
  let other: Actor;
  let redox: string;
  let plating: string;
  let series: string;
  let calibration: string;

  /** Names found for a query by the researcher (page 1, sorted by name). */
  const names = async (query: Record<string, string>, actor?: Actor) =>
    (await searchSolutions(actor ?? r1, { sort: "name", ...query })).solutions.map((s) => s.name);

  beforeAll(async () => {
    const labA = await createLabWithMembers(["admin", "supervisor", "researcher", "researcher"]);
    r1 = labA.members.researcher;
    r2 = labA.members.researcher3;
    const db = getDb();
    redox = (
      await insertProject(db, { labId: r1.labId, name: "Redox probes", createdById: r1.userId })
    ).id;
    plating = (
      await insertProject(db, { labId: r1.labId, name: "Plating", createdById: r1.userId })
    ).id;

    calibration = await entryWith(
      r1,
      redox,
      "Ferricyanide calibration on glassy carbon",
      "Cyclic voltammetry of ferricyanide.",
      [
        block("blk-a", "A KCl", [{ formula: "KCl", amount: 0.1 }]),
        block("blk-b", "B probe in KCl", [
          { formula: "KCl", amount: 0.1 },
          { formula: "K3Fe(CN)6", amount: 0.005 },
        ]),
      ],
    );
    await entryWith(r2, plating, "Copper plating bath", "Plating copper onto steel coupons.", [
      block("blk-c", "C acid copper", [{ formula: "CuSO4", amount: 0.2 }], { temperatureC: 40 }),
    ]);
    // Saved twice: the first revision had F at 0.05 mol/kg and 25 °C.
    const seriesTitle = "Sodium chloride series";
    const d = block("blk-d", "D NaCl dilute", [{ formula: "NaCl", amount: 0.01 }], {
      temperatureC: 20,
      model: "davies",
    });
    const g = block("blk-g", "G NaCl strong", [{ formula: "NaCl", amount: 2 }], {
      temperatureC: 20,
    });
    series = await entryWith(r1, redox, seriesTitle, "Conductivity of a dilution series.", [
      d,
      block("blk-f", "F NaCl", [{ formula: "NaCl", amount: 0.05 }]),
      g,
    ]);
    await saveEntryContent(r1, series, {
      baseRevision: 1,
      title: seriesTitle,
      content: doc("Conductivity of a dilution series.", [
        d,
        block("blk-f", "F NaCl", [{ formula: "NaCl", amount: 0.1 }], { temperatureC: 20 }),
        g,
      ]),
    });
    const archived = await entryWith(r1, redox, "Archived sodium chloride", "Old.", [
      block("blk-e", "E archived NaCl", [{ formula: "NaCl", amount: 0.1 }]),
    ]);
    await setEntryArchived(r1, archived, true);
    const submitted = await entryWith(r2, redox, "Submitted sulfate", "Sulfate blank.", [
      block("blk-h", "H sodium sulfate", [{ formula: "Na2SO4", amount: 0.05 }]),
    ]);
    await submitEntry(r2, submitted);

    const labB = await createLabWithMembers(["researcher"]);
    other = labB.members.researcher;
    const otherProject = (
      await insertProject(db, { labId: other.labId, name: "Elsewhere", createdById: other.userId })
    ).id;
    await entryWith(other, otherProject, "Another lab's sodium chloride", "Not yours.", [
      block("blk-x", "X other lab NaCl", [{ formula: "NaCl", amount: 0.1 }]),
    ]);
  });

  describe("each filter alone", () => {
    it("finds nothing filtered: every current solution of the lab, archived entries left out", async () => {
      expect(await names({})).toEqual([
        "A KCl",
        "B probe in KCl",
        "C acid copper",
        "D NaCl dilute",
        "F NaCl",
        "G NaCl strong",
        "H sodium sulfate",
      ]);
    });

    it("ionic strength on the molal scale", async () => {
      // I = ½ Σ m z²: 0.1 for 0.1 mol/kg of a 1:1 salt (definition).
      expect(await names({ iMin: "0.09", iMax: "0.11" })).toEqual(["A KCl", "F NaCl"]);
      expect(await names({ iMin: "0.12", iMax: "0.2" })).toEqual([
        "B probe in KCl",
        "H sodium sulfate",
      ]);
    });

    it("ionic strength on the molar scale", async () => {
      const found = await searchSolutions(r1, {
        scale: "molar",
        iMin: "0.09",
        iMax: "0.11",
        sort: "name",
      });
      expect(found.solutions.map((s) => s.name)).toEqual(["A KCl", "F NaCl"]);
      for (const s of found.solutions) expect(s.ionicStrengthMolar).not.toBe(s.ionicStrengthMolal);
    });

    it("species, all of or any of, by formula or by name", async () => {
      expect(await names({ species: "NaCl" })).toEqual([
        "D NaCl dilute",
        "F NaCl",
        "G NaCl strong",
      ]);
      expect(await names({ species: "sodium chloride" })).toEqual([
        "D NaCl dilute",
        "F NaCl",
        "G NaCl strong",
      ]);
      expect(await names({ species: "KCl, K3Fe(CN)6" })).toEqual(["B probe in KCl"]);
      expect(await names({ species: "K3Fe(CN)6, CuSO4", match: "any" })).toEqual([
        "B probe in KCl",
        "C acid copper",
      ]);
      expect(await names({ species: "sulfate" })).toEqual(["C acid copper", "H sodium sulfate"]);
      expect(await names({ species: "Cl-" })).toEqual([
        "A KCl",
        "B probe in KCl",
        "D NaCl dilute",
        "F NaCl",
        "G NaCl strong",
      ]);
    });

    it("solvent, temperature and model", async () => {
      expect(await names({ solvent: "water" })).toHaveLength(7);
      expect(await names({ solvent: "methanol" })).toEqual([]);
      expect(await names({ tMin: "15", tMax: "22" })).toEqual([
        "D NaCl dilute",
        "F NaCl",
        "G NaCl strong",
      ]);
      expect(await names({ tMin: "30" })).toEqual(["C acid copper"]);
      expect(await names({ model: "davies" })).toEqual(["D NaCl dilute"]);
    });

    it("author, project and entry status", async () => {
      expect(await names({ author: r2.userId })).toEqual(["C acid copper", "H sodium sulfate"]);
      expect(await names({ author: "me" })).toEqual([
        "A KCl",
        "B probe in KCl",
        "D NaCl dilute",
        "F NaCl",
        "G NaCl strong",
      ]);
      expect(await names({ project: plating })).toEqual(["C acid copper"]);
      expect(await names({ status: "submitted" })).toEqual(["H sodium sulfate"]);
      expect(await names({ status: "countersigned" })).toEqual([]);
    });

    it("date range of the save", async () => {
      expect(await names({ from: today, to: today })).toHaveLength(7);
      expect(await names({ from: dayOffset(1) })).toEqual([]);
      expect(await names({ to: dayOffset(-1) })).toEqual([]);
    });

    it("full text over titles and text: English stems and prefixes", async () => {
      expect(await names({ q: "ferricyan" })).toEqual(["A KCl", "B probe in KCl"]);
      // "plated" and "plating" share the stem "plate"; "coupon" finds "coupons".
      expect(await names({ q: "plated coupon" })).toEqual(["C acid copper"]);
      expect(await names({ q: "glassy calib" })).toEqual(["A KCl", "B probe in KCl"]);
      expect(await names({ q: "dilution" })).toEqual(["D NaCl dilute", "F NaCl", "G NaCl strong"]);
      expect(await names({ q: "titanium" })).toEqual([]);
    });
  });

  it("combines filters freely", async () => {
    expect(
      await names({ iMin: "0.05", iMax: "0.2", species: "Cl-", author: "me", q: "chloride" }),
    ).toEqual(["F NaCl"]);
    expect(await names({ species: "NaCl", tMin: "19", tMax: "21", iMin: "0.5" })).toEqual([
      "G NaCl strong",
    ]);
  });

  it("searches only the member's own lab", async () => {
    expect(await names({ species: "NaCl" }, other)).toEqual(["X other lab NaCl"]);
    expect(await names({ author: other.userId })).toEqual([]);
    expect(await names({ author: r1.userId }, other)).toEqual([]);
    const similar = await failure(
      findSimilarSolutions(other, { entry: calibration, block: "blk-a" }),
    );
    expect(similar.status).toBe(404);
  });

  it("counts only each entry's current revision, unless earlier revisions are asked for", async () => {
    expect(await names({ iMin: "0.04", iMax: "0.06", species: "NaCl" })).toEqual([]);
    const withHistory = await searchSolutions(r1, {
      iMin: "0.04",
      iMax: "0.06",
      species: "NaCl",
      history: "1",
    });
    expect(withHistory.solutions).toHaveLength(1);
    expect(withHistory.solutions[0]).toMatchObject({
      name: "F NaCl",
      fromRevision: 1,
      toRevision: 2,
      href: `/entries/${series}/revisions/1#block-blk-f`,
    });
    // The current F (revision 2 on) is found with history too, linked to the entry itself.
    const both = await searchSolutions(r1, {
      species: "NaCl",
      iMin: "0.04",
      iMax: "0.11",
      history: "1",
      sort: "ionicStrength",
    });
    expect(both.solutions.map((s) => [s.name, s.fromRevision, s.toRevision])).toEqual([
      ["F NaCl", 1, 2],
      ["F NaCl", 2, null],
    ]);
    expect(both.solutions[1].href).toBe(`/entries/${series}#block-blk-f`);
  });

  it("sorts by ionic strength, temperature, entry and author, either way", async () => {
    const by = async (sort: string, dir: string) =>
      (await searchSolutions(r1, { sort, dir })).solutions;
    const ascending = await by("ionicStrength", "asc");
    // A and F are both 0.1 mol/kg of a 1:1 salt: equal ionic strength, so either order.
    expect(ascending.map((s) => s.name)).toEqual([
      "D NaCl dilute",
      expect.stringMatching(/^(A KCl|F NaCl)$/),
      expect.stringMatching(/^(A KCl|F NaCl)$/),
      "B probe in KCl",
      "H sodium sulfate",
      "C acid copper",
      "G NaCl strong",
    ]);
    expect((await by("ionicStrength", "desc")).map((s) => s.name)).toEqual(
      [...ascending.map((s) => s.name)].reverse(),
    );
    expect((await by("temperature", "desc"))[0].name).toBe("C acid copper");
    expect((await by("entry", "asc")).map((s) => s.entryTitle)).toEqual([
      "Copper plating bath",
      "Ferricyanide calibration on glassy carbon",
      "Ferricyanide calibration on glassy carbon",
      "Sodium chloride series",
      "Sodium chloride series",
      "Sodium chloride series",
      "Submitted sulfate",
    ]);
    const authors = (await by("author", "asc")).map((s) => s.authorName);
    expect(authors).toEqual(
      [...authors].sort((a, b) => a.toLowerCase().localeCompare(b.toLowerCase())),
    );
    expect(new Set(authors)).toEqual(new Set([r1.name, r2.name]));
  });

  it("links each row to its block and shows the composition with typeset formulas", async () => {
    const [b] = (await searchSolutions(r1, { species: "K3Fe(CN)6" })).solutions;
    expect(b).toMatchObject({
      name: "B probe in KCl",
      composition: "0.1 mol/kg KCl + 0.005 mol/kg K₃Fe(CN)₆",
      entryTitle: "Ferricyanide calibration on glassy carbon",
      entryStatus: "draft",
      projectName: "Redox probes",
      authorName: r1.name,
      href: `/entries/${calibration}#block-blk-b`,
      similarHref: `/solutions/similar?entry=${calibration}&block=blk-b`,
    });
    expect(b.ionicStrengthMolal).toBeCloseTo(0.13, 12); // ½(0.115·1 + 0.1·1 + 0.005·9)
  });

  it("refuses bad input with a message by field, never a 500", async () => {
    const fields = async (query: Record<string, string>) =>
      (await failure(searchSolutions(r1, query))).fieldErrors;
    expect(await fields({ iMin: "0.5", iMax: "0.1" })).toEqual({
      iMax: ["The highest ionic strength is below the lowest."],
    });
    expect(await fields({ iMin: "lots" })).toEqual({
      iMin: ['Lowest ionic strength: "lots" is not a number.'],
    });
    expect(await fields({ tMin: "30", tMax: "10" })).toEqual({
      tMax: ["The highest temperature is below the lowest."],
    });
    expect(await fields({ species: "NaCl, unobtainium" })).toEqual({
      species: [
        '"unobtainium" is not a species of the catalogue or of the lab; type a formula (NaCl, SO4^2-) or choose from the list.',
      ],
    });
    expect(await fields({ q: "x".repeat(201) })).toEqual({
      q: ["Keep the text search under 200 characters."],
    });
    expect(await fields({ page: "2" })).toEqual({
      page: ["This search has one page; page 2 is past the end."],
    });
    expect(await fields({ page: "-1" })).toEqual({ page: ["Pages are whole numbers from 1."] });
    expect(await fields({ from: "1850-01-01" })).toEqual({
      from: ["Saved from: use a real date between 2000 and 2200."],
    });
    expect(await fields({ from: "2026-02-30" })).toEqual({
      from: ["Saved from: use a real date between 2000 and 2200."],
    });
    expect(await fields({ from: "2026-03-02", to: "2026-03-01" })).toEqual({
      to: ["The last date comes before the first."],
    });
    expect(await fields({ sort: "password" })).toEqual({
      sort: ["Sort by one of the table's columns."],
    });
    expect(await fields({ author: "someone" })).toEqual({
      author: ["Choose a member of the lab."],
    });
    expect((await failure(searchSolutions(r1, { iMin: "0.5", iMax: "0.1" }))).status).toBe(422);
  });

  it("lists similar solutions nearest first, with the difference in words", async () => {
    const result = await findSimilarSolutions(r1, { entry: calibration, block: "blk-a" });
    expect(result.target).toMatchObject({ name: "A KCl", ions: ["K+", "Cl-"] });
    // Candidates share an ion with KCl: C (Cu²⁺, SO₄²⁻) and H (Na⁺, SO₄²⁻) do not; E is
    // archived; X is another lab's.
    expect(result.similar.map((s) => [s.name, s.difference])).toEqual([
      ["B probe in KCl", "also Fe(CN)₆³⁻, I 30 % higher, same temperature"],
      ["F NaCl", "also Na⁺, no K⁺, same I, 5 °C colder"],
      ["D NaCl dilute", "also Na⁺, no K⁺, I 10× lower, 5 °C colder"],
      ["G NaCl strong", "also Na⁺, no K⁺, I 20× higher, 5 °C colder"],
    ]);
    // d² = mean of the ions' squared log ratios (2 decades for a missing ion) + (Δlog I)² + (ΔT/25)²
    expect(result.similar[0].distance).toBeCloseTo(
      Math.sqrt((Math.log10(0.115 / 0.1) ** 2 + 0 + 4) / 3 + Math.log10(1.3) ** 2),
      9,
    );
    expect(result.similar[1].distance).toBeCloseTo(Math.sqrt(8 / 3 + 0.04), 9);
    const earlier = await findSimilarSolutions(r1, {
      entry: series,
      block: "blk-f",
      revision: "1",
    });
    expect(earlier.target.name).toBe("F NaCl");
    expect(earlier.target.ionicStrengthMolal).toBeCloseTo(0.05, 12);
  });

  it("searches and suggests the lab's own species by formula or name", async () => {
    const labD = await createLabWithMembers(["researcher"]);
    const own = labD.members.researcher;
    await getDb().insert(labSpecies).values({
      labId: own.labId,
      formula: "FcMeOH",
      name: "Ferrocenemethanol",
      createdById: own.userId,
    });
    const project = (
      await insertProject(getDb(), { labId: own.labId, name: "Mediators", createdById: own.userId })
    ).id;
    await entryWith(own, project, "Mediator stock", "Ferrocenemethanol in KCl.", [
      block("blk-m", "M mediator", [
        { formula: "FcMeOH", amount: 0.001 },
        { formula: "KCl", amount: 0.1 },
      ]),
      block("blk-n", "N plain KCl", [{ formula: "KCl", amount: 0.1 }]),
    ]);
    expect(await names({ species: "ferrocenemethanol" }, own)).toEqual(["M mediator"]);
    expect(await names({ species: "FcMeOH, KCl" }, own)).toEqual(["M mediator"]);
    expect(await names({ species: "FcMeOH, KCl", match: "any" }, own)).toEqual([
      "M mediator",
      "N plain KCl",
    ]);
    // Another lab does not know this species.
    expect(
      (await failure(searchSolutions(r1, { species: "ferrocenemethanol" }))).fieldErrors,
    ).toEqual({
      species: [
        '"ferrocenemethanol" is not a species of the catalogue or of the lab; type a formula (NaCl, SO4^2-) or choose from the list.',
      ],
    });
    const suggestions = await suggestSpecies(own, { q: "Fc" });
    expect(suggestions[0]).toEqual({ formula: "FcMeOH", name: "Ferrocenemethanol", source: "lab" });
    expect((await suggestSpecies(r1, { q: "Fc" })).map((s) => s.source)).not.toContain("lab");
    expect((await suggestSpecies(r1, { q: "potassium chl" }))[0]).toMatchObject({
      formula: "KCl",
      source: "catalogue",
    });
  });

  describe("pagination and CSV", () => {
    let many: Actor;
    beforeAll(async () => {
      const labC = await createLabWithMembers(["researcher"]);
      many = labC.members.researcher;
      const project = (
        await insertProject(getDb(), {
          labId: many.labId,
          name: "Series",
          createdById: many.userId,
        })
      ).id;
      const blocks = Array.from({ length: 60 }, (_, i) =>
        block(
          `blk-s${String(i + 1).padStart(2, "0")}`,
          i === 41 ? "=2+3" : `S${String(i + 1).padStart(2, "0")}`,
          [{ formula: "NaCl", amount: (i + 1) / 1000 }],
        ),
      );
      await entryWith(many, project, "Sixty dilutions", "A long series.", blocks);
    });

    it("pages by 50 and says when a page is past the end", async () => {
      const first = await searchSolutions(many, { sort: "ionicStrength" });
      expect(first).toMatchObject({ total: 60, capped: false, page: 1, pages: 2, pageSize: 50 });
      expect(first.solutions).toHaveLength(50);
      expect(first.solutions[0].name).toBe("S01");
      const second = await searchSolutions(many, { sort: "ionicStrength", page: "2" });
      expect(second.solutions.map((s) => s.name)).toEqual([
        "S51",
        "S52",
        "S53",
        "S54",
        "S55",
        "S56",
        "S57",
        "S58",
        "S59",
        "S60",
      ]);
      const descending = await searchSolutions(many, { sort: "ionicStrength", dir: "desc" });
      expect(descending.solutions[0].name).toBe("S60");
      expect((await failure(searchSolutions(many, { page: "3" }))).fieldErrors).toEqual({
        page: ["This search has 2 pages; page 3 is past the end."],
      });
    });

    it("exports the whole result set as CSV, formulas escaped", async () => {
      const stream = await solutionsCsvStream(many, { species: "NaCl" });
      const text = await new Response(stream).text();
      const rows = Papa.parse<string[]>(text.trim(), { newline: "\r\n" }).data;
      expect(rows[0]).toEqual([
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
      ]);
      expect(rows).toHaveLength(61);
      const names = rows.slice(1).map((r) => r[0]);
      expect(new Set(names).size).toBe(60);
      expect(names).toContain("'=2+3");
      const s07 = rows.find((r) => r[0] === "S07")!;
      expect(s07[1]).toBe("0.007 mol/kg NaCl");
      expect(Number(s07[3])).toBeCloseTo(0.007, 12);
      expect(s07[9]).toBe("Sixty dilutions");
      expect(s07[14]).toBe("1–");
    });

    it("refuses a bad export query before the first byte", async () => {
      expect((await failure(solutionsCsvStream(many, { tMin: "hot" }))).fieldErrors).toEqual({
        tMin: ['Lowest temperature: "hot" is not a number.'],
      });
    });
  });
});
