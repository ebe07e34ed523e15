/**
 * Conductivity κ of an electrolyte from its ions, with the concentration correction of the
 * extended Debye–Hückel–Onsager equation in the form of Robinson & Stokes (Electrolyte
 * Solutions, 2nd ed. 1959, ch. 7; attribution from memory):
 *   Λ = Λ° − (A + B Λ°) √c / (1 + κa)
 *   A = 82.04 / (η (εr T)^½)   (electrophoretic; η in poise)
 *   B = 8.204×10⁵ / (εr T)^{3/2}   (relaxation)
 * which at 25 °C gives A ≈ 60.2 S cm² mol⁻¹ (mol/L)^−½ and B ≈ 0.229 (mol/L)^−½. κa is the
 * Debye parameter times the ion size (mean Kielland 1937 size of the ions present).
 * Each ion carries its share: λᵢ = λᵢ° − (A/2 + B λᵢ°) √I / (1 + κa), and
 *   κ = Σ |zᵢ| cᵢ λᵢ.
 * Range: 1:1 electrolytes up to about 0.1 mol/L (checked against the NIST KCl conductivity
 * standards at 0.01 and 0.1 mol/kg); for other charge types, mixtures and higher
 * concentrations the result is an estimate and `validity` says so.
 */
import { kelvin } from "../constants";
import { KIELLAND_ION_SIZE_ANGSTROM } from "../data/ion-size-kielland";
import { debyeHuckelConstants } from "../debye-huckel-constants";
import { ChemInputError } from "../errors";
import { waterDensityGPerMl, waterRelativePermittivity } from "../solvents/water";
import { waterViscosityMPaS } from "../solvents/water-viscosity";
import { ionCharge, limitingIonicConductivity } from "./ionic-conductivity";

export interface IonConcentration {
  formula: string;
  concentrationMolPerL: number;
}

export interface ElectrolyteConductivityInput {
  ions: IonConcentration[];
  temperatureC?: number;
}

export interface ElectrolyteConductivityResult {
  conductivitySPerM: number;
  conductivityMSPerCm: number;
  /** Without the concentration correction (Kohlrausch's independent migration only). */
  limitingConductivitySPerM: number;
  ionicStrengthMolPerL: number;
  onsagerA: number;
  onsagerB: number;
  ionSizeAngstrom: number;
  perIon: {
    ion: string;
    charge: number;
    lambdaSCm2PerMolPerCharge: number;
    lambdaAtConcentration: number;
  }[];
  validity: { inRange: boolean; messages: string[] };
  notes: string[];
  method: string;
}

export const CONDUCTIVITY_METHOD =
  "Extended Debye–Hückel–Onsager equation (Robinson & Stokes 1959), λ° from the CRC Handbook";

/** Onsager coefficients A (S cm² mol⁻¹ (mol/L)^−½) and B ((mol/L)^−½) for water at t. */
export function onsagerCoefficients(temperatureC: number): { a: number; b: number } {
  const epsT = waterRelativePermittivity(temperatureC) * kelvin(temperatureC);
  const viscosityPoise = waterViscosityMPaS(temperatureC) / 100;
  return { a: 82.04 / (viscosityPoise * Math.sqrt(epsT)), b: 8.204e5 / epsT ** 1.5 };
}

export function electrolyteConductivity(
  input: ElectrolyteConductivityInput,
): ElectrolyteConductivityResult {
  const temperatureC = input.temperatureC ?? 25;
  if (!Array.isArray(input.ions) || input.ions.length === 0)
    throw new ChemInputError("Give at least one ion with its concentration.", {
      field: "ions",
      code: "no_ions",
    });
  const ions = input.ions.map((entry, k) => {
    const c = entry.concentrationMolPerL;
    if (typeof c !== "number" || !Number.isFinite(c) || c < 0)
      throw new ChemInputError(
        `The concentration of ${entry.formula} must be a number ≥ 0 mol/L.`,
        {
          field: `ions[${k}].concentrationMolPerL`,
          code: "bad_concentration",
        },
      );
    ionCharge(entry.formula, `ions[${k}].formula`);
    return { ...limitingIonicConductivity(entry.formula, temperatureC), concentration: c };
  });
  const notes = [...new Set(ions.flatMap((i) => i.notes))];
  const messages: string[] = [];
  const ionicStrength = 0.5 * ions.reduce((s, i) => s + i.concentration * i.charge ** 2, 0);
  const { a, b } = onsagerCoefficients(temperatureC);

  // Mean Kielland size, weighted by concentration; 4 Å for ions Kielland did not list.
  let sizeWeight = 0;
  let sizeSum = 0;
  for (const i of ions) {
    const size = KIELLAND_ION_SIZE_ANGSTROM[i.ion];
    if (size === undefined) notes.push(`No Kielland size for ${i.ion}: 4 Å assumed.`);
    sizeSum += (size ?? 4) * i.concentration;
    sizeWeight += i.concentration;
  }
  const ionSizeAngstrom = sizeWeight > 0 ? sizeSum / sizeWeight : 4;
  // Debye–Hückel B is on the molal scale; in dilute water m ≈ c/ρ.
  const kappaA =
    debyeHuckelConstants(temperatureC).bPerAngstrom *
    ionSizeAngstrom *
    Math.sqrt(ionicStrength / waterDensityGPerMl(temperatureC));
  const sqrtI = Math.sqrt(ionicStrength);

  let kappa = 0;
  let kappaLimiting = 0;
  const perIon = ions.map((i) => {
    const lambda =
      i.lambdaSCm2PerMolPerCharge -
      ((a / 2 + b * i.lambdaSCm2PerMolPerCharge) * sqrtI) / (1 + kappaA);
    kappa += Math.abs(i.charge) * i.concentration * lambda;
    kappaLimiting += Math.abs(i.charge) * i.concentration * i.lambdaSCm2PerMolPerCharge;
    return {
      ion: i.ion,
      charge: i.charge,
      lambdaSCm2PerMolPerCharge: i.lambdaSCm2PerMolPerCharge,
      lambdaAtConcentration: lambda,
    };
  });

  const charge = ions.reduce((s, i) => s + i.charge * i.concentration, 0);
  const totalCharge = ions.reduce((s, i) => s + Math.abs(i.charge) * i.concentration, 0);
  if (totalCharge > 0 && Math.abs(charge) > 1e-6 * totalCharge)
    messages.push("The ions given are not electrically neutral; check the concentrations.");
  if (ionicStrength > 0.1)
    messages.push(
      `Ionic strength ${ionicStrength.toPrecision(3)} mol/L is above 0.1 mol/L, the range of this correction: the value is an estimate (it reads low).`,
    );
  if (ions.some((i) => Math.abs(i.charge) > 1))
    messages.push(
      "The correction is written for 1:1 electrolytes; with multivalent ions the value is an estimate.",
    );

  // λ in S cm² mol⁻¹ and c in mol/L give κ in S/cm after dividing by 1000; ×100 for S/m.
  const conductivitySPerM = (kappa / 1000) * 100;
  return {
    conductivitySPerM,
    conductivityMSPerCm: conductivitySPerM * 10,
    limitingConductivitySPerM: (kappaLimiting / 1000) * 100,
    ionicStrengthMolPerL: ionicStrength,
    onsagerA: a,
    onsagerB: b,
    ionSizeAngstrom,
    perIon,
    validity: { inRange: messages.length === 0, messages },
    notes,
    method: CONDUCTIVITY_METHOD,
  };
}
