import { formulaAsText } from "./formula-text";

interface TypedComponent {
  formula?: unknown;
  amount?: unknown;
  unit?: unknown;
  /** The basis of a weighed amount: "22.37 g per 100 mL". */
  perAmount?: unknown;
  perUnit?: unknown;
}

const shown = (x: unknown) =>
  typeof x === "number" && Number.isFinite(x) ? Number(x.toPrecision(3)).toString() : "?";

/**
 * A solution's recipe in one line, formulas typeset: "0.1 mol/kg NaCl + 5 mmol/L K₃Fe(CN)₆",
 * "22.4 g per 100 mL KCl".
 * Reads the block's components as stored (untyped JSON); rows without a formula are skipped
 * and a missing amount reads as "?".
 */
export function compositionSummary(components: unknown): string {
  if (!Array.isArray(components)) return "";
  return (components as TypedComponent[])
    .filter((c) => typeof c?.formula === "string" && c.formula.trim() !== "")
    .map((c) => {
      const unit = typeof c.unit === "string" ? c.unit : "";
      const per =
        typeof c.perUnit === "string" && c.perAmount !== null && c.perAmount !== undefined
          ? ` per ${shown(c.perAmount)} ${c.perUnit}`
          : "";
      return `${shown(c.amount)} ${unit}${per} ${formulaAsText(String(c.formula).trim())}`.replace(
        /\s+/g,
        " ",
      );
    })
    .join(" + ");
}
