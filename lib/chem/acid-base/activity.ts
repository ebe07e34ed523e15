/**
 * Single-ion activity coefficients for acid–base speciation, on the molal scale, with the
 * Debye–Hückel A of part 1 (from εr and ρ of water at the temperature):
 *  - "davies": log10 γ = −A z² (√I/(1+√I) − 0.3 I)  (Davies 1962, Ion Association), to I ≈ 0.5;
 *  - "bates-guggenheim": log10 γ = −A z² √I/(1 + 1.5 √I), the Bates–Guggenheim convention that
 *    defines pH of the primary standards for Cl− (Bates & Guggenheim 1960, Pure Appl. Chem. 1,
 *    163; IUPAC 2002 pH recommendations), applied here to every ion; to I ≈ 0.1;
 *  - "ideal": γ = 1 (textbook Henderson–Hasselbalch).
 * pH is always −log10 a(H+) with γ(H+) from the same convention. Neutral species: γ = 1.
 */
export type ActivityConvention = "davies" | "bates-guggenheim" | "ideal";

export const CONVENTION_LIMIT_I: Record<ActivityConvention, number> = {
  davies: 0.5,
  "bates-guggenheim": 0.1,
  ideal: 0.001,
};

export function log10GammaFactory(
  convention: ActivityConvention,
  aLog10: number,
  ionicStrengthMolal: number,
): (charge: number) => number {
  const I = Math.max(ionicStrengthMolal, 0);
  const s = Math.sqrt(I);
  let unit: number;
  if (convention === "ideal") unit = 0;
  else if (convention === "bates-guggenheim") unit = (-aLog10 * s) / (1 + 1.5 * s);
  else unit = -aLog10 * (s / (1 + s) - 0.3 * I);
  return (charge) => unit * charge * charge;
}

export function describeConvention(convention: ActivityConvention): string {
  if (convention === "bates-guggenheim")
    return "pH = −log10 a(H+); single-ion γ from the Bates–Guggenheim form log γ = −A z²√I/(1 + 1.5√I), the convention of the NIST/IUPAC primary pH standards";
  if (convention === "davies")
    return "pH = −log10 a(H+); single-ion γ from the Davies equation (0.3 I term)";
  return "pH = −log10 m(H+) with all γ = 1 (ideal solution)";
}
