/** εr and density of a catalogue solvent at a temperature, with the caveats that apply. */
import { ChemInputError } from "../errors";
import { getSolvent, type SolventData } from "./catalogue";
import { waterDensityGPerMl, waterRelativePermittivity } from "./water";

export interface SolventState {
  solvent: SolventData;
  temperatureC: number;
  relativePermittivity: number;
  densityGPerMl: number;
  notes: string[];
}

export function solventState(solventId: string, temperatureC: number): SolventState {
  const solvent = getSolvent(solventId);
  const { min, max } = solvent.liquidRangeC;
  if (!Number.isFinite(temperatureC) || temperatureC < min || temperatureC > max) {
    const what = solvent.temperatureDependent
      ? "the range of the water correlations"
      : `the liquid range of ${solvent.name}`;
    throw new ChemInputError(
      `Temperature ${temperatureC} °C is outside ${what} (${min} to ${max} °C at 1 atm).`,
      { field: "temperatureC", code: "temperature_out_of_range" },
    );
  }
  if (solvent.temperatureDependent) {
    return {
      solvent,
      temperatureC,
      notes: [],
      relativePermittivity: waterRelativePermittivity(temperatureC),
      densityGPerMl: waterDensityGPerMl(temperatureC),
    };
  }
  const notes =
    Math.abs(temperatureC - 25) > 0.5
      ? [
          `${solvent.name}: relative permittivity and density are known here at 25 °C only; the 25 °C values are used at ${temperatureC} °C.`,
        ]
      : [];
  return {
    solvent,
    temperatureC,
    notes,
    relativePermittivity: solvent.relativePermittivity25C,
    densityGPerMl: solvent.densityGPerMl25C,
  };
}
