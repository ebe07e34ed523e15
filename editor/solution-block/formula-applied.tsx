"use client";

import { formatSignificant } from "@/lib/ui/format-number";
import { Tex } from "../ui/tex";
import type { SolutionResult } from "@/lib/document/evaluate-solution-block";

/**
 * The model's equation as lib/chem states it, then the same equation with this solution's
 * numbers (lib/chem's `formulaTex`), then the resulting mean coefficient of each salt.
 */
export function FormulaApplied({ result }: { result: SolutionResult }) {
  return (
    <figure className="rounded-md border border-ink-faint/30 bg-paper px-3 py-2">
      <figcaption className="mb-1 text-[11px] font-medium tracking-wide text-ink-soft uppercase">
        Formula applied — {result.model.label}
      </figcaption>
      {/* Long equations (Pitzer's) wrap at their + and = signs instead of running out of the
          box: KaTeX breaks lines only in inline mode, so they are set inline in display style. */}
      <div className="space-y-1 text-ink">
        {result.formulaTexGeneral ? <Tex tex={result.formulaTexGeneral} wrap /> : null}
        {result.formulaTex && result.formulaTex !== result.formulaTexGeneral ? (
          <Tex tex={result.formulaTex} wrap className="text-lagoon-700" />
        ) : null}
      </div>
      <p className="mt-1 font-mono text-xs text-ink-soft tabular-nums">
        A = {formatSignificant(result.constants.aLog10)} (kg/mol)<sup>1/2</sup> · I ={" "}
        {formatSignificant(result.ionicStrength.molal)} mol/kg
        {result.salts
          .map((salt) => ` · γ±(${salt.formula}) = ${formatSignificant(salt.meanGamma)}`)
          .join("")}
      </p>
    </figure>
  );
}
