/**
 * Number formatting for computed values. Chemists read significant figures, so values are
 * shown to a fixed number of them; very small and very large values switch to a
 * ×10ⁿ form instead of a run of zeros. Pure, shared by the editor and pages.
 */
const SUPERSCRIPT_DIGITS: Record<string, string> = {
  "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻",
};

export function formatSignificant(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e5) {
    // toPrecision keeps trailing zeros that carry meaning ("0.1000").
    return Number(value).toPrecision(digits).replace(/e.*$/, "").replace("-", "−");
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split("e");
  const sup = String(Number(exponent)).replace(/[-0-9]/g, (ch) => SUPERSCRIPT_DIGITS[ch]);
  return `${mantissa.replace("-", "−")} × 10${sup}`;
}

/** A potential in volts, always with its sign and to the millivolt or better. */
export function formatPotentialV(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const text = Math.abs(value).toFixed(4);
  return `${value < 0 ? "−" : "+"}${text}`;
}

/** Parses what a person types into a number field: "1,5", "1e-3", "−0.2". Null when empty or not a number. */
export function parseTypedNumber(text: string): number | null {
  const cleaned = text.trim().replace(/\s+/g, "").replace(/[−–]/g, "-").replace(",", ".").replace(/[×x]10\^?/i, "e");
  if (cleaned === "" || cleaned === "-" || cleaned === ".") return null;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}
