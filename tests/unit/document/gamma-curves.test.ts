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
    const limiting = first["dh-limiting"] ?? first["dh-limiting:outside"];
    for (const model of ["davies", "dh-extended", "truesdell-jones"]) {
      const value = first[model] ?? first[`${model}:outside`];
      if (value !== undefined) expect(Math.abs(value - limiting) / limiting).toBeLessThan(0.02);
    }
  });

  it("moves a model to its dashed series beyond its stated range", () => {
    // Davies is used up to I ≈ 0.5 mol/kg (common practice; lib/chem states the same range).
    const inside = curves.points.filter((p) => p.davies !== undefined).map((p) => p.sqrtI ** 2);
    const outside = curves.points
      .filter((p) => p["davies:outside"] !== undefined)
      .map((p) => p.sqrtI ** 2);
    expect(Math.max(...inside)).toBeLessThanOrEqual(0.5 + 1e-9);
    expect(Math.min(...outside.filter((i) => i > 0.5))).toBeGreaterThan(0.5);
    expect(outside.length).toBeGreaterThan(0);
  });
});
