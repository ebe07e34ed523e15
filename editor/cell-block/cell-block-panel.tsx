"use client";

import type {
  CellBlockInput,
  ElectrodeInput,
  SolutionBlockInput,
} from "@/lib/document/block-schemas";
import { REFERENCE_ELECTRODE_IDS } from "@/lib/document/block-schemas";
import { referenceElectrodeLabel } from "../chem-catalogue";
import { NumberField } from "../ui/number-field";
import { SelectField } from "../ui/select-field";
import { TextField } from "../ui/text-field";
import { SafetyCaution } from "../ui/safety-caution";
import { CellElectrochemistry } from "./cell-electrochemistry";
import { CellPotential } from "./cell-potential";
import { ElectrodeFieldset } from "./electrode-fieldset";

interface CellBlockPanelProps {
  value: CellBlockInput;
  onChange: (next: CellBlockInput) => void;
  /** The entry's solution blocks, for the electrolyte link. */
  solutions: readonly SolutionBlockInput[];
  editable?: boolean;
}

const PURGE_GASES = ["N2", "Ar", "He", "O2", "CO2", "none"];
const REFERENCE_OPTIONS = REFERENCE_ELECTRODE_IDS.map((id) => ({
  value: id,
  label: referenceElectrodeLabel(id),
}));

export function solutionLabel(solution: SolutionBlockInput): string {
  return solution.name.trim() || `Unnamed solution #${String(solution.blockId).slice(0, 8)}`;
}

/** The cell block's form and the equilibrium potential of a couple in its electrolyte. */
export function CellBlockPanel({
  value,
  onChange,
  solutions,
  editable = true,
}: CellBlockPanelProps) {
  const patch = (changes: Partial<CellBlockInput>) => onChange({ ...value, ...changes });
  const electrode =
    (key: "workingElectrode" | "counterElectrode") => (changes: Partial<ElectrodeInput>) =>
      patch({ [key]: { ...value[key], ...changes } });
  const electrolyte = solutions.find((s) => s.blockId === value.electrolyteBlockId) ?? null;
  const dangling = value.electrolyteBlockId !== null && electrolyte === null;
  const electrolyteOptions = [
    { value: "", label: "— none —" },
    ...solutions.map((s) => ({ value: String(s.blockId), label: solutionLabel(s) })),
    ...(dangling
      ? [{ value: value.electrolyteBlockId as string, label: "(removed solution block)" }]
      : []),
  ];

  return (
    <section
      data-live-block="cell"
      aria-label={`Cell block ${value.name || "(unnamed)"}`}
      className="my-4 rounded-lg border border-ink-faint/40 bg-white/70 shadow-sm"
    >
      <header className="flex items-center gap-2 border-b border-ink-faint/30 bg-paper-deep/60 px-3 py-1.5">
        <span
          data-drag-handle
          title="Drag to move"
          className="cursor-grab text-ink-faint select-none"
          aria-hidden
        >
          ⠿
        </span>
        <span className="rounded bg-copper-600 px-1.5 py-0.5 text-[10px] font-semibold tracking-wider text-white uppercase">
          Cell
        </span>
        <TextField
          label="Cell name"
          hideLabel
          maxLength={120}
          className="flex-1"
          placeholder="Name, e.g. Cell 1"
          value={value.name}
          disabled={!editable}
          onValueChange={(name) => patch({ name })}
        />
      </header>
      <div className="space-y-4 px-3 py-3">
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <TextField
            label="Cell type"
            className="col-span-2"
            maxLength={80}
            value={value.cellType}
            disabled={!editable}
            onValueChange={(cellType) => patch({ cellType })}
          />
          <NumberField
            label="Temperature"
            unit="°C"
            bounds={{ min: -273.15, max: 1000 }}
            value={value.temperatureC}
            disabled={!editable}
            onValueChange={(temperatureC) => patch({ temperatureC })}
          />
          <SelectField
            label="Electrolyte"
            value={value.electrolyteBlockId ?? ""}
            options={electrolyteOptions}
            disabled={!editable}
            error={dangling ? "The linked solution block is no longer in this entry." : undefined}
            onValueChange={(id) => patch({ electrolyteBlockId: id === "" ? null : id })}
          />
          <SelectField
            label="Purge gas"
            value={value.purgeGas}
            options={(PURGE_GASES.includes(value.purgeGas)
              ? PURGE_GASES
              : [value.purgeGas, ...PURGE_GASES]
            ).map((gas) => ({ value: gas, label: gas === "none" ? "none" : gas }))}
            disabled={!editable}
            onValueChange={(purgeGas) => patch({ purgeGas })}
          />
          <NumberField
            label="Purge time"
            unit="min"
            value={value.purgeMinutes}
            disabled={!editable || value.purgeGas === "none"}
            error={
              value.purgeMinutes !== null && value.purgeMinutes < 0
                ? "A purge time cannot be negative."
                : undefined
            }
            onValueChange={(purgeMinutes) => patch({ purgeMinutes })}
          />
          <TextField
            label="Instrument"
            maxLength={120}
            value={value.instrument}
            placeholder="potentiostat model and serial"
            disabled={!editable}
            onValueChange={(instrument) => patch({ instrument })}
          />
          <TextField
            label="Channel"
            maxLength={40}
            value={value.channel}
            placeholder="e.g. 2"
            disabled={!editable}
            onValueChange={(channel) => patch({ channel })}
          />
        </div>
        <div className="grid gap-3 md:grid-cols-3">
          <ElectrodeFieldset
            legend="Working electrode"
            value={value.workingElectrode}
            editable={editable}
            materialPlaceholder="e.g. glassy carbon disc, 3 mm"
            onChange={electrode("workingElectrode")}
          />
          <ElectrodeFieldset
            legend="Counter electrode"
            value={value.counterElectrode}
            editable={editable}
            materialPlaceholder="e.g. platinum wire"
            onChange={electrode("counterElectrode")}
          />
          <ElectrodeFieldset
            legend="Reference electrode"
            value={value.referenceElectrode}
            editable={editable}
            showArea={false}
            materialPlaceholder="e.g. double junction, ceramic frit"
            onChange={(changes) =>
              patch({ referenceElectrode: { ...value.referenceElectrode, ...changes } })
            }
          >
            <SelectField
              label="Type"
              value={value.referenceElectrode.type}
              options={REFERENCE_OPTIONS}
              disabled={!editable}
              onValueChange={(type) =>
                patch({
                  referenceElectrode: {
                    ...value.referenceElectrode,
                    type: type as CellBlockInput["referenceElectrode"]["type"],
                  },
                })
              }
            />
          </ElectrodeFieldset>
        </div>
        <div className="border-t border-dashed border-ink-faint/40 pt-3">
          <CellPotential
            cell={value}
            electrolyte={electrolyte}
            editable={editable}
            onChange={patch}
          />
        </div>
        <div className="border-t border-dashed border-ink-faint/40 pt-3">
          <CellElectrochemistry
            cell={value}
            electrolyte={electrolyte}
            editable={editable}
            onChange={patch}
          />
        </div>
        <SafetyCaution />
      </div>
    </section>
  );
}
