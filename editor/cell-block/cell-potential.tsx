"use client";

import { useMemo } from "react";
import type { CellBlockInput, SolutionBlockInput } from "@/lib/document/block-schemas";
import { formatPotentialV } from "@/lib/ui/format-number";
import { coupleOptions, referenceElectrodeLabel } from "../chem-catalogue";
import { NumberField } from "../ui/number-field";
import { SelectField } from "../ui/select-field";
import { computeCellPotential } from "@/lib/document/evaluate-cell-block";
import { evaluationFromStored } from "@/lib/document/stored-evaluation";
import { useStoredSolution } from "../stored-results";

interface CellPotentialProps {
  cell: CellBlockInput;
  electrolyte: SolutionBlockInput | null;
  editable: boolean;
  onChange: (patch: Partial<CellBlockInput>) => void;
}

/** Couple choice and the computed equilibrium potential, against the reference and against SHE. */
export function CellPotential({ cell, electrolyte, editable, onChange }: CellPotentialProps) {
  // A saved revision uses the activities stored with its electrolyte, not today's engine.
  const stored = useStoredSolution(electrolyte?.blockId);
  const potential = useMemo(
    () =>
      computeCellPotential(
        cell,
        electrolyte,
        stored && electrolyte && !editable ? evaluationFromStored(electrolyte, stored) : undefined,
      ),
    [cell, electrolyte, stored, editable],
  );
  const couples = coupleOptions();
  const needsPh = cell.referenceElectrode.type === "RHE";
  const phError =
    potential.status === "error" && potential.field === "pH" ? potential.message : undefined;
  return (
    <div className="space-y-2">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <SelectField
          label="Couple"
          className="col-span-2"
          value={cell.couple ?? ""}
          options={[{ value: "", label: "— choose a couple —" }, ...couples]}
          disabled={!editable}
          error={
            potential.status === "error" && potential.field === "couple"
              ? potential.message
              : undefined
          }
          onValueChange={(couple) => onChange({ couple: couple === "" ? null : couple })}
        />
        {needsPh || cell.pH !== null ? (
          <NumberField
            label="pH (for RHE)"
            placeholder="from electrolyte"
            bounds={{ min: -20, max: 30 }}
            value={cell.pH}
            disabled={!editable}
            error={phError}
            onValueChange={(pH) => onChange({ pH })}
          />
        ) : null}
      </div>
      {potential.status === "ok" ? (
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-3" aria-live="polite">
          <dl className="contents">
            <div className="rounded-md border border-lagoon-100 bg-lagoon-50/60 px-3 py-1.5">
              <dt className="text-xs font-medium text-ink-soft">
                E vs {referenceElectrodeLabel(potential.reference)}
                {potential.junctionV !== null ? " (junction included)" : ""}
              </dt>
              <dd
                className="font-mono text-base text-lagoon-700 tabular-nums"
                data-testid="potential-vs-reference"
              >
                {formatPotentialV(potential.vsReference)}{" "}
                <span className="font-sans text-xs text-ink-soft">V</span>
              </dd>
            </div>
            <div className="rounded-md border border-lagoon-100 bg-lagoon-50/60 px-3 py-1.5">
              <dt className="text-xs font-medium text-ink-soft">E vs SHE</dt>
              <dd
                className="font-mono text-base text-lagoon-700 tabular-nums"
                data-testid="potential-vs-she"
              >
                {formatPotentialV(potential.vsShe)}{" "}
                <span className="font-sans text-xs text-ink-soft">V</span>
              </dd>
            </div>
          </dl>
          <p className="col-span-2 self-center text-xs text-ink-soft sm:col-span-1">
            {potential.reaction}, E° = {formatPotentialV(potential.standardPotentialV)} V vs SHE.
            Nernst equation at {potential.temperatureC} °C with the activities computed for the
            linked solution.
          </p>
          {potential.notes.length > 0 ? (
            <ul className="col-span-full list-disc pl-4 text-xs text-ink-soft">
              {potential.notes.map((note) => (
                <li key={note}>{note}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : potential.status === "error" &&
        potential.field !== "couple" &&
        potential.field !== "pH" ? (
        <p
          role="alert"
          className="rounded-md border border-red-300 bg-red-50 px-3 py-2 text-sm text-red-900"
        >
          {potential.message}
        </p>
      ) : potential.status === "idle" ? (
        <p className="text-sm text-ink-soft">{potential.message}</p>
      ) : null}
    </div>
  );
}
