// @vitest-environment node
import { describe, expect, it } from "vitest";
import { computeSolution } from "@/lib/chem";
import { computeGammaCurves } from "@/lib/document/gamma-curves";

const input = (molality: number, model = "davies") =>
  ({
    temperatureC: 25,
    solvent: "water",
    model,
    components: [{ formula: "NaCl", amount: molality, unit: "mol/kg" }],
  }) as Parameters<typeof computeSolution>[0];

describe("γ± against √I curves", () => {
  const own = input(1, "auto");
  const result = computeSolution(own);
  const curves = computeGammaCurves(own, result, "NaCl");

  it("draws several models and marks the solution's own point", () => {
    expect(curves.models).toEqual(expect.arrayContaining(["dh-limiting", "davies"]));
    expect(curves.own.sqrtI).toBeCloseTo(Math.sqrt(result.ionicStrength.molal), 12);
    expect(curves.own.meanGamma).toBe(result.salts[0].meanGamma);
    expect(curves.points.at(-1)!.sqrtI).toBeGreaterThan(curves.own.sqrtI);
  });

  it("lets the Debye–Hückel family meet the limiting law in the dilute limit", () => {
    // All Debye–Hückel forms reduce to log γ± = −A|z₊z₋|√I as I → 0 (common practice, no source).
    const first = curves.points[0];
    expect(first.sqrtI).toBeLessThan(0.07);
    const limiting = first["dh-limiting"];
    expect(limiting).toBeDefined();
    const compared = ["davies", "dh-extended", "truesdell-jones"].map((model) => {
      // Each of these models is inside its range at I < 0.005 mol/kg: a solid-line value.
      expect(first[model], model).toBeDefined();
      expect(Math.abs(first[model] - limiting) / limiting).toBeLessThan(0.02);
      return model;
    });
    expect(compared).toHaveLength(3);
  });

  it("moves a model to its dashed series beyond its stated range", () => {
    // lib/chem states Davies for 1:1 salts up to I = 0.05 mol/kg (where it stays within 2 % of
    // the CRC Handbook γ± table; lib/chem/models/dh-ranges.ts).
    const inside = curves.points.filter((p) => p.davies !== undefined).map((p) => p.sqrtI ** 2);
    const outside = curves.points
      .filter((p) => p["davies:outside"] !== undefined)
      .map((p) => p.sqrtI ** 2);
    expect(Math.max(...inside)).toBeLessThanOrEqual(0.05 + 1e-9);
    expect(Math.min(...outside.filter((i) => i > 0.05))).toBeGreaterThan(0.05);
    // 24 points up to √I = 1.5: √I = 1.5k/24 ≤ √0.05 for k ≤ 3, so 3 points inside and 21
    // beyond, plus the last inside point repeated on the dashed series to join the lines.
    expect(inside).toHaveLength(3);
    expect(outside).toHaveLength(22);
  });
});
