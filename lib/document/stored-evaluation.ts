import { formatSignificant } from "@/lib/ui/format-number";
import type { SolutionBlockInput } from "./block-schemas";
import { stockLookupsFromStored, type DilutionOutcome } from "./dilution";
import {
  chemInputOf,
  type SolutionEvaluation,
  type SolutionResult,
} from "./evaluate-solution-block";

/** A solution block's result as the server stored it when the revision was saved. */
export interface StoredSolution {
  results: Record<string, unknown>;
  engineVersion: string;
  computedAt: string;
}

/**
 * The stored result read back as an evaluation, so a saved revision shows the numbers it was
 * saved with, not a fresh computation by today's engine.
 */
export function evaluationFromStored(
  block: SolutionBlockInput,
  stored: StoredSolution,
): SolutionEvaluation {
  const { status, ...rest } = stored.results;
  if (status === "error") {
    const error = rest as { field?: string | null; message?: string };
    return {
      status: "error",
      field: error.field ?? undefined,
      message: error.message ?? "The engine refused these inputs.",
    };
  }
  if (status !== "ok") return { status: "empty" };
  // A block made from stocks: the stock compositions it was computed with are in the record.
  const input = chemInputOf(block, stockLookupsFromStored(block.dilution, stored.results));
  if (!input) return { status: "empty" };
  const { dilution, ...result } = rest;
  return {
    status: "ok",
    input,
    result: result as unknown as SolutionResult,
    ...(dilution ? { dilution: dilution as Extract<DilutionOutcome, { status: "ok" }> } : {}),
  };
}

const same = (a: number | null | undefined, b: number | null | undefined) =>
  a === b ||
  (typeof a === "number" &&
    typeof b === "number" &&
    Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a)));

/**
 * Where today's engine gives other numbers than the stored ones, in words: "I 0.1000 →
 * 0.1002 mol/kg", "γ±(NaCl) 0.7784 → 0.7791", "model davies → pitzer". Empty when they agree.
 */
export function describeEngineChange(
  stored: SolutionEvaluation,
  today: SolutionEvaluation,
): string[] {
  if (stored.status !== "ok" || today.status !== "ok") {
    return stored.status === today.status ? [] : [`result ${stored.status} → ${today.status}`];
  }
  const a = stored.result;
  const b = today.result;
  const changes: string[] = [];
  const num = (
    label: string,
    x: number | null | undefined,
    y: number | null | undefined,
    unit = "",
  ) => {
    if (!same(x, y))
      changes.push(`${label} ${formatSignificant(x)} → ${formatSignificant(y)}${unit}`);
  };
  if (a.model.used !== b.model.used) changes.push(`model ${a.model.used} → ${b.model.used}`);
  num("I", a.ionicStrength.molal, b.ionicStrength.molal, " mol/kg");
  num("Debye length", a.debyeLengthNm, b.debyeLengthNm, " nm");
  for (const salt of a.salts) {
    const now = b.salts.find((s) => s.formula === salt.formula);
    num(`γ±(${salt.formula})`, salt.meanGamma, now?.meanGamma);
  }
  for (const ion of a.ions) {
    const now = b.ions.find((i) => i.formula === ion.formula);
    num(`γ(${ion.formula})`, ion.gamma, now?.gamma);
  }
  if (a.validity.ok !== b.validity.ok)
    changes.push(
      `inside the model's range: ${a.validity.ok ? "yes" : "no"} → ${b.validity.ok ? "yes" : "no"}`,
    );
  return changes;
}
