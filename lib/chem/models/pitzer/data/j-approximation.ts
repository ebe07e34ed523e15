/**
 * Coefficients of Pitzer's closed-form approximation of the J(x) integral:
 * Pitzer (1975) J. Solution Chem. 4, 249–265, eq. 47 (also Pitzer 1991, Activity
 * Coefficients in Electrolyte Solutions, 2nd ed., Ch. 3). Values from memory of the paper;
 * the test suite checks the resulting J(x) against a quadrature of the defining integral.
 */
export const PITZER_1975_J_APPROXIMATION = {
  c1: 4.581,
  c2: 0.7237,
  c3: 0.012,
  c4: 0.528,
  source: "Pitzer (1975) J. Solution Chem. 4, 249-265, eq. 47 (from memory; checked by quadrature)",
} as const;
