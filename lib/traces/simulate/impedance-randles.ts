/**
 * Impedance of a Randles circuit, Rs in series with Cdl in parallel with (Rct + Zw), where
 * the semi-infinite Warburg element is Zw = σ ω^(−1/2) (1 − j)
 * (Bard & Faulkner 2001, §10.3; Orazem & Tribollet, Electrochemical Impedance
 * Spectroscopy, 2008, ch. 10):
 *   Z(ω) = Rs + 1 / ( jωCdl + 1 / (Rct + σ ω^(−1/2) (1 − j)) ).
 * Frequencies are log-spaced from high to low, as instruments sweep them.
 */
export interface RandlesInput {
  solutionResistanceOhm?: number;
  chargeTransferResistanceOhm?: number;
  doubleLayerCapacitanceF?: number;
  warburgCoefficientOhmPerSqrtS?: number;
  highFrequencyHz?: number;
  lowFrequencyHz?: number;
  pointsPerDecade?: number;
}

export interface SimulatedImpedance {
  frequencyHz: Float64Array;
  realOhm: Float64Array;
  /** −Z″, positive for a capacitive response. */
  imaginaryNegatedOhm: Float64Array;
  modulusOhm: Float64Array;
  /** Phase of Z in degrees (negative for a capacitive response). */
  phaseDeg: Float64Array;
  settings: Required<RandlesInput>;
}

export function randlesImpedance(
  omega: number,
  s: Required<RandlesInput>,
): { re: number; im: number } {
  // Faradaic branch Rct + σω^(−1/2)(1 − j).
  const w = s.warburgCoefficientOhmPerSqrtS / Math.sqrt(omega);
  const fRe = s.chargeTransferResistanceOhm + w;
  const fIm = -w;
  // Admittance: jωCdl + 1/(fRe + j fIm).
  const mag2 = fRe * fRe + fIm * fIm;
  const yRe = fRe / mag2;
  const yIm = omega * s.doubleLayerCapacitanceF - fIm / mag2;
  const yMag2 = yRe * yRe + yIm * yIm;
  return { re: s.solutionResistanceOhm + yRe / yMag2, im: -yIm / yMag2 };
}

export function simulateRandlesSpectrum(input: RandlesInput = {}): SimulatedImpedance {
  const s: Required<RandlesInput> = {
    solutionResistanceOhm: 50,
    chargeTransferResistanceOhm: 500,
    doubleLayerCapacitanceF: 2e-6,
    warburgCoefficientOhmPerSqrtS: 150,
    highFrequencyHz: 1e5,
    lowFrequencyHz: 0.1,
    pointsPerDecade: 10,
    ...input,
  };
  const decades = Math.log10(s.highFrequencyHz / s.lowFrequencyHz);
  const count = Math.round(decades * s.pointsPerDecade) + 1;
  const out = {
    frequencyHz: new Float64Array(count),
    realOhm: new Float64Array(count),
    imaginaryNegatedOhm: new Float64Array(count),
    modulusOhm: new Float64Array(count),
    phaseDeg: new Float64Array(count),
  };
  for (let k = 0; k < count; k++) {
    const f = s.highFrequencyHz * 10 ** (-k / s.pointsPerDecade);
    const z = randlesImpedance(2 * Math.PI * f, s);
    out.frequencyHz[k] = f;
    out.realOhm[k] = z.re;
    out.imaginaryNegatedOhm[k] = -z.im;
    out.modulusOhm[k] = Math.hypot(z.re, z.im);
    out.phaseDeg[k] = (Math.atan2(z.im, z.re) * 180) / Math.PI;
  }
  return { ...out, settings: s };
}
