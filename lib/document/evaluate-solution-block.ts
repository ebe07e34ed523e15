import { computeSolution, isChemInputError } from "@/lib/chem";
import type { SolutionBlockInput } from "./block-schemas";
import { normaliseFieldPath } from "./field-path";

export type ChemInput = Parameters<typeof computeSolution>[0];
export type SolutionResult = ReturnType<typeof computeSolution>;

export type SolutionEvaluation =
  | { status: "empty" }
  | { status: "ok"; input: ChemInput; result: SolutionResult }
  | { status: "error"; field?: string; message: string };

/*
 * Shared by the editor (live, in the browser) and the server (authoritative, on save): one
 * mapping from a solution block's inputs to lib/chem, so both compute the same numbers.
 */

/**
 * The block's inputs as lib/chem's input. Rows without a species are skipped (a row being
 * typed); `rowIndex` maps the engine's component index back to the row on screen, so its
 * message lands on the right input.
 */
function toChemInput(
  block: SolutionBlockInput,
):
  | { input: ChemInput; rowIndex: number[] }
  | { missing: { field: string; message: string } }
  | null {
  if (block.temperatureC === null)
    return { missing: { field: "temperatureC", message: "Enter the temperature." } };
  const rowIndex: number[] = [];
  const components: ChemInput["components"] = [];
  for (const [index, row] of block.components.entries()) {
    if (row.formula.trim() === "") continue;
    if (row.amount === null)
      return { missing: { field: `components[${index}].amount`, message: "Enter an amount." } };
    const hasPer = row.perAmount !== null && row.perAmount !== undefined && row.perUnit;
    components.push({
      formula: row.formula.trim(),
      amount: row.amount,
      unit: row.unit,
      ...(hasPer ? { per: { amount: row.perAmount as number, unit: row.perUnit as string } } : {}),
    });
    rowIndex.push(index);
  }
  if (components.length === 0) return null;
  const input = {
    temperatureC: block.temperatureC,
    solvent: block.solvent || "water",
    model: block.model,
    components,
    ...(block.densityGPerMl !== null && block.densityGPerMl !== undefined
      ? { densityGPerMl: block.densityGPerMl }
      : {}),
  } as ChemInput;
  return { input, rowIndex };
}

/** The engine input a block stands for, or null while it is incomplete. */
export function chemInputOf(block: SolutionBlockInput): ChemInput | null {
  const prepared = toChemInput(block);
  return prepared && "input" in prepared ? prepared.input : null;
}

/** Evaluates a block: a pure function of its inputs, so callers may cache it freely. */
export function evaluateSolutionBlock(block: SolutionBlockInput): SolutionEvaluation {
  const prepared = toChemInput(block);
  if (prepared === null) return { status: "empty" };
  if ("missing" in prepared) return { status: "error", ...prepared.missing };
  try {
    return { status: "ok", input: prepared.input, result: computeSolution(prepared.input) };
  } catch (error) {
    if (!isChemInputError(error)) throw error;
    return {
      status: "error",
      field: remapField(error.field, prepared.rowIndex),
      message: error.message,
    };
  }
}

function remapField(field: string | undefined, rowIndex: number[]): string | undefined {
  if (!field) return undefined;
  return normaliseFieldPath(field).replace(
    /^components\[(\d+)\]/,
    (_m, i: string) => `components[${rowIndex[Number(i)] ?? i}]`,
  );
}

const cache = new Map<string, SolutionEvaluation>();
const CACHE_SIZE = 256;

/**
 * Memoised evaluation keyed by the inputs' JSON. A node view re-renders on every editor
 * transaction; only a change to this block's own inputs reaches computeSolution.
 */
export function evaluateSolutionBlockCached(block: SolutionBlockInput): SolutionEvaluation {
  const key = JSON.stringify(block, (k, v: unknown) =>
    k === "blockId" || k === "name" ? undefined : v,
  );
  const hit = cache.get(key);
  if (hit) {
    // Refresh recency: Map keeps insertion order, so the oldest entry is evicted first.
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const evaluation = evaluateSolutionBlock(block);
  cache.set(key, evaluation);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return evaluation;
}
