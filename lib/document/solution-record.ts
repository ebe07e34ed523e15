import { ENGINE_VERSION } from "@/lib/chem";
import { compositionSummary } from "./composition-summary";
import type { SolutionBlockInput } from "./block-schemas";
import { canonicalHash } from "./canonical-hash";
import type { StockLookups } from "./dilution";
import { evaluateSolutionBlock } from "./evaluate-solution-block";

/**
 * What the server stores for one solution block's content: recomputed here with the same
 * lib/chem code the editor runs, never read from the client. A block whose inputs the engine
 * refuses is still recorded, with its error, so the record shows what was typed.
 */
export interface SolutionRecord {
  inputsHash: string;
  engineVersion: string;
  name: string;
  temperatureC: number;
  solvent: string;
  modelRequested: string;
  modelUsed: string | null;
  ionicStrengthMolal: number | null;
  ionicStrengthMolar: number | null;
  debyeLengthNm: number | null;
  species: string[];
  composition: Record<string, number>;
  /** The recipe in one line, formulas typeset, stocks' contributions included (the finder's). */
  compositionSummary: string;
  results: Record<string, unknown>;
  inputs: Record<string, unknown>;
}

const finiteOrNull = (x: unknown): number | null =>
  typeof x === "number" && Number.isFinite(x) ? x : null;

/**
 * The key of a block's computation: its inputs without the block id (a copied block computes
 * the same) and the engine version (a new engine computes afresh). Two saves of an unchanged
 * block share one stored result.
 */
export function solutionInputsHash(block: SolutionBlockInput): string {
  return canonicalHash({ inputs: keyedInputs(block), engineVersion: ENGINE_VERSION });
}

/**
 * The inputs a result is keyed and stored by. A block made from stocks names each stock's
 * entry, block and revision: a saved revision's stored result never changes, so the reference
 * fixes the stock's composition and the key stays a function of the block alone. A block
 * without stocks keys as it did before lineage existed (no `dilution` key).
 */
function keyedInputs(block: SolutionBlockInput): Record<string, unknown> {
  const { blockId: _blockId, dilution, ...inputs } = block;
  return dilution ? { ...inputs, dilution } : inputs;
}

/** The stored record of a block; `stocks` holds the stored compositions of its stocks. */
export function solutionRecordFor(
  block: SolutionBlockInput,
  stocks?: StockLookups,
): SolutionRecord {
  const evaluation = evaluateSolutionBlock(block, stocks);
  const ok = evaluation.status === "ok" ? evaluation.result : null;
  const typedRows = block.components.filter((c) => c.formula.trim() !== "" && c.amount !== null);
  const species = new Set<string>();
  for (const c of typedRows) species.add(c.formula.trim());
  for (const ion of ok?.ions ?? []) species.add(ion.formula);
  for (const salt of ok?.salts ?? []) species.add(salt.formula);
  const composition: Record<string, number> = {};
  for (const ion of ok?.ions ?? []) {
    const molality = finiteOrNull(ion.molality);
    if (molality !== null) composition[ion.formula] = (composition[ion.formula] ?? 0) + molality;
  }
  const inputs = keyedInputs(block);
  const dilution =
    evaluation.status === "ok" && evaluation.dilution
      ? { dilution: JSON.parse(JSON.stringify(evaluation.dilution)) as Record<string, unknown> }
      : {};

  return {
    inputsHash: solutionInputsHash(block),
    engineVersion: ENGINE_VERSION,
    name: block.name,
    temperatureC: ok?.temperatureC ?? block.temperatureC ?? 25,
    solvent: ok?.solvent.id ?? (block.solvent || "water"),
    modelRequested: block.model,
    modelUsed: ok?.model.used ?? null,
    ionicStrengthMolal: finiteOrNull(ok?.ionicStrength.molal),
    ionicStrengthMolar: finiteOrNull(ok?.ionicStrength.molar),
    debyeLengthNm: finiteOrNull(ok?.debyeLengthNm),
    species: [...species],
    composition,
    compositionSummary: compositionSummary([
      ...block.components,
      ...(evaluation.status === "ok" ? (evaluation.dilution?.components ?? []) : []),
    ]),
    results: ok
      ? {
          status: "ok",
          ...(JSON.parse(JSON.stringify(ok)) as Record<string, unknown>),
          ...dilution,
        }
      : evaluation.status === "error"
        ? { status: "error", field: evaluation.field ?? null, message: evaluation.message }
        : { status: "empty" },
    inputs: inputs,
  };
}
