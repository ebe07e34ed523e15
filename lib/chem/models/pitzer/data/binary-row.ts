/** Row shapes of the Pitzer parameter tables (see the table files for sources). */

export interface PitzerBinaryRow {
  salt: string;
  cation: string;
  anion: string;
  beta0: number;
  beta1: number;
  beta2: number;
  alpha1: number;
  alpha2: number;
  cPhi: number;
  /** Top of the molality range the parameters were fitted to (mol/kg). */
  maxMolality: number;
  /** Where `maxMolality` comes from ("source" = stated in the publication). */
  maxMolalityBasis: string;
  source: string;
  /**
   * For parameters fitted in mixtures (sparingly soluble salts of HMW84), the ionic strength
   * up to which they hold in a mixture; when absent, the ionic strength of the pure salt at
   * `maxMolality` is the limit.
   */
  maxIonicStrengthMolal?: number;
}

export interface PitzerTemperatureRow {
  cation: string;
  anion: string;
  /** ∂β0/∂T etc. at 298.15 K, per kelvin. */
  dBeta0: number;
  dBeta1: number;
  dBeta2: number;
  dCPhi: number;
  maxMolality: number;
  source: string;
}

export function binaryRow(
  salt: string,
  cation: string,
  anion: string,
  beta0: number,
  beta1: number,
  beta2: number,
  alpha1: number,
  alpha2: number,
  cPhi: number,
  maxMolality: number,
  maxMolalityBasis: string,
  source: string,
): PitzerBinaryRow {
  return {
    salt,
    cation,
    anion,
    beta0,
    beta1,
    beta2,
    alpha1,
    alpha2,
    cPhi,
    maxMolality,
    maxMolalityBasis,
    source,
  };
}
