"use client";

import { useMemo } from "react";
import { debyeHuckelConstants } from "@/lib/chem";
import { Tex } from "../ui/tex";
import { saltCharges } from "../chem-catalogue";
import type { ChemInput, SolutionResult } from "./evaluate-solution-block";
import { generalFormulaTex, substitutedFormulaTex } from "./formula-tex";

interface FormulaAppliedProps {
  input: ChemInput;
  result: SolutionResult;
  /** The salt whose γ± is written out; the first salt when none is chosen. */
  saltFormula: string | null;
}

/** The model's equation, then the same equation with this solution's numbers. */
export function FormulaApplied({ input, result, saltFormula }: FormulaAppliedProps) {
  const tex = useMemo(() => {
    const modelId = result.model.used;
    const engineTex = (result.model as { formulaTex?: string }).formulaTex ?? (result as { formulaTex?: string }).formulaTex;
    let constants: { aLog10: number; bPerAngstrom: number } | null = null;
    try {
      constants = debyeHuckelConstants(input.temperatureC, input.solvent);
    } catch {
      constants = null;
    }
    const salt = result.salts.find((s) => s.formula === saltFormula) ?? result.salts[0];
    const charges = salt ? saltCharges(salt.formula) : null;
    const substituted =
      constants && salt && charges
        ? substitutedFormulaTex({
            modelId,
            aLog10: constants.aLog10,
            bPerAngstrom: constants.bPerAngstrom,
            ionicStrengthMolal: result.ionicStrength.molal,
            temperatureC: input.temperatureC,
            salt: { formula: salt.formula, meanGamma: salt.meanGamma, ...charges },
          })
        : null;
    return { general: generalFormulaTex(modelId, engineTex), substituted };
  }, [input, result, saltFormula]);

  return (
    <figure className="rounded-md border border-ink-faint/30 bg-paper px-3 py-2">
      <figcaption className="mb-1 text-[11px] font-medium uppercase tracking-wide text-ink-soft">Formula applied</figcaption>
      <div className="overflow-x-auto text-ink">
        <Tex tex={tex.general} display />
        {tex.substituted ? <Tex tex={tex.substituted} display className="text-lagoon-700" /> : null}
      </div>
    </figure>
  );
}
