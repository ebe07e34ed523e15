// @vitest-environment node
import { describe, expect, it } from "vitest";
import { debyeHuckelConstants } from "@/lib/chem";
import { daviesModel } from "@/lib/chem/models/davies";
import { dhExtendedModel } from "@/lib/chem/models/dh-extended";
import type { ActivityModel } from "@/lib/chem/models/types";
import { readFixture, shortSource } from "../../support/read-reference";

function gammaOf(
  model: ActivityModel,
  formula: string,
  charge: number,
  ionicStrengthMolal: number,
  constants = debyeHuckelConstants(25),
) {
  const out = model.compute({
    ions: [{ formula, charge, molality: 0 }],
    ionicStrengthMolal,
    temperatureC: 25,
    solvent: "water",
    constants,
  });
  return Math.exp(out.lnGamma[0]);
}

// One catalogue ion per Kielland (1937) size class, |z| and å (Å).
const REPRESENTATIVE: Record<string, [string, number]> = {
  "1|2.5": ["Cs+", 1],
  "1|3": ["K+", 1],
  "1|4": ["Na+", 1],
  "1|6": ["Li+", 1],
  "1|9": ["H+", 1],
  "2|4.5": ["Pb^2+", 2],
  "2|5": ["Ba^2+", 2],
  "2|6": ["Ca^2+", 2],
  "2|8": ["Mg^2+", 2],
  "3|4": ["PO4^3-", -3],
  "3|9": ["Al^3+", 3],
};

describe("extended Debye–Hückel reproduces Kielland's (1937) table of single-ion γ", () => {
  const rows = readFixture("kielland-single-ion-gamma.csv");
  const table = rows.map((r) => {
    const [formula, charge] = REPRESENTATIVE[`${r.abs_charge}|${r.a_angstrom}`];
    const I = Number(r.ionic_strength_mol_per_kg);
    const gamma = gammaOf(dhExtendedModel, formula, charge, I);
    return {
      ion: formula,
      a: Number(r.a_angstrom),
      I,
      published: Number(r.gamma_i),
      model: Number(gamma.toFixed(4)),
      diff: Number((gamma - Number(r.gamma_i)).toFixed(4)),
      source: shortSource(r),
    };
  });

  it(`all ${rows.length} entries within 2 % (Kielland 1937 as reproduced in Freeze & Cherry 1979, App. IV)`, () => {
    console.table(table);
    expect(rows.length).toBe(88);
    // The table is printed to 3 decimals (2 for some entries, e.g. 0.83) and was computed
    // with older A and B (0.5085, 0.3281); our A is 0.45 % larger, so ours run slightly low.
    for (const row of table) expect(Math.abs(row.diff / row.published)).toBeLessThan(0.02);
    expect(Math.max(...table.map((r) => Math.abs(r.diff)))).toBeLessThan(0.008);
  });

  it("worked examples: H+ 0.914 at I = 0.01, Ca2+ 0.675 at I = 0.01, K+ 0.899 at I = 0.01 (worked_examples.md §5)", () => {
    expect(gammaOf(dhExtendedModel, "H+", 1, 0.01)).toBeCloseTo(0.914, 2);
    expect(gammaOf(dhExtendedModel, "Ca^2+", 2, 0.01)).toBeCloseTo(0.675, 2);
    expect(gammaOf(dhExtendedModel, "K+", 1, 0.01)).toBeCloseTo(0.899, 2);
  });

  it("with Freeze & Cherry's A = 0.5085, B = 0.3281 the computed check values are 0.826 (H+) and 0.445 (Mg2+) at I = 0.1", () => {
    const fc = {
      temperatureK: 298.15,
      aLog10: 0.5085,
      bPerAngstrom: 0.3281,
      aPhi: (0.5085 * Math.LN10) / 3,
    };
    expect(gammaOf(dhExtendedModel, "H+", 1, 0.1, fc)).toBeCloseTo(0.826, 3);
    expect(gammaOf(dhExtendedModel, "Mg^2+", 2, 0.1, fc)).toBeCloseTo(0.445, 3);
  });
});

describe("conventions and worked examples", () => {
  it("Bates–Guggenheim: a B = 1.5 gives γ(Cl−) = 0.7773 at I = 0.1 with A = 0.5100 (IUPAC Gold Book D01534)", () => {
    const A = 0.51;
    const gamma = 10 ** ((-A * Math.sqrt(0.1)) / (1 + 1.5 * Math.sqrt(0.1)));
    expect(gamma).toBeCloseTo(0.7773, 4);
    // the engine's extended equation gives the same with å = 1.5 / B
    const constants = {
      temperatureK: 298.15,
      aLog10: A,
      bPerAngstrom: 1.5 / 3,
      aPhi: (A * Math.LN10) / 3,
    };
    const out = dhExtendedModel.compute({
      ions: [{ formula: "Cl-", charge: -1, molality: 0.1 }],
      ionicStrengthMolal: 0.1,
      temperatureC: 25,
      solvent: "water",
      constants,
    });
    expect(Math.exp(out.lnGamma[0])).toBeCloseTo(gamma, 6); // Kielland å(Cl−) = 3 Å, B·å = 1.5
  });

  it.each([
    [0.5085, 0.7818],
    [0.51, 0.7812],
    [0.5114, 0.7807],
  ])(
    "Davies, z = 1, I = 0.1, A = %f: γ = %f (worked_examples.md §7, Davies 1962 form with 0.3)",
    (A, expected) => {
      const constants = {
        temperatureK: 298.15,
        aLog10: A,
        bPerAngstrom: 0.3287,
        aPhi: (A * Math.LN10) / 3,
      };
      expect(gammaOf(daviesModel, "Na+", 1, 0.1, constants)).toBeCloseTo(expected, 4);
    },
  );
});
