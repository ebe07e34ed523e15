import { formulaAsText } from "./formula-text";

interface TypedComponent {
  formula?: unknown;
  amount?: unknown;
  unit?: unknown;
}

/**
 * A solution's recipe in one line, formulas typeset: "0.1 mol/kg NaCl + 5 mmol/L K₃Fe(CN)₆".
 * Reads the block's components as stored (untyped JSON); rows without a formula are skipped
 * and a missing amount reads as "?".
 */
export function compositionSummary(components: unknown): string {
  if (!Array.isArray(components)) return "";
  return (components as TypedComponent[])
    .filter((c) => typeof c?.formula === "string" && c.formula.trim() !== "")
    .map((c) => {
      const amount =
        typeof c.amount === "number" && Number.isFinite(c.amount)
          ? Number(c.amount.toPrecision(3)).toString()
          : "?";
      const unit = typeof c.unit === "string" ? c.unit : "";
      return `${amount} ${unit} ${formulaAsText(String(c.formula).trim())}`.replace(/\s+/g, " ");
    })
    .join(" + ");
}
