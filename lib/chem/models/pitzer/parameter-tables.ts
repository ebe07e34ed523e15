/**
 * The Pitzer parameter sets Ionleaf uses, merged into look-up maps, and the order in which
 * they are consulted for a cation–anion pair:
 *   1. May et al. (2011), the largest modern critical compilation, with a published molality
 *      range for every salt, and the closest to the tabulated γ± of the sets checked;
 *   2. Harvie, Møller & Weare (1984) for the pairs May et al. lack (HSO4−, Ca/Mg with OH− and
 *      HCO3−, CaSO4, H2SO4…);
 *   3. Pitzer & Mayorga (1973) for pairs neither covers (acetates, borate, 3:1 and 4:1 salts…).
 * HMW84's θ/ψ were fitted with HMW84's own binary values; used with May et al. binaries they
 * are an approximation (they are small corrections: in seawater they move ln γ by ≲ 0.02).
 * θ/ψ: HMW84 first, then Pitzer & Kim (1974) for like-charge pairs HMW84 do not cover.
 */
import { HMW_1984_BINARY } from "./data/binary-hmw-1984";
import { MAY_2011_BINARY } from "./data/binary-may-2011";
import { PITZER_MAYORGA_1973_BINARY } from "./data/binary-pitzer-mayorga-1973";
import type { PitzerBinaryRow, PitzerTemperatureRow } from "./data/binary-row";
import { HMW_1984_MIXING } from "./data/mixing-hmw-1984";
import { PITZER_KIM_1974_MIXING } from "./data/mixing-pitzer-kim-1974";
import type { PitzerMixingRow } from "./data/mixing-row";
import { PITZER_TEMPERATURE_DERIVATIVES } from "./data/temperature-derivatives";
import {
  PITZER_TEMPERATURE_FUNCTIONS,
  type PitzerTemperatureFunctionRow,
} from "./data/temperature-functions";
import { pairKey } from "./ion-key";

export const BINARY_SETS_IN_PRIORITY: readonly (readonly PitzerBinaryRow[])[] = [
  MAY_2011_BINARY,
  HMW_1984_BINARY,
  PITZER_MAYORGA_1973_BINARY,
];

function firstWins<T>(rows: readonly T[], key: (row: T) => string, into: Map<string, T>): void {
  for (const row of rows) if (!into.has(key(row))) into.set(key(row), row);
}

const binaryByPair = new Map<string, PitzerBinaryRow>();
for (const set of BINARY_SETS_IN_PRIORITY)
  firstWins(set, (r) => pairKey(r.cation, r.anion), binaryByPair);

const thetaByPair = new Map<string, PitzerMixingRow>();
const psiByTriple = new Map<string, PitzerMixingRow>();
for (const set of [HMW_1984_MIXING, PITZER_KIM_1974_MIXING]) {
  firstWins(
    set.filter((r) => r.kind === "theta"),
    (r) => pairKey(r.ionI, r.ionJ),
    thetaByPair,
  );
  firstWins(
    set.filter((r) => r.kind === "psi"),
    (r) => pairKey(r.ionI, r.ionJ, r.kind === "psi" ? r.commonIon : ""),
    psiByTriple,
  );
}

const temperatureByPair = new Map<string, PitzerTemperatureRow>();
firstWins(PITZER_TEMPERATURE_DERIVATIVES, (r) => pairKey(r.cation, r.anion), temperatureByPair);

const functionByPair = new Map<string, PitzerTemperatureFunctionRow>();
firstWins(PITZER_TEMPERATURE_FUNCTIONS, (r) => pairKey(r.cation, r.anion), functionByPair);

/** The full temperature function of a pair, where one is published (data/temperature-functions.ts). */
export function temperatureFunction(
  cation: string,
  anion: string,
): PitzerTemperatureFunctionRow | undefined {
  return functionByPair.get(pairKey(cation, anion));
}

export function binaryParameters(cation: string, anion: string): PitzerBinaryRow | undefined {
  return binaryByPair.get(pairKey(cation, anion));
}

export function temperatureDerivatives(
  cation: string,
  anion: string,
): PitzerTemperatureRow | undefined {
  return temperatureByPair.get(pairKey(cation, anion));
}

export function thetaParameter(ionI: string, ionJ: string): PitzerMixingRow | undefined {
  return thetaByPair.get(pairKey(ionI, ionJ));
}

export function psiParameter(
  ionI: string,
  ionJ: string,
  common: string,
): PitzerMixingRow | undefined {
  return psiByTriple.get(pairKey(ionI, ionJ, common));
}
