// @vitest-environment node
/**
 * No silent jumps: sweeps of "auto" over molality and temperature. Adjacent points may differ
 * by 0.5 % or more only where one of them carries the "model changed" message (modelChange).
 * Self-consistency of the engine (no outside value exists for this property). The step is
 * fine enough that the smooth change of γ± between points stays below 0.5 % (CaCl2 near
 * 5 mol/kg changes by 0.3 % per 0.1 % of molality, so the steps there are 0.1 %; CaCl2 at
 * 3 mol/kg near 100 °C by 0.5 % per 0.5 K, so the temperature step is 0.25 K). bench/chem-sweep.ts
 * times the same sweep (keep the two grids in step).
 */
import { describe, expect, it } from "vitest";
import { computeSolution } from "@/lib/chem";

const SALTS = ["NaCl", "CaCl2", "MgSO4", "Cu(NO3)2", "LiPF6", "K3Fe(CN)6", "HCl"];

function point(formula: string, molality: number, temperatureC: number) {
  const r = computeSolution({
    temperatureC,
    model: "auto",
    components: [{ formula, amount: molality, unit: "mol/kg" }],
  });
  return { gamma: r.salts[0].meanGamma, used: r.model.used, said: Boolean(r.modelChange) };
}

function sweep(values: number[], at: (v: number) => ReturnType<typeof point>) {
  let silent = 0;
  let said = 0;
  let prev = at(values[0]);
  for (const v of values.slice(1)) {
    const cur = at(v);
    const step = Math.abs(cur.gamma / prev.gamma - 1);
    if (step >= 0.005 || cur.used !== prev.used) {
      if (cur.said || prev.said) said++;
      else silent++;
    }
    prev = cur;
  }
  return { points: values.length, silent, said };
}

const molalities: number[] = [];
for (let m = 0.001; m <= 6; m *= m < 1 ? 1.005 : m < 3 ? 1.002 : 1.001) molalities.push(m);
const temperatures = Array.from({ length: 401 }, (_, i) => i * 0.25);

describe("continuity of auto over molality and temperature", () => {
  it("over molality 0.001–6 mol/kg at 0, 25 and 60 °C: every jump or model change is said", () => {
    let points = 0;
    let said = 0;
    for (const salt of SALTS)
      for (const T of [0, 25, 60]) {
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
      for (const m of [0.01, 0.5, 3]) {
        const s = sweep(temperatures, (T) => point(salt, m, T));
        expect(s.silent, `${salt} at ${m} mol/kg`).toBe(0);
        points += s.points;
        said += s.said;
      }
    expect(points).toBe(SALTS.length * 3 * 401);
    expect(said).toBeGreaterThan(0);
  });
});
