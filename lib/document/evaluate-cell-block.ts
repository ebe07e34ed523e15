import { convertPotentialDetailed, isChemInputError, nernstPotentialDetailed } from "@/lib/chem";
import type { CellBlockInput, SolutionBlockInput } from "@/lib/document/block-schemas";
import { cellJunctionPotential } from "@/lib/document/evaluate-cell-electrochem";
import {
  evaluateSolutionBlockCached,
  type SolutionEvaluation,
} from "@/lib/document/evaluate-solution-block";

export type CellPotentialResult =
  | { status: "idle"; message: string }
  | { status: "error"; field?: string; message: string }
  | {
      status: "ok";
      vsShe: number;
      /** What the potentiostat reads against the reference: the junction included when asked. */
      vsReference: number;
      /** The liquid junction added to vsReference (V); null when not applied. */
      junctionV: number | null;
      reference: string;
      temperatureC: number;
      reaction: string;
      standardPotentialV: number;
      notes: string[];
    };

type SolutionResult = Extract<
  ReturnType<typeof evaluateSolutionBlockCached>,
  { status: "ok" }
>["result"];

/** Fraction of an ion bound in pairs above which the cell's notes name it. */
const PAIRED_NOTE_FRACTION = 0.01;

/**
 * Activities for the Nernst equation: those of the free ions. With ion association they come
 * from the speciation (a = γ_free m_free, which equals γ_stoich m_total); the note names the
 * ions of which more than 1 % is paired.
 */
function freeIonActivities(result: SolutionResult): {
  activities: Record<string, number>;
  note?: string;
} {
  const activities: Record<string, number> = {};
  for (const ion of result.ions) activities[ion.formula] = ion.activity;
  const speciation = result.speciation;
  if (!speciation) return { activities };
  const paired: string[] = [];
  for (const free of speciation.free) {
    activities[free.formula] = free.activity;
    const total = result.ions.find((ion) => ion.formula === free.formula)?.molality ?? 0;
    const fraction = total > 0 ? 1 - free.molality / total : 0;
    if (fraction > PAIRED_NOTE_FRACTION)
      paired.push(`${free.formula} ${Math.round(100 * fraction)} % paired`);
  }
  return {
    activities,
    ...(paired.length
      ? { note: `Free-ion activities after ion association (${paired.join(", ")}).` }
      : {}),
  };
}

/**
 * Equilibrium potential of the chosen couple at the linked electrolyte's computed activities
 * (lib/chem's nernstPotential), then on the chosen reference scale (convertPotential).
 * The cell's temperature wins over the solution's when both are given.
 */
export function computeCellPotential(
  cell: CellBlockInput,
  electrolyte: SolutionBlockInput | null,
  /** The electrolyte's stored evaluation, for a saved revision; computed live otherwise. */
  electrolyteEvaluation?: SolutionEvaluation,
): CellPotentialResult {
  if (!cell.couple)
    return { status: "idle", message: "Choose a couple to see its equilibrium potential." };
  if (!electrolyte)
    return { status: "idle", message: "Link the electrolyte to a solution block of this entry." };
  const evaluation = electrolyteEvaluation ?? evaluateSolutionBlockCached(electrolyte);
  if (evaluation.status === "empty")
    return { status: "idle", message: "The linked solution has no components yet." };
  if (evaluation.status === "error") {
    return {
      status: "error",
      message: `The linked solution cannot be computed: ${evaluation.message}`,
    };
  }
  const temperatureC = cell.temperatureC ?? electrolyte.temperatureC ?? 25;
  const { activities, note: pairingNote } = freeIonActivities(evaluation.result);
  try {
    const notes: string[] = pairingNote ? [pairingNote] : [];
    if (
      cell.temperatureC !== null &&
      electrolyte.temperatureC !== null &&
      cell.temperatureC !== electrolyte.temperatureC
    ) {
      notes.push(
        `Activities are those of the solution at ${electrolyte.temperatureC} °C; the Nernst slope uses the cell's ${cell.temperatureC} °C.`,
      );
    }
    // pH = −log10 a(H⁺) by definition (IUPAC); taken from the electrolyte when not typed.
    const hydrogen = evaluation.result.ions.find((ion) => ion.formula === "H+");
    const pHValue =
      cell.pH ?? (hydrogen && hydrogen.activity > 0 ? -Math.log10(hydrogen.activity) : null);
    if (cell.pH === null && pHValue !== null)
      notes.push(`pH ${pHValue.toFixed(2)} from the electrolyte's computed a(H⁺).`);
    const pH = pHValue === null ? {} : { pH: pHValue };
    const nernst = nernstPotentialDetailed({
      couple: cell.couple,
      activities,
      temperatureC,
      ...pH,
    });
    const reference = cell.referenceElectrode.type;
    const converted = convertPotentialDetailed(nernst.potentialV, "SHE", reference, {
      temperatureC,
      ...pH,
    });
    // A potential read against the reference contains +Ej (lib/chem's junction-potential.ts).
    let junctionV: number | null = null;
    if (cell.applyJunctionPotential) {
      const junction = cellJunctionPotential(cell, electrolyte, evaluation);
      if (junction.status === "ok") {
        junctionV = junction.junctionPotentialV;
        notes.push(
          `E vs ${reference} includes the liquid junction, ${(junctionV * 1000).toFixed(1)} ± ${(junction.uncertaintyV * 1000).toFixed(1)} mV (Henderson): what the potentiostat reads.`,
        );
      } else notes.push(`Liquid junction not applied: ${junction.message}`);
    }
    return {
      status: "ok",
      vsShe: nernst.potentialV,
      vsReference: converted.potentialV + (junctionV ?? 0),
      junctionV,
      reference,
      temperatureC,
      reaction: nernst.reaction,
      standardPotentialV: nernst.standardPotentialV,
      notes: [...notes, ...nernst.notes, ...converted.notes],
    };
  } catch (error) {
    if (!isChemInputError(error)) throw error;
    return { status: "error", field: error.field, message: error.message };
  }
}
