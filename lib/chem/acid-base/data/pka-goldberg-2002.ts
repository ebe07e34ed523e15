/**
 * Thermodynamic acid dissociation constants (I = 0, 25 °C, 0.1 MPa) with standard reaction
 * enthalpies ΔrH° and heat capacities ΔrCp° for the buffer systems Ionleaf designs, from
 * Goldberg, Kishore & Lennen (2002) "Thermodynamic quantities for the ionization reactions of
 * buffers", J. Phys. Chem. Ref. Data 31, 231–370 (their Table 4 of selected values).
 * All numbers below are FROM MEMORY of that table (no public copy was at hand): the tests check
 * them through published standard-buffer pH values (Bates 1973; NIST SRMs), not directly.
 * Steps are listed in the order protons leave the fully protonated form.
 */
export interface DissociationStep {
  pKa25: number;
  deltaHkJPerMol: number;
  deltaCpJPerMolK: number;
}

export interface AcidSystemData {
  id: BufferSystemId;
  name: string;
  /** Species from fully protonated to fully deprotonated; charge of species k = charge0 − k. */
  species: readonly string[];
  charge0: number;
  steps: readonly DissociationStep[];
  /** Useful buffer range of each step is pKa ± 1 (common practice, no source). */
  source: string;
}

export type BufferSystemId =
  "phosphate" | "acetate" | "citrate" | "carbonate" | "borate" | "tris" | "hepes" | "mes" | "mops";

const GKL2002 =
  "Goldberg, Kishore & Lennen (2002) J. Phys. Chem. Ref. Data 31, 231, Table 4 (from memory)";

const step = (
  pKa25: number,
  deltaHkJPerMol: number,
  deltaCpJPerMolK: number,
): DissociationStep => ({
  pKa25,
  deltaHkJPerMol,
  deltaCpJPerMolK,
});

export const ACID_SYSTEMS: readonly AcidSystemData[] = [
  {
    id: "phosphate",
    name: "phosphate",
    species: ["H3PO4", "H2PO4-", "HPO4^2-", "PO4^3-"],
    charge0: 0,
    steps: [step(2.148, -8.0, -141), step(7.198, 3.6, -230), step(12.35, 16.0, -242)],
    source: GKL2002,
  },
  {
    id: "acetate",
    name: "acetate",
    species: ["CH3COOH", "CH3COO-"],
    charge0: 0,
    steps: [step(4.756, -0.41, -142)],
    source: GKL2002,
  },
  {
    id: "citrate",
    name: "citrate",
    species: ["H3C6H5O7", "H2C6H5O7-", "HC6H5O7^2-", "C6H5O7^3-"],
    charge0: 0,
    steps: [step(3.128, 4.07, -131), step(4.761, 2.23, -178), step(6.396, -3.38, -254)],
    source: GKL2002,
  },
  // H2CO3* = CO2(aq) + H2CO3; the first constant is for CO2(aq) + H2O ⇌ H+ + HCO3−.
  {
    id: "carbonate",
    name: "carbonate",
    species: ["CO2(aq)", "HCO3-", "CO3^2-"],
    charge0: 0,
    steps: [step(6.351, 9.15, -371), step(10.329, 14.7, -249)],
    source: GKL2002,
  },
  // B(OH)3 + H2O ⇌ B(OH)4− + H+ (polyborates neglected: fine below about 0.025 mol/kg boron).
  {
    id: "borate",
    name: "borate",
    species: ["B(OH)3", "B(OH)4-"],
    charge0: 0,
    steps: [step(9.237, 13.8, -240)],
    source: GKL2002,
  },
  {
    id: "tris",
    name: "Tris",
    species: ["TrisH+", "Tris"],
    charge0: 1,
    steps: [step(8.072, 47.45, -59)],
    source: GKL2002,
  },
  // Good's buffers: only the step near neutrality (the sulfonic acid step, pKa < 3, is not modelled).
  {
    id: "hepes",
    name: "HEPES",
    species: ["HEPES", "HEPES-"],
    charge0: 0,
    steps: [step(7.564, 20.4, 47)],
    source: GKL2002,
  },
  {
    id: "mes",
    name: "MES",
    species: ["MES", "MES-"],
    charge0: 0,
    steps: [step(6.27, 14.8, 5)],
    source: GKL2002,
  },
  {
    id: "mops",
    name: "MOPS",
    species: ["MOPS", "MOPS-"],
    charge0: 0,
    steps: [step(7.184, 21.1, 25)],
    source: GKL2002,
  },
];

/**
 * Ionization of water, H2O ⇌ H+ + OH−: pKw = 13.995 at 25 °C, ΔrH° = 55.81 kJ/mol,
 * ΔrCp° = −224 J/(mol K): Olofsson & Hepler (1975) J. Solution Chem. 4, 127 (from memory).
 */
export const WATER_IONIZATION: DissociationStep & { source: string } = {
  pKa25: 13.995,
  deltaHkJPerMol: 55.81,
  deltaCpJPerMolK: -224,
  source: "Olofsson & Hepler (1975) J. Solution Chem. 4, 127 (from memory)",
};

export function acidSystem(id: string): AcidSystemData | undefined {
  return ACID_SYSTEMS.find((s) => s.id === id);
}
