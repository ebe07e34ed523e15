/**
 * The density behind molar ↔ molal conversion: the one the researcher gave; otherwise, in
 * water, the Laliberté & Cooper (2004) model when every solute has coefficients (solved
 * together with the amounts, since the mass fractions depend on the density for molar inputs);
 * otherwise the solvent's own density, an approximation for dilute solutions. The result says
 * which was used.
 */
import { solveAmounts, type AmountInput, type SolvedAmounts } from "../amounts/solve";
import type { ResolvedSpecies } from "../species/resolve";
import { laliberteDensityGPerMl, laliberteRow } from "./laliberte-cooper";
import type { LaliberteRow } from "./data/laliberte-2009";

type DensitySource = "given" | "laliberte-cooper" | "solvent";

export interface DensityUsed {
  gPerMl: number;
  source: DensitySource;
  /** In words, for the block: which density and from where. */
  label: string;
  /** Set when the model was used beyond its fitted temperature or concentration. */
  note?: string;
}

const MAX_ITERATIONS = 50;
const TOLERANCE = 1e-12;

function fmt(x: number, digits = 3): string {
  return Number(x.toPrecision(digits)).toString();
}

export function amountsWithDensity(
  inputs: readonly AmountInput[],
  species: readonly ResolvedSpecies[],
  givenDensityGPerMl: number | undefined,
  solvent: { id: string; densityGPerMl: number },
  temperatureC: number,
): { amounts: SolvedAmounts; density: DensityUsed } {
  if (givenDensityGPerMl !== undefined)
    return {
      amounts: solveAmounts(inputs, species, givenDensityGPerMl, solvent.densityGPerMl),
      density: { gPerMl: givenDensityGPerMl, source: "given", label: "density given" },
    };
  const rows = species.map((s) => (s.ions.length > 0 ? laliberteRow(s.saltFormula) : undefined));
  const modelled =
    solvent.id === "water" &&
    species.length > 0 &&
    rows.every((row, i) => row !== undefined || !(inputs[i].amount > 0));
  if (!modelled) {
    const amounts = solveAmounts(inputs, species, undefined, solvent.densityGPerMl);
    const missing = species
      .filter((s, i) => inputs[i].amount > 0 && !rows[i])
      .map((s) => s.saltFormula);
    return {
      amounts,
      density: {
        gPerMl: solvent.densityGPerMl,
        source: "solvent",
        label: `density of the solvent (${fmt(solvent.densityGPerMl, 5)} g/mL)`,
        ...(solvent.id === "water" && missing.length
          ? {
              note: `The density model (Laliberté & Cooper 2004) has no coefficients for ${missing.join(", ")}: molar ↔ molal conversion uses the density of water.`,
            }
          : {}),
      },
    };
  }
  const used = rows as LaliberteRow[];
  let rho = solvent.densityGPerMl;
  let amounts = solveAmounts(inputs, species, rho, solvent.densityGPerMl);
  for (let it = 0; it < MAX_ITERATIONS; it++) {
    const total = amounts.kgSolutionPerKgSolvent;
    const fractions = amounts.components.map(
      (c, i) => (c.molality * species[i].anhydrousMolarMassGPerMol) / 1000 / total,
    );
    const next = laliberteDensityGPerMl(used, fractions, temperatureC);
    // The amounts in hand were solved with this density already.
    if (Math.abs(next - rho) <= TOLERANCE * rho) break;
    rho = next;
    amounts = solveAmounts(inputs, species, rho, solvent.densityGPerMl);
  }
  const soluteFraction = 1 - 1 / amounts.kgSolutionPerKgSolvent;
  const outside = used.filter(
    (row, i) =>
      inputs[i].amount > 0 &&
      (temperatureC < row.tMinC || temperatureC > row.tMaxC || soluteFraction > row.wMax),
  );
  return {
    amounts,
    density: {
      gPerMl: rho,
      source: "laliberte-cooper",
      label: `${fmt(rho, 5)} g/mL from the density model of Laliberté & Cooper (2004)`,
      ...(outside.length
        ? {
            note: `The density model is extrapolated for ${outside.map((r) => `${r.salt} (fitted ${fmt(r.tMinC)}–${fmt(r.tMaxC)} °C, to ${fmt(100 * r.wMax)} % by mass)`).join(", ")}.`,
          }
        : {}),
    },
  };
}
