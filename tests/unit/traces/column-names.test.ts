// @vitest-environment node
import { describe, expect, it } from "vitest";
import { readColumnName, readUnit } from "@/lib/traces";

describe("column names in their common written forms", () => {
  it.each([
    ["E/V", "potential", "V", 1],
    ["E / V", "potential", "V", 1],
    ["Potential (V)", "potential", "V", 1],
    ["Potential [mV]", "potential", "mV", 1e-3],
    ["Ewe/V", "potential", "V", 1],
    ["Voltage (V)", "potential", "V", 1],
    ["I/mA", "current", "mA", 1e-3],
    ["Current (A)", "current", "A", 1],
    ["I / µA", "current", "µA", 1e-6],
    ["I / μA", "current", "µA", 1e-6], // Greek mu, not the micro sign
    ["I/uA", "current", "µA", 1e-6],
    ["Current [nA]", "current", "nA", 1e-9],
    ["j / mA cm-2", "currentDensity", "mA/cm²", 10],
    ["Current density (mA/cm²)", "currentDensity", "mA/cm²", 10],
    ["i (µA cm⁻²)", "currentDensity", "µA/cm²", 1e-2],
    ["I (A/m2)", "currentDensity", "A/m²", 1],
    ["t/s", "time", "s", 1],
    ["Time (s)", "time", "s", 1],
    ["time/ms", "time", "ms", 1e-3],
    ["Elapsed time (min)", "time", "min", 60],
    ["Q/mC", "charge", "mC", 1e-3],
    ["Charge (C)", "charge", "C", 1],
    ["Z'/Ohm", "impedanceReal", "Ω", 1],
    ["Z′ / kΩ", "impedanceReal", "kΩ", 1e3],
    ["Re(Z) [Ohm]", "impedanceReal", "Ω", 1],
    ["-Z''/Ohm", "impedanceImaginaryNegated", "Ω", 1],
    ["−Z″ / Ω", "impedanceImaginaryNegated", "Ω", 1],
    ["-Im(Z) (Ohm)", "impedanceImaginaryNegated", "Ω", 1],
    ["|Z|/Ohm", "impedanceModulus", "Ω", 1],
    ["Freq/Hz", "frequency", "Hz", 1],
    ["Frequency (kHz)", "frequency", "kHz", 1e3],
    ["f / mHz", "frequency", "mHz", 1e-3],
    ["Phase/deg", "phase", "deg", Math.PI / 180],
    ["Phase angle (rad)", "phase", "rad", 1],
  ])("%s → %s in %s", (name, quantity, unit, factor) => {
    const r = readColumnName(name);
    expect(r.quantity).toBe(quantity);
    expect(r.unit?.canonical).toBe(unit);
    expect(r.unit!.siFactor).toBeCloseTo(factor, 12);
    expect(r.problem).toBeNull();
  });

  it("reads Z″ without the minus as −Z″ with a sign flip", () => {
    const r = readColumnName("Z''/Ohm");
    expect(r.quantity).toBe("impedanceImaginaryNegated");
    expect(r.sign).toBe(-1);
    expect(readColumnName("-Z''/Ohm").sign).toBe(1);
  });

  it.each(["Cycle", "cycle number", "Scan", "Cycle No.", "sweep"])(
    "%s is the cycle number",
    (name) => {
      expect(readColumnName(name).quantity).toBe("cycle");
    },
  );

  it.each([
    ["E / V vs Ag/AgCl", "Ag/AgCl", null],
    ["E / V vs Ag/AgCl (3 M KCl)", "Ag/AgCl (3 M KCl)", "Ag/AgCl-3MKCl"],
    ["Potential vs SCE (V)", "SCE", "SCE"],
    ["E vs. Ag/AgCl, sat. KCl / mV", "Ag/AgCl, sat. KCl", "Ag/AgCl-satKCl"],
    ["E/V vs RHE", "RHE", "RHE"],
    ["E (V vs. Hg/HgO)", "Hg/HgO", null],
  ] as const)("%s: reference %s (lib/chem id %s)", (name, text, id) => {
    const r = readColumnName(name);
    expect(r.quantity).toBe("potential");
    expect(r.referenceElectrode).toEqual({ text, id });
  });

  it("keeps an ambiguous reference without an id: Ag/AgCl alone could be sat., 3.5 M or 3 M KCl", () => {
    expect(readColumnName("E / V vs Ag/AgCl").referenceElectrode?.id).toBeNull();
  });

  it("reads a potential from its unit when the name is unknown, and says it could not name an impedance part", () => {
    expect(readColumnName("WE(1) Potential? (V)").quantity).toBe("potential");
    expect(readColumnName("WE(1) Potential? (V)").recognisedBy).toBe("unit");
    const ohm = readColumnName("Zfoo/Ohm");
    expect(ohm.quantity).toBeNull();
    expect(ohm.problem).toMatch(/impedance part/);
  });

  it("reports a unit that does not fit the name, and an unknown unit", () => {
    expect(readColumnName("E/mA").quantity).toBeNull();
    expect(readColumnName("E/mA").problem).toMatch(/does not fit/);
    expect(readColumnName("I/furlong").problem).toMatch(/not one this parser knows/);
    expect(readColumnName("Temperature (°C)").quantity).toBeNull();
  });

  it("treats row counters as neither data nor a problem", () => {
    for (const name of ["#", "Index", "Point", "n"]) {
      const r = readColumnName(name);
      expect(r.ignorable, name).toBe(true);
      expect(r.problem).toBeNull();
    }
  });
});

describe("units", () => {
  it("tells mHz from MHz and reads ohm in any case", () => {
    expect(readUnit("mHz")!.siFactor).toBe(1e-3);
    expect(readUnit("MHz")!.siFactor).toBe(1e6);
    expect(readUnit("OHM")!.dimension).toBe("resistance");
    expect(readUnit("kohm")!.siFactor).toBe(1e3);
  });

  it("does not take °C for coulombs", () => {
    expect(readUnit("°C")).toBeNull();
    expect(readUnit("℃")).toBeNull();
  });
});
