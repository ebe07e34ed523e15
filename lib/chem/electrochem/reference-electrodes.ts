/**
 * Reference electrodes: potential vs SHE at 25 °C and, where published, the temperature
 * coefficient (linear about 25 °C). Conversion: E(vs B) = E(vs A) + E_A − E_B.
 *
 * Sources: SCE 0.2412 V and Ag/AgCl (sat. KCl) 0.197 V, 3.5 M KCl 0.205 V, 3 M KCl 0.210 V:
 * Bard & Faulkner, Electrochemical Methods, 2nd ed. (2001) (values confirmed in public
 * copies, tests/fixtures/reference/electrode-potentials.csv). Hg/HgO (1 M NaOH) 0.140 V and
 * Hg/Hg2SO4 (sat. K2SO4) 0.640 V: Sawyer, Sobkowiak & Roberts, Electrochemistry for
 * Chemists, 2nd ed. (1995), §5.2 (recalled; other sources give 0.650–0.658 V for the latter).
 * Temperature coefficients: Sawyer, Sobkowiak & Roberts (1995) (recalled).
 * RHE: E = −(RT ln10 / F) pH vs SHE (by definition).
 */
import { ChemInputError } from "../errors";
import { nernstSlopeV } from "./nernst";

export type ReferenceElectrodeId =
  | "SHE"
  | "SCE"
  | "Ag/AgCl-satKCl"
  | "Ag/AgCl-3.5MKCl"
  | "Ag/AgCl-3MKCl"
  | "Hg/HgO-1MNaOH"
  | "Hg/Hg2SO4-satK2SO4"
  | "RHE";

interface ReferenceData {
  id: ReferenceElectrodeId;
  name: string;
  potentialV25C: number;
  /** dE/dT in V/K, null where no value is published in the sources above. */
  temperatureCoefficientVPerK: number | null;
  source: string;
}

const BF = "Bard & Faulkner (2001) Electrochemical Methods, 2nd ed.";
const SSR =
  "Sawyer, Sobkowiak & Roberts (1995) Electrochemistry for Chemists, 2nd ed., §5.2 (from memory)";

const REFERENCE_ELECTRODES: readonly ReferenceData[] = [
  {
    id: "SHE",
    name: "standard hydrogen electrode",
    potentialV25C: 0,
    temperatureCoefficientVPerK: 0,
    source: "definition",
  },
  {
    id: "SCE",
    name: "saturated calomel electrode (sat. KCl)",
    potentialV25C: 0.2412,
    temperatureCoefficientVPerK: -6.6e-4,
    source: `${BF}; dE/dT: ${SSR}`,
  },
  {
    id: "Ag/AgCl-satKCl",
    name: "Ag/AgCl, saturated KCl",
    potentialV25C: 0.197,
    temperatureCoefficientVPerK: -1.01e-3,
    source: `${BF}; dE/dT: ${SSR}`,
  },
  {
    id: "Ag/AgCl-3.5MKCl",
    name: "Ag/AgCl, 3.5 M KCl",
    potentialV25C: 0.205,
    temperatureCoefficientVPerK: -7.3e-4,
    source: `${BF}; dE/dT: ${SSR}`,
  },
  {
    id: "Ag/AgCl-3MKCl",
    name: "Ag/AgCl, 3 M KCl",
    potentialV25C: 0.21,
    temperatureCoefficientVPerK: null,
    source: BF,
  },
  {
    id: "Hg/HgO-1MNaOH",
    name: "Hg/HgO, 1 M NaOH",
    potentialV25C: 0.14,
    temperatureCoefficientVPerK: null,
    source: SSR,
  },
  {
    id: "Hg/Hg2SO4-satK2SO4",
    name: "Hg/Hg₂SO₄, saturated K₂SO₄",
    potentialV25C: 0.64,
    temperatureCoefficientVPerK: null,
    source: SSR,
  },
  {
    id: "RHE",
    name: "reversible hydrogen electrode (needs pH)",
    potentialV25C: 0,
    temperatureCoefficientVPerK: null,
    source: "E = −(RT ln10/F)·pH vs SHE",
  },
];

const BY_ID = new Map(REFERENCE_ELECTRODES.map((r) => [r.id, r]));

export function listReferenceElectrodes(): {
  id: ReferenceElectrodeId;
  name: string;
  potentialV25C: number;
  temperatureCoefficientVPerK: number | null;
  source: string;
}[] {
  return REFERENCE_ELECTRODES.map((r) => ({ ...r }));
}

export interface PotentialOptions {
  temperatureC?: number;
  pH?: number;
}

/** Potential of a reference electrode vs SHE, with notes on what was assumed. */
export function referencePotentialVsShe(
  id: string,
  options: PotentialOptions = {},
  notes: string[] = [],
): number {
  const ref = BY_ID.get(id as ReferenceElectrodeId);
  if (!ref) {
    throw new ChemInputError(
      `Unknown reference electrode "${id}". Use one of: ${REFERENCE_ELECTRODES.map((r) => r.id).join(", ")}.`,
      { field: "reference", code: "unknown_reference" },
    );
  }
  const t = options.temperatureC ?? 25;
  if (!Number.isFinite(t) || t < 0 || t > 100) {
    throw new ChemInputError(
      `Temperature ${t} °C is outside the range of reference-electrode data (0–100 °C).`,
      { field: "temperatureC", code: "temperature_out_of_range" },
    );
  }
  if (ref.id === "RHE") {
    if (options.pH === undefined || !(options.pH >= -2 && options.pH <= 16)) {
      throw new ChemInputError(
        "Converting to or from RHE needs the pH of the solution (a number from −2 to 16).",
        {
          field: "pH",
          code: "missing_ph",
        },
      );
    }
    return -nernstSlopeV(t, 1) * options.pH;
  }
  if (Math.abs(t - 25) < 1e-9) return ref.potentialV25C;
  if (ref.temperatureCoefficientVPerK === null) {
    notes.push(
      `${ref.name}: no published temperature coefficient here; the 25 °C potential is used at ${t} °C.`,
    );
    return ref.potentialV25C;
  }
  return ref.potentialV25C + ref.temperatureCoefficientVPerK * (t - 25);
}

export function convertPotentialDetailed(
  potentialV: number,
  from: string,
  to: string,
  options: PotentialOptions = {},
): { potentialV: number; notes: string[] } {
  if (typeof potentialV !== "number" || !Number.isFinite(potentialV)) {
    throw new ChemInputError("The potential must be a number in volts.", {
      field: "potential",
      code: "bad_potential",
    });
  }
  const notes: string[] = [];
  const eFrom = referencePotentialVsShe(from, options, notes);
  const eTo = referencePotentialVsShe(to, options, notes);
  return { potentialV: potentialV + eFrom - eTo, notes };
}

/** A potential measured against `from`, expressed against `to` (V). */
export function convertPotential(
  potentialV: number,
  from: string,
  to: string,
  options: PotentialOptions = {},
): number {
  return convertPotentialDetailed(potentialV, from, to, options).potentialV;
}
