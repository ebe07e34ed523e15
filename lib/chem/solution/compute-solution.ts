/**
 * computeSolution: species → amounts → ions → ionic strength and screening → activity
 * model → ion and mean-salt activities, osmotic coefficient, validity, warnings, hazards.
 */
import { solveAmounts } from "../amounts/solve";
import { componentField } from "../component-field";
import { debyeHuckelConstantsFrom } from "../debye-huckel-constants";
import { ChemInputError } from "../errors";
import { chooseModel } from "../models/auto";
import { getModel } from "../models/registry";
import type { ActivityModelInput, ModelIon } from "../models/types";
import { ionByKey } from "../species/ion-index";
import { resolveSpecies } from "../species/resolve";
import { solventState } from "../solvents/properties";
import { solutionHazards } from "./hazards";
import { meanSaltResults } from "./mean-salt";
import { osmoticCoefficientByGibbsDuhem, waterActivityFromOsmotic } from "./osmotic";
import {
  chargeBalance,
  ionPairingMessage,
  ionicStrength,
  kappaPerNm,
  type IonAmount,
} from "./screening";
import type { IonResult, SolutionInput, SolutionResult } from "./types";
import { validateSolutionInput } from "./validate";

export function computeSolution(input: SolutionInput): SolutionResult {
  const { temperatureC, solventId, requested, density } = validateSolutionInput(input);
  const state = solventState(solventId, temperatureC);
  const species = input.components.map((c, i) =>
    resolveSpecies(c.formula, componentField(i, "formula")),
  );
  const amounts = solveAmounts(input.components, species, density, state.densityGPerMl);
  const V = amounts.litresPerKgSolvent;

  // Ions, merged over components, in order of first appearance.
  const byFormula = new Map<string, IonAmount & { key: string; lnGamma?: number }>();
  let neutralMolality = 0;
  species.forEach((s, i) => {
    const m = amounts.components[i].molality;
    if (s.ions.length === 0) neutralMolality += m;
    for (const ion of s.ions) {
      const entry = byFormula.get(ion.formula) ?? {
        formula: ion.formula,
        charge: ion.charge,
        molality: 0,
        molarity: 0,
        key: ion.key,
      };
      entry.molality += m * ion.count;
      entry.molarity = entry.molality / V;
      byFormula.set(ion.formula, entry);
    }
  });
  const ions = [...byFormula.values()];
  const I = ionicStrength(ions);
  const balance = chargeBalance(ions);
  const kappa = kappaPerNm(I.molar, state.relativePermittivity, temperatureC);

  const constants = debyeHuckelConstantsFrom(
    state.relativePermittivity,
    state.densityGPerMl,
    temperatureC,
  );
  const modelIons: ModelIon[] = ions.map(({ formula, charge, molality }) => ({
    formula,
    charge,
    molality,
  }));
  const context = {
    ions: modelIons,
    ionicStrengthMolal: I.molal,
    temperatureC,
    solvent: state.solvent.id,
  };
  const choice = requested === "auto" ? chooseModel(context) : null;
  const model = getModel(choice ? choice.id : requested);
  const modelInput: ActivityModelInput = {
    ions: modelIons,
    ionicStrengthMolal: I.molal,
    temperatureC,
    solvent: state.solvent.id,
    constants,
    options: input.modelOptions,
  };
  const output = model.compute(modelInput);

  const ionResults: IonResult[] = ions.map((ion, i) => {
    const lnGamma = output.lnGamma[i];
    if (!Number.isFinite(lnGamma)) {
      throw new ChemInputError(
        `The ${model.label} model gives no finite activity coefficient for ${ion.formula} in this solution.`,
        { field: "model", code: "model_failed" },
      );
    }
    const gamma = Math.exp(lnGamma);
    ion.lnGamma = lnGamma;
    return {
      formula: ion.formula,
      name: ionByKey(ion.key)?.name,
      charge: ion.charge,
      molality: ion.molality,
      molarity: ion.molarity,
      gamma,
      activity: gamma * ion.molality,
      lnGamma,
      log10Gamma: lnGamma / Math.LN10,
    };
  });
  const salts = meanSaltResults(
    species,
    amounts.components,
    (formula) => byFormula.get(formula)?.lnGamma ?? 0,
  );

  const totalMolality = neutralMolality + ions.reduce((sum, ion) => sum + ion.molality, 0);
  // A model's φ covers its ions; neutral solutes (γ = 1) dilute the deviation from ideality.
  const ionMolality = totalMolality - neutralMolality;
  const phi =
    output.osmoticCoefficient === undefined
      ? osmoticCoefficientByGibbsDuhem(model, modelInput, output.lnGamma, neutralMolality)
      : totalMolality > 0
        ? 1 + (ionMolality / totalMolality) * (output.osmoticCoefficient - 1)
        : 1;
  // From the combined φ, so neutral solutes count; a model's own a_w counts its ions only.
  const aw =
    state.solvent.id === "water" ? waterActivityFromOsmotic(phi, totalMolality) : undefined;

  const messages = [
    ...output.validityMessages,
    ...ionPairingMessage(state.relativePermittivity, temperatureC, I.molar),
  ];
  if (choice && !choice.covered)
    messages.unshift(`No model covers this composition: ${choice.reason}.`);
  const warnings: string[] = [];
  const notes: string[] = [];
  for (const s of species) {
    for (const w of s.warnings) warnings.push(w);
    for (const n of s.notes) if (!notes.includes(n)) notes.push(n);
  }
  for (const n of output.notes) if (!notes.includes(n)) notes.push(n);
  warnings.push(...amounts.warnings, ...state.notes);
  if (balance.warning) warnings.push(balance.warning);
  if (state.solvent.id !== "water") {
    const hydrates = species.filter((s) => s.hydrateWater > 0).map((s) => s.formula);
    if (hydrates.length)
      warnings.push(
        `The water of crystallisation of ${hydrates.join(", ")} is counted as solvent mass, but it is water in ${state.solvent.name}: the solvent is no longer pure.`,
      );
  }

  return {
    temperatureC,
    solvent: {
      id: state.solvent.id,
      name: state.solvent.name,
      relativePermittivity: state.relativePermittivity,
      densityGPerMl: state.densityGPerMl,
    },
    ionicStrength: I,
    debyeLengthNm: kappa > 0 ? 1 / kappa : null,
    kappaPerNm: kappa,
    ions: ionResults,
    salts,
    components: species.map((s, i) => ({
      formula: s.formula,
      name: s.name,
      kind: s.kind,
      molarMassGPerMol: s.molarMassGPerMol,
      hydrateWater: s.hydrateWater,
      molality: amounts.components[i].molality,
      molarity: amounts.components[i].molarity,
      ions: s.ions.map((ion) => ({ formula: ion.formula, count: ion.count })),
    })),
    ...(Number.isFinite(phi) ? { osmoticCoefficient: phi } : {}),
    ...(aw !== undefined && Number.isFinite(aw) ? { waterActivity: aw } : {}),
    chargeExcessEqPerKg: balance.excessEqPerKg,
    constants,
    model: {
      requested,
      used: model.id,
      label: model.label,
      reason: choice ? choice.reason : `${model.label} was requested`,
    },
    formulaTex: model.substitutedTex ? model.substitutedTex(modelInput) : model.formulaTex,
    formulaTexGeneral: model.formulaTex,
    validity: { ok: messages.length === 0, messages },
    warnings,
    notes,
    hazards: solutionHazards(species, state.solvent.id),
  };
}
