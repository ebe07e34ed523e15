/** Simulations packaged as the columns and header an export of that technique would have. */
import type { SimulatedCv } from "./cv-reversible";
import type { SimulatedChronoamperometry } from "./chronoamperometry";
import type { SimulatedImpedance } from "./impedance-randles";
import type { TraceToWrite } from "./write-trace-file";

const REFERENCE = "Ag/AgCl (3 M KCl)";

export function cvTrace(sim: SimulatedCv): TraceToWrite {
  return {
    columns: [
      { quantity: "time", valuesSi: sim.timeS },
      { quantity: "potential", valuesSi: sim.potentialV },
      { quantity: "current", valuesSi: sim.currentA },
      { quantity: "cycle", valuesSi: sim.cycle },
    ],
    header: {
      techniqueName: "Cyclic Voltammetry",
      scanRateVPerS: sim.settings.scanRateVPerS,
      electrodeAreaCm2: sim.settings.electrodeAreaCm2,
      referenceElectrodeText: REFERENCE,
      temperatureC: sim.settings.temperatureC,
    },
  };
}

export function chronoamperometryTrace(sim: SimulatedChronoamperometry): TraceToWrite {
  return {
    columns: [
      { quantity: "time", valuesSi: sim.timeS },
      { quantity: "potential", valuesSi: sim.potentialV },
      { quantity: "current", valuesSi: sim.currentA },
    ],
    header: {
      techniqueName: "Chronoamperometry",
      electrodeAreaCm2: 0.0707,
      referenceElectrodeText: REFERENCE,
    },
  };
}

export function impedanceTrace(sim: SimulatedImpedance): TraceToWrite {
  return {
    columns: [
      { quantity: "frequency", valuesSi: sim.frequencyHz },
      { quantity: "impedanceReal", valuesSi: sim.realOhm },
      { quantity: "impedanceImaginaryNegated", valuesSi: sim.imaginaryNegatedOhm },
      { quantity: "impedanceModulus", valuesSi: sim.modulusOhm },
      { quantity: "phase", valuesSi: sim.phaseDeg.map((d) => (d * Math.PI) / 180) },
    ],
    header: { techniqueName: "Potentiostatic EIS", referenceElectrodeText: REFERENCE },
  };
}

export function openCircuitTrace(sim: {
  timeS: Float64Array;
  potentialV: Float64Array;
}): TraceToWrite {
  return {
    columns: [
      { quantity: "time", valuesSi: sim.timeS },
      { quantity: "potential", valuesSi: sim.potentialV },
    ],
    header: { techniqueName: "Open Circuit Potential", referenceElectrodeText: REFERENCE },
  };
}
