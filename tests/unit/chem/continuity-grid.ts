/**
 * The sweep over molality and temperature of the continuity test (continuity-sweep.test.ts),
 * shared with its benchmark (bench/chem-sweep.ts). "auto" at each point; a step of 0.5 % or
 * more, or a change of model, must carry the "model changed" message (modelChange).
 */
import { computeSolution } from "@/lib/chem";

export const SWEEP_SALTS = ["NaCl", "CaCl2", "MgSO4", "Cu(NO3)2", "LiPF6", "K3Fe(CN)6", "HCl"];
export const SWEEP_MOLALITY_TEMPERATURES_C = [0, 25, 60];
export const SWEEP_TEMPERATURE_MOLALITIES = [0.01, 0.5, 3];

/** 0.001–6 mol/kg; steps of 0.5 % below 1, 0.2 % to 3, 0.1 % above (CaCl2 near 5 mol/kg). */
export const SWEEP_MOLALITIES: number[] = [];
for (let m = 0.001; m <= 6; m *= m < 1 ? 1.005 : m < 3 ? 1.002 : 1.001) SWEEP_MOLALITIES.push(m);

/** 0–100 °C in steps of 0.25 K. */
export const SWEEP_TEMPERATURES_C = Array.from({ length: 401 }, (_, i) => i * 0.25);

export interface SweepPoint {
  gamma: number;
  used: string;
  said: boolean;
}

export function sweepPoint(formula: string, molality: number, temperatureC: number): SweepPoint {
  const r = computeSolution({
    temperatureC,
    model: "auto",
    components: [{ formula, amount: molality, unit: "mol/kg" }],
  });
  return { gamma: r.salts[0].meanGamma, used: r.model.used, said: Boolean(r.modelChange) };
}

/** Walks the values; counts the jumps (≥ 0.5 % or a model change) said and not said. */
export function sweep(values: readonly number[], at: (v: number) => SweepPoint) {
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
