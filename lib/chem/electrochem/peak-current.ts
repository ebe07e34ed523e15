/**
 * Expected peak current of a reversible couple in cyclic voltammetry at a planar electrode
 * under semi-infinite linear diffusion, the Randles–Ševčík equation (Bard & Faulkner,
 * Electrochemical Methods, 2nd ed. 2001, eq. 6.2.18; Nicholson & Shain 1964):
 *   ip = 0.4463 n F A C (n F v D / (R T))^½
 * (at 25 °C: ip = 2.69×10⁵ n^{3/2} A D^½ C v^½ with A in cm², D in cm²/s, C in mol/cm³,
 * v in V/s, B&F eq. 6.2.19). The reversible peak separation for a switching potential well
 * past the wave is 2.218 RT/nF (57.0/n mV at 25 °C, B&F §6.2.1).
 */
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from "../constants";
import { ChemInputError } from "../errors";
import { finiteResult } from "../finite-result";
import { diffusionCoefficient, findRedoxProbe } from "./redox-probes";

export interface RandlesSevcikInput {
  electrons?: number;
  electrodeAreaCm2: number;
  concentrationMolPerL: number;
  diffusionCoefficientCm2PerS: number;
  scanRateVPerS: number;
  temperatureC?: number;
}

function positive(value: unknown, field: string, what: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0)
    throw new ChemInputError(`${what} must be a positive number.`, { field, code: "bad_value" });
  return value;
}

function temperatureK(temperatureC: number | undefined): number {
  const t = temperatureC ?? 25;
  if (typeof t !== "number" || !Number.isFinite(t) || t < -40 || t > 200)
    throw new ChemInputError(`Temperature ${t} °C is outside −40 to 200 °C.`, {
      field: "temperatureC",
      code: "temperature_out_of_range",
    });
  return kelvin(t);
}

/** Peak current in amperes (magnitude). */
export function randlesSevcikPeakCurrent(input: RandlesSevcikInput): number {
  const n = positive(input.electrons ?? 1, "electrons", "The number of electrons");
  const area = positive(input.electrodeAreaCm2, "electrodeAreaCm2", "The electrode area") * 1e-4;
  const c =
    positive(input.concentrationMolPerL, "concentrationMolPerL", "The concentration") * 1000;
  const d =
    positive(
      input.diffusionCoefficientCm2PerS,
      "diffusionCoefficientCm2PerS",
      "The diffusion coefficient",
    ) * 1e-4;
  const v = positive(input.scanRateVPerS, "scanRateVPerS", "The scan rate");
  const t = temperatureK(input.temperatureC);
  return finiteResult(
    0.4463 *
      n *
      FARADAY_C_PER_MOL *
      area *
      c *
      Math.sqrt((n * FARADAY_C_PER_MOL * v * d) / (GAS_CONSTANT_J_PER_MOL_K * t)),
    "electrodeAreaCm2",
    "The peak current",
  );
}

/** 2.218 RT/nF in volts: the reversible ΔEp for a distant switching potential. */
export function reversiblePeakSeparationV(electrons = 1, temperatureC = 25): number {
  const n = positive(electrons, "electrons", "The number of electrons");
  return finiteResult(
    (2.218 * GAS_CONSTANT_J_PER_MOL_K * temperatureK(temperatureC)) / (n * FARADAY_C_PER_MOL),
    "electrons",
    "The peak separation",
  );
}

export interface ExpectedPeakInput {
  probe: string;
  /** The form present in the solution; the first sweep converts it. */
  formInSolution: "oxidized" | "reduced";
  electrodeAreaCm2: number;
  concentrationMolPerL: number;
  scanRateVPerS: number;
  temperatureC?: number;
}

export interface ExpectedPeak {
  peakCurrentA: number;
  /** The first sweep's peak: anodic when the reduced form is present, cathodic otherwise. */
  forwardPeak: "anodic" | "cathodic";
  electrons: number;
  diffusionCoefficientCm2PerS: number;
  reversibleDeltaEpV: number;
  notes: string[];
  sources: string[];
}

export function expectedPeakCurrent(input: ExpectedPeakInput): ExpectedPeak {
  const probe = findRedoxProbe(input.probe);
  const d = diffusionCoefficient(probe.id, input.formInSolution, input.temperatureC ?? 25);
  const peakCurrentA = randlesSevcikPeakCurrent({
    electrons: probe.electrons,
    electrodeAreaCm2: input.electrodeAreaCm2,
    concentrationMolPerL: input.concentrationMolPerL,
    diffusionCoefficientCm2PerS: d.diffusionCoefficientCm2PerS,
    scanRateVPerS: input.scanRateVPerS,
    temperatureC: input.temperatureC,
  });
  const notes = [...d.notes];
  // Radial diffusion adds to the planar current at smaller disks (Ngamchuea et al. 2014,
  // J. Solid State Electrochem. 18, 3251: radius above 4 mm for quantitative Randles–Ševčík).
  const radiusMm = Math.sqrt((input.electrodeAreaCm2 * 100) / Math.PI);
  if (radiusMm < 4)
    notes.push(
      `A ${radiusMm.toFixed(1)} mm radius disk gets some radial diffusion: measured peaks run a few per cent above Randles–Ševčík (Ngamchuea et al. 2014).`,
    );
  return {
    peakCurrentA,
    forwardPeak: input.formInSolution === "reduced" ? "anodic" : "cathodic",
    electrons: probe.electrons,
    diffusionCoefficientCm2PerS: d.diffusionCoefficientCm2PerS,
    reversibleDeltaEpV: reversiblePeakSeparationV(probe.electrons, input.temperatureC ?? 25),
    notes,
    sources: [d.source, "Randles–Ševčík: Bard & Faulkner (2001) eq. 6.2.18"],
  };
}
