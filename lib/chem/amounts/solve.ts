/**
 * Turns each component's stated amount into molality (mol/kg of solvent) and molarity
 * (mol/L of solution).
 *
 * Every amount becomes one of: a molality m, a molarity c, or a mass fraction w. The
 * solution is then built on 1 kg of solvent: total mass T (kg) and volume V (L) satisfy
 *   T = 1 + Σ_molal m M + Σ_molar c V M + Σ_frac w T (M_anhydrous / M_weighed),
 *   V = T / ρ  (solution density given)   or   V = 1 kg / ρ_solvent (dilute approximation),
 * which is linear in T. Masses M are anhydrous: water of crystallisation is solvent.
 * A weighed hydrate "per mass of solvent" adds its water to that solvent; components that
 * name the same mass of solvent share it (they were weighed into the same water).
 */
import { ChemInputError } from "../errors";
import type { ResolvedSpecies } from "../species/resolve";
import { componentField } from "../component-field";
import { readUnit } from "./units";
import { WATER_MOLAR_MASS_KG_PER_MOL } from "../constants";

export interface AmountInput {
  amount: number;
  unit: string;
  per?: { amount: number; unit: string };
}

export interface ComponentAmount {
  molality: number;
  molarity: number;
}

export interface SolvedAmounts {
  components: ComponentAmount[];
  /** Litres of solution per kg of solvent. */
  litresPerKgSolvent: number;
  /** Total solution mass per kg of solvent, kg. */
  kgSolutionPerKgSolvent: number;
  warnings: string[];
}

type Spec =
  { type: "molal"; m: number } | { type: "molar"; c: number } | { type: "fraction"; w: number };

function finiteNonNegative(value: unknown, field: string, what: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new ChemInputError(
      `The ${what} must be a number (got ${typeof value === "string" ? JSON.stringify(value) : String(value)}).`,
      { field, code: "bad_amount" },
    );
  }
  if (value < 0)
    throw new ChemInputError(`The ${what} cannot be negative (got ${value}).`, {
      field,
      code: "negative_amount",
    });
  return value;
}

function specsOf(inputs: readonly AmountInput[], species: readonly ResolvedSpecies[]): Spec[] {
  const solventGroups = new Map<number, { kg: number; hydrateKg: number }>();
  const pending: { index: number; mol: number; group: number }[] = [];
  const specs: (Spec | null)[] = inputs.map((input, i) => {
    const amount = finiteNonNegative(input.amount, componentField(i, "amount"), "amount");
    const unit = readUnit(input.unit, componentField(i, "unit"));
    const molarMass = species[i].molarMassGPerMol;
    if (unit.kind === "mass" || unit.kind === "volume") {
      if (unit.kind === "volume")
        throw new ChemInputError(
          `A volume (${input.unit}) is not an amount of ${species[i].formula}; give its mass or a concentration.`,
          { field: componentField(i, "unit"), code: "bad_unit" },
        );
      if (!input.per)
        throw new ChemInputError(
          `A mass of ${species[i].formula} needs the mass of solvent it was dissolved in or the final volume of solution ("per").`,
          { field: componentField(i, "per"), code: "missing_per" },
        );
      const perAmount = finiteNonNegative(
        input.per.amount,
        componentField(i, "per.amount"),
        "solvent mass or volume",
      );
      if (perAmount === 0)
        throw new ChemInputError("The mass of solvent or final volume must be greater than zero.", {
          field: componentField(i, "per.amount"),
          code: "zero_per",
        });
      const per = readUnit(input.per.unit, componentField(i, "per.unit"));
      const mol = (amount * unit.factor) / molarMass;
      if (per.kind === "volume") return { type: "molar", c: mol / (perAmount * per.factor) };
      if (per.kind === "mass") {
        const kg = (perAmount * per.factor) / 1000;
        const group = kg;
        const g = solventGroups.get(group) ?? { kg, hydrateKg: 0 };
        g.hydrateKg += mol * species[i].hydrateWater * WATER_MOLAR_MASS_KG_PER_MOL;
        solventGroups.set(group, g);
        pending.push({ index: i, mol, group });
        return null;
      }
      throw new ChemInputError(
        `"per" must be a mass of solvent (g, kg) or a final volume of solution (mL, L), not ${input.per.unit}.`,
        { field: componentField(i, "per.unit"), code: "bad_unit" },
      );
    }
    if (input.per)
      throw new ChemInputError(`"per" applies to a weighed mass only, not to ${input.unit}.`, {
        field: componentField(i, "per"),
        code: "unexpected_per",
      });
    if (unit.kind === "molal") return { type: "molal", m: amount * unit.factor };
    if (unit.kind === "molar") return { type: "molar", c: amount * unit.factor };
    if (unit.kind === "mass-concentration")
      return { type: "molar", c: (amount * unit.factor) / molarMass };
    const w = amount * unit.factor;
    if (w >= 1)
      throw new ChemInputError(
        `A mass fraction must be below 1 (100 %); got ${amount} ${input.unit}.`,
        { field: componentField(i, "amount"), code: "bad_amount" },
      );
    return { type: "fraction", w };
  });
  for (const p of pending) {
    const g = solventGroups.get(p.group)!;
    specs[p.index] = { type: "molal", m: p.mol / (g.kg + g.hydrateKg) };
  }
  return specs as Spec[];
}

export function solveAmounts(
  inputs: readonly AmountInput[],
  species: readonly ResolvedSpecies[],
  solutionDensityGPerMl: number | undefined,
  solventDensityGPerMl: number,
): SolvedAmounts {
  const specs = specsOf(inputs, species);
  const warnings: string[] = [];
  // T = (1 + S + αC) / (1 − βC − F), V = α + βT
  let S = 0;
  let C = 0;
  let F = 0;
  specs.forEach((spec, i) => {
    const mAnhydrousKg = species[i].anhydrousMolarMassGPerMol / 1000;
    if (spec.type === "molal") S += spec.m * mAnhydrousKg;
    else if (spec.type === "molar") C += spec.c * mAnhydrousKg;
    else F += (spec.w * species[i].anhydrousMolarMassGPerMol) / species[i].molarMassGPerMol;
  });
  const alpha = solutionDensityGPerMl === undefined ? 1 / solventDensityGPerMl : 0;
  const beta = solutionDensityGPerMl === undefined ? 0 : 1 / solutionDensityGPerMl;
  const denominator = 1 - beta * C - F;
  if (!(denominator > 0)) {
    throw new ChemInputError(
      "The stated amounts add up to more solute than the solution can hold (check the units and the density).",
      { field: "components", code: "impossible_amounts" },
    );
  }
  const T = (1 + S + alpha * C) / denominator;
  const V = alpha + beta * T;
  const anyAmount = specs.some(
    (s) => (s.type === "molal" ? s.m : s.type === "molar" ? s.c : s.w) > 0,
  );
  if (solutionDensityGPerMl === undefined && anyAmount) {
    warnings.push(
      `No solution density given: molar ↔ molal conversion uses the solvent density (${solventDensityGPerMl.toFixed(5)} g/mL), an approximation for dilute solutions.`,
    );
  }
  const components = specs.map((spec, i) => {
    const molality =
      spec.type === "molal"
        ? spec.m
        : spec.type === "molar"
          ? spec.c * V
          : (spec.w * T) / (species[i].molarMassGPerMol / 1000);
    return { molality, molarity: molality / V };
  });
  return { components, litresPerKgSolvent: V, kgSolutionPerKgSolvent: T, warnings };
}
