/**
 * Mean activity coefficient of each dissolved salt from its ions' coefficients:
 *   ln γ± = Σ νi ln γi / ν,   m± = m (Π νi^νi)^{1/ν},   a± = γ± m±
 * (CRC Handbook table header; e.g. CaCl2: m± = 4^{1/3} m).
 */
import type { ComponentAmount } from "../amounts/solve";
import type { ResolvedSpecies } from "../species/resolve";
import type { SaltResult } from "./types";

export function meanSaltResults(
  species: readonly ResolvedSpecies[],
  amounts: readonly ComponentAmount[],
  lnGammaOf: (ionFormula: string) => number,
): SaltResult[] {
  const salts: SaltResult[] = [];
  species.forEach((s, component) => {
    let cations = 0;
    let anions = 0;
    for (const ion of s.ions) {
      if (ion.charge > 0) cations++;
      else if (ion.charge < 0) anions++;
    }
    if (cations === 0 || anions === 0) return;
    let nu = 0;
    let sumLn = 0;
    let logStoich = 0;
    for (const ion of s.ions) {
      nu += ion.count;
      sumLn += ion.count * lnGammaOf(ion.formula);
      logStoich += ion.count * Math.log(ion.count);
    }
    const lnMeanGamma = sumLn / nu;
    const meanGamma = Math.exp(lnMeanGamma);
    const meanMolality = amounts[component].molality * Math.exp(logStoich / nu);
    salts.push({
      formula: s.saltFormula,
      component,
      meanGamma,
      meanMolality,
      meanActivity: meanGamma * meanMolality,
      lnMeanGamma,
      log10MeanGamma: lnMeanGamma / Math.LN10,
    });
  });
  return salts;
}
