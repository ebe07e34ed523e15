import {
  electrolyteConductivity,
  expectedPeakCurrent,
  findRedoxProbe,
  iRDrop,
  isChemInputError,
  liquidJunctionPotential,
  parseFormula,
  referenceFillingSolution,
  uncompensatedResistanceDisk,
  FARADAY_C_PER_MOL,
  GAS_CONSTANT_J_PER_MOL_K,
} from "@/lib/chem";
import type { IonConcentration } from "@/lib/chem";
import type { CellBlockInput, SolutionBlockInput } from "./block-schemas";
import { evaluateSolutionBlockCached, type SolutionEvaluation } from "./evaluate-solution-block";
import { texNumber } from "./tex-number";

/*
 * What a cell block shows about its electrolyte and its working electrode, from lib/chem:
 * the liquid junction at the reference electrode (Henderson), the electrolyte's conductivity
 * (Debye–Hückel–Onsager), the uncompensated resistance of the disk (Newman) and the expected
 * reversible peak current of a redox probe (Randles–Ševčík). Pure, so the server computes
 * the same numbers as the browser; every section says why it is empty instead of throwing.
 */

export type Section<T> =
  | { status: "idle"; message: string }
  | { status: "error"; field?: string; message: string }
  | ({ status: "ok" } & T);

/** The equation as published, then the same equation with this cell's numbers. */
export interface FormulaTex {
  general: string;
  applied: string;
}

export interface JunctionSection {
  junctionPotentialV: number;
  uncertaintyV: number;
  uncertaintyNote: string;
  fillingLabel: string;
  /** The cell block asks for the junction to be included in potentials vs the reference. */
  applied: boolean;
  formula: FormulaTex;
  notes: string[];
  method: string;
}

interface ConductivitySection {
  conductivitySPerM: number;
  conductivityMSPerCm: number;
  ionicStrengthMolPerL: number;
  inRange: boolean;
  /** The range the correction was checked in, always stated. */
  range: string;
  messages: string[];
  formula: FormulaTex;
  notes: string[];
  method: string;
}

interface ResistanceSection {
  radiusMm: number;
  resistanceOhm: number;
  formula: FormulaTex;
  notes: string[];
}

export interface PeakSection {
  probeName: string;
  form: "oxidized" | "reduced";
  forwardPeak: "anodic" | "cathodic";
  electrons: number;
  concentrationMolPerL: number;
  concentrationFrom: "typed" | "solution";
  scanRateVPerS: number;
  areaCm2: number;
  diffusionCoefficientCm2PerS: number;
  peakCurrentA: number;
  reversibleDeltaEpV: number;
  /** i_p R_u at the expected peak, V; null without a resistance. */
  iRDropV: number | null;
  formula: FormulaTex;
  notes: string[];
  sources: string[];
}

export interface CellElectrochemistry {
  temperatureC: number;
  junction: Section<JunctionSection>;
  conductivity: Section<ConductivitySection>;
  resistance: Section<ResistanceSection>;
  peak: Section<PeakSection>;
}

const CONDUCTIVITY_RANGE =
  "Checked for 1:1 electrolytes up to about 0.1 mol/L in water (the KCl conductivity standards at 0.01 and 0.1 mol/kg); above that, or with multivalent ions, an estimate.";

const idle = (message: string) => ({ status: "idle" as const, message });

function refusal(error: unknown): { status: "error"; field?: string; message: string } {
  if (!isChemInputError(error)) throw error;
  return { status: "error", field: error.field, message: error.message };
}

/** The cell's temperature wins over the solution's, as for the equilibrium potential. */
function cellTemperatureC(cell: CellBlockInput, electrolyte: SolutionBlockInput | null) {
  return cell.temperatureC ?? electrolyte?.temperatureC ?? 25;
}

type Ions =
  | { status: "ok"; ions: IonConcentration[]; solvent: string; evaluation: SolutionEvaluation }
  | { status: "idle"; message: string }
  | { status: "error"; message: string };

/** The linked electrolyte's ions as molarities (lib/chem's totals, ion pairs included). */
function electrolyteIons(
  electrolyte: SolutionBlockInput | null,
  stored: SolutionEvaluation | undefined,
): Ions {
  if (!electrolyte) return idle("Needs the electrolyte: link a solution block above.");
  const evaluation = stored ?? evaluateSolutionBlockCached(electrolyte);
  if (evaluation.status === "empty") return idle("The linked solution has no components yet.");
  if (evaluation.status === "error")
    return {
      status: "error",
      message: `The linked solution cannot be computed: ${evaluation.message}`,
    };
  const ions = evaluation.result.ions
    .filter((ion) => ion.charge !== 0 && ion.molarity > 0)
    .map((ion) => ({ formula: ion.formula, concentrationMolPerL: ion.molarity }));
  if (ions.length === 0) return idle("The linked solution holds no ions.");
  return { status: "ok", ions, solvent: electrolyte.solvent || "water", evaluation };
}

function needsWater(ions: Ions): Ions {
  if (ions.status === "ok" && ions.solvent !== "water")
    return idle(
      `The ionic conductivities used here are for water; the linked solution's solvent is ${ions.solvent}.`,
    );
  return ions;
}

/** Disk radius (mm) and area (cm²): from the radius field, else from the geometric area. */
function diskGeometry(cell: CellBlockInput): {
  radiusMm: number;
  areaCm2: number;
  notes: string[];
} | null {
  const radius = cell.workingElectrodeRadiusMm ?? null;
  const typedArea = cell.workingElectrode.areaCm2;
  if (radius !== null) {
    const areaCm2 = Math.PI * (radius / 10) ** 2;
    const notes: string[] = [];
    if (typedArea !== null && typedArea > 0 && Math.abs(typedArea / areaCm2 - 1) > 0.05)
      notes.push(
        `The geometric area typed (${texFree(typedArea)} cm²) differs from πr² = ${texFree(areaCm2)} cm²: the radius is used.`,
      );
    return { radiusMm: radius, areaCm2, notes };
  }
  if (typedArea !== null && typedArea > 0) {
    return {
      radiusMm: Math.sqrt(typedArea / Math.PI) * 10,
      areaCm2: typedArea,
      notes: [
        `Radius ${texFree(Math.sqrt(typedArea / Math.PI) * 10)} mm from the geometric area, taking the working electrode for a disk.`,
      ],
    };
  }
  return null;
}

const texFree = (value: number) => Number(value.toPrecision(3)).toString();

const HENDERSON_TEX =
  "E_j = \\frac{RT}{F}\\,\\frac{\\sum_i \\frac{|z_i| u_i}{z_i}\\,[c_i(\\beta)-c_i(\\alpha)]}{\\sum_i |z_i| u_i\\,[c_i(\\beta)-c_i(\\alpha)]}\\,\\ln\\frac{\\sum_i |z_i| u_i\\,c_i(\\alpha)}{\\sum_i |z_i| u_i\\,c_i(\\beta)}";

/** Henderson junction between the reference's filling solution (α) and the electrolyte (β). */
export function cellJunctionPotential(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  stored?: SolutionEvaluation,
): Section<JunctionSection> {
  const filling = referenceFillingSolution(cell.referenceElectrode.type);
  if (!filling)
    return idle(
      `The ${cell.referenceElectrode.type} has no filling solution of its own (it sits in the cell's solution or behind a bridge): no junction is computed.`,
    );
  const ions = needsWater(electrolyteIons(electrolyte, stored));
  if (ions.status !== "ok") return ions;
  const temperatureC = cellTemperatureC(cell, electrolyte);
  try {
    const result = liquidJunctionPotential({
      fillingSolution: filling.ions,
      cellElectrolyte: ions.ions,
      temperatureC,
    });
    const rtOverF = (GAS_CONSTANT_J_PER_MOL_K * (temperatureC + 273.15)) / FARADAY_C_PER_MOL;
    return {
      status: "ok",
      junctionPotentialV: result.junctionPotentialV,
      uncertaintyV: result.uncertaintyV,
      uncertaintyNote: result.uncertaintyNote,
      fillingLabel: filling.label,
      applied: cell.applyJunctionPotential === true,
      formula: {
        general: HENDERSON_TEX,
        applied: `\\frac{RT}{F} = ${texNumber(rtOverF * 1000, 4)}\\ \\mathrm{mV}\\ (${texNumber(temperatureC, 3)}\\,^\\circ\\mathrm{C}) \\;\\Rightarrow\\; E_j = ${texNumber(result.junctionPotentialV * 1000, 2)} \\pm ${texNumber(result.uncertaintyV * 1000, 2)}\\ \\mathrm{mV}`,
      },
      notes: result.notes,
      method: result.method,
    };
  } catch (error) {
    return refusal(error);
  }
}

const CONDUCTIVITY_TEX =
  "\\kappa = \\sum_i |z_i|\\,c_i\\left[\\lambda_i^\\circ - \\frac{(A/2 + B\\lambda_i^\\circ)\\sqrt{I}}{1+\\kappa_{\\mathrm{D}} a}\\right]";

function cellConductivity(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  stored: SolutionEvaluation | undefined,
): Section<ConductivitySection> {
  const ions = needsWater(electrolyteIons(electrolyte, stored));
  if (ions.status !== "ok") return ions;
  const temperatureC = cellTemperatureC(cell, electrolyte);
  try {
    const result = electrolyteConductivity({ ions: ions.ions, temperatureC });
    return {
      status: "ok",
      conductivitySPerM: result.conductivitySPerM,
      conductivityMSPerCm: result.conductivityMSPerCm,
      ionicStrengthMolPerL: result.ionicStrengthMolPerL,
      inRange: result.validity.inRange,
      range: CONDUCTIVITY_RANGE,
      messages: result.validity.messages,
      formula: {
        general: CONDUCTIVITY_TEX,
        applied: `A = ${texNumber(result.onsagerA, 3)},\\ B = ${texNumber(result.onsagerB, 3)},\\ I = ${texNumber(result.ionicStrengthMolPerL, 3)}\\ \\mathrm{mol/L},\\ a = ${texNumber(result.ionSizeAngstrom, 2)}\\ \\text{\\AA} \\;\\Rightarrow\\; \\kappa = ${texNumber(result.conductivityMSPerCm, 4)}\\ \\mathrm{mS/cm}\\ (\\text{limiting } ${texNumber(result.limitingConductivitySPerM * 10, 4)})`,
      },
      notes: result.notes,
      method: result.method,
    };
  } catch (error) {
    return refusal(error);
  }
}

function cellResistance(
  cell: CellBlockInput,
  conductivity: Section<ConductivitySection>,
): Section<ResistanceSection> {
  const geometry = diskGeometry(cell);
  if (!geometry)
    return idle(
      "Enter the working electrode's disk radius (or its geometric area) for the uncompensated resistance.",
    );
  if (conductivity.status !== "ok")
    return idle("The uncompensated resistance needs the electrolyte's conductivity.");
  try {
    const radiusM = geometry.radiusMm / 1000;
    const resistanceOhm = uncompensatedResistanceDisk({
      radiusM,
      conductivitySPerM: conductivity.conductivitySPerM,
    });
    return {
      status: "ok",
      radiusMm: geometry.radiusMm,
      resistanceOhm,
      formula: {
        general: "R_u = \\frac{1}{4\\kappa r}",
        applied: `R_u = \\frac{1}{4 \\times ${texNumber(conductivity.conductivitySPerM, 4)}\\ \\mathrm{S/m} \\times ${texNumber(radiusM, 3)}\\ \\mathrm{m}} = ${texNumber(resistanceOhm, 3)}\\ \\Omega`,
      },
      notes: [
        ...geometry.notes,
        "Disk in an insulating plane with the counter and reference electrodes far away (Newman 1966): an upper bound; a reference tip close to the disk sees less. Measure R_u (impedance at high frequency, or current interrupt) before compensating it.",
      ],
    };
  } catch (error) {
    return refusal(error);
  }
}

/** Concentration of the probe's form in the linked solution, mol/L; null when absent. */
function concentrationInSolution(formula: string, evaluation: SolutionEvaluation | null) {
  if (!evaluation || evaluation.status !== "ok") return null;
  let key: string;
  try {
    key = parseFormula(formula).anhydrousKey;
  } catch {
    return null;
  }
  for (const ion of evaluation.result.ions) {
    try {
      if (parseFormula(ion.formula).anhydrousKey === key && ion.molarity > 0) return ion.molarity;
    } catch {
      // An ion lib/chem computed always parses; skip it if not.
    }
  }
  return null;
}

const RANDLES_SEVCIK_TEX = "i_p = 0.4463\\,nFAC\\sqrt{\\frac{nFvD}{RT}}";

function cellPeak(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  evaluation: SolutionEvaluation | null,
  resistance: Section<ResistanceSection>,
  scanRateOverrideVPerS: number | undefined,
): Section<PeakSection> {
  const choice = cell.redoxProbe ?? null;
  if (!choice || choice.probe === "")
    return idle("Choose a redox probe for the expected reversible peak current.");
  let probe;
  try {
    probe = findRedoxProbe(choice.probe);
  } catch (error) {
    return refusal(error);
  }
  const geometry = diskGeometry(cell);
  if (!geometry) return idle("Enter the working electrode's disk radius (or its geometric area).");
  const formula = choice.form === "oxidized" ? probe.oxidized : probe.reduced;
  const fromSolution = concentrationInSolution(formula, evaluation);
  const concentrationMolPerL =
    choice.concentrationMmolPerL !== null ? choice.concentrationMmolPerL / 1000 : fromSolution;
  if (concentrationMolPerL === null)
    return idle(`Enter the concentration of ${formula} (the linked solution does not hold it).`);
  const scanRateVPerS =
    scanRateOverrideVPerS ?? (choice.scanRateMVPerS !== null ? choice.scanRateMVPerS / 1000 : null);
  if (scanRateVPerS === null) return idle("Enter the scan rate.");
  const temperatureC = cellTemperatureC(cell, electrolyte);
  try {
    const expected = expectedPeakCurrent({
      probe: probe.id,
      formInSolution: choice.form,
      electrodeAreaCm2: geometry.areaCm2,
      concentrationMolPerL,
      scanRateVPerS,
      temperatureC,
    });
    const notes = [...geometry.notes, ...expected.notes];
    if (choice.concentrationMmolPerL === null)
      notes.push(`Concentration of ${formula} from the linked solution.`);
    const solvent = electrolyte?.solvent || "water";
    if (!probe.medium.toLowerCase().startsWith(solvent.toLowerCase()))
      notes.push(`D is that of ${probe.medium}; the linked solution's solvent is ${solvent}.`);
    const iRDropV =
      resistance.status === "ok"
        ? iRDrop({ currentA: expected.peakCurrentA, resistanceOhm: resistance.resistanceOhm })
        : null;
    const n = expected.electrons;
    return {
      status: "ok",
      probeName: probe.name,
      form: choice.form,
      forwardPeak: expected.forwardPeak,
      electrons: n,
      concentrationMolPerL,
      concentrationFrom: choice.concentrationMmolPerL === null ? "solution" : "typed",
      scanRateVPerS,
      areaCm2: geometry.areaCm2,
      diffusionCoefficientCm2PerS: expected.diffusionCoefficientCm2PerS,
      peakCurrentA: expected.peakCurrentA,
      reversibleDeltaEpV: expected.reversibleDeltaEpV,
      iRDropV,
      formula: {
        general: RANDLES_SEVCIK_TEX,
        applied: `i_p = 0.4463 \\cdot ${n}F \\cdot ${texNumber(geometry.areaCm2, 3)}\\ \\mathrm{cm^2} \\cdot ${texNumber(concentrationMolPerL * 1000, 3)}\\ \\mathrm{mmol/L}\\sqrt{\\frac{${n}F \\cdot ${texNumber(scanRateVPerS, 3)}\\ \\mathrm{V/s} \\cdot ${texNumber(expected.diffusionCoefficientCm2PerS, 3)}\\ \\mathrm{cm^2/s}}{R \\cdot ${texNumber(temperatureC + 273.15, 5)}\\ \\mathrm{K}}} = ${texNumber(expected.peakCurrentA * 1e6, 3)}\\ \\mu\\mathrm{A}`,
      },
      notes,
      sources: expected.sources,
    };
  } catch (error) {
    return refusal(error);
  }
}

/**
 * Everything the cell block shows below its potential. `scanRateVPerS` replaces the block's
 * own scan rate (a trace block compares at the scan rate its file was recorded at).
 */
export function evaluateCellElectrochemistry(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  stored?: SolutionEvaluation,
  options: { scanRateVPerS?: number } = {},
): CellElectrochemistry {
  const conductivity = cellConductivity(cell, electrolyte, stored);
  const resistance = cellResistance(cell, conductivity);
  const evaluation = electrolyte ? (stored ?? evaluateSolutionBlockCached(electrolyte)) : null;
  return {
    temperatureC: cellTemperatureC(cell, electrolyte),
    junction: cellJunctionPotential(cell, electrolyte, stored),
    conductivity,
    resistance,
    peak: cellPeak(cell, electrolyte, evaluation, resistance, options.scanRateVPerS),
  };
}
