/**
 * Thermodynamic sanity of a result before it is shown: φ > 0, 0 < a_w ≤ 1 for solutions of
 * non-volatile solutes, every γ and activity finite and positive. A result that fails is
 * outside the model's range, with the reason (its numbers are not physical).
 */
import { ChemInputError } from "../errors";

export interface SanityInput {
  modelLabel: string;
  lnGamma: readonly number[];
  ionFormulas: readonly string[];
  osmoticCoefficient: number;
  waterActivity?: number;
}

/** ln γ beyond which exp() leaves double precision: the model has no usable answer. */
const LN_OVERFLOW = 700;

export function sanityMessages(s: SanityInput): string[] {
  const messages: string[] = [];
  s.lnGamma.forEach((lg, i) => {
    if (!Number.isFinite(lg) || Math.abs(lg) > LN_OVERFLOW) {
      throw new ChemInputError(
        `The ${s.modelLabel} model gives no finite activity coefficient for ${s.ionFormulas[i]} in this solution (far outside its range).`,
        { field: "model", code: "model_failed" },
      );
    }
  });
  if (!Number.isFinite(s.osmoticCoefficient) || s.osmoticCoefficient <= 0)
    messages.push(
      `The ${s.modelLabel} model gives an osmotic coefficient φ = ${Number(s.osmoticCoefficient.toPrecision(3))} ≤ 0 here, which no solution has: this composition is outside the model's range and its numbers are not physical.`,
    );
  if (s.waterActivity !== undefined && !(s.waterActivity > 0 && s.waterActivity <= 1))
    messages.push(
      `The water activity a_w = ${Number(s.waterActivity.toPrecision(3))} is outside 0 < a_w ≤ 1: this composition is outside the model's range.`,
    );
  return messages;
}
