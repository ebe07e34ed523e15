import { describe, expect, it } from "vitest";
import { computeSolution, molarMass } from "@/lib/chem";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import type { DilutionInput, SolutionBlockInput } from "@/lib/document/block-schemas";
import {
  dilutionComponents,
  stockComponentsFromResult,
  stockKey,
  type StockComposition,
  type StockLookup,
} from "@/lib/document/dilution";
import { evaluateSolutionBlock } from "@/lib/document/evaluate-solution-block";
import { solutionInputsHash, solutionRecordFor } from "@/lib/document/solution-record";

const ENTRY_A = "0b6f9a52-3c1e-4d0a-9f7e-1a2b3c4d5e6f";
const ENTRY_B = "7d1c2b3a-4e5f-4a6b-8c7d-9e0f1a2b3c4d";

function stock(
  entryId: string,
  blockId: string,
  components: StockComposition["components"],
): StockComposition {
  return {
    entryId,
    blockId,
    revision: 2,
    name: blockId,
    entryTitle: "Stocks",
    solvent: "water",
    temperatureC: 25,
    components,
  };
}

function lookups(...stocks: StockComposition[]): Map<string, StockLookup> {
  return new Map(stocks.map((s) => [stockKey(s), { status: "ok", stock: s }]));
}

const ref = (s: StockComposition, volume: number | null, volumeUnit: "µL" | "mL" | "L" = "mL") => ({
  entryId: s.entryId,
  blockId: s.blockId,
  revision: s.revision,
  volume,
  volumeUnit,
});

const kclStock = stock(ENTRY_A, "stock-kcl", [{ formula: "KCl", molarity: 0.5 }]);
const naclStock = stock(ENTRY_B, "stock-nacl", [{ formula: "NaCl", molarity: 1 }]);
const mixStock = stock(ENTRY_B, "stock-mix", [
  { formula: "KCl", molarity: 0.1 },
  { formula: "K2SO4", molarity: 0.02 },
]);

describe("dilution arithmetic (c₁V₁ = c₂V₂, common practice, no source)", () => {
  it("10 mL of 0.5 mol/L KCl made up to 100 mL is 0.05 mol/L", () => {
    const out = dilutionComponents(
      { stocks: [ref(kclStock, 10)], finalVolume: 100, finalVolumeUnit: "mL" },
      lookups(kclStock),
    );
    expect(out.status).toBe("ok");
    if (out.status !== "ok") return;
    // 0.5 mol/L × 10 mL / 100 mL = 0.05 mol/L
    expect(out.components).toEqual([{ formula: "KCl", amount: 0.05, unit: "mol/L" }]);
    expect(out.lines).toHaveLength(1);
    expect(out.lines[0]).toMatchObject({ stockMolarity: 0.5, volumeMl: 10, finalVolumeMl: 100 });
    expect(out.notes[0]).toMatch(/c₂ = c₁·V₁\/V₂/);
  });

  it("mixes two stocks and adds a salt present in both", () => {
    const dilution: DilutionInput = {
      stocks: [ref(kclStock, 10), ref(naclStock, 5), ref(mixStock, 50)],
      finalVolume: 0.1,
      finalVolumeUnit: "L",
    };
    const out = dilutionComponents(dilution, lookups(kclStock, naclStock, mixStock));
    expect(out.status).toBe("ok");
    if (out.status !== "ok") return;
    const byFormula = Object.fromEntries(out.components.map((c) => [c.formula, c.amount]));
    // KCl: 0.5 × 10/100 + 0.1 × 50/100 = 0.05 + 0.05 = 0.1 mol/L
    expect(byFormula.KCl).toBeCloseTo(0.1, 12);
    // NaCl: 1 × 5/100 = 0.05 mol/L; K2SO4: 0.02 × 50/100 = 0.01 mol/L
    expect(byFormula.NaCl).toBeCloseTo(0.05, 12);
    expect(byFormula.K2SO4).toBeCloseTo(0.01, 12);
    expect(out.components).toHaveLength(3);
    expect(out.lines).toHaveLength(4);
  });

  it("reads microlitres and litres: 100 µL of 1 mol/L into 10 mL is 0.01 mol/L", () => {
    const out = dilutionComponents(
      { stocks: [ref(naclStock, 100, "µL")], finalVolume: 10, finalVolumeUnit: "mL" },
      lookups(naclStock),
    );
    expect(out.status === "ok" && out.components[0].amount).toBeCloseTo(0.01, 12);
  });

  it("refuses impossible volumes, each on its own field", () => {
    const none = lookups(kclStock);
    expect(
      dilutionComponents(
        { stocks: [ref(kclStock, 60), ref(kclStock, 50)], finalVolume: 100, finalVolumeUnit: "mL" },
        none,
      ),
    ).toMatchObject({ status: "error", field: "dilution.finalVolume" });
    expect(
      dilutionComponents(
        { stocks: [ref(kclStock, null)], finalVolume: 100, finalVolumeUnit: "mL" },
        none,
      ),
    ).toMatchObject({ status: "error", field: "dilution.stocks[0].volume" });
    expect(
      dilutionComponents(
        { stocks: [ref(kclStock, 0)], finalVolume: 100, finalVolumeUnit: "mL" },
        none,
      ),
    ).toMatchObject({ status: "error", field: "dilution.stocks[0].volume" });
    expect(
      dilutionComponents(
        { stocks: [ref(kclStock, 1)], finalVolume: null, finalVolumeUnit: "mL" },
        none,
      ),
    ).toMatchObject({ status: "error", field: "dilution.finalVolume" });
  });

  it("waits for a stock still loading and says why one is unavailable", () => {
    const dilution: DilutionInput = {
      stocks: [ref(kclStock, 10)],
      finalVolume: 100,
      finalVolumeUnit: "mL",
    };
    expect(dilutionComponents(dilution, new Map()).status).toBe("loading");
    expect(
      dilutionComponents(
        dilution,
        new Map([[stockKey(kclStock), { status: "unavailable", message: "Stock not found." }]]),
      ),
    ).toEqual({ status: "error", field: "dilution.stocks[0]", message: "Stock not found." });
  });

  it("says when a stock was made in another solvent", () => {
    const out = dilutionComponents(
      { stocks: [ref(kclStock, 10)], finalVolume: 100, finalVolumeUnit: "mL" },
      lookups(kclStock),
      "methanol",
    );
    expect(out.status === "ok" && out.notes.join(" ")).toMatch(/made in water.*methanol/);
  });
});

describe("a solution block made from a stock", () => {
  const child = (overrides: Partial<SolutionBlockInput> = {}) =>
    defaultSolutionBlockInput({
      blockId: "child-block",
      name: "Working electrolyte",
      components: [{ formula: "KCl", amount: 0.75, unit: "g", perAmount: 100, perUnit: "mL" }],
      dilution: {
        stocks: [
          {
            entryId: ENTRY_A,
            blockId: "stock-a",
            revision: 2,
            volume: 10,
            volumeUnit: "mL",
          },
        ],
        finalVolume: 100,
        finalVolumeUnit: "mL",
      },
      ...overrides,
    });
  const stockA = {
    ...stock(ENTRY_A, "stock-a", [{ formula: "KCl", molarity: 0.1 }]),
  };

  it("10 mL of 0.1 mol/L KCl to 100 mL plus 0.75 g KCl gives the summed molarity", () => {
    const evaluation = evaluateSolutionBlock(child(), lookups(stockA));
    expect(evaluation.status).toBe("ok");
    if (evaluation.status !== "ok") return;
    // Stock: 0.1 mol/L × 10/100 = 0.01 mol/L. Weighed: 0.75 g / M(KCl) / 0.100 L, with
    // M(KCl) = 74.551 g/mol from IUPAC 2021 standard atomic weights (lib/chem's molarMass).
    const weighed = 0.75 / molarMass("KCl") / 0.1;
    expect(weighed).toBeCloseTo(0.100603, 5);
    const k = evaluation.result.ions.find((i) => i.formula === "K+")!;
    expect(k.molarity).toBeCloseTo(0.01 + weighed, 10);
    // A 1:1 salt: I (molar) = c (common practice).
    expect(evaluation.result.ionicStrength.molar).toBeCloseTo(0.01 + weighed, 10);
    // Molality from the density lib/chem models for KCl (Laliberté & Cooper 2004), said.
    expect(evaluation.result.density.source).toBe("laliberte-cooper");
    expect(evaluation.dilution?.lines).toHaveLength(1);
  });

  it("computes exactly what lib/chem computes for the same molar recipe", () => {
    const evaluation = evaluateSolutionBlock(child(), lookups(stockA));
    const direct = computeSolution({
      temperatureC: 25,
      solvent: "water",
      model: "auto",
      components: [
        { formula: "KCl", amount: 0.75, unit: "g", per: { amount: 100, unit: "mL" } },
        { formula: "KCl", amount: 0.01, unit: "mol/L" },
      ],
    });
    expect(evaluation.status === "ok" && evaluation.result.ionicStrength).toEqual(
      direct.ionicStrength,
    );
  });

  it("without the stock's composition it waits, and a bad volume lands on its field", () => {
    expect(evaluateSolutionBlock(child())).toMatchObject({ status: "error", field: "dilution" });
    const bad = child({
      dilution: {
        stocks: [
          { entryId: ENTRY_A, blockId: "stock-a", revision: 2, volume: -1, volumeUnit: "mL" },
        ],
        finalVolume: 100,
        finalVolumeUnit: "mL",
      },
    });
    expect(evaluateSolutionBlock(bad, lookups(stockA))).toMatchObject({
      status: "error",
      field: "dilution.stocks[0].volume",
    });
  });

  it("stores the arithmetic with the result, keyed by the stock reference", () => {
    const record = solutionRecordFor(child(), lookups(stockA));
    expect(record.results.status).toBe("ok");
    expect(record.results.dilution).toMatchObject({ finalVolumeMl: 100 });
    expect(record.inputs.dilution).toMatchObject({ stocks: [{ blockId: "stock-a", revision: 2 }] });
    const later = child();
    later.dilution!.stocks[0].revision = 3;
    expect(solutionInputsHash(later)).not.toBe(solutionInputsHash(child()));
  });

  it("writes the one-line recipe with what the stocks contribute, for the finder", () => {
    // Its own weighed KCl as typed, then 10 mL of 0.1 mol/L KCl to 100 mL: 0.01 mol/L.
    expect(solutionRecordFor(child(), lookups(stockA)).compositionSummary).toBe(
      "0.75 g per 100 mL KCl + 0.01 mol/L KCl",
    );
    // Made from the stock alone, the recipe is the stock's share, not empty.
    expect(solutionRecordFor(child({ components: [] }), lookups(stockA)).compositionSummary).toBe(
      "0.01 mol/L KCl",
    );
    // Until the stock's composition is known, only the typed rows.
    expect(solutionRecordFor(child()).compositionSummary).toBe("0.75 g per 100 mL KCl");
  });

  it("keys a block without stocks as before lineage existed", () => {
    const plain = defaultSolutionBlockInput({
      blockId: "b1",
      components: [{ formula: "NaCl", amount: 0.1, unit: "mol/kg" }],
    });
    const { dilution: _d, ...withoutKey } = plain;
    expect(solutionInputsHash(plain)).toBe(solutionInputsHash(withoutKey));
  });
});

describe("a stock's composition from its stored result", () => {
  it("reads each component's molarity as lib/chem computed it", () => {
    const result = computeSolution({
      temperatureC: 25,
      components: [
        { formula: "CuSO4·5H2O", amount: 1.25, unit: "g", per: { amount: 50, unit: "mL" } },
      ],
    });
    const stored = { status: "ok", ...(JSON.parse(JSON.stringify(result)) as object) };
    const components = stockComponentsFromResult(stored);
    // 1.25 g / 249.68 g/mol (IUPAC 2021) / 0.050 L = 0.10013 mol/L
    expect(components).toHaveLength(1);
    expect(components![0].formula).toBe("CuSO4·5H2O");
    expect(components![0].molarity).toBeCloseTo(1.25 / molarMass("CuSO4·5H2O") / 0.05, 10);
    expect(stockComponentsFromResult({ status: "error", message: "x" })).toBeNull();
    expect(stockComponentsFromResult({ status: "ok", components: [] })).toBeNull();
  });
});
