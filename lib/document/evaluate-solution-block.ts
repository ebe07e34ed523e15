import { computeSolution, isChemInputError } from "@/lib/chem";
import type { SolutionBlockInput } from "./block-schemas";
import { dilutionComponents, hasStocks, stockKey, type StockLookups } from "./dilution";
import { normaliseFieldPath } from "./field-path";

export type ChemInput = Parameters<typeof computeSolution>[0];
export type SolutionResult = ReturnType<typeof computeSolution>;

type DilutionDone = Extract<ReturnType<typeof dilutionComponents>, { status: "ok" }>;

export type SolutionEvaluation =
  | { status: "empty" }
  | { status: "ok"; input: ChemInput; result: SolutionResult; dilution?: DilutionDone }
  | { status: "error"; field?: string; message: string };

const NO_STOCKS: StockLookups = new Map();

/*
 * Shared by the editor (live, in the browser) and the server (authoritative, on save): one
 * mapping from a solution block's inputs to lib/chem, so both compute the same numbers.
 */

/**
 * The block's inputs as lib/chem's input: its own rows, plus what its stocks contribute when it
 * is made from stocks (lib/document/dilution.ts). Rows without a species are skipped (a row
 * being typed); `fieldOf` maps the engine's component index back to the input on screen, so its
 * message lands on the right field.
 */
function toChemInput(
  block: SolutionBlockInput,
  stocks: StockLookups,
):
  | { input: ChemInput; fieldOf: string[]; dilution?: DilutionDone }
  | { missing: { field: string; message: string } }
  | null {
  if (block.temperatureC === null)
    return { missing: { field: "temperatureC", message: "Enter the temperature." } };
  const fieldOf: string[] = [];
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
    fieldOf.push(`components[${index}]`);
  }
  let dilution: DilutionDone | undefined;
  if (hasStocks(block.dilution)) {
    const outcome = dilutionComponents(block.dilution, stocks, block.solvent || "water");
    if (outcome.status === "loading")
      return {
        missing: { field: "dilution", message: "Reading the stored composition of the stocks…" },
      };
    if (outcome.status === "error")
      return { missing: { field: outcome.field, message: outcome.message } };
    if (outcome.status === "ok") {
      dilution = outcome;
      for (const c of outcome.components) {
        components.push(c);
        fieldOf.push("dilution");
      }
    }
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
  return { input, fieldOf, ...(dilution ? { dilution } : {}) };
}

/** The engine input a block stands for, or null while it is incomplete. */
export function chemInputOf(
  block: SolutionBlockInput,
  stocks: StockLookups = NO_STOCKS,
): ChemInput | null {
  const prepared = toChemInput(block, stocks);
  return prepared && "input" in prepared ? prepared.input : null;
}

/**
 * Evaluates a block: a pure function of its inputs and of the stored compositions of its stocks
 * (if it is made from stocks), so callers may cache it freely.
 */
export function evaluateSolutionBlock(
  block: SolutionBlockInput,
  stocks: StockLookups = NO_STOCKS,
): SolutionEvaluation {
  const prepared = toChemInput(block, stocks);
  if (prepared === null) return { status: "empty" };
  if ("missing" in prepared) return { status: "error", ...prepared.missing };
  try {
    return {
      status: "ok",
      input: prepared.input,
      result: computeSolution(prepared.input),
      ...(prepared.dilution ? { dilution: prepared.dilution } : {}),
    };
  } catch (error) {
    if (!isChemInputError(error)) throw error;
    return {
      status: "error",
      field: remapField(error.field, prepared.fieldOf),
      message: error.message,
    };
  }
}

function remapField(field: string | undefined, fieldOf: string[]): string | undefined {
  if (!field) return undefined;
  const path = normaliseFieldPath(field);
  const match = /^components\[(\d+)\]/.exec(path);
  const target = match ? fieldOf[Number(match[1])] : undefined;
  if (!match || !target) return path;
  // A stock's contribution has no input of its own: the message goes to the stocks.
  return target === "dilution" ? target : target + path.slice(match[0].length);
}

const cache = new Map<string, SolutionEvaluation>();
const CACHE_SIZE = 256;

/**
 * Memoised evaluation keyed by the inputs' JSON. A node view re-renders on every editor
 * transaction; only a change to this block's own inputs reaches computeSolution.
 */
export function evaluateSolutionBlockCached(
  block: SolutionBlockInput,
  stocks: StockLookups = NO_STOCKS,
): SolutionEvaluation {
  const used = hasStocks(block.dilution)
    ? block.dilution.stocks.map((ref) => stocks.get(stockKey(ref)) ?? null)
    : [];
  const key = JSON.stringify([block, used], (k, v: unknown) =>
    k === "blockId" || k === "name" ? undefined : v,
  );
  const hit = cache.get(key);
  if (hit) {
    // Refresh recency: Map keeps insertion order, so the oldest entry is evicted first.
    cache.delete(key);
    cache.set(key, hit);
    return hit;
  }
  const evaluation = evaluateSolutionBlock(block, stocks);
  cache.set(key, evaluation);
  if (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return evaluation;
}
