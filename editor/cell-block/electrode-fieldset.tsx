"use client";

import { useId } from "react";
import type { ElectrodeInput } from "@/lib/document/block-schemas";
import { inputClass, labelClass } from "../ui/field-styles";
import { NumberField } from "../ui/number-field";
import { TextField } from "../ui/text-field";

interface ElectrodeFieldsetProps {
  legend: string;
  value: ElectrodeInput;
  editable: boolean;
  onChange: (patch: Partial<ElectrodeInput>) => void;
  materialPlaceholder: string;
  /** Extra fields, e.g. the reference electrode's type. */
  children?: React.ReactNode;
  showArea?: boolean;
}

const MAX_STEPS = 20;

/** Material, geometric area and pretreatment steps (one per line) of one electrode. */
export function ElectrodeFieldset({
  legend,
  value,
  editable,
  onChange,
  materialPlaceholder,
  children,
  showArea = true,
}: ElectrodeFieldsetProps) {
  const stepsId = useId();
  return (
    <fieldset className="min-w-0 rounded-md border border-ink-faint/30 px-3 pt-1 pb-3">
      <legend className="px-1 text-xs font-semibold text-ink">{legend}</legend>
      <div className="space-y-2">
        {children}
        <TextField
          label="Material"
          maxLength={80}
          value={value.material}
          placeholder={materialPlaceholder}
          disabled={!editable}
          onValueChange={(material) => onChange({ material })}
        />
        {showArea ? (
          <NumberField
            label="Geometric area"
            unit="cm²"
            value={value.areaCm2}
            disabled={!editable}
            onValueChange={(areaCm2) => onChange({ areaCm2 })}
            error={
              value.areaCm2 !== null && value.areaCm2 <= 0
                ? "An area is greater than zero."
                : undefined
            }
          />
        ) : null}
        <div>
          <label htmlFor={stepsId} className={`${labelClass} mb-0.5`}>
            Pretreatment{" "}
            <span className="tracking-normal text-ink-faint normal-case">(one step per line)</span>
          </label>
          <textarea
            id={stepsId}
            rows={Math.min(6, Math.max(2, value.pretreatment.length + 1))}
            className={`${inputClass} resize-y text-xs leading-relaxed`}
            disabled={!editable}
            placeholder={"Polish with 0.05 µm alumina, 2 min\nSonicate in water, 3 min"}
            value={value.pretreatment.join("\n")}
            // Empty lines are kept while typing so Enter starts a new step; the schema allows 20.
            onChange={(event) =>
              onChange({
                pretreatment: event.target.value
                  .split("\n")
                  .slice(0, MAX_STEPS)
                  .map((line) => line.slice(0, 300)),
              })
            }
          />
        </div>
      </div>
    </fieldset>
  );
}
