import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { evaluateSolutionBlock } from "@/lib/document/evaluate-solution-block";

/**
 * What the server stores for one solution block of a revision: recomputed here with the
 * same lib/chem code the editor runs, never read from the client. A block whose inputs the
 * engine refuses is still recorded, with its error, so the record shows what was typed.
 */
export interface SolutionRecord {
  blockId: string;
  name: string;
  temperatureC: number;
  solvent: string;
  modelRequested: string;
  modelUsed: string | null;
  ionicStrengthMolal: number | null;
  ionicStrengthMolar: number | null;
  debyeLengthNm: number | null;
  species: string[];
  results: Record<string, unknown>;
  inputs: Record<string, unknown>;
  components: {
    position: number;
    formula: string;
    amount: number;
    unit: string;
    perAmount: number | null;
    perUnit: string | null;
    molality: number | null;
    molarity: number | null;
  }[];
}

const finiteOrNull = (x: unknown): number | null =>
  typeof x === "number" && Number.isFinite(x) ? x : null;

export function solutionRecordFor(block: SolutionBlockInput): SolutionRecord {
  const evaluation = evaluateSolutionBlock(block);
  const ok = evaluation.status === "ok" ? evaluation.result : null;
  const typedRows = block.components.filter((c) => c.formula.trim() !== "" && c.amount !== null);
  const species = new Set<string>();
  for (const c of typedRows) species.add(c.formula.trim());
  for (const ion of ok?.ions ?? []) species.add(ion.formula);
  for (const salt of ok?.salts ?? []) species.add(salt.formula);
  const componentResults = ok?.components ?? [];

  return {
    blockId: block.blockId,
    name: block.name,
    temperatureC: ok?.temperatureC ?? block.temperatureC ?? 25,
    solvent: ok?.solvent.id ?? (block.solvent || "water"),
    modelRequested: block.model,
    modelUsed: ok?.model.used ?? null,
    ionicStrengthMolal: finiteOrNull(ok?.ionicStrength.molal),
    ionicStrengthMolar: finiteOrNull(ok?.ionicStrength.molar),
    debyeLengthNm: finiteOrNull(ok?.debyeLengthNm),
    species: [...species],
    results: ok
      ? { status: "ok", ...(JSON.parse(JSON.stringify(ok)) as Record<string, unknown>) }
      : evaluation.status === "error"
        ? { status: "error", field: evaluation.field ?? null, message: evaluation.message }
        : { status: "empty" },
    inputs: block,
    components: typedRows.map((c, position) => ({
      position,
      formula: c.formula.trim(),
      amount: c.amount as number,
      unit: c.unit,
      perAmount: c.perAmount ?? null,
      perUnit: c.perUnit ?? null,
      molality: finiteOrNull(componentResults[position]?.molality),
      molarity: finiteOrNull(componentResults[position]?.molarity),
    })),
  };
}
