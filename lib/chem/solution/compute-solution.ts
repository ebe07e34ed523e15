/**
 * computeSolution: species → amounts → ions → ionic strength and screening → activity model
 * (with ion association for free-ion models) → ion and mean-salt activities, osmotic
 * coefficient, sanity and range checks, charge balance, warnings, hazards.
 */
import { amountsWithDensity } from "../density/solution-density";
import { componentField } from "../component-field";
import { debyeHuckelConstantsFrom } from "../debye-huckel-constants";
import { chooseModel } from "../models/auto";
import { getModel } from "../models/registry";
import type { ActivityModelInput, ModelIon } from "../models/types";
import { ionByKey } from "../species/ion-index";
import { resolveSpecies } from "../species/resolve";
import { solventState } from "../solvents/properties";
import { chargeBalanceOf } from "./charge-balance";
import { evaluateModel } from "./evaluate-model";
import { solutionHazards } from "./hazards";
import { meanSaltResults } from "./mean-salt";
import { osmoticCoefficientByGibbsDuhem, waterActivityFromOsmotic } from "./osmotic";
import { sanityMessages } from "./sanity";
import { ionPairingMessage, ionicStrength, kappaPerNm } from "./screening";
import { solutionIons } from "./solution-ions";
import { speciationResult } from "./speciation-result";
import type { IonResult, SolutionInput, SolutionResult } from "./types";
import { validateSolutionInput } from "./validate";
import { solutionWarnings } from "./warnings";

export function computeSolution(input: SolutionInput): SolutionResult {
  const { temperatureC, solventId, requested, density } = validateSolutionInput(input);
  const state = solventState(solventId, temperatureC);
  const species = input.components.map((c, i) =>
    resolveSpecies(c.formula, componentField(i, "formula")),
  );
  const { amounts, density: densityUsed } = amountsWithDensity(
    input.components,
    species,
    density,
    { id: state.solvent.id, densityGPerMl: state.densityGPerMl },
    temperatureC,
  );
  const V = amounts.litresPerKgSolvent;
  const { ions, neutralMolality } = solutionIons(species, amounts.components, V);
  const I = ionicStrength(ions);
  const balance = chargeBalanceOf(ions);
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
  const choice =
    requested === "auto"
      ? chooseModel({
          ions: modelIons,
          ionicStrengthMolal: I.molal,
          temperatureC,
          solvent: state.solvent.id,
          chargeBalanced: balance.balanced,
        })
      : null;
  const model = getModel(choice ? choice.id : requested);
  const modelInput: ActivityModelInput = {
    ions: modelIons,
    ionicStrengthMolal: I.molal,
    temperatureC,
    solvent: state.solvent.id,
    constants,
    options: input.modelOptions,
  };
  const evaluation = evaluateModel(model, modelInput, input.ionAssociation !== false);
  const output = evaluation.output;
  const freeIndex = evaluation.speciation;

  const ionResults: IonResult[] = ions.map((ion, i) => {
    const lnGamma = evaluation.lnGamma[i];
    const gamma = Math.exp(lnGamma);
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
      ...(freeIndex
        ? {
            freeMolality: freeIndex.freeMolality[i],
            freeGamma: Math.exp(freeIndex.freeLnGamma[i]),
          }
        : {}),
    };
  });
  const lnGammaByFormula = new Map(ionResults.map((r) => [r.formula, r.lnGamma]));
  const salts = meanSaltResults(
    species,
    amounts.components,
    (formula) => lnGammaByFormula.get(formula) ?? 0,
  );

  const ionMolality = ions.reduce((sum, ion) => sum + ion.molality, 0);
  const totalMolality = neutralMolality + ionMolality;
  // A model's φ covers its ions; neutral solutes (γ = 1) dilute the deviation from ideality.
  const phi =
    evaluation.osmoticCoefficient === undefined
      ? osmoticCoefficientByGibbsDuhem(model, modelInput, output.lnGamma, neutralMolality)
      : totalMolality > 0
        ? 1 + (ionMolality / totalMolality) * (evaluation.osmoticCoefficient - 1)
        : 1;
  // From the combined φ, so neutral solutes count; a model's own a_w counts its ions only.
  const aw =
    state.solvent.id === "water" ? waterActivityFromOsmotic(phi, totalMolality) : undefined;

  const messages = [
    ...(choice?.change ? [choice.change] : []),
    ...(balance.message ? [balance.message] : []),
    ...output.validityMessages,
    ...ionPairingMessage(state.relativePermittivity, temperatureC, I.molar),
    ...sanityMessages({
      modelLabel: model.label,
      lnGamma: evaluation.lnGamma,
      ionFormulas: ions.map((i) => i.formula),
      osmoticCoefficient: phi,
      waterActivity: aw,
    }),
  ];
  const { warnings, notes } = solutionWarnings(species, state, amounts.warnings, output.notes);
  if (balance.message) warnings.push(balance.message);
  if (densityUsed.note) warnings.push(densityUsed.note);
  const speciation = freeIndex ? speciationResult(ions, V, freeIndex) : undefined;
  if (speciation) notes.push(speciation.note);

  return {
    temperatureC,
    solvent: {
      id: state.solvent.id,
      name: state.solvent.name,
      relativePermittivity: state.relativePermittivity,
      densityGPerMl: state.densityGPerMl,
    },
    ionicStrength: I,
    density: densityUsed,
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
    chargeBalance: {
      balanced: balance.balanced,
      excessEqPerKg: balance.excessEqPerKg,
      offers: balance.offers,
    },
    constants,
    model: {
      requested,
      used: model.id,
      label: model.label,
      reason: choice ? choice.reason : `${model.label} was requested`,
    },
    ...(choice?.change ? { modelChange: choice.change } : {}),
    ...(speciation ? { speciation } : {}),
    formulaTex: model.substitutedTex ? model.substitutedTex(modelInput) : model.formulaTex,
    formulaTexGeneral: model.formulaTex,
    validity: { ok: messages.length === 0, messages },
    warnings,
    notes,
    hazards: solutionHazards(species, state.solvent.id),
  };
}
