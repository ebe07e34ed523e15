/**
 * First temperature derivatives of the binary Pitzer parameters at 25 °C, (∂P/∂T)_p in 1/K:
 * Silvester & Pitzer (1978) J. Solution Chem. 7, 327–337, Table I (1:1 salts) and Pitzer
 * (1991) Activity Coefficients in Electrolyte Solutions, 2nd ed., Ch. 3, Table 13 (others;
 * that table prints ∂C/∂T with C = Cφ/(2√|z_M z_X|), converted here to ∂Cφ/∂T).
 * P(T) ≈ P(25 °C) + (∂P/∂T)(T − 298.15 K): a first-order expansion the sources recommend
 * for roughly 0–50 °C, up to the molality given per row (the range the derivative was fitted to).
 * Derived from the same apparent-molal enthalpy data as the PM73 25 °C values; applied to the
 * selected 25 °C row whatever its source, which the model reports in its notes.
 */
import type { PitzerTemperatureRow } from "./binary-row";

const SP78 = "Silvester & Pitzer (1978) J. Solution Chem. 7, 327-337, Table I";
const P91 = "Pitzer (1991) Activity Coefficients in Electrolyte Solutions, 2nd ed., Ch. 3, Table 13";

/** Columns: cation, anion, ∂β0/∂T, ∂β1/∂T, ∂β2/∂T, ∂Cφ/∂T, max molality of the fit, source. */
export const PITZER_TEMPERATURE_DERIVATIVES: readonly PitzerTemperatureRow[] = [
  { cation: "H+", anion: "Cl-", dBeta0: -0.0003081, dBeta1: 0.0001419, dBeta2: 0, dCPhi: -6.213e-05, maxMolality: 4.5, source: SP78 },
  { cation: "H+", anion: "Br-", dBeta0: -0.0002049, dBeta1: 0.0004467, dBeta2: 0, dCPhi: -5.685e-05, maxMolality: 6.0, source: SP78 },
  { cation: "H+", anion: "I-", dBeta0: -2.3e-05, dBeta1: 0.000886, dBeta2: 0, dCPhi: -7.32e-05, maxMolality: 6.0, source: SP78 },
  { cation: "H+", anion: "ClO4-", dBeta0: 0.0004905, dBeta1: 0.001931, dBeta2: 0, dCPhi: -0.0001177, maxMolality: 6.0, source: SP78 },
  { cation: "Li+", anion: "Cl-", dBeta0: -0.0001685, dBeta1: 0.0005366, dBeta2: 0, dCPhi: -4.52e-05, maxMolality: 6.4, source: SP78 },
  { cation: "Li+", anion: "Br-", dBeta0: -0.0001891, dBeta1: 0.0006636, dBeta2: 0, dCPhi: -2.813e-05, maxMolality: 6.0, source: SP78 },
  { cation: "Li+", anion: "ClO4-", dBeta0: 3.86e-05, dBeta1: 0.0007009, dBeta2: 0, dCPhi: -7.712e-05, maxMolality: 4.0, source: SP78 },
  { cation: "Na+", anion: "F-", dBeta0: 0.0005361, dBeta1: 0.00087, dBeta2: 0, dCPhi: 0, maxMolality: 0.7, source: SP78 },
  { cation: "Na+", anion: "Cl-", dBeta0: 0.0007159, dBeta1: 0.0007005, dBeta2: 0, dCPhi: -0.0001054, maxMolality: 6.0, source: SP78 },
  { cation: "Na+", anion: "Br-", dBeta0: 0.0007692, dBeta1: 0.001079, dBeta2: 0, dCPhi: -9.3e-05, maxMolality: 9.0, source: SP78 },
  { cation: "Na+", anion: "I-", dBeta0: 0.0008355, dBeta1: 0.000828, dBeta2: 0, dCPhi: -8.35e-05, maxMolality: 6.0, source: SP78 },
  { cation: "Na+", anion: "OH-", dBeta0: 0.0007, dBeta1: 0.000134, dBeta2: 0, dCPhi: -0.0001894, maxMolality: 4.2, source: SP78 },
  { cation: "Na+", anion: "ClO3-", dBeta0: 0.001035, dBeta1: 0.001907, dBeta2: 0, dCPhi: -9.29e-05, maxMolality: 6.4, source: SP78 },
  { cation: "Na+", anion: "ClO4-", dBeta0: 0.001296, dBeta1: 0.002297, dBeta2: 0, dCPhi: -0.0001623, maxMolality: 6.0, source: SP78 },
  { cation: "Na+", anion: "BrO3-", dBeta0: 0.000559, dBeta1: 0.003437, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: SP78 },
  { cation: "Na+", anion: "IO3-", dBeta0: 0.002066, dBeta1: 0.006057, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: SP78 },
  { cation: "Na+", anion: "SCN-", dBeta0: 0.00078, dBeta1: 0.002, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: SP78 },
  { cation: "Na+", anion: "NO3-", dBeta0: 0.001266, dBeta1: 0.00206, dBeta2: 0, dCPhi: -0.0002316, maxMolality: 2.2, source: SP78 },
  { cation: "K+", anion: "F-", dBeta0: 0.000214, dBeta1: 0.000544, dBeta2: 0, dCPhi: -5.95e-05, maxMolality: 5.9, source: SP78 },
  { cation: "K+", anion: "Cl-", dBeta0: 0.0005794, dBeta1: 0.001071, dBeta2: 0, dCPhi: -5.095e-05, maxMolality: 4.5, source: SP78 },
  { cation: "K+", anion: "Br-", dBeta0: 0.000739, dBeta1: 0.00174, dBeta2: 0, dCPhi: -7.004e-05, maxMolality: 5.2, source: SP78 },
  { cation: "K+", anion: "I-", dBeta0: 0.0009914, dBeta1: 0.001186, dBeta2: 0, dCPhi: -9.44e-05, maxMolality: 7.0, source: SP78 },
  { cation: "K+", anion: "ClO3-", dBeta0: 0.001987, dBeta1: 0.00318, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: SP78 },
  { cation: "K+", anion: "ClO4-", dBeta0: 6e-05, dBeta1: 0.01007, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: SP78 },
  { cation: "K+", anion: "SCN-", dBeta0: 0.000687, dBeta1: 0.0037, dBeta2: 0, dCPhi: 4.3e-06, maxMolality: 3.1, source: SP78 },
  { cation: "K+", anion: "NO3-", dBeta0: 0.000206, dBeta1: 0.00645, dBeta2: 0, dCPhi: 0.000397, maxMolality: 2.4, source: SP78 },
  { cation: "K+", anion: "H2PO4-", dBeta0: 0.0006045, dBeta1: 0.00286, dBeta2: 0, dCPhi: -0.0001011, maxMolality: 1.8, source: SP78 },
  { cation: "Mg^2+", anion: "Cl-", dBeta0: -0.000194, dBeta1: 0.00278, dBeta2: 0, dCPhi: -0.000164049, maxMolality: 2.0, source: P91 },
  { cation: "Mg^2+", anion: "Br-", dBeta0: -5.6e-05, dBeta1: 0.00386, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Mg^2+", anion: "ClO4-", dBeta0: 0.000523, dBeta1: 0.0045, dBeta2: 0, dCPhi: -0.000353553, maxMolality: 3.2, source: P91 },
  { cation: "Mg^2+", anion: "NO3-", dBeta0: 0.000515, dBeta1: 0.00449, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Ca^2+", anion: "Cl-", dBeta0: -0.000561, dBeta1: 0.00266, dBeta2: 0, dCPhi: -0.000204495, maxMolality: 6.0, source: P91 },
  { cation: "Ca^2+", anion: "Br-", dBeta0: -0.000523, dBeta1: 0.00604, dBeta2: 0, dCPhi: 0, maxMolality: 0.6, source: P91 },
  { cation: "Ca^2+", anion: "NO3-", dBeta0: 0.00053, dBeta1: 0.00919, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Ca^2+", anion: "ClO4-", dBeta0: 0.00083, dBeta1: 0.00508, dBeta2: 0, dCPhi: -0.000308299, maxMolality: 4.0, source: P91 },
  { cation: "Sr^2+", anion: "Cl-", dBeta0: 0.000717, dBeta1: 0.00284, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Sr^2+", anion: "Br-", dBeta0: -0.000328, dBeta1: 0.00653, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Sr^2+", anion: "NO3-", dBeta0: 0.000177, dBeta1: 0.01247, dBeta2: 0, dCPhi: 0, maxMolality: 0.2, source: P91 },
  { cation: "Sr^2+", anion: "ClO4-", dBeta0: 0.001143, dBeta1: 0.00539, dBeta2: 0, dCPhi: -0.000311127, maxMolality: 3.0, source: P91 },
  { cation: "Ba^2+", anion: "Cl-", dBeta0: 0.00064, dBeta1: 0.00323, dBeta2: 0, dCPhi: -0.000152735, maxMolality: 1.8, source: P91 },
  { cation: "Ba^2+", anion: "Br-", dBeta0: -0.000338, dBeta1: 0.00678, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Ba^2+", anion: "NO3-", dBeta0: -0.00291, dBeta1: 0.0291, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Mn^2+", anion: "ClO4-", dBeta0: 0.000397, dBeta1: 0.00503, dBeta2: 0, dCPhi: -0.000333754, maxMolality: 4.0, source: P91 },
  { cation: "Co^2+", anion: "ClO4-", dBeta0: 0.000545, dBeta1: 0.00536, dBeta2: 0, dCPhi: -0.00035921, maxMolality: 4.0, source: P91 },
  { cation: "Ni^2+", anion: "ClO4-", dBeta0: 0.000666, dBeta1: 0.00476, dBeta2: 0, dCPhi: -0.000381838, maxMolality: 4.0, source: P91 },
  { cation: "Cu^2+", anion: "Cl-", dBeta0: -0.00271, dBeta1: 0.0085, dBeta2: 0, dCPhi: 0, maxMolality: 0.6, source: P91 },
  { cation: "Zn^2+", anion: "ClO4-", dBeta0: 0.000596, dBeta1: 0.00509, dBeta2: 0, dCPhi: -0.000384666, maxMolality: 4.0, source: P91 },
  { cation: "Li+", anion: "SO4^2-", dBeta0: 0.000506, dBeta1: 0.00141, dBeta2: 0, dCPhi: -0.000233345, maxMolality: 3.0, source: P91 },
  { cation: "Na+", anion: "SO4^2-", dBeta0: 0.002367, dBeta1: 0.00563, dBeta2: 0, dCPhi: -0.000487904, maxMolality: 3.0, source: P91 },
  { cation: "K+", anion: "SO4^2-", dBeta0: 0.00144, dBeta1: 0.0067, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Rb+", anion: "SO4^2-", dBeta0: 0.00094, dBeta1: 0.00864, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "Cs+", anion: "SO4^2-", dBeta0: -0.000893, dBeta1: 0.01448, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "La^3+", anion: "Cl-", dBeta0: 0.000253, dBeta1: 0.00798, dBeta2: 0, dCPhi: -0.000370659, maxMolality: 3.6, source: P91 },
  { cation: "La^3+", anion: "ClO4-", dBeta0: 0.000152, dBeta1: 0.01503, dBeta2: 0, dCPhi: -0.000672036, maxMolality: 2.1, source: P91 },
  { cation: "La^3+", anion: "NO3-", dBeta0: 0.000173, dBeta1: 0.01095, dBeta2: 0, dCPhi: -0.000450333, maxMolality: 2.2, source: P91 },
  { cation: "Na+", anion: "Fe(CN)6^3-", dBeta0: 0.00305, dBeta1: 0.0152, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "K+", anion: "Fe(CN)6^3-", dBeta0: -0.00087, dBeta1: 0.0315, dBeta2: 0, dCPhi: 0, maxMolality: 0.1, source: P91 },
  { cation: "K+", anion: "Fe(CN)6^4-", dBeta0: 0.00474, dBeta1: 0.0392, dBeta2: 0, dCPhi: 0, maxMolality: 0.2, source: P91 },
  { cation: "Mg^2+", anion: "SO4^2-", dBeta0: -0.00069, dBeta1: 0.0153, dBeta2: -0.253, dCPhi: 0.000524, maxMolality: 2.0, source: P91 },
  { cation: "Ca^2+", anion: "SO4^2-", dBeta0: 0, dBeta1: 0.0546, dBeta2: -0.516, dCPhi: 0, maxMolality: 0.02, source: P91 },
  { cation: "Cu^2+", anion: "SO4^2-", dBeta0: -0.0044, dBeta1: 0.0238, dBeta2: -0.473, dCPhi: 0.0048, maxMolality: 1.0, source: P91 },
  { cation: "Zn^2+", anion: "SO4^2-", dBeta0: -0.00366, dBeta1: 0.0233, dBeta2: -0.333, dCPhi: 0.00396, maxMolality: 1.0, source: P91 },
  { cation: "Cd^2+", anion: "SO4^2-", dBeta0: -0.00279, dBeta1: 0.0171, dBeta2: -0.522, dCPhi: 0.0026, maxMolality: 1.0, source: P91 },
];
