// @vitest-environment node
/**
 * Each Debye–Hückel-family model against published mean activity coefficients
 * (gamma-binary.csv: CRC Handbook 92nd ed. "Mean Activity Coefficients of Electrolytes",
 * compiled from Hamer & Wu 1972 and the JPCRD evaluations; NaCl 0–40 °C from Pitzer, Peiper &
 * Busey 1984; rows marked "memory" from Robinson & Stokes 1959). The deviation per salt and
 * molality is printed as a table; the assertion is the tolerance for the model's documented
 * range, in percent of γ±.
 */
import { describe, expect, it } from "vitest";
import { computeSolution, type ActivityModelId } from "@/lib/chem";
import { ION_ASSOCIATION_ONSET_MOLAL } from "@/lib/chem/models/dh-common";
import { limitingLawSqrtIMax } from "@/lib/chem/models/dh-limiting";
import { readFixture, shortSource } from "../../support/read-reference";

const rows = readFixture("gamma-binary.csv").map((r) => ({
  salt: r.salt,
  molality: Number(r.molality_mol_per_kg),
  temperatureC: Number(r.temperature_C),
  gamma: Number(r.gamma_pm),
  source: shortSource(r),
  confidence: r.confidence,
}));

interface Deviation {
  salt: string;
  m: number;
  t: number;
  I: number;
  published: number;
  model: number;
  deviationPct: number;
  inRange: boolean;
  source: string;
}

function deviations(model: ActivityModelId, options = {}): Deviation[] {
  return rows.map((row) => {
    const result = computeSolution({
      model,
      temperatureC: row.temperatureC,
      components: [{ formula: row.salt, amount: row.molality, unit: "mol/kg" }],
      densityGPerMl: 1,
      modelOptions: options,
    });
    const gamma = result.salts[0].meanGamma;
    return {
      salt: row.salt,
      m: row.molality,
      t: row.temperatureC,
      I: result.ionicStrength.molal,
      published: row.gamma,
      model: Number(gamma.toFixed(4)),
      deviationPct: Number((100 * (gamma / row.gamma - 1)).toFixed(2)),
      inRange: result.validity.ok,
      source: row.source,
    };
  });
}

function show(model: string, table: Deviation[]) {
  console.log(`\n${model}: deviation from published γ± (in range only)`);
  console.table(
    table
      .filter((d) => d.inRange)
      .map(({ salt, m, t, published, model: g, deviationPct, source }) => ({
        salt,
        m,
        t,
        published,
        model: g,
        deviationPct,
        source,
      })),
  );
}

const worst = (table: Deviation[]) => Math.max(...table.map((d) => Math.abs(d.deviationPct)));

/** Prints the model's in-range deviations and returns them, after checking there are enough. */
function inRangeRows(model: string, table: Deviation[], atLeast: number): Deviation[] {
  show(model, table);
  const inRange = table.filter((d) => d.inRange);
  expect(inRange.length).toBeGreaterThanOrEqual(atLeast);
  return inRange;
}

describe("Debye–Hückel limiting law (range √I ≤ 0.1/|z₊z₋|, common practice)", () => {
  const table = deviations("dh-limiting");
  it("within 2 % of published γ± wherever it declares itself valid", () => {
    expect(worst(inRangeRows("dh-limiting", table, 15))).toBeLessThan(2);
  });
  it("declares 1:1 salts valid to √I = 0.1 and 2:1 salts only to √I = 0.05", () => {
    const nacl = (m: number) => table.find((d) => d.salt === "NaCl" && d.m === m && d.t === 25)!;
    expect(nacl(0.01).inRange).toBe(true);
    expect(nacl(0.02).inRange).toBe(false);
    expect(limitingLawSqrtIMax(2)).toBeCloseTo(0.05, 12);
    const cacl2 = table.find((d) => d.salt === "CaCl2" && d.m === 0.001)!;
    expect(Math.sqrt(cacl2.I)).toBeGreaterThan(0.05);
    expect(cacl2.inRange).toBe(false);
  });
  it("is already 13 % low for 0.1 mol/kg HCl, which is why it says so", () => {
    const hcl = table.find((d) => d.salt === "HCl" && d.m === 0.1)!;
    expect(hcl.deviationPct).toBeLessThan(-10);
    expect(hcl.inRange).toBe(false);
  });
});

describe("extended Debye–Hückel with Kielland sizes (range I ≤ 0.1 mol/kg)", () => {
  const table = deviations("dh-extended");
  it("within 3 % of published γ± for I ≤ 0.1 (sulfates to I = 0.05)", () => {
    expect(worst(inRangeRows("dh-extended", table, 40))).toBeLessThan(3);
  });
  it("flags sulfate ion association above I = 0.05 (K2SO4 0.02 m is in range, 0.05 m is not)", () => {
    expect(table.find((d) => d.salt === "K2SO4" && d.m === 0.01)!.inRange).toBe(true);
    expect(table.find((d) => d.salt === "K2SO4" && d.m === 0.05)!.inRange).toBe(false);
    expect(ION_ASSOCIATION_ONSET_MOLAL).toBe(0.05);
  });
});

describe("Güntelberg (range I ≤ 0.1 mol/kg)", () => {
  const table = deviations("guntelberg");
  it("within 7 % of published γ± for I ≤ 0.1 (one ion size for all: worst for HCl and MgCl2)", () => {
    expect(worst(inRangeRows("guntelberg", table, 40))).toBeLessThan(7);
  });
});

describe("Davies (range I ≤ 0.5 mol/kg)", () => {
  const table = deviations("davies");
  it("within 6 % of published γ± for I ≤ 0.1 and within 13 % for 0.1 < I ≤ 0.5", () => {
    const inRange = inRangeRows("davies (0.3)", table, 70);
    expect(worst(inRange.filter((d) => d.I <= 0.1))).toBeLessThan(6);
    expect(worst(inRange.filter((d) => d.I > 0.1 && !(d.salt === "KNO3")))).toBeLessThan(13);
  });
  it("KNO3 (nitrate association) is the known outlier: 35 % high at 0.5 mol/kg", () => {
    expect(table.find((d) => d.salt === "KNO3" && d.m === 0.5)!.deviationPct).toBeGreaterThan(25);
  });
  it("coefficient 0.2 gives lower γ± than 0.3 above I ≈ 0.05", () => {
    const with02 = deviations("davies", { daviesCoefficient: 0.2 });
    const i = rows.findIndex(
      (r) => r.salt === "NaCl" && r.molality === 0.5 && r.temperatureC === 25,
    );
    expect(with02[i].model).toBeLessThan(table[i].model);
  });
});

describe("Truesdell–Jones with b-dot fallback (range I ≤ 2 with fitted b, ≤ 0.5 otherwise)", () => {
  const table = deviations("truesdell-jones");
  it("within 10 % up to I = 2 for NaCl, KCl, CaCl2, MgCl2 (fitted WATEQ4F b), 0–40 °C", () => {
    const fitted = inRangeRows("truesdell-jones", table, 60).filter((d) =>
      ["NaCl", "KCl", "CaCl2", "MgCl2"].includes(d.salt),
    );
    expect(fitted.some((d) => d.I >= 1.5)).toBe(true);
    expect(worst(fitted)).toBeLessThan(10);
    // at 25 °C the fitted salts stay within 2 % up to 2 mol/kg
    expect(worst(fitted.filter((d) => d.t === 25))).toBeLessThan(2);
  });
  it("within 7 % up to I = 0.5 for HCl, LiCl, NaOH (b-dot ions) and says so beyond", () => {
    const bdot = table.filter((d) => ["HCl", "LiCl", "NaOH"].includes(d.salt));
    expect(worst(bdot.filter((d) => d.inRange))).toBeLessThan(7);
    expect(bdot.find((d) => d.salt === "HCl" && d.m === 1)!.inRange).toBe(false);
  });
});

describe("charge types each model declares (common practice)", () => {
  const run = (model: ActivityModelId, formula: string) =>
    computeSolution({
      model,
      components: [{ formula, amount: 0.001, unit: "mol/kg" }],
    }).validity.messages.join(" ");
  it("Davies and Güntelberg say so for a 3:1 salt; extended Debye–Hückel (Kielland, |z| ≤ 4) does not", () => {
    expect(run("davies", "LaCl3")).toMatch(/charge up to ±2; La\^3\+ is beyond it/);
    expect(run("guntelberg", "K3Fe(CN)6")).toMatch(/charge up to ±2/);
    expect(run("dh-extended", "K4Fe(CN)6")).not.toMatch(/charge up to/);
  });
});
