// @vitest-environment node
/**
 * Pitzer temperature functions of salts other than NaCl against independent published fits at
 * 0, 25, 50, 75 and 100 °C (NaCl: pitzer-temperature.test.ts, against the tables of Pitzer,
 * Peiper & Busey 1984). No table of γ± or φ away from 25 °C was at hand for these salts, so
 * the reference values are computed from published equations with their published
 * coefficients (confidence "computed-from-published-equation"): each paper's function for β0,
 * β1, β2, Cφ, evaluated here, in the Pitzer equations written out below (not the engine's).
 * A reference is used only where its temperature terms are not those of the engine's row:
 * Appelo's (2015) KCl β0 and Cφ are those of Greenberg & Møller (1989), and his MgCl2 those of
 * de Lima & Pitzer (1983) with the Cφ of Pabalan & Pitzer (1987), so neither is used for them.
 *
 * Sources (coefficients as transcribed in the public copies named; checked at 25 °C where a
 * table or the paper's own values are at hand: the CRC Handbook table for HCl, CaCl2, MgCl2 and
 * K2SO4, Rard & Miller's values for PP86; Archer's KCl and Møller's Na2SO4, for which the
 * fixtures hold no confirmed table, agree with the engine at 25 °C within 0.3 % and 2.1 %,
 * below. Not used: the transcription
 * of Hovey, Pitzer & Rard (1993) for Na2SO4 (pytzer HPR93), whose ∂β0/∂T at 25 °C is
 * −3.3·10⁻⁴ K⁻¹ against +2.4·10⁻³ of Silvester & Pitzer 1978 and every other fit; de Lima &
 * Pitzer (1983) for MgCl2, the engine's own source; Spencer, Møller & Weare (1990), fitted
 * below 25 °C and 2–6 % from the CRC table at 25 °C):
 * - A99: Archer (1999) J. Phys. Chem. Ref. Data 28, 1–17, eq. 22 and Table 4 (KCl, 260–420 K);
 *   github mvdh7/pytzer pytzer/parameters (bC_K_Cl_A99).
 * - M88: Møller (1988) Geochim. Cosmochim. Acta 52, 821–837, eq. 13 (Na2SO4 273–573 K; CaCl2
 *   β0, β1) and its Aφ(T); GM89: Greenberg & Møller (1989) Geochim. Cosmochim. Acta 53,
 *   2503–2518 (CaCl2 Cφ and K2SO4, 273–523 K, with M88's Aφ); pytzer bC_Na_SO4_M88,
 *   bC_Ca_Cl_GM89, bC_K_SO4_GM89, Aosm_M88.
 * - PP86: Phutela & Pitzer (1986) J. Phys. Chem. 90, 895–901, eq. 29 (MgSO4 to 473 K, from the
 *   25 °C values of Rard & Miller 1981); pytzer bC_Mg_SO4_PP86ii.
 * - VOI2020: Voigt (2020) THEREDA Journal 1(1), 1–9, THEREDA data set VOI2020, PHREEQC form
 *   (273.15–393.15 K): HCl, CaCl2, MgCl2, Na2SO4, K2SO4, MgSO4, NaOH; github usgs-coupled/phreeqc3
 *   database/OtherDatabases/THEREDA_2026-01_PHRQ.dat (B0, B1, B2, C0 = Cφ, ALPHAS).
 * Aφ: each reference with the Aφ its authors used: M88's own equation for M88 and GM89; Archer &
 * Wang (1990) for A99 (through the Chebyshev fit of Clegg, Rard & Pitzer 1994, Appendix II;
 * pytzer Aosm_CRP94; checked against tests/fixtures/reference/water-properties.csv); the εr of
 * Bradley & Pitzer (1979) for PP86 (Pitzer's group) and VOI2020 (run in PHREEQC), evaluated
 * with the engine's function (lib/chem/models/pitzer/water-a-phi.ts, checked below against
 * Archer & Wang and Møller). Since this check the Pitzer model's Aφ changes with temperature as
 * that Aφ does (kept at the other models' 0.3921 at 25 °C): with the Malmberg & Maryott εr alone
 * its Aφ was 0.55 % low at 100 °C, and γ± of MgSO4 at 2 mol/kg 3.9 % high against Phutela &
 * Pitzer there.
 *
 * Molalities stay below the solubility of the salt at each temperature (from memory: Na2SO4
 * about 0.3 mol/kg at 0 °C and 2 at 25 °C, K2SO4 0.4 at 0 °C and 0.7 at 25 °C, KCl 3.7 at 0 °C,
 * MgSO4 1.8 at 0 °C) and within the molality of the engine's row.
 *
 * Tolerance: 1 % inside both fitted ranges, on the change of γ± and φ from 25 °C and on the
 * values themselves beyond what the two publications' 25 °C values already differ by (their
 * 25 °C sets are checked against the CRC Handbook table, which says which is nearer it:
 * pitzer-temperature-salts.test.ts and below). Where it is wider, two published fits disagree
 * away from 25 °C and nothing at hand decides between them: the measured bound and the reason
 * are beside the case, and lib/chem/README.md lists them.
 */
import { describe, expect, it } from "vitest";
import { pitzerBinarySalt, pitzerWaterAPhi } from "@/lib/chem/models/pitzer";
import { debyeHuckelConstants } from "@/lib/chem/debye-huckel-constants";
import { readFixture } from "../../support/read-reference";

const TR = 298.15;

interface Parameters {
  beta0: number;
  beta1: number;
  beta2: number;
  alpha1: number;
  alpha2: number;
  cPhi: number;
}

/** PHREEQC form (VOI2020): A0 + A1(1/T − 1/Tr) + A2 ln(T/Tr) + A3(T − Tr) + A4(T² − Tr²) + A5(1/T² − 1/Tr²). */
const phreeqc = (a: readonly number[], T: number) =>
  a[0] +
  a[1] * (1 / T - 1 / TR) +
  a[2] * Math.log(T / TR) +
  a[3] * (T - TR) +
  a[4] * (T * T - TR * TR) +
  a[5] * (1 / (T * T) - 1 / (TR * TR));
/** Møller (1988) eq. 13: a1 + a2 T + a3/T + a4 ln T + a5/(T − 263) + a6 T² + a7/(680 − T) + a8/(T − 227). */
const moller = (a: readonly number[], T: number) =>
  a[0] +
  a[1] * T +
  a[2] / T +
  a[3] * Math.log(T) +
  a[4] / (T - 263) +
  a[5] * T * T +
  a[6] / (680 - T) +
  a[7] / (T - 227);
/** Archer (1999) eq. 22: a1 + a2(T − Tr)/100 + a3(T − Tr)²/10⁵ + 100 a4/(T − 225) + 1000 a5/T + 10⁶ a6/(T − 225)³. */
const archer = (a: readonly number[], T: number) =>
  a[0] +
  a[1] * (T - TR) * 1e-2 +
  a[2] * (T - TR) ** 2 * 1e-5 +
  (a[3] * 1e2) / (T - 225) +
  (a[4] * 1e3) / T +
  (a[5] * 1e6) / (T - 225) ** 3;
/** Phutela & Pitzer (1986) eq. 29: q1..q4 heat-capacity terms, q5 = ∂P/∂T at Tr, q6 = P(Tr). */
const phutela = (q: readonly number[], T: number) =>
  q[0] * (T / 2 + TR ** 2 / (2 * T) - TR) +
  q[1] * (T ** 2 / 6 + TR ** 3 / (3 * T) - TR ** 2 / 2) +
  q[2] * (T ** 3 / 12 + TR ** 4 / (4 * T) - TR ** 3 / 3) +
  q[3] * (T ** 4 / 20 + TR ** 5 / (5 * T) - TR ** 4 / 4) +
  q[4] * (TR - TR ** 2 / T) +
  q[5];

/** Aφ of Møller (1988), eq. 13 form. */
const aPhiMoller = (T: number) =>
  moller(
    [
      3.36901532e-1, -6.3210043e-4, 9.14252359, -1.35143986e-2, 2.26089488e-3, 1.92118597e-6,
      4.52586464e1, 0,
    ],
    T,
  );
/** Aφ of Archer & Wang (1990), as the Chebyshev series of Clegg, Rard & Pitzer (1994) App. II. */
const CRP94 = [
  0.79725608124 / 2,
  0.573389669896e-1,
  0.977632177788e-3,
  0.489973732417e-2,
  -0.313151784342e-2,
  0.179145971002e-2,
  -0.920584241844e-3,
  0.443862726879e-3,
  -0.203661129991e-3,
  0.900924147948e-4,
  -0.388189392385e-4,
  0.164245088592e-4,
  -0.686031972567e-5,
  0.283455806377e-5,
  -0.115641433004e-5,
  0.461489672579e-6,
  -0.177069754948e-6,
  0.612464488231e-7,
  -0.175689013085e-7,
];
function aPhiArcherWang(T: number): number {
  const x = (2 * T - 373.15 - 234.15) / (373.15 - 234.15);
  let [previous, current] = [1, x];
  let sum = CRP94[0] + CRP94[1] * x;
  for (let n = 2; n < CRP94.length; n++) {
    [previous, current] = [current, 2 * x * current - previous];
    sum += CRP94[n] * current;
  }
  return sum;
}

/**
 * Aφ with the εr of Bradley & Pitzer (1979), as Pitzer's group (PP86) and PHREEQC (VOI2020)
 * use it: the engine's function, checked against Archer & Wang and Møller below.
 */
const aPhiBradleyPitzer = (T: number) => pitzerWaterAPhi(T - 273.15);

const vo = (
  b0: readonly number[],
  b1: readonly number[],
  cPhi: readonly number[],
  b2: readonly number[] | null = null,
  alpha1 = 2,
) => ({ b0, b1, b2, cPhi, alpha1 });

/** VOI2020 rows of the THEREDA export: B0, B1, (B2), C0 (= Cφ); ALPHAS 2 0 unless stated. */
const VOI2020 = {
  HCl: vo(
    [
      1.7621966566776e-1, 9.90122197847134e3, 5.00672152023573e1, -1.09028292019965e-1,
      4.28321318179085e-5, -3.5102615442901e5,
    ],
    [
      2.9952169750777e-1, 1.89788670755908e5, 7.76484447411149e2, -1.39639369414878,
      4.67182180527993e-4, -8.59926099585062e6,
    ],
    [0, 0, 0, 0, 0, 0],
  ),
  CaCl2: vo(
    [
      3.0654497147407e-1, 5.23608186384246e5, 2.22855799524205e3, -4.19718905646762,
      1.47522004931144e-3, -2.29716385982982e7,
    ],
    [1.7081116892327, 0, 0, -1.54168146009983e-2, 3.17906175957664e-5, 0],
    [
      2.224452591463e-3, -4.94500185265404e4, -2.10953653516146e2, 3.98063953334536e-1,
      -1.40189055264899e-4, 2.16526128601977e6,
    ],
  ),
  MgCl2: vo(
    [3.5234576217139e-1, -9.59490759877323, 0, -4.56325711588189e-4, 0, 0],
    [1.6814797738046, 1.2392880942931e3, 0, 1.63946228155632e-2, 0, 0],
    [5.1899397863093e-3, 1.25282293222683e1, 0, 2.8564736424319e-5, 0, 0],
  ),
  Na2SO4: vo(
    [1.9579891046156e-2, 1.05204034674364e3, 7.85532752179927, -1.29646136267966e-2, 0, 0],
    [1.1129875007366, -5.0431463443382e4, -2.91106998737146e2, 4.2220582235853e-1, 0, 0],
    [4.9699330996802e-3, -4.94281555114559e2, -3.12028447170606, 4.68167669733598e-3, 0, 0],
  ),
  K2SO4: vo(
    [
      4.9949391296309e-2, -1.41145202357328e4, -1.11056264285285e2, 2.90998909615732e-1,
      -1.26103983282218e-4, 0,
    ],
    [
      7.7929062667499e-1, 2.56167918936797e4, 2.5260626183174e2, -8.01713271994708e-1,
      4.18618165133201e-4, 0,
    ],
    [
      -4.8823380893737e-9, 9.68608750255577e3, 7.69901240122677e1, -2.03028031270672e-1,
      8.86250840820254e-5, 0,
    ],
  ),
  MgSO4: vo(
    [
      2.2087967316202e-1, 1.65423990618798e5, 6.58462298514643e2, -1.15985005015335,
      3.82707396716579e-4, -7.74819138613266e6,
    ],
    [
      3.3428960066281, 5.57775460099826e4, 3.40942736424319e2, -9.22947899452763e-1,
      4.70349342955078e-4, -1.81956819652414e6,
    ],
    [
      2.5000979788871e-2, 2.48800055926394e3, 1.27053711828733e1, -2.42641781706657e-2,
      6.93981653256359e-6, -6.7851921246016e4,
    ],
    [-3.7249543119502e1, 0, -3.19308950508148e3, 2.19252957483914e1, -1.91180218654158e-2, 0],
    1.4,
  ),
  NaOH: vo(
    [1.0436084822611e-1, -9.88884051957424e1, 0, -1.04785157977028e-3, 0, 0],
    [1.245819743129e-1, -2.06111999037825e2, 0, -1.29580588129172e-3, 0, 0],
    [2.1542996464022e-3, 1.73000562992363e1, 0, 1.18266752059655e-4, 0, 0],
  ),
};

function fromVoigt(salt: keyof typeof VOI2020) {
  const r = VOI2020[salt];
  return (T: number): Parameters => ({
    beta0: phreeqc(r.b0, T),
    beta1: phreeqc(r.b1, T),
    beta2: r.b2 ? phreeqc(r.b2, T) : 0,
    alpha1: r.alpha1,
    alpha2: 12,
    cPhi: phreeqc(r.cPhi, T),
  });
}

interface Reference {
  name: string;
  /** Temperatures (K) the publication fitted. */
  fitted: [number, number];
  parameters: (T: number) => Parameters;
  aPhi: (T: number) => number;
}

const VOIGT = (salt: keyof typeof VOI2020): Reference => ({
  name: "Voigt (2020) VOI2020",
  fitted: [273.15, 393.15],
  parameters: fromVoigt(salt),
  aPhi: aPhiBradleyPitzer,
});

const REFERENCES: Record<string, Reference[]> = {
  KCl: [
    {
      name: "Archer (1999)",
      fitted: [260, 420],
      parameters: (T) => ({
        beta0: archer(
          [
            0.413229483398493, -0.0870121476114027, 0.101413736179231, -0.0199822538522801,
            -0.0998120581680816, 0,
          ],
          T,
        ),
        beta1: archer([0.206691413598171, 0.102544606022162, 0, 0, 0, -0.00188349608000903], T),
        beta2: 0,
        alpha1: 2,
        alpha2: 12,
        // Archer's C⁽⁰⁾ = Cφ / (2 √|zM zX|).
        cPhi:
          2 * archer([-0.00133515934994478, 0, 0, 0.00234117693834228, -0.00075896583546707, 0], T),
      }),
      aPhi: aPhiArcherWang,
    },
  ],
  HCl: [VOIGT("HCl")],
  CaCl2: [
    {
      name: "Møller (1988) / Greenberg & Møller (1989)",
      fitted: [273.15, 523.15],
      parameters: (T) => ({
        beta0: moller(
          [
            -9.41895832e1, -4.04750026e-2, 2.34550368e3, 1.709123e1, -9.22885841e-1, 1.51488122e-5,
            -1.39082, 0,
          ],
          T,
        ),
        beta1: moller([3.4787, -1.5417e-2, 0, 0, 0, 3.1791e-5, 0, 0], T),
        beta2: 0,
        alpha1: 2,
        alpha2: 12,
        cPhi: moller(
          [
            1.93056024e1, 9.77090932e-3, -4.28383748e2, -3.57996343, 8.82068538e-2, -4.62270238e-6,
            9.91113465, 0,
          ],
          T,
        ),
      }),
      aPhi: aPhiMoller,
    },
    VOIGT("CaCl2"),
  ],
  MgCl2: [VOIGT("MgCl2")],
  Na2SO4: [
    {
      name: "Møller (1988)",
      fitted: [273.15, 573.15],
      parameters: (T) => ({
        beta0: moller(
          [
            8.16920027e1, 3.01104957e-2, -2.32193726e3, -1.43780207e1, -6.66496111e-1,
            -1.03923656e-5, 0, 0,
          ],
          T,
        ),
        beta1: moller(
          [
            1.00463018e3, 5.77453682e-1, -2.18434467e4, -1.89110656e2, -2.03550548e-1,
            -3.23949532e-4, 1.46772243e3, 0,
          ],
          T,
        ),
        beta2: 0,
        alpha1: 2,
        alpha2: 12,
        cPhi: moller(
          [
            -8.07816886e1, -3.54521126e-2, 2.0243883e3, 1.4619773e1, -9.1697474e-2, 1.43946005e-5,
            -2.42272049, 0,
          ],
          T,
        ),
      }),
      aPhi: aPhiMoller,
    },
    VOIGT("Na2SO4"),
  ],
  K2SO4: [
    {
      name: "Greenberg & Møller (1989)",
      fitted: [273.15, 523.15],
      parameters: (T) => ({
        beta0: moller([4.07908797e1, 8.26906675e-3, -1.41842998e3, -6.74728848, 0, 0, 0, 0], T),
        beta1: moller([-1.31669651e1, 2.35793239e-2, 2.06712594e3, 0, 0, 0, 0, 0], T),
        beta2: 0,
        alpha1: 2,
        alpha2: 12,
        cPhi: -0.0188,
      }),
      aPhi: aPhiMoller,
    },
    VOIGT("K2SO4"),
  ],
  MgSO4: [
    {
      name: "Phutela & Pitzer (1986)",
      fitted: [298.15, 473.15],
      parameters: (T) => ({
        beta0: phutela([-1.0282, 8.479e-3, -2.3366e-5, 2.1575e-8, 6.8402e-4, 0.21499], T),
        beta1: phutela([-2.9596e-1, 9.4564e-4, 0, 0, 1.1028e-2, 3.3646], T),
        beta2: phutela([-1.3764e1, 1.2121e-1, -2.7642e-4, 0, -2.1515e-1, -32.743], T),
        alpha1: 1.4,
        alpha2: 12,
        // Their C⁽⁰⁾ = Cφ / (2 √|zM zX|) = Cφ / 4, at 25 °C Rard & Miller's Cφ 0.02797.
        cPhi: 4 * phutela([1.0541e-1, -8.9316e-4, 2.51e-6, -2.3436e-9, -8.7899e-5, 0.02797 / 4], T),
      }),
      aPhi: aPhiBradleyPitzer,
    },
    VOIGT("MgSO4"),
  ],
  NaOH: [VOIGT("NaOH")],
};

interface Salt {
  cation: string;
  zc: number;
  anion: string;
  za: number;
}
const SALT: Record<string, Salt> = {
  KCl: { cation: "K+", zc: 1, anion: "Cl-", za: -1 },
  HCl: { cation: "H+", zc: 1, anion: "Cl-", za: -1 },
  CaCl2: { cation: "Ca^2+", zc: 2, anion: "Cl-", za: -1 },
  MgCl2: { cation: "Mg^2+", zc: 2, anion: "Cl-", za: -1 },
  Na2SO4: { cation: "Na+", zc: 1, anion: "SO4^2-", za: -2 },
  K2SO4: { cation: "K+", zc: 1, anion: "SO4^2-", za: -2 },
  MgSO4: { cation: "Mg^2+", zc: 2, anion: "SO4^2-", za: -2 },
  NaOH: { cation: "Na+", zc: 1, anion: "OH-", za: -1 },
};

/** γ± and φ of one salt from the Pitzer (1991, ch. 3) equations for a binary solution, b = 1.2. */
function pitzerBinary(s: Salt, p: Parameters, molality: number, aPhi: number) {
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  const d = gcd(s.zc, -s.za);
  const nuM = -s.za / d;
  const nuX = s.zc / d;
  const nu = nuM + nuX;
  const zz = Math.abs(s.zc * s.za);
  const I = 0.5 * molality * (nuM * s.zc ** 2 + nuX * s.za ** 2);
  const sqrtI = Math.sqrt(I);
  const b = 1.2;
  const fGamma = -aPhi * (sqrtI / (1 + b * sqrtI) + (2 / b) * Math.log(1 + b * sqrtI));
  const gTerm = (beta: number, alpha: number) =>
    beta === 0
      ? 0
      : ((2 * beta) / (alpha * alpha * I)) *
        (1 - (1 + alpha * sqrtI - 0.5 * alpha * alpha * I) * Math.exp(-alpha * sqrtI));
  const bGamma = 2 * p.beta0 + gTerm(p.beta1, p.alpha1) + gTerm(p.beta2, p.alpha2);
  const bPhi =
    p.beta0 + p.beta1 * Math.exp(-p.alpha1 * sqrtI) + p.beta2 * Math.exp(-p.alpha2 * sqrtI);
  const mB = (2 * nuM * nuX) / nu;
  const mC = (2 * (nuM * nuX) ** 1.5) / nu;
  return {
    gamma: Math.exp(zz * fGamma + molality * mB * bGamma + molality * molality * mC * 1.5 * p.cPhi),
    phi:
      1 -
      (zz * aPhi * sqrtI) / (1 + b * sqrtI) +
      molality * mB * bPhi +
      molality * molality * mC * p.cPhi,
  };
}

const engine = (s: Salt, molality: number, temperatureC: number) =>
  pitzerBinarySalt({
    cation: s.cation,
    cationCharge: s.zc,
    anion: s.anion,
    anionCharge: s.za,
    molality,
    temperatureC,
    aPhi: pitzerWaterAPhi(temperatureC),
  });

const pct = (x: number, ref: number) => (100 * (x - ref)) / ref;

interface Case {
  salt: string;
  reference: string;
  /** Molalities per temperature (°C). */
  grid: Record<number, number[]>;
  /**
   * Where two published fits disagree and nothing at hand decides between them: the measured
   * bound (%) of the deviation checked there, and why.
   */
  disagreement?: (T: number, m: number) => { limit: number; reason: string } | null;
}

const ALL = (m: number[]) => ({ 0: m, 25: m, 50: m, 75: m, 100: m });

/** A measured bound (%) at some temperatures, with the reason; 1 % elsewhere. */
const bounds =
  (byT: Record<number, number>, reason: string, minMolality = 0) =>
  (T: number, m: number) =>
    byT[T] !== undefined && m >= minMolality ? { limit: byT[T], reason } : null;

const CACL2_REASON =
  "Appelo (2015) and the Møller (1988) / Greenberg & Møller (1989) lineage (Voigt 2020 keeps M88's β1) disagree: " +
  "at 75–100 °C through Appelo's β2 = −1.13 − 0.0476 (T − 298.15 K), CaCl⁺ pairing that grows with T (with β2 held at " +
  "its 25 °C value the engine is within 1.8 % of M88/GM89 at 100 °C); at 0 °C through M88/GM89's β0 (0.26 against 0.32) " +
  "and Cφ (0.011 against 0.0005), a turn below 10 °C that Appelo's function does not have. No CaCl2 table away from 25 °C " +
  "was at hand to decide.";
const SULFATE_REASON_NA =
  "Na2SO4: Møller (1988) and Voigt (2020) bracket the engine's change from 25 °C at 50–100 °C (M88 up to 1.7 % below it, " +
  "VOI2020 up to 1.2 % above); at 0 °C (0.1–0.3 mol/kg, near the solubility) M88 and VOI2020 are 1.2–4.6 % below the " +
  "engine, and the Silvester & Pitzer (1978) / Pitzer (1991) first-order derivatives extrapolated there are 0.6 % above it.";

const CASES: Case[] = [
  {
    salt: "KCl",
    reference: "Archer (1999)",
    grid: {
      0: [0.1, 0.5, 1, 2, 3],
      25: [0.1, 0.5, 1, 2, 4],
      50: [0.1, 0.5, 1, 2, 4],
      75: [0.1, 0.5, 1, 2, 4],
      100: [0.1, 0.5, 1, 2, 4],
    },
  },
  {
    salt: "HCl",
    reference: "Voigt (2020) VOI2020",
    // The engine's HCl function (Campbell et al. 1993) is stated for 0–55 °C. At 2–4 mol/kg
    // VOI2020's 25 °C values sit 1–3 % below the CRC table (4 mol/kg: 1.714 against 1.762);
    // its change from 25 °C agrees with the engine's within 0.5 %.
    grid: { 0: [0.1, 0.5, 1, 2, 4], 25: [0.1, 0.5, 1, 2, 4], 50: [0.1, 0.5, 1, 2, 4] },
  },
  {
    salt: "CaCl2",
    reference: "Møller (1988) / Greenberg & Møller (1989)",
    grid: ALL([0.1, 0.5, 1, 2]),
    disagreement: (T, m) =>
      bounds({ 75: 2.2, 100: 4.5 }, CACL2_REASON)(T, m) ??
      bounds({ 0: 19 }, CACL2_REASON, 0.5)(T, m),
  },
  {
    salt: "CaCl2",
    reference: "Voigt (2020) VOI2020",
    grid: ALL([0.1, 0.5, 1, 2]),
    disagreement: (T, m) =>
      bounds({ 75: 1.5, 100: 4.3 }, CACL2_REASON)(T, m) ??
      bounds({ 0: 16 }, CACL2_REASON, 0.5)(T, m),
  },
  {
    salt: "MgCl2",
    reference: "Voigt (2020) VOI2020",
    grid: ALL([0.1, 0.5, 1, 2, 4]),
    disagreement: (T, m) =>
      bounds(
        m >= 2 ? { 0: 4, 50: 4.5, 75: 9, 100: 12.5 } : { 100: 1.3 },
        "The engine's MgCl2 temperature terms are de Lima & Pitzer's (1983) β0, β1 (∂β1/∂T at 25 °C 4.6·10⁻³ K⁻¹) with " +
          "Pabalan & Pitzer's (1987) Cφ, through Appelo (2015); Voigt (2020) has 2.5·10⁻³, and Pitzer's (1991) " +
          "calorimetric ∂β1/∂T is 2.78·10⁻³. Above 1 mol/kg the two fits part away from 25 °C (4 mol/kg, 100 °C: 12 %); " +
          "the calorimetric slopes lie between them at 35 °C. No MgCl2 table away from 25 °C was at hand to decide.",
        m >= 2 ? 2 : 1,
      )(T, m),
  },
  {
    salt: "Na2SO4",
    reference: "Møller (1988)",
    grid: {
      0: [0.1, 0.3],
      25: [0.1, 0.5, 1, 1.5],
      50: [0.1, 0.5, 1, 2],
      75: [0.1, 0.5, 1, 2],
      100: [0.1, 0.5, 1, 2],
    },
    disagreement: bounds({ 0: 3.2, 50: 1.8, 75: 1.8, 100: 1.8 }, SULFATE_REASON_NA),
  },
  {
    salt: "Na2SO4",
    reference: "Voigt (2020) VOI2020",
    grid: {
      0: [0.1, 0.3],
      25: [0.1, 0.5, 1, 1.5],
      50: [0.1, 0.5, 1, 2],
      75: [0.1, 0.5, 1, 2],
      100: [0.1, 0.5, 1, 2],
    },
    disagreement: bounds({ 0: 4.7, 100: 1.3 }, SULFATE_REASON_NA),
  },
  {
    salt: "K2SO4",
    reference: "Greenberg & Møller (1989)",
    grid: {
      0: [0.1, 0.3],
      25: [0.1, 0.3, 0.5],
      50: [0.1, 0.3, 0.5, 0.7],
      75: [0.1, 0.3, 0.5, 0.7],
      100: [0.1, 0.3, 0.5, 0.7],
    },
    disagreement: bounds(
      { 0: 5.2, 50: 1.9, 75: 1.9, 100: 1.1 },
      "Greenberg & Møller (1989), with a constant Cφ (−0.0188), and Voigt (2020) disagree with each other by 4–5 % in the " +
        "change from 25 °C at 0 °C and 1–2 % at 50–75 °C; the engine (Appelo 2015) follows Voigt within 0.9 % (next case).",
    ),
  },
  {
    salt: "K2SO4",
    reference: "Voigt (2020) VOI2020",
    // The 25 °C sets differ by 2–3 % (VOI2020 ≈ HMW84 against May et al. 2011; reference README item 7).
    grid: {
      0: [0.1, 0.3],
      25: [0.1, 0.3, 0.5],
      50: [0.1, 0.3, 0.5, 0.7],
      75: [0.1, 0.3, 0.5, 0.7],
      100: [0.1, 0.3, 0.5, 0.7],
    },
  },
  {
    salt: "MgSO4",
    reference: "Phutela & Pitzer (1986)",
    // Fitted from 298.15 K: 0 °C is outside it.
    grid: {
      25: [0.1, 0.5, 1, 2],
      50: [0.1, 0.5, 1, 2],
      75: [0.1, 0.5, 1, 2],
      100: [0.1, 0.5, 1, 2],
    },
  },
  {
    salt: "MgSO4",
    reference: "Voigt (2020) VOI2020",
    grid: {
      0: [0.1, 0.5, 1],
      25: [0.1, 0.5, 1, 2],
      50: [0.1, 0.5, 1, 2],
      75: [0.1, 0.5, 1, 2],
      100: [0.1, 0.5, 1, 2],
    },
    disagreement: bounds(
      { 0: 2, 50: 1.2, 75: 1.5, 100: 2.5 },
      "Phutela & Pitzer (1986) and Voigt (2020) differ from each other by up to 2.4 % in the change from 25 °C; the " +
        "engine (Appelo 2015) follows Phutela & Pitzer within 0.3 % at 25–100 °C (previous case).",
    ),
  },
  {
    salt: "NaOH",
    reference: "Voigt (2020) VOI2020",
    grid: ALL([0.1, 0.5, 1, 2, 4]),
    disagreement: bounds(
      { 0: 7.5, 50: 7, 75: 9, 100: 9.5 },
      "Voigt's (2020) NaOH, two temperature terms per parameter, is 3–4 % below the CRC table at 25 °C and 0.5–1 mol/kg " +
        "(the engine: 1–1.5 %); the engine's Pabalan & Pitzer (1987) is a fit to NaOH(aq) data to 350 °C. Away from " +
        "25 °C they part by up to 9 % (4 mol/kg); the first-order derivatives of Silvester & Pitzer (1978) at 35 °C lie " +
        "between the two. No NaOH table away from 25 °C was at hand to decide.",
    ),
  },
];

describe("Aφ and the reference equations as transcribed", () => {
  it("the Pitzer model's Aφ: the other models' 0.3921 at 25 °C, changing with temperature as the Bradley & Pitzer (1979) Aφ does; within 0.3 % of Archer & Wang (1990) at 0–100 °C", () => {
    expect(pitzerWaterAPhi(25)).toBeCloseTo(debyeHuckelConstants(25).aPhi, 12);
    let worst = 0;
    for (let t = 0; t <= 100; t += 5)
      worst = Math.max(worst, Math.abs(pct(pitzerWaterAPhi(t), aPhiArcherWang(t + 273.15))));
    // Measured: 0.28 % (the Malmberg & Maryott Aφ alone is 0.55 % off at 100 °C).
    expect(worst).toBeLessThan(0.3);
    // The change from 25 °C is Møller's (1988), who fitted Bradley & Pitzer's values.
    const change = (a: (t: number) => number, t: number) => a(t) - a(25);
    for (const t of [0, 50, 100])
      expect(
        Math.abs(change(pitzerWaterAPhi, t) - change((c) => aPhiMoller(c + 273.15), t)),
      ).toBeLessThan(0.0005);
  });

  it("Aφ of Archer & Wang (1990) through Clegg, Rard & Pitzer (1994) reproduces the fixture's values at 0–100 °C (tests/fixtures/reference/water-properties.csv)", () => {
    const rows = readFixture("water-properties.csv").filter((r) =>
      r.original_source.startsWith("Clegg, Rard & Pitzer"),
    );
    for (const r of rows)
      expect(aPhiArcherWang(Number(r.temperature_C) + 273.15)).toBeCloseTo(Number(r.A_phi), 5);
    expect(rows.length).toBe(15);
  });

  it("the transcriptions at 25 °C: Phutela & Pitzer (1986) give Rard & Miller's (1981) MgSO4 values; every reference against the CRC Handbook (92nd ed.) table where it lists the salt, 0.1–2 mol/kg, within 2.6 % (K2SO4 5.5 %, reference README item 7; the KCl rows are from memory and not used)", () => {
    const mgso4 = REFERENCES.MgSO4[0].parameters(TR);
    // Rard & Miller (1981): β0 0.21499, β1 3.3646, β2 −32.743, Cφ 0.02797 (pytzer bC_Mg_SO4_RM81).
    const published = [0.21499, 3.3646, -32.743, 0.02797];
    [mgso4.beta0, mgso4.beta1, mgso4.beta2, mgso4.cPhi].forEach((value, i) =>
      expect(value).toBeCloseTo(published[i], 12),
    );
    const crc = readFixture("gamma-binary.csv").filter(
      (r) => r.temperature_C === "25" && r.original_source.startsWith("CRC"),
    );
    const table: Record<string, Record<string, number>> = {};
    let checked = 0;
    for (const [salt, references] of Object.entries(REFERENCES))
      for (const ref of references)
        for (const row of crc.filter((r) => r.salt === salt)) {
          const m = Number(row.molality_mol_per_kg);
          if (m < 0.1 || m > 2) continue;
          const g = pitzerBinary(SALT[salt], ref.parameters(TR), m, ref.aPhi(TR)).gamma;
          const d = pct(g, Number(row.gamma_pm));
          (table[`${salt} ${ref.name}`] ??= {})[`${m}`] = Number(d.toFixed(2));
          // K2SO4: the handbook's values at 0.1–0.5 mol/kg are 4–5 % below every Pitzer set
          // (tests/fixtures/reference/README.md, item 7). Measured elsewhere: at most 2.5 %
          // (Voigt 2020 CaCl2 at 2 mol/kg).
          expect(Math.abs(d), `${salt} ${ref.name} ${m}`).toBeLessThan(
            salt === "K2SO4" ? 5.5 : 2.6,
          );
          checked++;
        }
    console.table(table);
    // HCl, CaCl2, MgCl2, K2SO4 rows at 0.1–2 mol/kg, per reference.
    expect(checked).toBe(26);
  });
});

describe("temperature functions against independent published fits, 0–100 °C", () => {
  for (const c of CASES) {
    const ref = REFERENCES[c.salt].find((r) => r.name === c.reference)!;
    const s = SALT[c.salt];
    it(`${c.salt} against ${c.reference} (computed from the published equation)`, () => {
      const table: Record<string, Record<string, string>> = {};
      const failures: string[] = [];
      let points = 0;
      /** Engine and reference γ± and φ at T (°C), m; deviations in %. */
      const compare = (T: number, m: number) => {
        const ours = engine(s, m, T);
        const theirs = pitzerBinary(s, ref.parameters(T + 273.15), m, ref.aPhi(T + 273.15));
        return {
          ours,
          theirs,
          gamma: pct(ours.meanActivityCoefficient, theirs.gamma),
          phi: pct(ours.osmoticCoefficient!, theirs.phi),
        };
      };
      for (const [temperature, molalities] of Object.entries(c.grid)) {
        const T = Number(temperature);
        const TK = T + 273.15;
        expect(TK, `${c.reference} fitted range`).toBeGreaterThanOrEqual(ref.fitted[0] - 1e-9);
        expect(TK).toBeLessThanOrEqual(ref.fitted[1] + 1e-9);
        for (const m of molalities) {
          const d = compare(T, m);
          const d25 = compare(25, m);
          // Change from 25 °C, engine against reference (% of γ± and of φ).
          const change = {
            gamma:
              100 *
              (Math.log(d.ours.meanActivityCoefficient / d25.ours.meanActivityCoefficient) -
                Math.log(d.theirs.gamma / d25.theirs.gamma)),
            phi:
              100 *
              (d.ours.osmoticCoefficient! / d25.ours.osmoticCoefficient! -
                d.theirs.phi / d25.theirs.phi),
          };
          const known = c.disagreement?.(T, m);
          const limit = known?.limit ?? 1;
          // The change from 25 °C within the limit; the value itself within the limit plus
          // what the two publications' 25 °C values already differ by (the CRC-table check at
          // 25 °C, pitzer-temperature-salts.test.ts, says which is nearer the table there).
          if (
            Math.abs(change.gamma) >= limit ||
            Math.abs(change.phi) >= limit ||
            Math.abs(d.gamma) >= limit + Math.abs(d25.gamma) ||
            Math.abs(d.phi) >= limit + Math.abs(d25.phi)
          )
            failures.push(
              `${T} °C ${m} mol/kg: γ± ${d.gamma.toFixed(2)} %, φ ${d.phi.toFixed(2)} %; change from 25 °C ${change.gamma.toFixed(2)} %, ${change.phi.toFixed(2)} %`,
            );
          (table[`${m} mol/kg`] ??= {})[`${T} °C`] =
            `${d.ours.meanActivityCoefficient.toFixed(4)}/${d.theirs.gamma.toFixed(4)} ${d.gamma.toFixed(2)} (${change.gamma.toFixed(2)}) | φ ${d.phi.toFixed(2)} (${change.phi.toFixed(2)})${known ? " *" : ""}`;
          points++;
        }
      }
      console.log(
        `${c.salt}: engine γ± / ${c.reference} γ±, deviation % of γ± (of its change from 25 °C) | of φ (of its change); *: documented disagreement`,
      );
      console.table(table);
      expect(failures).toEqual([]);
      expect(points).toBe(Object.values(c.grid).flat().length);
    });
  }
});
