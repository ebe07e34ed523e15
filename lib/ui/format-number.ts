/**
 * Number formatting for computed values. Chemists read significant figures, so values are
 * shown to a fixed number of them; very small and very large values switch to a
 * ×10ⁿ form instead of a run of zeros. Pure, shared by the editor and pages.
 */
const SUPERSCRIPT_DIGITS: Record<string, string> = {
  "0": "⁰",
  "1": "¹",
  "2": "²",
  "3": "³",
  "4": "⁴",
  "5": "⁵",
  "6": "⁶",
  "7": "⁷",
  "8": "⁸",
  "9": "⁹",
  "-": "⁻",
};

export function formatSignificant(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e5) {
    // toPrecision keeps trailing zeros that carry meaning ("0.1000"). It switches to
    // exponent form when the integer part has more digits than asked (12345 → "1.235e+4"):
    // that case falls through to the × 10ⁿ form rather than losing the exponent.
    const fixed = Number(value).toPrecision(digits);
    if (!fixed.includes("e")) return fixed.replace("-", "−");
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

const CURRENT_PREFIXES = [
  { factor: 1, unit: "A" },
  { factor: 1e3, unit: "mA" },
  { factor: 1e6, unit: "µA" },
  { factor: 1e9, unit: "nA" },
  { factor: 1e12, unit: "pA" },
];

/** A current with the prefix that puts it between 1 and 1000: "77.72 µA", "−1.204 nA". */
export function formatCurrentA(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const prefix =
    CURRENT_PREFIXES.find((p) => Math.abs(value) * p.factor >= 1) ??
    CURRENT_PREFIXES[CURRENT_PREFIXES.length - 1];
  return `${formatSignificant(value * prefix.factor, digits)} ${prefix.unit}`;
}

/** Parses what a person types into a number field: "1,5", "1e-3", "−0.2". Null when empty or not a number. */
export function parseTypedNumber(text: string): number | null {
  const cleaned = text
    .trim()
    .replace(/\s+/g, "")
    .replace(/[−–]/g, "-")
    .replace(",", ".")
    .replace(/[×x]10\^?/i, "e");
  if (cleaned === "" || cleaned === "-" || cleaned === ".") return null;
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}

const FROM_SUPERSCRIPT: Record<string, string> = Object.fromEntries(
  Object.entries(SUPERSCRIPT_DIGITS).map(([digit, sup]) => [sup, digit]),
);

/** The inverse of formatSignificant: "0.1000", "−2.217 × 10⁻⁴" → a number; null when unreadable. */
export function parseShownNumber(text: string): number | null {
  const match = /^(−?[\d.]+)(?: × 10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?$/.exec(text.trim());
  if (!match) return null;
  const exponent = match[2] ? Number([...match[2]].map((ch) => FROM_SUPERSCRIPT[ch]).join("")) : 0;
  return Number(match[1].replace("−", "-")) * 10 ** exponent;
}
