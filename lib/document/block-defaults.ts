import { newBlockId } from "./block-id";
import type {
  CellBlockInput,
  ElectrodeInput,
  SolutionBlockInput,
  TraceBlockInput,
} from "./block-schemas";

/** Inputs of a freshly inserted solution block: water at 25 °C, one empty row. */
export function defaultSolutionBlockInput(
  overrides: Partial<SolutionBlockInput> = {},
): SolutionBlockInput {
  return {
    blockId: newBlockId(),
    name: "",
    solvent: "water",
    temperatureC: 25,
    densityGPerMl: null,
    model: "auto",
    components: [{ formula: "", amount: null, unit: "mol/kg" }],
    dilution: null,
    ...overrides,
  };
}

function emptyElectrode(): ElectrodeInput {
  return { material: "", areaCm2: null, pretreatment: [] };
}

/** Inputs of a freshly inserted cell block: a three-electrode cell at 25 °C. */
export function defaultCellBlockInput(overrides: Partial<CellBlockInput> = {}): CellBlockInput {
  return {
    blockId: newBlockId(),
    name: "",
    cellType: "three-electrode, single compartment",
    workingElectrode: emptyElectrode(),
    counterElectrode: emptyElectrode(),
    referenceElectrode: { ...emptyElectrode(), type: "Ag/AgCl-3MKCl" },
    electrolyteBlockId: null,
    purgeGas: "N2",
    purgeMinutes: null,
    temperatureC: 25,
    instrument: "",
    channel: "",
    couple: null,
    pH: null,
    workingElectrodeRadiusMm: null,
    applyJunctionPotential: false,
    redoxProbe: null,
    ...overrides,
  };
}

/** A trace block for an uploaded export: all cycles, potentials on the file's own scale. */
export function defaultTraceBlockInput(
  overrides: Partial<TraceBlockInput> & { attachmentId: string },
): TraceBlockInput {
  return {
    blockId: newBlockId(),
    name: "",
    cellBlockId: null,
    showCurrentDensity: false,
    potentialScale: null,
    cycles: null,
    ...overrides,
  };
}
