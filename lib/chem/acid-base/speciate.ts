/**
 * Reverse mode: given what was weighed (or pipetted) into a volume or a mass of water, the pH,
 * ionic strength and species distribution at equilibrium, with activity corrections iterated
 * to self-consistency (equilibrium.ts).
 */
import { ChemInputError } from "../errors";
import { molarMass } from "../formula";
import { describeConvention } from "./activity";
import { cautionsFor } from "./cautions";
import { type Conditions, conditionsAt, ionicStrengthWarning } from "./conditions";
import { acidSystem, type BufferSystemId } from "./data/pka-goldberg-2002";
import { type IonAmount, type SystemAtT, solveEquilibrium } from "./equilibrium";
import { requireReagent } from "./reagent-lookup";
import type { SpeciateComponent, SpeciateInput, SpeciateResult, SpeciesResult } from "./types";

function positive(value: number | undefined, field: string, what: string): number {
  if (!(typeof value === "number" && Number.isFinite(value) && value > 0)) {
    throw new ChemInputError(`${what} must be a positive number.`, {
      field,
      code: "invalid_amount",
    });
  }
  return value;
}

function componentAmountMol(c: SpeciateComponent, i: number): number {
  const field = `components[${i}]`;
  if (c.massG !== undefined)
    return positive(c.massG, `${field}.massG`, `Mass of ${c.formula}`) / molarMass(c.formula);
  if (c.amountMol !== undefined)
    return positive(c.amountMol, `${field}.amountMol`, `Amount of ${c.formula}`);
  if (c.volumeMl !== undefined || c.concentrationMolar !== undefined) {
    const v = positive(c.volumeMl, `${field}.volumeMl`, `Volume of ${c.formula} stock`);
    return (
      (v / 1000) *
      positive(
        c.concentrationMolar,
        `${field}.concentrationMolar`,
        `Concentration of the ${c.formula} stock`,
      )
    );
  }
  throw new ChemInputError(
    `Give a mass (g), an amount (mol) or a stock volume and concentration for ${c.formula}.`,
    {
      field: `${field}.massG`,
      code: "missing_amount",
    },
  );
}

/** Totals per buffer system and the fixed (non-H+/OH−) ions, in mol, from the components. */
function tallyComponents(components: readonly SpeciateComponent[]) {
  const systemMol = new Map<BufferSystemId, number>();
  const ionMol = new Map<string, { charge: number; mol: number }>();
  const hazards: (string | undefined)[] = [];
  const addIon = (formula: string, charge: number, mol: number) => {
    if (formula === "H+" || formula === "OH-") return; // free H+/OH− follow from the charge balance
    const prev = ionMol.get(formula);
    ionMol.set(formula, { charge, mol: (prev?.mol ?? 0) + mol });
  };
  components.forEach((c, i) => {
    const found = requireReagent(c.formula, `components[${i}].formula`);
    const n = componentAmountMol(c, i);
    hazards.push(found.reagent.hazard);
    if (found.kind === "buffer") {
      for (const part of found.reagent.contributes)
        systemMol.set(part.system, (systemMol.get(part.system) ?? 0) + n * part.count);
      for (const ion of found.reagent.counterIons) addIon(ion.formula, ion.charge, n * ion.count);
    } else {
      for (const ion of found.reagent.ions) addIon(ion.formula, ion.charge, n * ion.count);
    }
  });
  return { systemMol, ionMol, hazards };
}

/** kg of water per litre of solution: ρ(water) — the dilute-solution approximation, stated in notes. */
export function solventKgPerLitre(conditions: Conditions): number {
  return conditions.waterDensityGPerMl;
}

export function equilibrate(
  systemMolal: Map<BufferSystemId, number>,
  fixedIons: IonAmount[],
  conditions: Conditions,
  molalToMolar: number,
): Omit<SpeciateResult, "cautions" | "notes" | "warnings"> & { warnings: string[] } {
  const systems: SystemAtT[] = [];
  for (const [id, total] of systemMolal) {
    const data = acidSystem(id)!;
    systems.push({ data, pKa: conditions.pKaOf(data), totalMolal: total });
  }
  const state = solveEquilibrium(systems, fixedIons, conditions.pKw, (i) => conditions.gammaAt(i));
  const log10Gamma = conditions.gammaAt(state.ionicStrengthMolal);
  const systemOf = new Map<string, { id: BufferSystemId; total: number }>();
  for (const s of systems)
    for (const f of s.data.species) systemOf.set(f, { id: s.data.id, total: s.totalMolal });
  const species: SpeciesResult[] = state.species.map((sp) => {
    const gamma = Math.pow(10, log10Gamma(sp.charge));
    const sys = systemOf.get(sp.formula);
    return {
      formula: sp.formula,
      charge: sp.charge,
      molality: sp.molality,
      molarity: sp.molality * molalToMolar,
      gamma,
      activity: gamma * sp.molality,
      ...(sys ? { system: sys.id, fraction: sys.total > 0 ? sp.molality / sys.total : 0 } : {}),
    };
  });
  const warnings: string[] = [...conditions.warnings];
  const w = ionicStrengthWarning(conditions, state.ionicStrengthMolal);
  if (w) warnings.push(w);
  for (const s of systems) {
    if (s.data.id === "borate" && s.totalMolal > 0.025)
      warnings.push(
        "Above about 0.025 mol/kg boron, polyborates form; they are not modelled, so the pH is approximate.",
      );
    if (s.data.id === "carbonate")
      warnings.push(
        "Carbonate buffers exchange CO2 with air: keep them closed; the pH drifts in an open vessel.",
      );
  }
  return {
    pH: state.pH,
    temperatureC: conditions.temperatureC,
    ionicStrength: {
      molal: state.ionicStrengthMolal,
      molar: state.ionicStrengthMolal * molalToMolar,
    },
    species,
    systems: systems.map((s) => ({
      id: s.data.id,
      name: s.data.name,
      totalMolal: s.totalMolal,
      totalMolar: s.totalMolal * molalToMolar,
      pKa: s.pKa,
      pKaSource: s.data.source,
    })),
    pHConvention: describeConvention(conditions.convention),
    warnings,
  };
}

export function speciate(input: SpeciateInput): SpeciateResult {
  const conditions = conditionsAt(input.temperatureC, input.activityConvention);
  if (!Array.isArray(input.components) || input.components.length === 0) {
    throw new ChemInputError("Add at least one component.", {
      field: "components",
      code: "missing_components",
    });
  }
  const notes: string[] = [];
  let kgWater: number;
  let molalToMolar: number;
  if (input.waterMassG !== undefined) {
    kgWater = positive(input.waterMassG, "waterMassG", "Mass of water") / 1000;
    molalToMolar = solventKgPerLitre(conditions);
    notes.push(
      "Molarities are estimated from molalities with the density of water (dilute-solution approximation).",
    );
  } else {
    const litres = positive(input.volumeMl, "volumeMl", "Final volume") / 1000;
    molalToMolar = solventKgPerLitre(conditions);
    kgWater = litres * molalToMolar;
    notes.push(
      "Molalities are estimated from molarities with the density of water (dilute-solution approximation; under 1 % error below about 0.2 mol/L).",
    );
  }
  const { systemMol, ionMol, hazards } = tallyComponents(input.components);
  const systemMolal = new Map([...systemMol].map(([id, mol]) => [id, mol / kgWater]));
  const fixedIons = [...ionMol].map(([formula, v]) => ({
    formula,
    charge: v.charge,
    molality: v.mol / kgWater,
  }));
  const result = equilibrate(systemMolal, fixedIons, conditions, molalToMolar);
  if (!Number.isFinite(result.pH)) {
    throw new ChemInputError("The speciation did not converge for this composition.", {
      field: "components",
      code: "model_failed",
    });
  }
  return { ...result, notes, cautions: cautionsFor(hazards) };
}
