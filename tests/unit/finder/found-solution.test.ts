import { describe, expect, it } from "vitest";
import type { FinderRow } from "@/db/queries/solution-finder";
import { toFound } from "@/lib/finder/found-solution";

const row = (overrides: Partial<FinderRow> = {}): FinderRow => ({
  id: "5b0f5a52-3a39-4bb8-9d1c-0d6a4a1f7e01",
  entryId: "bb261ca0-64d9-4822-b4b5-1ac6b98e26e5",
  blockId: "sol-Ab_9-x",
  fromRevision: 2,
  toRevision: null,
  name: "Supporting electrolyte",
  ionicStrengthMolal: 0.1,
  ionicStrengthMolar: 0.0997,
  debyeLengthNm: 0.961,
  temperatureC: 25,
  solvent: "water",
  modelUsed: "davies",
  species: ["KCl", "K+", "Cl-"],
  composition: "0.1 mol/kg KCl",
  createdAt: new Date("2026-03-14T09:30:00.000Z"),
  entryTitle: "Chloride baseline",
  entryStatus: "draft",
  authorName: "Tobin Bench",
  projectName: "Baselines",
  ...overrides,
});

describe("a finder row as the table and the API show it", () => {
  it("links a current solution to its entry and its block, and to similar solutions", () => {
    const found = toFound(row());
    expect(found.href).toBe("/entries/bb261ca0-64d9-4822-b4b5-1ac6b98e26e5#block-sol-Ab_9-x");
    expect(found.similarHref).toBe(
      `/solutions/similar?${new URLSearchParams({ entry: row().entryId, block: row().blockId }).toString()}`,
    );
    expect(found.savedAt).toBe("2026-03-14T09:30:00.000Z");
    expect(found.composition).toBe("0.1 mol/kg KCl");
  });

  it("links an earlier solution to the last revision that showed it", () => {
    const found = toFound(row({ fromRevision: 2, toRevision: 5 }));
    expect(found.href).toBe(
      "/entries/bb261ca0-64d9-4822-b4b5-1ac6b98e26e5/revisions/4#block-sol-Ab_9-x",
    );
    expect(found.similarHref).toBe(
      `/solutions/similar?${new URLSearchParams({ entry: row().entryId, block: row().blockId, revision: "4" }).toString()}`,
    );
  });
});
