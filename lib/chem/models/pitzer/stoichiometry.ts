/** Smallest whole-number formula of a salt from its ion charges, e.g. (+2, −1) → ν+ = 1, ν− = 2. */
function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

export function stoichiometry(
  cationCharge: number,
  anionCharge: number,
): { nuCation: number; nuAnion: number } {
  const a = Math.abs(cationCharge);
  const b = Math.abs(anionCharge);
  const g = gcd(a, b);
  return { nuCation: b / g, nuAnion: a / g };
}

/** Ionic strength of a pure salt of these charges at molality m: ½ m (ν+ z+² + ν− z−²). */
export function saltIonicStrength(
  cationCharge: number,
  anionCharge: number,
  molality: number,
): number {
  const { nuCation, nuAnion } = stoichiometry(cationCharge, anionCharge);
  return 0.5 * molality * (nuCation * cationCharge ** 2 + nuAnion * anionCharge ** 2);
}
