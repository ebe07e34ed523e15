import { ELEMENTS } from "../data/atomic-weights";
import type { Composition } from "./composition";

/** Electron mass in g/mol (CODATA 2018, 5.48579909065e-4 u): ions differ from atoms by it. */
const ELECTRON_MOLAR_MASS_G_PER_MOL = 5.48579909065e-4;

/**
 * Molar mass from IUPAC 2021 abridged standard atomic weights. The mass of the electrons
 * gained or lost by an ion is ignored by common practice (it is below the uncertainty of
 * most atomic weights); `withElectrons` includes it for the rare case it matters.
 */
export function compositionMolarMass(
  composition: Composition,
  charge = 0,
  withElectrons = false,
): number {
  let mass = 0;
  for (const [symbol, count] of Object.entries(composition)) {
    mass += ELEMENTS.get(symbol)!.atomicWeight * count;
  }
  return withElectrons ? mass - charge * ELECTRON_MOLAR_MASS_G_PER_MOL : mass;
}
