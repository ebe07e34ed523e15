/**
 * Pitzer binary parameters as full functions of temperature (form in ../temperature/forms.ts),
 * for the salts where a published function exists. A row replaces the 25 °C parameter set
 * of the same pair: its value at 25 °C belongs to the same fit as its temperature terms.
 *
 * Where a function's own 25 °C values reproduce the tabulated γ± less well than the 25 °C
 * compilation (MgCl2 −2.2 %, K2SO4 +3.5 % against the CRC Handbook table; HCl +3 % at
 * 6 mol/kg against Robinson & Stokes 1959, from memory), or where no table at 25 °C is at hand
 * to choose between them (KOH), the row is
 * `anchored`: P(T) = P(25 °C, compilation) + F(T) − F(298.15 K), the function's temperature
 * change added to the compilation value, as first-order derivatives are applied.
 *
 * - Appelo (2015) Appl. Geochem. 55, 62–71 ("ref. 3" of PHREEQC pitzer.dat), fitted to
 *   0–200 °C; Ionleaf states 0–100 °C (its water correlations). Public copy: github
 *   usgs-coupled/phreeqc3 database/pitzer.dat (tests/fixtures/reference/pitzer-binary-temperature.csv).
 *   Its KCl β0 and Cφ are those of Greenberg & Møller (1989), its MgCl2 β0 and β1 those of
 *   de Lima & Pitzer (1983) with the Cφ of Pabalan & Pitzer (1987): the checks use other fits.
 * - Holmes & Mesmer (1983) J. Phys. Chem. 87, 1242, eq. 25 and Table: LiCl, CsCl, 0–250 °C.
 * - Campbell et al. (1993) Mar. Chem. 44, 221, eq. 31: HCl, 0–55 °C (β0 a2 = −2.1197e-3,
 *   the misprint corrected as in Waters & Millero 2013).
 * - Pabalan & Pitzer (1987) Geochim. Cosmochim. Acta 51, 2429: NaOH, 0–350 °C.
 * - Millero & Pierrot (1998) Aquat. Geochem. 4, 153–199, eq. 15 and appendix tables: nitrates
 *   and NaClO4, 0–50 °C. Their P_RL are the ∂P/∂T of Silvester & Pitzer (1978) / Pitzer (1991)
 *   (data/temperature-derivatives.ts, identical numbers) and their P_J the heat-capacity terms;
 *   P_R are the Pitzer & Mayorga (1973) 25 °C values, so the rows are anchored on the 25 °C
 *   compilation (May et al. 2011). Their molality limit is that of the ∂P/∂T fit; the 25 °C
 *   row keeps its own range at 25 ± 0.5 °C (`limitAwayFrom25`).
 * - Voigt (2020) THEREDA Journal 1(1), 1–9 ("Hexary system of oceanic salts – polythermal Pitzer
 *   dataset", the THEREDA data set VOI2020): KOH, 273.15–393.15 K, in the PHREEQC form (data
 *   class "based upon experimental data"). Public copy: github usgs-coupled/phreeqc3
 *   database/OtherDatabases/THEREDA_2026-01_PHRQ.dat. Anchored on May et al. (2011) at 25 °C,
 *   so 25 °C results stay as they were (no KOH table at 25 °C is in the fixtures to choose
 *   between the sets). The export states no molality range for the fit: Ionleaf applies the
 *   temperature terms to 6 mol/kg, where VOI2020's own 25 °C γ± stays within 5 % of Pitzer &
 *   Mayorga (1973) and May et al. (2011) (measured 4.5 %; at 8–10 mol/kg they part by up to
 *   17 %); beyond it, away from 25 °C, the result says so (tests/unit/chem/pitzer-temperature-salts.test.ts).
 * Public copy of HM83, CMR93, PP87 and MP98: github mvdh7/pytzer pytzer/parameters.py
 * (bC_*_HM83, bC_H_Cl_CMR93, bC_Na_OH_PP87i, bC_*_MP98).
 *
 * Every row is evaluated with the Aφ of Bradley & Pitzer's (1979) permittivity, the one its fit
 * used (models/pitzer/water-a-phi.ts). Checked away from 25 °C (lib/chem/README.md has the
 * table): NaCl against the tables of Pitzer, Peiper & Busey (1984); KCl, HCl, CaCl2, MgCl2, the
 * sulfates and NaOH against independent published fits (Archer 1999; Møller 1988; Greenberg &
 * Møller 1989; Phutela & Pitzer 1986; Voigt 2020), within 1 % except where two published fits
 * disagree (CaCl2 at 0 and 75–100 °C, MgCl2 above 1 mol/kg, Na2SO4 at 0 °C, NaOH); LiCl, CsCl,
 * KOH, the nitrates and NaClO4 have no independent fit or table away from 25 °C at hand.
 *
 * The other perchlorates (LiClO4, KClO4, HClO4, Mg/Ca(ClO4)2) and nitrates (LiNO3, HNO3) have
 * no published temperature function in the sources at hand (MP98 lists only NaClO4 and the Na,
 * K, Mg, Ca nitrates; THEREDA gives HNO3 and the nitrates at 25 °C only and has no Li or ClO4):
 * they keep the first-order derivatives (10–40 °C) or the 25 °C set, and say so away from it.
 * The KOH row of the MP98 transcription carries the KI temperature terms (an estimate by
 * analogy, 0–50 °C); it is not used now that a KOH fit exists.
 */
import type { TemperatureForm } from "../temperature/forms";

export interface PitzerTemperatureFunctionRow {
  salt: string;
  cation: string;
  anion: string;
  form: TemperatureForm;
  beta0: readonly number[];
  beta1: readonly number[];
  beta2: readonly number[] | null;
  cPhi: readonly number[];
  alpha1: number;
  alpha2: number;
  /** True: add F(T) − F(298.15 K) to the 25 °C compilation row instead of using F(T) itself. */
  anchored?: boolean;
  /**
   * Anchored rows only. True: at 25 ± 0.5 °C the 25 °C row's own molality range holds, and
   * `maxMolality` (the fit of the temperature terms) limits only away from 25 °C, said in a
   * message as for first-order derivatives. False/absent: the smaller of the two always.
   */
  limitAwayFrom25?: boolean;
  /** Temperatures (°C) the function is stated for in Ionleaf. */
  rangeC: { min: number; max: number };
  /** Top of the molality range of the fit (mol/kg). */
  maxMolality: number;
  source: string;
}

const APPELO =
  "Appelo (2015) Appl. Geochem. 55, 62-71 (PHREEQC pitzer.dat, ref. 3), fitted 0-200 °C";
const HM83 = "Holmes & Mesmer (1983) J. Phys. Chem. 87, 1242-1255, eq. 25";
const CMR93 = "Campbell et al. (1993) Mar. Chem. 44, 221-233, eq. 31";
const PP87 = "Pabalan & Pitzer (1987) Geochim. Cosmochim. Acta 51, 2429-2443";
const MP98 = "Millero & Pierrot (1998) Aquat. Geochem. 4, 153-199, eq. 15";
const MP98_RANGE = { min: 0, max: 50 };
const VOI2020 =
  "Voigt (2020) THEREDA Journal 1(1), 1-9 (THEREDA data set VOI2020), fitted 0-120 °C";

/** One Millero & Pierrot (1998) row: [P_R, P_J·10⁵, P_RL·10⁴] for β0, β1 and Cφ. */
const mp98 = (
  salt: string,
  cation: string,
  anion: string,
  beta0: readonly number[],
  beta1: readonly number[],
  cPhi: readonly number[],
  maxMolality: number,
): PitzerTemperatureFunctionRow => ({
  salt,
  cation,
  anion,
  form: "millero-pierrot-1998",
  beta0,
  beta1,
  beta2: null,
  cPhi,
  alpha1: 2,
  alpha2: 12,
  anchored: true,
  limitAwayFrom25: true,
  rangeC: MP98_RANGE,
  maxMolality,
  source: MP98,
});

const WATER = { min: 0, max: 100 };

export const PITZER_TEMPERATURE_FUNCTIONS: readonly PitzerTemperatureFunctionRow[] = [
  {
    salt: "NaCl",
    cation: "Na+",
    anion: "Cl-",
    form: "phreeqc",
    beta0: [0.07534, 9598.4, 35.48, -0.058731, 1.798e-5, -5e5],
    beta1: [0.2769, 13770, 46.8, -0.069512, 2e-5, -748230],
    beta2: null,
    cPhi: [0.00148, -120.5, -0.2081, 0, 1.166e-7, 11121],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 6.1,
    source: APPELO,
  },
  {
    salt: "KCl",
    cation: "K+",
    anion: "Cl-",
    form: "phreeqc",
    beta0: [0.04808, -758.48, -4.7062, 0.010072, -3.7599e-6, 0],
    beta1: [0.2168, 0, -6.895, 0.02262, -9.293e-6, -1e5],
    beta2: null,
    cPhi: [-7.88e-4, 91.27, 0.58643, -0.001298, 4.9567e-7, 0],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 4.8,
    source: APPELO,
  },
  {
    salt: "CaCl2",
    cation: "Ca^2+",
    anion: "Cl-",
    form: "phreeqc",
    beta0: [0.3159, 0, 0, -3.27e-4, 1.4e-7, 0],
    beta1: [1.614, 0, 0, 7.63e-3, -8.19e-7, 0],
    beta2: [-1.13, 0, 0, -0.0476, 0, 0],
    cPhi: [1.4e-4, -57, -0.098, -7.83e-4, 7.18e-7, 0],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 6,
    source: APPELO,
  },
  {
    salt: "MgCl2",
    cation: "Mg^2+",
    anion: "Cl-",
    form: "phreeqc",
    beta0: [0.351, 0, 0, -9.32e-4, 5.94e-7, 0],
    beta1: [1.65, 0, 0, -0.0109, 2.6e-5, 0],
    beta2: null,
    cPhi: [0.00651, 0, 0, -2.5e-4, 2.418e-7, 0],
    alpha1: 2,
    alpha2: 12,
    anchored: true,
    rangeC: WATER,
    maxMolality: 5,
    source: APPELO,
  },
  {
    salt: "Na2SO4",
    cation: "Na+",
    anion: "SO4^2-",
    form: "phreeqc",
    beta0: [0.0273, 0, -5.8, 9.89e-3, 0, -1.563e5],
    beta1: [0.956, 2663, 0, 0.01158, 0, -3.194e5],
    beta2: null,
    cPhi: [3.418e-3, -384, 0, -8.451e-4, 0, 5.177e4],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 4,
    source: APPELO,
  },
  {
    salt: "K2SO4",
    cation: "K+",
    anion: "SO4^2-",
    form: "phreeqc",
    beta0: [0.0317, 0, 0, 9.28e-4, 0, 0],
    beta1: [0.756, -1.514e4, -80.3, 0.1091, 0, 0],
    beta2: null,
    cPhi: [8.18e-3, -625, -3.3, 4.06e-3, 0, 0],
    alpha1: 2,
    alpha2: 12,
    anchored: true,
    rangeC: WATER,
    maxMolality: 0.7,
    source: APPELO,
  },
  {
    salt: "MgSO4",
    cation: "Mg^2+",
    anion: "SO4^2-",
    form: "phreeqc",
    beta0: [0.2135, -951, 0, -0.0234, 2.28e-5, 0],
    beta1: [3.367, -5780, 0, -0.148, 1.576e-4, 0],
    beta2: [-32.45, 0, -3236, 21.812, -0.018859, 0],
    cPhi: [0.02875, 0, -2.084, 0.011428, -8.228e-6, 0],
    alpha1: 1.4,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 3,
    source: APPELO,
  },
  {
    salt: "LiCl",
    cation: "Li+",
    anion: "Cl-",
    form: "holmes-mesmer-1983",
    beta0: [0.14847, 0, 0, -1.546e-4, 0, 0],
    beta1: [0.307, 0, 0, 6.36e-4, 0, 0],
    beta2: null,
    cPhi: [0.00371, 4.115, 0, 0, -3.71e-9, 0],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 6,
    source: HM83,
  },
  {
    salt: "CsCl",
    cation: "Cs+",
    anion: "Cl-",
    form: "holmes-mesmer-1983",
    beta0: [0.03352, -1290, -8.4279, 0.018502, -6.7942e-6, 0],
    beta1: [0.0429, -38, 0, 0.001306, 0, 0],
    beta2: null,
    cPhi: [-2.62e-4, 157.13, 1.086, -0.0025242, 9.84e-7, 0],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 6,
    source: HM83,
  },
  {
    salt: "HCl",
    cation: "H+",
    anion: "Cl-",
    form: "moller-1988",
    beta0: [1.2859, -2.1197e-3, -142.5877, 0, 0, 0, 0, 0],
    beta1: [-4.4474, 8.425698e-3, 665.7882, 0, 0, 0, 0, 0],
    beta2: null,
    cPhi: [-0.305156, 5.16e-4, 45.52154, 0, 0, 0, 0, 0],
    alpha1: 2,
    alpha2: 12,
    anchored: true,
    rangeC: { min: 0, max: 55 },
    maxMolality: 6,
    source: CMR93,
  },
  {
    salt: "NaOH",
    cation: "Na+",
    anion: "OH-",
    form: "pabalan-pitzer-1987",
    beta0: [
      2.7682478e2, -2.8131778e-3, -7.3755443e3, 3.701254e-1, -4.935997e1, 1.0945106e-1,
      7.1788733e-6, -4.0218506e-5, -5.8847404e-9, 1.1931122e1, 2.4824963, -4.821741e-3,
    ],
    beta1: [
      4.6286977e2, 0, -1.0294181e4, 0, -8.5960581e1, 2.3905969e-1, 0, -1.0795894e-4, 0, 0, 0, 0,
    ],
    beta2: null,
    cPhi: [
      -1.6686897e1, 4.0534778e-4, 4.5364961e2, -5.1714017e-2, 2.9680772, -6.5161667e-3,
      -1.0553037e-6, 2.3765786e-6, 8.9893405e-10, -6.8923899e-1, -8.1156286e-2, 0,
    ],
    alpha1: 2,
    alpha2: 12,
    rangeC: WATER,
    maxMolality: 6,
    source: PP87,
  },
  {
    salt: "KOH",
    cation: "K+",
    anion: "OH-",
    form: "phreeqc",
    beta0: [0.13733900526985, 147.009407059955, 0, 7.87878490588731e-4, 0, 0],
    beta1: [0.33487971107695, -2151.13077034097, 0, -0.0171311827530218, 0, 0],
    beta2: null,
    cPhi: [0.001788662588501, -22.3159846052078, 0, -2.02214587768356e-4, 0, 0],
    alpha1: 2,
    alpha2: 12,
    anchored: true,
    limitAwayFrom25: true,
    rangeC: WATER,
    // Not stated in the source at hand; Ionleaf's limit, measured (see the header).
    maxMolality: 6,
    source: VOI2020,
  },
  // Molality limits: those of the Silvester & Pitzer (1978) / Pitzer (1991) ∂P/∂T fits.
  mp98(
    "NaNO3",
    "Na+",
    "NO3-",
    [0.0068, -2.24, 12.66],
    [0.1783, -2.96, 20.6],
    [-0.00072, 0.594, -2.316],
    2.2,
  ),
  mp98(
    "KNO3",
    "K+",
    "NO3-",
    [-0.0816, -0.785, 2.06],
    [0.0494, -8.26, 64.5],
    [0.0066, 0, 3.97],
    2.4,
  ),
  mp98(
    "NaClO4",
    "Na+",
    "ClO4-",
    [0.0554, -0.611, 12.96],
    [0.2755, -6.35, 22.97],
    [-0.00118, 0.0562, -1.623],
    6,
  ),
  mp98(
    "Mg(NO3)2",
    "Mg^2+",
    "NO3-",
    [0.367125, -1.2322, 5.15],
    [1.58475, 4.0492, 44.925],
    [-0.020625, 0, 0],
    0.1,
  ),
  mp98(
    "Ca(NO3)2",
    "Ca^2+",
    "NO3-",
    [0.210825, 4.0248, 5.295],
    [1.40925, -13.289, 91.875],
    [-0.020142, -15.435, 0],
    0.1,
  ),
];
