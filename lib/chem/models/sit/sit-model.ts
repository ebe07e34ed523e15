/**
 * Specific ion interaction theory (Brønsted–Guggenheim–Scatchard; NEA-TDB form, Grenthe et al.
 * 1992, Appendix B):
 *
 *   log10 γ_j = −z_j² D + Σ_k ε(j,k) m_k,    D = A √I / (1 + 1.5 √I)
 *   φ − 1     = −(ln10/Σm) [ (2A/a³)(v − 2 ln v − 1/v) − Σ_c Σ_a ε(c,a) m_c m_a ],  v = 1 + a√I, a = 1.5
 *
 * (φ follows from the same excess Gibbs energy as γ; the test suite checks Gibbs–Duhem.)
 * The sum runs over ions of opposite charge only; ε of like-charged ions is zero by convention.
 * Valid to I ≈ 3.5 mol/kg (NEA-TDB guidance) near 25 °C; a = 1.5 kg^½ mol^−½ is held constant.
 */
import { ChemInputError } from "../../errors";
import { chargeTypeRows, rangeViolations, type ModelRange } from "../range";
import { ionKey } from "../pitzer/ion-key";
import type { ActivityModel, ActivityModelInput, ActivityModelOutput, ModelIon } from "../types";
import { SIT_EPSILON_25C } from "./epsilon-table";
import { waterActivityFromOsmotic } from "../../solution/osmotic";

/** Ba_j of the SIT Debye–Hückel term, kg^½ mol^−½ (NEA-TDB convention, Grenthe et al. 1992). */
const SIT_BA = 1.5;
/**
 * Ionleaf's SIT range (NEA-TDB quote SIT up to I ≈ 3.5 mol/kg; Grenthe et al. 1992 App. B):
 * ε are 25 °C values; NEA-TDB accept them within ±25 K, but against
 * Pitzer, Peiper & Busey (1984) NaCl is +4.4 % off at 0 °C and +2.6 % at 20 °C (1 mol/kg), so
 * 20–30 °C is stated. Ionic strength: the largest I with every table value within 2 % (NaCl
 * 0.75 mol/kg at 20 °C +2.4 %, MgCl2 I = 0.3 −2.3 %, K2SO4 I = 0.03 +2.8 %; KNO3 0.5 mol/kg
 * +8 % against Robinson & Stokes 1959, from memory, so 1:1 to 0.2); 2:2 and higher charge
 * types are not stated.
 */
const SIT_RANGE: ModelRange = {
  temperatureC: { min: 20, max: 30 },
  limits: chargeTypeRows({ "1:1": 0.2, "2:1": 0.2, "1:2": 0.01, "2:2": 0 }, 2),
  basis: "Ionleaf: largest I with every CRC table value within 2 %",
};
const LABEL = "SIT";

const epsilonByPair = new Map(SIT_EPSILON_25C.map((r) => [`${r.cation}|${r.anion}`, r]));

function sitEpsilon(cation: string, anion: string): number | undefined {
  return epsilonByPair.get(`${cation}|${anion}`)?.epsilonKgPerMol;
}

/** Cation–anion pairs present without a tabulated ε. */
function sitMissingPairs(ions: readonly ModelIon[]): string[] {
  const present = ions.filter((i) => i.molality > 0);
  const missing: string[] = [];
  for (const c of present.filter((i) => i.charge > 0))
    for (const a of present.filter((i) => i.charge < 0)) {
      const ck = ionKey(c.formula, c.charge);
      const ak = ionKey(a.formula, a.charge);
      if (sitEpsilon(ck, ak) === undefined) missing.push(`${ck}–${ak}`);
    }
  return missing;
}

export function computeSit(input: ActivityModelInput): ActivityModelOutput {
  if (input.solvent !== "water") {
    throw new ChemInputError(
      `The SIT ε coefficients are for water; they do not apply to ${input.solvent}.`,
      {
        field: "solvent",
        code: "model_not_applicable",
      },
    );
  }
  const A = input.constants?.aLog10;
  if (!(typeof A === "number" && Number.isFinite(A) && A > 0)) {
    throw new ChemInputError("The Debye–Hückel constant A must be a positive number.", {
      field: "constants.aLog10",
      code: "invalid_constant",
    });
  }
  input.ions.forEach((ion, i) => {
    if (!(Number.isFinite(ion.molality) && ion.molality >= 0)) {
      throw new ChemInputError(
        `Molality of ${ion.formula} must be a finite, non-negative number.`,
        {
          field: `ions[${i}].molality`,
          code: "invalid_amount",
        },
      );
    }
  });
  const I = input.ionicStrengthMolal;
  const sqrtI = Math.sqrt(Math.max(I, 0));
  const D = (A * sqrtI) / (1 + SIT_BA * sqrtI);
  const keys = input.ions.map((ion) => ionKey(ion.formula, ion.charge));
  let epsilonSum = 0; // Σc Σa ε m_c m_a
  const log10Gamma = input.ions.map((ion, j) => {
    let v = -ion.charge * ion.charge * D;
    input.ions.forEach((other, k) => {
      if (ion.charge * other.charge >= 0) return;
      const eps = ion.charge > 0 ? sitEpsilon(keys[j], keys[k]) : sitEpsilon(keys[k], keys[j]);
      if (eps === undefined) return;
      v += eps * other.molality;
      if (ion.charge > 0) epsilonSum += eps * ion.molality * other.molality;
    });
    return v;
  });
  const sumM = input.ions.reduce((s, ion) => s + (ion.charge !== 0 ? ion.molality : 0), 0);
  const v = 1 + SIT_BA * sqrtI;
  const dh = ((2 * A) / SIT_BA ** 3) * (v - 2 * Math.log(v) - 1 / v);
  const osmoticCoefficient = sumM > 0 ? 1 - (Math.LN10 / sumM) * (dh - epsilonSum) : 1;
  const waterActivity = waterActivityFromOsmotic(osmoticCoefficient, sumM);

  const validityMessages = rangeViolations(LABEL, SIT_RANGE, input.ions, I, input.temperatureC);
  const missing = sitMissingPairs(input.ions);
  if (missing.length > 0)
    validityMessages.push(`No SIT ε for ${missing.join(", ")}: taken as zero.`);
  const lnGamma = log10Gamma.map((x) => x * Math.LN10);
  if (!lnGamma.every(Number.isFinite) || !Number.isFinite(osmoticCoefficient)) {
    throw new ChemInputError("The SIT model could not be evaluated for this composition.", {
      field: "ions",
      code: "model_failed",
    });
  }
  return {
    lnGamma,
    osmoticCoefficient,
    waterActivity,
    validityMessages,
    notes: [
      "SIT ε from the NEA-TDB compilation (Guillaumont et al. 2003, App. B); D with a·B = 1.5 kg^½ mol^−½.",
    ],
  };
}

export const sitModel: ActivityModel = {
  id: "sit",
  label: "Specific ion interaction theory (SIT)",
  formulaTex: String.raw`\log_{10}\gamma_j = -z_j^2\,\frac{A\sqrt{I}}{1+1.5\sqrt{I}} + \sum_k \varepsilon(j,k)\,m_k`,
  compute: computeSit,
  validityNote:
    "Water, 20–30 °C, every cation–anion pair with an NEA-TDB ε (Grenthe et al. 1992; Guillaumont et al. 2003); I ≤ 0.2 mol/kg for 1:1 and 2:1, 0.01 for 1:2 salts (within 2 % of the CRC and PPB84 tables; NEA quote 3.5).",
  range: SIT_RANGE,
};

/** Whether SIT covers a composition, for the "auto" model choice. */
export function sitCoverage(
  ions: readonly ModelIon[],
  temperatureC: number,
  ionicStrengthMolal: number,
): { covered: boolean; parameters: boolean; reasons: string[] } {
  const reasons: string[] = [];
  const charged = ions.filter((i) => i.charge !== 0 && i.molality > 0);
  if (!charged.some((i) => i.charge > 0) || !charged.some((i) => i.charge < 0))
    reasons.push("SIT needs at least one cation and one anion.");
  const missing = sitMissingPairs(ions);
  if (missing.length > 0) reasons.push(`no SIT ε for ${missing.join(", ")}`);
  const parameters = reasons.length === 0;
  const outside = rangeViolations(LABEL, SIT_RANGE, ions, ionicStrengthMolal, temperatureC);
  return {
    covered: parameters && outside.length === 0,
    parameters,
    reasons: [...reasons, ...outside],
  };
}
