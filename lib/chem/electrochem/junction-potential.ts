/**
 * Liquid junction potential by the Henderson equation (Henderson 1907; Bard & Faulkner,
 * Electrochemical Methods, 2nd ed. 2001, eq. 2.3.39), with ionic mobilities taken from the
 * limiting ionic conductivities (uᵢ ∝ λᵢ°, per unit charge) and concentrations for
 * activities:
 *
 *   Ej = φ(β) − φ(α)
 *      = (RT/F) · Σ (|zᵢ|uᵢ/zᵢ)(cᵢ(β) − cᵢ(α)) / Σ |zᵢ|uᵢ (cᵢ(β) − cᵢ(α))
 *             · ln( Σ |zᵢ|uᵢ cᵢ(α) / Σ |zᵢ|uᵢ cᵢ(β) )
 *
 * Here α is the reference electrode's filling solution and β the cell electrolyte, so a
 * potential measured against that electrode contains +Ej: E(corrected) = E(measured) − Ej.
 * When both sides hold the same ions in the same proportions (a "type 1" junction) the
 * ratio in front is 0/0; its limit is the transference form (t₊ − t₋)(RT/F) ln(c(α)/c(β)).
 *
 * Uncertainty (common practice, no single source): Henderson assumes a linear mixing
 * region and uses concentrations with infinite-dilution mobilities; it agrees with measured
 * junctions to about a millivolt for 0.1 mol/L 1:1 pairs and drifts by several millivolts
 * for concentrated bridges. The estimate below is max(0.5 mV, 10 % of |Ej|), widened to
 * max(2 mV, 30 %) when a side exceeds 0.1 mol/L ionic strength.
 */
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from "../constants";
import { ChemInputError } from "../errors";
import { finiteResult } from "../finite-result";
import type { IonConcentration } from "./electrolyte-conductivity";
import { ionCharge, limitingIonicConductivity } from "./ionic-conductivity";

export interface JunctionPotentialInput {
  /** Side α: the reference electrode's filling (or bridge) solution. */
  fillingSolution: IonConcentration[];
  /** Side β: the cell electrolyte. */
  cellElectrolyte: IonConcentration[];
  temperatureC?: number;
}

export interface JunctionPotentialResult {
  /** φ(cell electrolyte) − φ(filling solution), V. */
  junctionPotentialV: number;
  uncertaintyV: number;
  /** Words for the cell block: what the number is and how far to trust it. */
  uncertaintyNote: string;
  method: string;
  notes: string[];
}

interface Side {
  byKey: Map<string, { formula: string; charge: number; c: number }>;
  ionicStrength: number;
}

function readSide(ions: IonConcentration[], field: string): Side {
  if (!Array.isArray(ions) || ions.length === 0)
    throw new ChemInputError("Each side of the junction needs at least one ion.", {
      field,
      code: "no_ions",
    });
  const byKey = new Map<string, { formula: string; charge: number; c: number }>();
  let ionicStrength = 0;
  ions.forEach((ion, k) => {
    const c = ion.concentrationMolPerL;
    if (typeof c !== "number" || !Number.isFinite(c) || c < 0)
      throw new ChemInputError(`The concentration of ${ion.formula} must be a number ≥ 0 mol/L.`, {
        field: `${field}[${k}].concentrationMolPerL`,
        code: "bad_concentration",
      });
    const { key, charge, formula } = ionCharge(ion.formula, `${field}[${k}].formula`);
    const previous = byKey.get(key);
    byKey.set(key, { formula, charge, c: (previous?.c ?? 0) + c });
    ionicStrength += 0.5 * c * charge * charge;
  });
  return { byKey, ionicStrength };
}

export function liquidJunctionPotential(input: JunctionPotentialInput): JunctionPotentialResult {
  const temperatureC = input.temperatureC ?? 25;
  const alpha = readSide(input.fillingSolution, "fillingSolution");
  const beta = readSide(input.cellElectrolyte, "cellElectrolyte");
  const notes: string[] = [];
  const keys = new Set([...alpha.byKey.keys(), ...beta.byKey.keys()]);
  let numerator = 0;
  let denominator = 0;
  let sumAlpha = 0;
  let sumBeta = 0;
  // The same sums without the concentration difference, for the type-1 limit.
  let signedMobility = 0;
  let totalMobility = 0;
  for (const key of keys) {
    const a = alpha.byKey.get(key);
    const b = beta.byKey.get(key);
    const { formula, charge } = (a ?? b)!;
    const lambda = limitingIonicConductivity(formula, temperatureC);
    for (const n of lambda.notes) if (!notes.includes(n)) notes.push(n);
    // λ° per unit charge is F·uᵢ, so the mobility uᵢ is proportional to it.
    const u = lambda.lambdaSCm2PerMolPerCharge;
    const ca = a?.c ?? 0;
    const cb = b?.c ?? 0;
    const absZ = Math.abs(charge);
    numerator += ((absZ * u) / charge) * (cb - ca);
    denominator += absZ * u * (cb - ca);
    sumAlpha += absZ * u * ca;
    sumBeta += absZ * u * cb;
    signedMobility += ((absZ * u) / charge) * (ca + cb);
    totalMobility += absZ * u * (ca + cb);
  }
  if (!(sumAlpha > 0) || !(sumBeta > 0))
    throw new ChemInputError(
      "Both sides of the junction need ions at a concentration above zero.",
      {
        field: "cellElectrolyte",
        code: "empty_side",
      },
    );
  const rtf = (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / FARADAY_C_PER_MOL;
  const logRatio = Math.log(sumAlpha / sumBeta);
  const ratio =
    Math.abs(denominator) > 1e-12 * (sumAlpha + sumBeta)
      ? numerator / denominator
      : signedMobility / totalMobility;
  const junctionPotentialV = rtf * ratio * logRatio;

  const concentrated = alpha.ionicStrength > 0.1 || beta.ionicStrength > 0.1;
  const uncertaintyV = concentrated
    ? Math.max(2e-3, 0.3 * Math.abs(junctionPotentialV))
    : Math.max(5e-4, 0.1 * Math.abs(junctionPotentialV));
  const mv = (v: number) => `${(v * 1000).toFixed(1)} mV`;
  const uncertaintyNote = concentrated
    ? `Henderson estimate ${mv(junctionPotentialV)} ± ${mv(uncertaintyV)}: with a concentrated side it uses concentrations for activities and may be off by several millivolts.`
    : `Henderson estimate ${mv(junctionPotentialV)} ± ${mv(uncertaintyV)}: about a millivolt for dilute 1:1 pairs.`;
  return {
    junctionPotentialV,
    uncertaintyV,
    uncertaintyNote,
    method: "Henderson equation (Bard & Faulkner 2001, eq. 2.3.39), λ° from the CRC Handbook",
    notes,
  };
}

/** A potential measured against a reference electrode, with the junction's contribution removed. */
export function junctionCorrectedPotential(
  measuredPotentialV: number,
  junctionPotentialV: number,
): number {
  for (const [value, field] of [
    [measuredPotentialV, "measuredPotentialV"],
    [junctionPotentialV, "junctionPotentialV"],
  ] as const)
    if (typeof value !== "number" || !Number.isFinite(value))
      throw new ChemInputError("Potentials must be numbers in volts.", {
        field,
        code: "bad_potential",
      });
  return finiteResult(
    measuredPotentialV - junctionPotentialV,
    "measuredPotentialV",
    "The corrected potential",
  );
}
