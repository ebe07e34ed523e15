"use client";

import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { modelOptions, solventOptions } from "../chem-catalogue";
import { NumberField } from "../ui/number-field";
import { SelectField } from "../ui/select-field";
import type { FieldMessages } from "./field-messages";

interface SolutionSettingsProps {
  value: SolutionBlockInput;
  errors: FieldMessages;
  editable: boolean;
  onChange: (patch: Partial<SolutionBlockInput>) => void;
}

/** Solvent, temperature, optional density and activity model of one solution. */
export function SolutionSettings({ value, errors, editable, onChange }: SolutionSettingsProps) {
  const solvents = solventOptions();
  const known = solvents.some((option) => option.value === value.solvent);
  // A saved block may name a model this build does not offer: show it as saved, and let the
  // engine's message on the field say so, rather than silently showing another model.
  const models = modelOptions();
  const modelKnown = models.some((option) => option.value === value.model);
  return (
    <div className="grid grid-cols-2 gap-3 sm:grid-cols-[1fr_0.8fr_0.8fr_1.4fr]">
      <SelectField
        label="Solvent"
        value={value.solvent}
        options={known ? solvents : [{ value: value.solvent, label: value.solvent }, ...solvents]}
        disabled={!editable}
        error={errors.get("solvent")}
        onValueChange={(solvent) => onChange({ solvent })}
      />
      <NumberField
        label="Temperature"
        unit="°C"
        bounds={{ min: -273.15, max: 1000 }}
        value={value.temperatureC}
        disabled={!editable}
        error={errors.get("temperatureC")}
        onValueChange={(temperatureC) => onChange({ temperatureC })}
      />
      <NumberField
        label="Density (optional)"
        unit="g/mL"
        placeholder="estimated"
        bounds={{ min: -100, max: 100 }}
        value={value.densityGPerMl ?? null}
        disabled={!editable}
        error={errors.get("densityGPerMl")}
        onValueChange={(densityGPerMl) => onChange({ densityGPerMl })}
      />
      <SelectField
        label="Activity model"
        value={value.model}
        options={modelKnown ? models : [{ value: value.model, label: value.model }, ...models]}
        disabled={!editable}
        error={errors.get("model")}
        onValueChange={(model) => onChange({ model: model as SolutionBlockInput["model"] })}
      />
    </div>
  );
}
