/**
 * Ranges of the Debye–Hückel family in water (see range.ts for what a row means). The
 * ionic-strength limits are measured: the largest I at which every confirmed table value is
 * reproduced within 2 % (CRC Handbook 92nd ed. γ± at 25 °C for HCl, LiCl, NaCl, MgCl2, CaCl2,
 * K2SO4; Pitzer, Peiper & Busey 1984 for NaCl at 0–100 °C), with ion association on for
 * sulfates. The first failing table point is named beside each limit. Charge types without a
 * table (2:2 and higher) get the limiting-law scale, √I ≤ 0.1/|z₊z₋| (common practice).
 * Temperatures: 0–100 °C, where A and B are computed from εr and ρ of water at T.
 */
import { chargeTypeRows, type ModelRange } from "./range";

const WATER_C = { min: 0, max: 100 };
const TABLES = "Ionleaf: largest I with every CRC/PPB84 table value within 2 %";

/** √I ≤ 0.1/|z₊ z₋|: the limiting-law scale for charge types without a table. */
const scale = (zz: number) => (0.1 / zz) ** 2;

export const DH_EXTENDED_RANGE: ModelRange = {
  temperatureC: WATER_C,
  // first misses: NaCl 0.1 mol/kg (−2.2 %), CaCl2 I = 0.3 (−3.2 %), K2SO4 I = 0.03 (−2.5 %)
  limits: chargeTypeRows(
    { "1:1": 0.05, "2:1": 0.15, "1:2": 0.015, "2:2": scale(4), higher: scale(9) },
    4,
  ),
  basis: TABLES,
};

export const DAVIES_RANGE: ModelRange = {
  temperatureC: WATER_C,
  // first misses: HCl 0.1 mol/kg (−2.0 %), MgCl2 I = 0.06 (−2.3 %), K2SO4 I = 0.3 (+5.5 %)
  limits: chargeTypeRows({ "1:1": 0.05, "2:1": 0.03, "1:2": 0.15, "2:2": scale(4) }, 2),
  basis: TABLES,
};

export const GUNTELBERG_RANGE: ModelRange = {
  temperatureC: WATER_C,
  // first misses: HCl 0.05 mol/kg (−3.1 %), MgCl2 I = 0.015 (−2.1 %), K2SO4 I = 0.015 (−2.2 %)
  limits: chargeTypeRows({ "1:1": 0.02, "2:1": 0.01, "1:2": 0.01, "2:2": scale(4) }, 2),
  basis: TABLES,
};

/** Every ion with a WATEQ4F-fitted b (Truesdell & Jones 1974; Ball & Nordstrom 1991). */
export const TRUESDELL_JONES_FITTED_RANGE: ModelRange = {
  temperatureC: WATER_C,
  limits: [
    // b was fitted at 25 °C: near it to I = 2 (MgCl2 I = 3: −3.1 %; Na2SO4 I = 0.6: +5 % against
    // Robinson & Stokes 1959 from memory and Pitzer alike, so 1:2 to I = 0.3) …
    ...chargeTypeRows({ "1:1": 2, "2:1": 2, "1:2": 0.3, "2:2": scale(4) }, 2, { min: 20, max: 30 }),
    // … elsewhere to I = 0.3 (NaCl 0.5 mol/kg: −2.2 % at 70 °C; 0.75 mol/kg: +3.3 % at 0 °C)
    ...chargeTypeRows({ "1:1": 0.3, "2:1": 0.3, "1:2": 0.3, "2:2": scale(4) }, 2),
  ],
  basis: TABLES,
};

/** Some ion without a fitted b: the b-dot form of Helgeson (1969). */
export const TRUESDELL_JONES_BDOT_RANGE: ModelRange = {
  temperatureC: WATER_C,
  // first miss: LiCl 0.2 mol/kg (−2.1 %)
  limits: chargeTypeRows(
    { "1:1": 0.1, "2:1": 0.1, "1:2": 0.1, "2:2": scale(4), higher: scale(9) },
    4,
  ),
  basis: TABLES,
};
