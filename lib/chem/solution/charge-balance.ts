/**
 * Charge balance Σ m_i z_i of the ions as entered, the validity message when it is not ~0, and
 * the counter-ions the researcher may add to balance it (the component to append, in mol/kg).
 */
import { ionByKey } from "../species/ion-index";
import { resolveSpecies } from "../species/resolve";
import type { IonAmount } from "./screening";
import type { SolutionComponentInput } from "./types";

/** Relative imbalance below which the charges count as balanced (rounding of typed amounts). */
const BALANCED = 1e-6;

/** Counter-ions offered, in the order a lab would reach for them (common practice, no source). */
const ANIONS = ["Cl-", "NO3-", "ClO4-", "SO4^2-", "Br-", "OH-", "PF6-"] as const;
const CATIONS = ["Na+", "K+", "Li+", "H+", "NH4+", "N(C4H9)4^+"] as const;

export interface CounterIonOffer {
  formula: string;
  name?: string;
  charge: number;
  /** The component that balances the charge exactly. */
  component: SolutionComponentInput;
}

export interface ChargeBalance {
  excessEqPerKg: number;
  balanced: boolean;
  /** Percent of all charge in excess. */
  percent: number;
  message?: string;
  offers: CounterIonOffer[];
}

function balancingComponent(excessEqPerKg: number, ionFormula: string): SolutionComponentInput {
  const ion = resolveSpecies(ionFormula).ions[0];
  const amount = Math.abs(excessEqPerKg) / Math.abs(ion.charge);
  return { formula: ion.formula, amount: Number(amount.toPrecision(6)), unit: "mol/kg" };
}

export function chargeBalanceOf(ions: readonly IonAmount[]): ChargeBalance {
  let sum = 0;
  let scale = 0;
  for (const ion of ions) {
    sum += ion.molality * ion.charge;
    scale += ion.molality * Math.abs(ion.charge);
  }
  if (scale === 0 || Math.abs(sum) <= BALANCED * scale)
    return { excessEqPerKg: 0, balanced: true, percent: 0, offers: [] };
  const percent = (100 * Math.abs(sum)) / scale;
  const sign = sum > 0 ? "positive" : "negative";
  const candidates = sum > 0 ? ANIONS : CATIONS;
  const offers = candidates.map((formula) => {
    const species = resolveSpecies(formula);
    return {
      formula: species.ions[0].formula,
      name: ionByKey(species.ions[0].key)?.name,
      charge: species.ions[0].charge,
      component: balancingComponent(sum, formula),
    };
  });
  return {
    excessEqPerKg: sum,
    balanced: false,
    percent,
    message: `The ions do not balance: ${Math.abs(sum).toPrecision(3)} mol/kg of excess ${sign} charge (${percent.toPrecision(2)} % of all charge). A real solution is neutral, so these activities describe no solution that exists; add the counter-ion, or check the formulas.`,
    offers,
  };
}
