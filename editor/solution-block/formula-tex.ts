/**
 * The equation applied in a solution block, as TeX, with the solution's own numbers put in.
 * The numbers all come from lib/chem (A from its Debye–Hückel constants, I and γ± from the
 * result); this file only writes them into the published form of each equation.
 */

export interface FormulaNumbers {
  modelId: string;
  /** Debye–Hückel A (log10, molal scale) at the solution's temperature, kg^½ mol^−½. */
  aLog10: number;
  bPerAngstrom: number;
  ionicStrengthMolal: number;
  temperatureC: number;
  salt?: { formula: string; zPlus: number; zMinus: number; meanGamma: number };
  /** The engine's own TeX of the model, when it exposes one. */
  engineTex?: string;
}

const GENERAL: Record<string, string> = {
  "dh-limiting": String.raw`\log_{10}\gamma_i = -A z_i^2 \sqrt{I}`,
  guntelberg: String.raw`\log_{10}\gamma_i = -A z_i^2 \frac{\sqrt{I}}{1+\sqrt{I}}`,
  davies: String.raw`\log_{10}\gamma_i = -A z_i^2 \left(\frac{\sqrt{I}}{1+\sqrt{I}} - 0.3\,I\right)`,
  "dh-extended": String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + B\,\mathring{a}_i \sqrt{I}}`,
  "truesdell-jones": String.raw`\log_{10}\gamma_i = -\frac{A z_i^2 \sqrt{I}}{1 + B\,a_i \sqrt{I}} + b_i I`,
  sit: String.raw`\log_{10}\gamma_i = -z_i^2 \frac{A\sqrt{I}}{1 + 1.5\sqrt{I}} + \sum_k \varepsilon(i,k)\, m_k`,
  pitzer: String.raw`\ln\gamma_{MX} = |z_M z_X| f^\gamma + m\,\tfrac{2\nu_M\nu_X}{\nu} B^\gamma_{MX} + m^2 \tfrac{2(\nu_M\nu_X)^{3/2}}{\nu} C^\gamma_{MX}`,
};

const n = (value: number, digits = 4) => {
  const text = Math.abs(value) >= 1e-3 || value === 0 ? value.toPrecision(digits) : value.toExponential(digits - 1).replace(/e(.*)$/, "\\times 10^{$1}");
  return text;
};

/** The general equation of the model (the engine's TeX when it gives one). */
export function generalFormulaTex(modelId: string, engineTex?: string): string {
  return engineTex ?? GENERAL[modelId] ?? String.raw`\gamma_i = f(I)`;
}

/** The same equation for the chosen salt's mean coefficient, with numbers substituted, or null. */
export function substitutedFormulaTex(numbers: FormulaNumbers): string | null {
  const { salt, aLog10: A, ionicStrengthMolal: I } = numbers;
  if (!salt) return null;
  const zz = Math.abs(salt.zPlus * salt.zMinus);
  const rootI = Math.sqrt(I);
  const lhs = String.raw`\log_{10}\gamma_\pm(\text{${texSafeFormula(salt.formula)}})`;
  const result = String.raw`${n(Math.log10(salt.meanGamma))} \;\Rightarrow\; \gamma_\pm = ${n(salt.meanGamma)}`;
  const shape: Record<string, string> = {
    "dh-limiting": String.raw`-${n(A)}\times ${zz}\times\sqrt{${n(I)}}`,
    guntelberg: String.raw`-${n(A)}\times ${zz}\times\frac{${n(rootI)}}{1+${n(rootI)}}`,
    davies: String.raw`-${n(A)}\times ${zz}\times\left(\frac{${n(rootI)}}{1+${n(rootI)}} - 0.3\times ${n(I)}\right)`,
  };
  const middle = shape[numbers.modelId];
  if (middle) return `${lhs} = ${middle} = ${result}`;
  // Ion-size and interaction models: list the numbers that go in, then the engine's result.
  return String.raw`A = ${n(A)}\ \mathrm{kg^{1/2}\,mol^{-1/2}},\; B = ${n(numbers.bPerAngstrom)}\ \text{Å}^{-1}\,\mathrm{kg^{1/2}\,mol^{-1/2}},\; I = ${n(I)}\ \mathrm{mol\,kg^{-1}} \;\Rightarrow\; ${lhs} = ${result}`;
}

/** A formula as plain text inside \text{}: only characters that need no TeX escaping. */
function texSafeFormula(formula: string): string {
  return formula.replace(/[^A-Za-z0-9()[\]·+\- ]/g, "");
}
