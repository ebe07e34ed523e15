/**
 * Diffusion coefficients of the redox probes electrochemists calibrate with, at 25 °C, and
 * how they follow temperature.
 *
 * Sources and confidence (tests/fixtures/reference/diffusion-coefficients.csv):
 * - Hexacyanoferrate(III)/(II) in 0.1 mol/L KCl: 7.2 and 6.7 ×10⁻⁶ cm²/s, Konopka &
 *   McDuffie (1970) Anal. Chem. 42, 1741 (from memory; the literature spans 6.3–7.6).
 *   At infinite dilution the CRC Handbook (Vanýsek) gives 8.96 and 7.35 ×10⁻⁶ (confirmed):
 *   supporting electrolyte slows both.
 * - Hexaammineruthenium(III) in 0.1 mol/L KCl: 6.3 ×10⁻⁶ cm²/s (from memory, no single
 *   source pinned down; quoted values span about 5.3–9 ×10⁻⁶).
 * - Ferrocenemethanol in aqueous 0.1 mol/L KCl or KNO₃: 7.8 ×10⁻⁶ cm²/s (from memory,
 *   the value common in scanning electrochemical microscopy work; quoted 6.7–7.8).
 * - Ferrocene in acetonitrile, 0.1 mol/L Bu₄NPF₆: 2.4 ×10⁻⁵ cm²/s at 298 K and the
 *   activation energy of diffusion 7.1 kJ/mol, Wang, Rogers & Compton (2010)
 *   J. Electroanal. Chem. 648, 15 (Ea confirmed in the public abstract; D from memory).
 * Temperature: in water, Stokes–Einstein scaling D ∝ T/η(T) with the viscosity of water
 * (no published temperature function was found for these probes); in acetonitrile the
 * published Arrhenius law D = D₂₉₈ exp(−Ea/R (1/T − 1/298.15)).
 */
import { GAS_CONSTANT_J_PER_MOL_K, kelvin } from "../constants";
import { ChemInputError } from "../errors";
import { assertLiquidWaterTemperature, waterViscosityMPaS } from "../solvents/water-viscosity";

export type RedoxProbeId =
  | "ferricyanide/ferrocyanide"
  | "hexaammineruthenium"
  | "ferrocenemethanol"
  | "ferrocene-acetonitrile";

export interface RedoxProbe {
  id: RedoxProbeId;
  name: string;
  /** lib/chem couple id where the catalogue has one (listCouples), else null. */
  coupleId: string | null;
  electrons: number;
  oxidized: string;
  reduced: string;
  medium: string;
  /** cm²/s at 25 °C; null where no value is known here. */
  diffusionOxidizedCm2PerS25C: number | null;
  diffusionReducedCm2PerS25C: number | null;
  temperatureLaw:
    | { kind: "stokes-einstein-water" }
    | { kind: "arrhenius"; activationEnergyJPerMol: number; rangeC: [number, number] };
  source: string;
  confidence: "confirmed" | "memory";
}

const REDOX_PROBES: readonly RedoxProbe[] = [
  {
    id: "ferricyanide/ferrocyanide",
    name: "hexacyanoferrate(III)/(II)",
    coupleId: "Fe(CN)6 3-/4-",
    electrons: 1,
    oxidized: "Fe(CN)6^3-",
    reduced: "Fe(CN)6^4-",
    medium: "water, 0.1 mol/L KCl",
    diffusionOxidizedCm2PerS25C: 7.2e-6,
    diffusionReducedCm2PerS25C: 6.7e-6,
    temperatureLaw: { kind: "stokes-einstein-water" },
    source: "Konopka & McDuffie (1970) Anal. Chem. 42, 1741 (from memory)",
    confidence: "memory",
  },
  {
    id: "hexaammineruthenium",
    name: "hexaammineruthenium(III)/(II)",
    coupleId: "Ru(NH3)6 3+/2+",
    electrons: 1,
    oxidized: "Ru(NH3)6^3+",
    reduced: "Ru(NH3)6^2+",
    medium: "water, 0.1 mol/L KCl",
    diffusionOxidizedCm2PerS25C: 6.3e-6,
    diffusionReducedCm2PerS25C: null,
    temperatureLaw: { kind: "stokes-einstein-water" },
    source: "voltammetry literature, from memory (quoted 5.3–9 ×10⁻⁶ cm²/s)",
    confidence: "memory",
  },
  {
    id: "ferrocenemethanol",
    name: "ferrocenemethanol",
    coupleId: null,
    electrons: 1,
    oxidized: "FcCH2OH+",
    reduced: "FcCH2OH",
    medium: "water, 0.1 mol/L KCl or KNO₃",
    diffusionOxidizedCm2PerS25C: null,
    diffusionReducedCm2PerS25C: 7.8e-6,
    temperatureLaw: { kind: "stokes-einstein-water" },
    source:
      "scanning electrochemical microscopy literature, from memory (quoted 6.7–7.8 ×10⁻⁶ cm²/s)",
    confidence: "memory",
  },
  {
    id: "ferrocene-acetonitrile",
    name: "ferrocene/ferrocenium in acetonitrile",
    coupleId: null,
    electrons: 1,
    oxidized: "Fc+",
    reduced: "Fc",
    medium: "acetonitrile, 0.1 mol/L Bu₄NPF₆",
    diffusionOxidizedCm2PerS25C: null,
    diffusionReducedCm2PerS25C: 2.4e-5,
    temperatureLaw: { kind: "arrhenius", activationEnergyJPerMol: 7100, rangeC: [-10, 50] },
    source:
      "Wang, Rogers & Compton (2010) J. Electroanal. Chem. 648, 15 (Ea confirmed; D from memory)",
    confidence: "memory",
  },
];

const BY_ID = new Map(REDOX_PROBES.map((p) => [p.id, p]));

export function listRedoxProbes(): RedoxProbe[] {
  return REDOX_PROBES.map((p) => ({ ...p, temperatureLaw: { ...p.temperatureLaw } }));
}

export function findRedoxProbe(id: string): RedoxProbe {
  const probe = BY_ID.get(id as RedoxProbeId);
  if (!probe)
    throw new ChemInputError(
      `Unknown redox probe "${id}". Known: ${REDOX_PROBES.map((p) => p.id).join(", ")}.`,
      {
        field: "probe",
        code: "unknown_probe",
      },
    );
  return probe;
}

export interface DiffusionCoefficientResult {
  diffusionCoefficientCm2PerS: number;
  source: string;
  notes: string[];
}

/** D of a probe's oxidized or reduced form at a temperature (°C). */
export function diffusionCoefficient(
  probeId: string,
  form: "oxidized" | "reduced",
  temperatureC = 25,
): DiffusionCoefficientResult {
  const probe = findRedoxProbe(probeId);
  const at25 =
    form === "oxidized" ? probe.diffusionOxidizedCm2PerS25C : probe.diffusionReducedCm2PerS25C;
  if (at25 === null)
    throw new ChemInputError(
      `No diffusion coefficient of the ${form} form of ${probe.name} is known here.`,
      {
        field: "form",
        code: "no_diffusion_coefficient",
      },
    );
  if (typeof temperatureC !== "number" || !Number.isFinite(temperatureC))
    throw new ChemInputError("Temperature must be a number in °C.", {
      field: "temperatureC",
      code: "bad_temperature",
    });
  const notes: string[] = [];
  if (probe.confidence === "memory")
    notes.push(`${probe.name}: D recalled, not confirmed in a public copy; allow about ±15 %.`);
  let value = at25;
  if (Math.abs(temperatureC - 25) > 1e-9) {
    const law = probe.temperatureLaw;
    if (law.kind === "stokes-einstein-water") {
      assertLiquidWaterTemperature(temperatureC);
      value =
        at25 *
        (kelvin(temperatureC) / kelvin(25)) *
        (waterViscosityMPaS(25) / waterViscosityMPaS(temperatureC));
      notes.push(
        "Temperature by Stokes–Einstein scaling with the viscosity of water (no published temperature function for this probe).",
      );
    } else {
      const [low, high] = law.rangeC;
      if (temperatureC < low || temperatureC > high)
        throw new ChemInputError(
          `The published temperature law for ${probe.name} covers ${low}–${high} °C.`,
          {
            field: "temperatureC",
            code: "temperature_out_of_range",
          },
        );
      value =
        at25 *
        Math.exp(
          (-law.activationEnergyJPerMol / GAS_CONSTANT_J_PER_MOL_K) *
            (1 / kelvin(temperatureC) - 1 / kelvin(25)),
        );
      notes.push(
        `Temperature by the published activation energy of diffusion, ${law.activationEnergyJPerMol / 1000} kJ/mol.`,
      );
    }
  }
  return { diffusionCoefficientCm2PerS: value, source: probe.source, notes };
}
