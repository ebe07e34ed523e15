"use client";

import type { KeyboardEvent } from "react";
import {
  AMOUNT_UNITS,
  PER_UNITS,
  UNITS_NEEDING_PER,
  type SolutionComponentInput,
} from "@/lib/document/block-schemas";
import { NumberField } from "../ui/number-field";
import { SelectField } from "../ui/select-field";
import { quietButtonClass } from "../ui/field-styles";
import { SpeciesCombobox } from "./species-combobox";
import type { FieldMessages } from "./field-messages";

const UNIT_LABELS: Record<string, string> = {
  "mol/kg": "mol/kg solvent",
  "mmol/kg": "mmol/kg solvent",
  "mol/L": "mol/L",
  "mmol/L": "mmol/L",
  "µmol/L": "µmol/L",
  g: "g (weighed)",
  mg: "mg (weighed)",
  "g/L": "g/L solution",
  "wt%": "wt% (mass percent)",
  "mass fraction": "mass fraction",
};
const UNIT_OPTIONS = AMOUNT_UNITS.map((unit) => ({
  value: unit,
  label: UNIT_LABELS[unit] ?? unit,
}));
const PER_OPTIONS = PER_UNITS.map((unit) => ({
  value: unit,
  label: unit === "g" || unit === "kg" ? `${unit} of solvent` : `${unit} final volume`,
}));

interface ComponentRowProps {
  index: number;
  component: SolutionComponentInput;
  errors: FieldMessages;
  editable: boolean;
  onChange: (patch: Partial<SolutionComponentInput>) => void;
  onRemove: () => void;
  onKeyDown: (event: KeyboardEvent<HTMLInputElement>) => void;
  speciesRef: (element: HTMLInputElement | null) => void;
  showBasis: boolean;
}

export function ComponentRow({
  index,
  component,
  errors,
  editable,
  onChange,
  onRemove,
  onKeyDown,
  speciesRef,
  showBasis,
}: ComponentRowProps) {
  const prefix = `components[${index}]`;
  const needsPer = UNITS_NEEDING_PER.includes(component.unit);
  const rowNumber = index + 1;
  return (
    <tr className="align-top">
      <td className="min-w-32 py-1 pr-2">
        <SpeciesCombobox
          label={`Species, row ${rowNumber}`}
          value={component.formula}
          onValueChange={(formula) => onChange({ formula })}
          error={errors.get(`${prefix}.formula`) ?? errors.get(prefix)}
          disabled={!editable}
          onRowKeyDown={onKeyDown}
          inputRef={speciesRef}
        />
      </td>
      <td className="w-28 py-1 pr-2">
        <NumberField
          label={`Amount, row ${rowNumber}`}
          hideLabel
          value={component.amount}
          onValueChange={(amount) => onChange({ amount })}
          error={errors.get(`${prefix}.amount`)}
          disabled={!editable}
          onKeyDown={onKeyDown}
        />
      </td>
      <td className="w-36 py-1 pr-2">
        <SelectField
          label={`Unit, row ${rowNumber}`}
          hideLabel
          value={component.unit}
          options={UNIT_OPTIONS}
          disabled={!editable}
          error={errors.get(`${prefix}.unit`)}
          onValueChange={(unit) =>
            onChange({
              unit: unit as SolutionComponentInput["unit"],
              ...(UNITS_NEEDING_PER.includes(unit as SolutionComponentInput["unit"]) &&
              !component.perUnit
                ? { perAmount: component.perAmount ?? null, perUnit: "mL" }
                : {}),
            })
          }
        />
      </td>
      {showBasis ? (
        <td className="w-56 py-1 pr-2">
          {needsPer ? (
            <div className="flex items-start gap-1">
              <span className="pt-1.5 text-xs text-ink-soft">per</span>
              <NumberField
                label={`Per amount, row ${rowNumber}`}
                hideLabel
                className="w-20"
                value={component.perAmount ?? null}
                onValueChange={(perAmount) => onChange({ perAmount })}
                error={errors.get(`${prefix}.per.amount`) ?? errors.get(`${prefix}.per`)}
                disabled={!editable}
                onKeyDown={onKeyDown}
              />
              <SelectField
                label={`Per unit, row ${rowNumber}`}
                hideLabel
                className="flex-1"
                value={component.perUnit ?? "mL"}
                options={PER_OPTIONS}
                disabled={!editable}
                error={errors.get(`${prefix}.per.unit`)}
                onValueChange={(perUnit) =>
                  onChange({ perUnit: perUnit as SolutionComponentInput["perUnit"] })
                }
              />
            </div>
          ) : (
            <span className="block pt-1.5 text-xs text-ink-faint">—</span>
          )}
        </td>
      ) : null}
      <td className="w-8 py-1">
        {editable ? (
          <button
            type="button"
            className={quietButtonClass}
            aria-label={`Remove row ${rowNumber}`}
            title="Remove row (Ctrl+Backspace on an empty row)"
            onClick={onRemove}
          >
            <span aria-hidden>×</span>
          </button>
        ) : null}
      </td>
    </tr>
  );
}
