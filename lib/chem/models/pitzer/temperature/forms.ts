/**
 * The published forms of a Pitzer parameter as a function of temperature T (K), with
 * Tr = 298.15 K. Each table row names the form its coefficients belong to.
 *
 * - "phreeqc": P = A0 + A1(1/T − 1/Tr) + A2 ln(T/Tr) + A3(T − Tr) + A4(T² − Tr²) + A5(1/T² − 1/Tr²)
 *   (Appelo 2015, Appl. Geochem. 55, 62; the form of PHREEQC's pitzer.dat, src/pitzer.cpp).
 * - "holmes-mesmer-1983": P = a0 + a1(1/T − 1/Tr) + a2 ln(T/Tr) + a3(T − Tr) + a4(T² − Tr²)
 *   + a5 ln(T − 260)  (Holmes & Mesmer 1983, J. Phys. Chem. 87, 1242, eq. 25).
 * - "moller-1988": P = a1 + a2 T + a3/T + a4 ln T + a5/(T − 263) + a6 T² + a7/(680 − T)
 *   + a8/(T − 227)  (Møller 1988, Geochim. Cosmochim. Acta 52, 821, eq. 13; used by
 *   Campbell et al. 1993, Mar. Chem. 44, 221, eq. 31).
 * - "pabalan-pitzer-1987": P = a0 + a1 p + a2/T + a3 p/T + a4 ln T + a5 T + a6 T p + a7 T²
 *   + a8 T² p + a9/(T − 227) + a10/(647 − T) + a11 p/(647 − T), p in bar
 *   (Pabalan & Pitzer 1987, Geochim. Cosmochim. Acta 51, 2429, NaOH equation).
 * - "millero-pierrot-1998": a = [P_R, P_J·10⁵, P_RL·10⁴] of Millero & Pierrot (1998) Aquat.
 *   Geochem. 4, 153, eq. 15 (P_RL = ∂P/∂T at Tr, P_J = ∂²P/∂T² + (2/T)∂P/∂T, taken constant):
 *   P = P_R + P_J (T² − Tr²)/6 + (P_J Tr³/3 − P_RL Tr²)(1/T − 1/Tr).
 *   This is the integral of the definition of P_J with P(Tr) = P_R and ∂P/∂T(Tr) = P_RL; the
 *   public transcription (pytzer MP98_eq15) multiplies the P_RL term by P_J as well, which
 *   would make ∂P/∂T at 25 °C ≈ 0 against the P_RL of Silvester & Pitzer (1978) that the
 *   same paper tabulates; the tests check ∂P/∂T(Tr) = P_RL.
 */
export type TemperatureForm =
  "phreeqc" | "holmes-mesmer-1983" | "moller-1988" | "pabalan-pitzer-1987" | "millero-pierrot-1998";

const TR = 298.15;
/** Pressure of the 1 atm isobar in bar, for the one form that carries pressure terms. */
const ONE_ATMOSPHERE_BAR = 1.01325;

export function evaluateForm(form: TemperatureForm, a: readonly number[], T: number): number {
  switch (form) {
    case "phreeqc":
      return (
        a[0] +
        a[1] * (1 / T - 1 / TR) +
        a[2] * Math.log(T / TR) +
        a[3] * (T - TR) +
        a[4] * (T * T - TR * TR) +
        a[5] * (1 / (T * T) - 1 / (TR * TR))
      );
    case "holmes-mesmer-1983":
      return (
        a[0] +
        a[1] * (1 / T - 1 / TR) +
        a[2] * Math.log(T / TR) +
        a[3] * (T - TR) +
        a[4] * (T * T - TR * TR) +
        a[5] * Math.log(T - 260)
      );
    case "moller-1988":
      return (
        a[0] +
        a[1] * T +
        a[2] / T +
        a[3] * Math.log(T) +
        a[4] / (T - 263) +
        a[5] * T * T +
        a[6] / (680 - T) +
        a[7] / (T - 227)
      );
    case "pabalan-pitzer-1987": {
      const p = ONE_ATMOSPHERE_BAR;
      return (
        a[0] +
        a[1] * p +
        a[2] / T +
        (a[3] * p) / T +
        a[4] * Math.log(T) +
        a[5] * T +
        a[6] * T * p +
        a[7] * T * T +
        a[8] * T * T * p +
        a[9] / (T - 227) +
        a[10] / (647 - T) +
        (a[11] * p) / (647 - T)
      );
    }
    case "millero-pierrot-1998": {
      const pJ = a[1] * 1e-5;
      const pRL = a[2] * 1e-4;
      return (
        a[0] +
        (pJ * (T * T - TR * TR)) / 6 +
        ((pJ * TR ** 3) / 3 - pRL * TR * TR) * (1 / T - 1 / TR)
      );
    }
  }
}
