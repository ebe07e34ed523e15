/**
 * The J(x) integral of the unsymmetrical-mixing (higher-order electrostatic) terms and its
 * derivative J′(x), Pitzer (1975) J. Solution Chem. 4, 249–265:
 *
 *   J(x) = (1/x) ∫₀^∞ [1 + q + q²/2 − e^q] y² dy,   q = −(x/y) e^(−y)
 *
 * evaluated with Pitzer's (1975) closed-form approximation (his eq. 47):
 *
 *   J(x) ≈ x / [4 + C1 x^(−C2) exp(−C3 x^C4)],  C1 = 4.581, C2 = 0.7237, C3 = 0.0120, C4 = 0.528
 *
 * and J′(x) as the exact derivative of that expression. The approximation is good to about
 * 1 % of J over the x range of aqueous electrolytes (x = 6 zi zj Aφ √I ≲ 50), which moves
 * ln γ by far less than the spread between published parameter sets; the test suite checks it
 * against a direct quadrature of the defining integral.
 */
import { PITZER_1975_J_APPROXIMATION as C } from "./data/j-approximation";

/** J(x) and dJ/dx at x ≥ 0 (both 0 at x = 0). */
export function jFunction(x: number): { j: number; jPrime: number } {
  if (!(x > 0)) return { j: 0, jPrime: 0 };
  const xPowC4 = Math.pow(x, C.c4);
  const tail = C.c1 * Math.pow(x, -C.c2) * Math.exp(-C.c3 * xPowC4);
  const denominator = 4 + tail;
  const j = x / denominator;
  // d/dx [x / D] with D = 4 + C1 x^−C2 e^(−C3 x^C4)
  const jPrime = (4 + tail * (1 + C.c2 + C.c3 * C.c4 * xPowC4)) / (denominator * denominator);
  return { j, jPrime };
}
