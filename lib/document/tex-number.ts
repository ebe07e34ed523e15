/** A number for KaTeX: "0.0707", "1.23\times10^{-6}"; significant digits as asked. */
export function texNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return "\\text{—}";
  if (value === 0) return "0";
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e5) {
    const fixed = value.toPrecision(digits);
    if (!fixed.includes("e")) return fixed;
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split("e");
  return `${mantissa}\\times10^{${Number(exponent)}}`;
}
