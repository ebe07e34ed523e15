// @vitest-environment node
/**
 * No silent jumps: sweeps of "auto" over molality and temperature. Adjacent points may differ
 * by 0.5 % or more only where one of them carries the "model changed" message (modelChange).
 * Self-consistency of the engine (no outside value exists for this property). The step is
 * fine enough that the smooth change of γ± between points stays below 0.5 % (CaCl2 near
 * 5 mol/kg changes by 0.3 % per 0.1 % of molality, so the steps there are 0.1 %; CaCl2 at
 * 3 mol/kg near 100 °C by 0.5 % per 0.5 K, so the temperature step is 0.25 K).
 */
import { describe, expect, it } from "vitest";
import {
  SWEEP_MOLALITIES as molalities,
  SWEEP_MOLALITY_TEMPERATURES_C,
  SWEEP_SALTS as SALTS,
  SWEEP_TEMPERATURE_MOLALITIES,
  SWEEP_TEMPERATURES_C as temperatures,
  sweep,
  sweepPoint as point,
} from "./continuity-grid";

describe("continuity of auto over molality and temperature", () => {
  it("over molality 0.001–6 mol/kg at 0, 25 and 60 °C: every jump or model change is said", () => {
    let points = 0;
    let said = 0;
    for (const salt of SALTS)
      for (const T of SWEEP_MOLALITY_TEMPERATURES_C) {
        const s = sweep(molalities, (m) => point(salt, m, T));
        expect(s.silent, `${salt} at ${T} °C`).toBe(0);
        points += s.points;
        said += s.said;
      }
    expect(points).toBe(SALTS.length * 3 * molalities.length);
    // The sweep crosses model boundaries (e.g. LiPF6 leaves Davies at I = 0.05): they are said.
    expect(said).toBeGreaterThan(0);
  });

  it("over temperature 0–100 °C at 0.01, 0.5 and 3 mol/kg: every jump or model change is said", () => {
    let points = 0;
    let said = 0;
    for (const salt of SALTS)
      for (const m of SWEEP_TEMPERATURE_MOLALITIES) {
        const s = sweep(temperatures, (T) => point(salt, m, T));
        expect(s.silent, `${salt} at ${m} mol/kg`).toBe(0);
        points += s.points;
        said += s.said;
      }
    expect(points).toBe(SALTS.length * 3 * 401);
    expect(said).toBeGreaterThan(0);
  });
});
