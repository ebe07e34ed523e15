// @vitest-environment node
import { describe, expect, it } from "vitest";
import { limitingIonicConductivity, nernstSlopeV } from "@/lib/chem";
import { defaultCellBlockInput, defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { cellBlockInputSchema, type CellBlockInput } from "@/lib/document/block-schemas";
import {
  compareVoltammogram,
  peakCurrentAgainstScanRate,
  type MeasuredVoltammogram,
} from "@/lib/document/compare-voltammogram";
import { computeCellPotential } from "@/lib/document/evaluate-cell-block";
import { evaluateCellElectrochemistry } from "@/lib/document/evaluate-cell-electrochem";
import { analyseVoltammogram } from "@/lib/traces";
import { simulateReversibleCv } from "@/lib/traces/simulate";
import { readFixture } from "../../support/read-reference";

const standards = readFixture("conductivity-standards.csv");

const kcl = (molPerL: number) =>
  defaultSolutionBlockInput({
    name: `${molPerL} M KCl`,
    components: [{ formula: "KCl", amount: molPerL, unit: "mol/L" }],
  });

/** The cell-preparation template's electrolyte: 0.1 M KCl with 5 mM ferri- and ferrocyanide. */
const ferri = defaultSolutionBlockInput({
  name: "Ferri/ferro in KCl",
  components: [
    { formula: "KCl", amount: 0.1, unit: "mol/L" },
    { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
    { formula: "K4Fe(CN)6", amount: 5, unit: "mmol/L" },
  ],
});

const probeCell = (overrides: Partial<CellBlockInput> = {}) =>
  defaultCellBlockInput({
    electrolyteBlockId: ferri.blockId,
    workingElectrodeRadiusMm: 1.5,
    redoxProbe: {
      probe: "ferricyanide/ferrocyanide",
      form: "reduced",
      concentrationMmolPerL: null,
      scanRateMVPerS: 100,
    },
    ...overrides,
  });

function ok<T extends { status: string }>(section: T): Extract<T, { status: "ok" }> {
  if (section.status !== "ok") throw new Error(JSON.stringify(section));
  return section as Extract<T, { status: "ok" }>;
}

describe("the cell block's electrolyte conductivity", () => {
  it("0.01 mol/L KCl at 25 °C: within 0.5 % of 1413 µS/cm (US EPA Method 120.1 standard, conductivity-standards.csv), inside the stated range", () => {
    const row = standards.find((r) => r.molarity_mol_per_L === "0.01" && r.temperature_C === "25")!;
    expect(Number(row.value)).toBe(1413);
    const cell = defaultCellBlockInput({ electrolyteBlockId: "x" });
    const kappa = ok(evaluateCellElectrochemistry(cell, kcl(0.01)).conductivity);
    const microSiemensPerCm = kappa.conductivityMSPerCm * 1000;
    expect(Math.abs(microSiemensPerCm / 1413 - 1)).toBeLessThan(0.005);
    expect(kappa.inRange).toBe(true);
    expect(kappa.range).toMatch(/0\.1 mol\/L/);
    expect(kappa.formula.applied).toMatch(/\\kappa = 1\.41\d\\ \\mathrm\{mS\/cm\}/);
  });

  it("says when the electrolyte is outside the range (0.5 mol/L) and refuses another solvent in words", () => {
    const cell = defaultCellBlockInput();
    const kappa = ok(evaluateCellElectrochemistry(cell, kcl(0.5)).conductivity);
    expect(kappa.inRange).toBe(false);
    expect(kappa.messages.join(" ")).toMatch(/above 0\.1 mol\/L/);
    const inAcetonitrile = { ...kcl(0.01), solvent: "acetonitrile" };
    const other = evaluateCellElectrochemistry(cell, inAcetonitrile).conductivity;
    expect(other.status).not.toBe("ok");
  });
});

describe("uncompensated resistance of the disk", () => {
  it("R_u = 1/(4κr) (Newman 1966): 1.5 mm disk in 0.01 mol/L KCl is 1180 Ω within 0.5 % of the value from the 1413 µS/cm standard", () => {
    const cell = defaultCellBlockInput({ workingElectrodeRadiusMm: 1.5 });
    const ru = ok(evaluateCellElectrochemistry(cell, kcl(0.01)).resistance);
    const fromStandard = 1 / (4 * 0.1413 * 1.5e-3); // κ 1413 µS/cm = 0.1413 S/m
    expect(fromStandard).toBeCloseTo(1179.5, 1);
    expect(Math.abs(ru.resistanceOhm / fromStandard - 1)).toBeLessThan(0.005);
    expect(ru.formula.applied).toMatch(/= 1\.18\\times10\^\{3\}\\ \\Omega/);
  });

  it("takes the radius from the geometric area when none is typed, and says so", () => {
    const cell = defaultCellBlockInput({
      workingElectrode: { material: "GC", areaCm2: Math.PI * 0.15 ** 2, pretreatment: [] },
    });
    const ru = ok(evaluateCellElectrochemistry(cell, kcl(0.01)).resistance);
    expect(ru.radiusMm).toBeCloseTo(1.5, 10);
    expect(ru.notes[0]).toMatch(/from the geometric area/);
    expect(evaluateCellElectrochemistry(defaultCellBlockInput(), kcl(0.01)).resistance).toEqual({
      status: "idle",
      message: expect.stringMatching(/disk radius/),
    });
  });
});

describe("expected reversible peak current (Randles–Ševčík)", () => {
  it("5 mM ferrocyanide, 1.5 mm disk, 100 mV/s: within 0.3 % of Bard & Faulkner's 25 °C form 2.69×10⁵ n^{3/2} A D^½ C v^½ (eq. 6.2.19; the constant is rounded)", () => {
    const peak = ok(evaluateCellElectrochemistry(probeCell(), ferri).peak);
    const area = Math.PI * 0.15 ** 2;
    // D of ferrocyanide in 0.1 M KCl: 6.7×10⁻⁶ cm²/s (Konopka & McDuffie 1970, from memory).
    expect(peak.diffusionCoefficientCm2PerS).toBe(6.7e-6);
    const book = 2.69e5 * area * Math.sqrt(6.7e-6) * 5e-6 * Math.sqrt(0.1);
    expect(book * 1e6).toBeCloseTo(77.84, 1);
    expect(Math.abs(peak.peakCurrentA / book - 1)).toBeLessThan(0.003);
    expect(peak.concentrationFrom).toBe("solution");
    expect(peak.concentrationMolPerL).toBeCloseTo(0.005, 12);
    expect(peak.forwardPeak).toBe("anodic");
    // Reversible ΔEp 2.218 RT/F = 57.0 mV at 25 °C (Bard & Faulkner 2001, §6.2.1).
    expect(peak.reversibleDeltaEpV * 1000).toBeCloseTo(57.0, 1);
    expect(peak.formula.applied).toMatch(/= 77\.\d\\ \\mu\\mathrm\{A\}/);
  });

  it("a typed concentration wins over the solution's; a missing scan rate or probe is asked for", () => {
    const typed = probeCell({
      redoxProbe: {
        probe: "ferricyanide/ferrocyanide",
        form: "oxidized",
        concentrationMmolPerL: 1,
        scanRateMVPerS: 100,
      },
    });
    const peak = ok(evaluateCellElectrochemistry(typed, ferri).peak);
    expect(peak.concentrationFrom).toBe("typed");
    expect(peak.forwardPeak).toBe("cathodic");
    const noRate = probeCell({
      redoxProbe: {
        probe: "ferricyanide/ferrocyanide",
        form: "reduced",
        concentrationMmolPerL: null,
        scanRateMVPerS: null,
      },
    });
    expect(evaluateCellElectrochemistry(noRate, ferri).peak.status).toBe("idle");
    expect(evaluateCellElectrochemistry(probeCell({ redoxProbe: null }), ferri).peak.status).toBe(
      "idle",
    );
    const negative = probeCell({
      redoxProbe: {
        probe: "ferricyanide/ferrocyanide",
        form: "reduced",
        concentrationMmolPerL: -1,
        scanRateMVPerS: 100,
      },
    });
    expect(evaluateCellElectrochemistry(negative, ferri).peak).toMatchObject({
      status: "error",
      field: "concentrationMolPerL",
    });
  });
});

describe("liquid junction at the reference electrode", () => {
  it("0.1 M KCl against Ag/AgCl in 3 M KCl is the type-1 limit (t₊ − t₋)(RT/F) ln 30 with CRC λ° (Henderson; self-consistency)", () => {
    const cell = defaultCellBlockInput({ electrolyteBlockId: "x" });
    const junction = ok(evaluateCellElectrochemistry(cell, kcl(0.1)).junction);
    const k = limitingIonicConductivity("K+").lambdaSCm2PerMolPerCharge;
    const cl = limitingIonicConductivity("Cl-").lambdaSCm2PerMolPerCharge;
    const expected = ((k - cl) / (k + cl)) * (nernstSlopeV(25) / Math.LN10) * Math.log(3 / 0.1);
    expect(junction.junctionPotentialV).toBeCloseTo(expected, 9);
    // A concentrated KCl bridge keeps the junction to a few millivolts (B&F 2001 §2.3.5).
    expect(Math.abs(junction.junctionPotentialV)).toBeLessThan(0.003);
    expect(junction.uncertaintyV).toBeGreaterThanOrEqual(0.002);
    expect(junction.fillingLabel).toBe("3 mol/L KCl");
  });

  it("is added to E vs the reference only when asked, and an SHE has no filling to compute against", () => {
    const plain = probeCell({ couple: "Fe(CN)6 3-/4-" });
    const applied = probeCell({ couple: "Fe(CN)6 3-/4-", applyJunctionPotential: true });
    const a = ok(computeCellPotential(plain, ferri));
    const b = ok(computeCellPotential(applied, ferri));
    const junction = ok(evaluateCellElectrochemistry(applied, ferri).junction);
    expect(a.junctionV).toBeNull();
    expect(b.junctionV).toBe(junction.junctionPotentialV);
    expect(b.vsReference - a.vsReference).toBeCloseTo(junction.junctionPotentialV, 12);
    expect(b.vsShe).toBe(a.vsShe);
    expect(b.notes.join(" ")).toMatch(/includes the liquid junction/);
    const she = probeCell({
      referenceElectrode: { type: "SHE", material: "", areaCm2: null, pretreatment: [] },
    });
    expect(evaluateCellElectrochemistry(she, ferri).junction.status).toBe("idle");
  });
});

describe("stored cell blocks from before these fields", () => {
  it("still validate and compute; the radius field has bounds", () => {
    const {
      workingElectrodeRadiusMm: _r,
      applyJunctionPotential: _j,
      redoxProbe: _p,
      ...old
    } = defaultCellBlockInput({ blockId: "cell-old-1" });
    const parsed = cellBlockInputSchema.parse(old);
    const chem = evaluateCellElectrochemistry(parsed, kcl(0.01));
    expect(chem.conductivity.status).toBe("ok");
    expect(chem.peak.status).toBe("idle");
    expect(ok(computeCellPotential({ ...parsed, couple: "Fe(CN)6 3-/4-" }, ferri)).junctionV).toBe(
      null,
    );
    const radius = (r: number) =>
      cellBlockInputSchema.safeParse({ ...old, workingElectrodeRadiusMm: r }).success;
    expect([radius(1.5), radius(0), radius(-1), radius(101), radius(5e-6)]).toEqual([
      true,
      false,
      false,
      false,
      false,
    ]);
  });
});

/** A reversible CV by lib/traces' finite-difference simulation, analysed like an upload. */
function simulatedVoltammogram(scanRateVPerS: number): MeasuredVoltammogram {
  const sim = simulateReversibleCv({
    concentrationMolPerL: 5e-3,
    diffusionCoefficientCm2PerS: 6.7e-6,
    electrodeAreaCm2: Math.PI * 0.15 ** 2,
    scanRateVPerS,
    startingSpecies: "reduced",
  });
  const cycles = analyseVoltammogram({ potentialV: sim.potentialV, currentA: sim.currentA });
  return { scanRateVPerS, cycles };
}

describe("a voltammogram beside its cell", () => {
  it("a simulated reversible CV of the cell's own probe: ΔEp ≈ 57 mV judged reversible, forward peak within 2 % of Randles–Ševčík", () => {
    const result = compareVoltammogram(probeCell(), ferri, simulatedVoltammogram(0.1));
    const c = ok(result);
    // Reversible: 57–58 mV at 25 °C (Bard & Faulkner 2001, Table 6.2.1).
    expect(c.measured.deltaEpV! * 1000).toBeGreaterThan(56);
    expect(c.measured.deltaEpV! * 1000).toBeLessThan(60);
    expect(c.verdict).toMatch(/reversible \(Nernstian\)/);
    const expected = ok(c.expected);
    expect(Math.abs(c.measured.anodicPeakCurrentA! / expected.peakCurrentA - 1)).toBeLessThan(0.02);
    expect(c.scanRateFrom).toBe("trace");
    // iR at the larger peak, current from zero, × R_u of the cell (Ohm's law).
    const ru = ok(evaluateCellElectrochemistry(probeCell(), ferri).resistance).resistanceOhm;
    expect(c.resistanceOhm).toBe(ru);
    expect(c.iRDrop!.dropV).toBeCloseTo(c.iRDrop!.currentA * ru, 12);
  });

  it("ΔEp 72 mV reads as quasi-reversible or uncompensated resistance (the verdict words of lib/chem)", () => {
    const measured: MeasuredVoltammogram = {
      scanRateVPerS: 0.1,
      cycles: [
        {
          cycle: 1,
          anodic: { potentialV: 0.25, currentA: 7.5e-5, rawCurrentA: 8e-5 },
          cathodic: { potentialV: 0.178, currentA: -7.4e-5, rawCurrentA: -9e-5 },
          deltaEpV: 0.072,
        },
      ],
    };
    const c = ok(compareVoltammogram(probeCell(), ferri, measured));
    expect(c.verdict).toBe("ΔEp 72 mV: quasi-reversible or uncompensated resistance.");
    expect(c.iRDrop).toMatchObject({ peak: "cathodic", currentA: -9e-5 });
    const noPeaks = compareVoltammogram(probeCell(), ferri, { scanRateVPerS: 0.1, cycles: [] });
    expect(noPeaks.status).toBe("idle");
  });

  it("i_p against √v: three simulated scan rates fall on the Randles–Ševčík line within 2 %; a file without a scan rate is left out and named", () => {
    const rates = [0.025, 0.1, 0.4];
    const series = peakCurrentAgainstScanRate(probeCell(), ferri, [
      ...rates.map((v) => ({ label: `${v * 1000} mV/s`, measured: simulatedVoltammogram(v) })),
      { label: "no rate", measured: { ...simulatedVoltammogram(0.1), scanRateVPerS: null } },
    ]);
    expect(series.points.map((p) => p.label)).toEqual(["25 mV/s", "100 mV/s", "400 mV/s"]);
    expect(series.skipped).toEqual(["no rate"]);
    expect(series.forwardPeak).toBe("anodic");
    const slope = series.expectedSlope!;
    for (const p of series.points)
      expect(Math.abs(p.peakCurrentA / (slope * p.sqrtScanRate) - 1)).toBeLessThan(0.02);
  });
});
