/**
 * Thermodynamic sanity before a result is shown (φ > 0, 0 < a_w ≤ 1, finite γ) and charge
 * balance. Self-consistency checks (the criteria are thermodynamic identities; no table).
 */
import { describe, expect, it } from "vitest";
import { computeSolution } from "@/lib/chem";
import { BINARY_SETS_IN_PRIORITY, pitzerBinarySalt } from "@/lib/chem/models/pitzer";

const chargeOf = (ion: string) => {
  const m = /\^(\d)([+-])$/.exec(ion);
  if (m) return (m[2] === "+" ? 1 : -1) * Number(m[1]);
  return ion.endsWith("+") ? 1 : -1;
};

describe("sanity of every result", () => {
  it("every Pitzer parameter row gives φ > 0, a_w ≤ 1 and finite γ± over its stated molality range at 25 °C", () => {
    let rows = 0;
    for (const set of BINARY_SETS_IN_PRIORITY)
      for (const row of set) {
        for (let i = 1; i <= 20; i++) {
          const m = (row.maxMolality * i) / 20;
          const r = pitzerBinarySalt({
            cation: row.cation,
            cationCharge: chargeOf(row.cation),
            anion: row.anion,
            anionCharge: chargeOf(row.anion),
            molality: m,
            temperatureC: 25,
            aPhi: 0.3915,
          });
          expect(
            r.osmoticCoefficient!,
            `${row.salt} at ${m} mol/kg (${row.source})`,
          ).toBeGreaterThan(0);
          expect(r.waterActivity!).toBeLessThanOrEqual(1);
          expect(Number.isFinite(r.meanActivityCoefficient)).toBe(true);
        }
        rows++;
      }
    expect(rows).toBe(BINARY_SETS_IN_PRIORITY.reduce((a, s) => a + s.length, 0));
  });

  it("a negative osmotic coefficient is shown as outside the range with the reason, never as valid (InCl3 0.5 mol/kg, Pitzer & Mayorga 1973)", () => {
    const r = computeSolution({
      model: "pitzer",
      components: [{ formula: "InCl3", amount: 0.5, unit: "mol/kg" }],
    });
    expect(r.validity.ok).toBe(false);
    expect(r.validity.messages.join(" ")).toMatch(/osmotic coefficient φ = -0.5\d* ≤ 0/);
    expect(r.validity.messages.join(" ")).toMatch(/a_w = 1\.\d+ is outside 0 < a_w ≤ 1/);
  });

  it("an activity coefficient beyond double precision is a typed error, never Infinity (Davies, 100 mol/kg Al2(SO4)3)", () => {
    const run = (ionAssociation: boolean) => () =>
      computeSolution({
        model: "davies",
        ionAssociation,
        components: [{ formula: "Al2(SO4)3", amount: 100, unit: "mol/kg" }],
      });
    expect(run(false)).toThrowError(
      expect.objectContaining({ name: "ChemInputError", code: "model_failed" }),
    );
    // With ion pairs the speciation cannot converge on such γ: also a typed error.
    expect(run(true)).toThrowError(
      expect.objectContaining({ name: "ChemInputError", code: "speciation_failed" }),
    );
  });
});

describe("charge balance", () => {
  const lone = () =>
    computeSolution({
      model: "auto",
      components: [{ formula: "Na+", amount: 0.1, unit: "mol/kg" }],
    });

  it("an unbalanced composition gets a validity message, not only a warning", () => {
    const r = lone();
    expect(r.validity.ok).toBe(false);
    expect(r.validity.messages.join(" ")).toMatch(/0.100 mol\/kg of excess positive charge/);
    expect(r.chargeBalance.balanced).toBe(false);
  });

  it("auto does not hand it to Pitzer or SIT (NaCl + extra Na+, which Pitzer parameterises)", () => {
    const r = computeSolution({
      model: "auto",
      components: [
        { formula: "NaCl", amount: 0.1, unit: "mol/kg" },
        { formula: "Na+", amount: 0.01, unit: "mol/kg" },
      ],
    });
    expect(["pitzer", "sit"]).not.toContain(r.model.used);
  });

  it("offers counter-ions; appending the offered chloride balances the charge exactly", () => {
    const r = lone();
    const chloride = r.chargeBalance.offers.find((o) => o.formula === "Cl-")!;
    expect(chloride.component).toEqual({ formula: "Cl-", amount: 0.1, unit: "mol/kg" });
    const sulfate = r.chargeBalance.offers.find((o) => o.formula === "SO4^2-")!;
    expect(sulfate.component.amount).toBeCloseTo(0.05, 12);
    const fixed = computeSolution({
      model: "auto",
      components: [{ formula: "Na+", amount: 0.1, unit: "mol/kg" }, chloride.component],
    });
    expect(fixed.chargeBalance.balanced).toBe(true);
    expect(fixed.model.used).toBe("pitzer");
    expect(fixed.validity.ok).toBe(true);
  });

  it("excess negative charge offers cations", () => {
    const r = computeSolution({ components: [{ formula: "Cl-", amount: 0.2, unit: "mol/kg" }] });
    expect(r.chargeBalance.offers.map((o) => o.formula)).toContain("K+");
    expect(r.chargeBalance.offers.every((o) => o.charge > 0)).toBe(true);
  });
});
