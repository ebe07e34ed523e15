/**
 * The Debye–Hückel osmotic slope Aφ the Pitzer model uses in water. Pitzer parameters are fitted
 * together with an Aφ(T). PHREEQC, in which Appelo (2015) and Voigt (2020) fitted theirs,
 * computes it from the permittivity of Bradley & Pitzer (1979) (PHREEQC src, calc_dielectrics);
 * Møller's (1988) Aφ equation agrees with it within 0.01 % at 100 °C; Pitzer's group (Pitzer,
 * Peiper & Busey 1984; Phutela & Pitzer 1986; Pabalan & Pitzer 1987) used Bradley & Pitzer too
 * (from memory). It is within 0.15 % of Archer & Wang (1990) at 0–100 °C. The Malmberg &
 * Maryott (1956) εr of the other models gives an Aφ 0.28 % above Archer & Wang at 0 °C and
 * 0.55 % below at 100 °C, enough to move γ± of a 2:2 salt at 1–2 mol/kg by 3.3–3.9 % at 100 °C
 * against the fit's own values (tests/unit/chem/pitzer-temperature-references.test.ts). Same
 * general expression and water density (Kell 1975) as debye-huckel-constants.ts; only εr differs.
 */
import { debyeHuckelConstants, debyeHuckelConstantsFrom } from "../../debye-huckel-constants";
import { waterDensityGPerMl, waterRelativePermittivityBradleyPitzer } from "../../solvents/water";

const bradleyPitzerAPhi = (temperatureC: number) =>
  debyeHuckelConstantsFrom(
    waterRelativePermittivityBradleyPitzer(temperatureC),
    waterDensityGPerMl(temperatureC),
    temperatureC,
  ).aPhi;

/** Aφ at 25 °C as the other models have it (Malmberg & Maryott εr): 0.3921 (kg/mol)^½. */
const A_PHI_25 = debyeHuckelConstants(25).aPhi;
const BRADLEY_PITZER_A_PHI_25 = bradleyPitzerAPhi(25);

/**
 * Aφ (kg/mol)^½ of water at 1 atm for the Pitzer model, 0–100 °C: the 25 °C value the 25 °C
 * parameter sets (Pitzer & Mayorga 1973, May et al. 2011) reproduce their tables with, changed
 * with temperature as the Bradley & Pitzer Aφ changes, like the anchored parameter rows. So 25 °C
 * results stay as the handbook tables have them (CaCl2 at 2 mol/kg moved 2.2 % above the CRC
 * value with the Bradley & Pitzer value itself) and the temperature change is the fits' own.
 */
export function pitzerWaterAPhi(temperatureC: number): number {
  return A_PHI_25 + bradleyPitzerAPhi(temperatureC) - BRADLEY_PITZER_A_PHI_25;
}
