/**
 * Osmotic coefficient consistent with any activity model, by the Gibbs–Duhem relation
 * integrated along the dilution path m_i(t) = t m_i (t from 0 to 1):
 *   Σm (φ − 1) = Σ m_i ln γ_i(1) − Σ m_i ∫₀¹ ln γ_i(t) dt
 * The integral is taken with t = u² (ln γ goes as √t at infinite dilution) and 8-point
 * Gauss–Legendre quadrature. Water activity: ln a_w = −φ M_w Σm (M_w in kg/mol).
 */
import { WATER_MOLAR_MASS_KG_PER_MOL } from "../constants";
import { GL_NODES as NODES, GL_WEIGHTS as WEIGHTS } from "../models/dh-common";
import type { ActivityModel, ActivityModelInput } from "../models/types";

export function osmoticCoefficientByGibbsDuhem(
  model: ActivityModel,
  input: ActivityModelInput,
  lnGamma: readonly number[],
  neutralMolality: number,
): number {
  let totalMolality = neutralMolality;
  let endTerm = 0;
  for (let i = 0; i < input.ions.length; i++) {
    totalMolality += input.ions[i].molality;
    endTerm += input.ions[i].molality * lnGamma[i];
  }
  if (totalMolality === 0) return 1;
  let integral = 0;
  for (let k = 0; k < NODES.length; k++) {
    const u = NODES[k];
    const t = u * u;
    const scaled = model.compute({
      ...input,
      ions: input.ions.map((ion) => ({ ...ion, molality: ion.molality * t })),
      ionicStrengthMolal: input.ionicStrengthMolal * t,
    }).lnGamma;
    let sum = 0;
    for (let i = 0; i < input.ions.length; i++) sum += input.ions[i].molality * scaled[i];
    integral += WEIGHTS[k] * sum * 2 * u;
  }
  return 1 + (endTerm - integral) / totalMolality;
}

export function waterActivityFromOsmotic(
  osmoticCoefficient: number,
  totalMolality: number,
): number {
  return Math.exp(-osmoticCoefficient * WATER_MOLAR_MASS_KG_PER_MOL * totalMolality);
}
