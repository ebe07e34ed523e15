// @vitest-environment node
import { describe, expect, it } from "vitest";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { AMOUNT_UNITS, PER_UNITS, UNITS_NEEDING_PER } from "@/lib/document/block-schemas";
import { evaluateSolutionBlock } from "@/lib/document/evaluate-solution-block";

// Every unit the block offers must be one lib/chem reads, or the menu would offer a refusal.
describe("units offered by the solution block", () => {
  it.each(AMOUNT_UNITS)("lib/chem accepts %s", (unit) => {
    const needsPer = UNITS_NEEDING_PER.includes(unit);
    const amount =
      unit === "mass fraction"
        ? 0.005
        : unit === "wt%"
          ? 0.5
          : unit === "g/L"
            ? 7.455
            : needsPer
              ? unit === "mg"
                ? 745.5
                : 0.7455
              : 0.1;
    const evaluation = evaluateSolutionBlock(
      defaultSolutionBlockInput({
        components: [
          {
            formula: "KCl",
            amount,
            unit,
            ...(needsPer ? { perAmount: 100, perUnit: "mL" as const } : {}),
          },
        ],
      }),
    );
    expect(evaluation.status === "ok" ? "ok" : evaluation).toBe("ok");
  });

  it.each(PER_UNITS)("lib/chem accepts a basis in %s", (perUnit) => {
    const perAmount = perUnit === "kg" || perUnit === "L" ? 0.1 : 100;
    const evaluation = evaluateSolutionBlock(
      defaultSolutionBlockInput({
        components: [{ formula: "KCl", amount: 0.7455, unit: "g", perAmount, perUnit }],
      }),
    );
    expect(evaluation.status === "ok" ? "ok" : evaluation).toBe("ok");
  });

  it("reads 7.455 g/L of KCl as 0.1 mol/L (M(KCl) = 74.55 g/mol, IUPAC 2021 atomic weights)", () => {
    const evaluation = evaluateSolutionBlock(
      defaultSolutionBlockInput({ components: [{ formula: "KCl", amount: 7.455, unit: "g/L" }] }),
    );
    expect(evaluation.status).toBe("ok");
    if (evaluation.status === "ok")
      expect(evaluation.result.ionicStrength.molar).toBeCloseTo(0.1, 4);
  });
});
