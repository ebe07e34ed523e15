"use client";

import { useMemo } from "react";
import {
  WORKING_ELECTRODE_RADIUS_MM,
  type CellBlockInput,
  type RedoxProbeChoice,
  type SolutionBlockInput,
} from "@/lib/document/block-schemas";
import {
  evaluateCellElectrochemistry,
  type FormulaTex,
  type Section,
} from "@/lib/document/evaluate-cell-electrochem";
import { evaluationFromStored } from "@/lib/document/stored-evaluation";
import { formatCurrentA, formatSignificant } from "@/lib/ui/format-number";
import { redoxProbeOptions, referenceElectrodeLabel } from "../chem-catalogue";
import { useStoredSolution } from "../stored-results";
import { NumberField } from "../ui/number-field";
import { SelectField } from "../ui/select-field";
import { Tex } from "../ui/tex";

interface CellElectrochemistryProps {
  cell: CellBlockInput;
  electrolyte: SolutionBlockInput | null;
  editable: boolean;
  onChange: (patch: Partial<CellBlockInput>) => void;
}

const mV = (v: number) => `${v < 0 ? "−" : "+"}${Math.abs(v * 1000).toFixed(1)} mV`;

/** One computed quantity: its value, what it rests on, its formula as applied. */
function Card({
  title,
  testId,
  section,
  value,
  children,
  formula,
}: {
  title: string;
  testId: string;
  section: Section<{ formula: FormulaTex }>;
  value?: React.ReactNode;
  children?: React.ReactNode;
  formula?: FormulaTex;
}) {
  return (
    <div
      className="min-w-0 rounded-md border border-lagoon-100 bg-lagoon-50/40 px-3 py-2"
      data-testid={testId}
    >
      <h4 className="text-xs font-medium text-ink-soft">{title}</h4>
      {section.status === "ok" ? (
        <>
          <p className="font-mono text-base text-lagoon-700 tabular-nums" data-testid="value">
            {value}
          </p>
          {children}
          {formula ? (
            <figure className="mt-1 overflow-x-auto rounded border border-ink-faint/30 bg-paper px-2 py-1 text-sm">
              <figcaption className="text-[10px] font-medium tracking-wide text-ink-soft uppercase">
                Formula applied
              </figcaption>
              <Tex tex={formula.general} wrap className="text-ink" />
              <Tex tex={formula.applied} wrap className="text-lagoon-700" />
            </figure>
          ) : null}
        </>
      ) : (
        <p
          className={section.status === "error" ? "text-sm text-red-800" : "text-sm text-ink-soft"}
          role={section.status === "error" ? "alert" : undefined}
        >
          {section.message}
        </p>
      )}
    </div>
  );
}

function Notes({ notes }: { notes: readonly string[] }) {
  if (notes.length === 0) return null;
  return (
    <ul className="mt-1 list-disc pl-4 text-xs text-ink-soft">
      {notes.map((note) => (
        <li key={note}>{note}</li>
      ))}
    </ul>
  );
}

/**
 * The electrolyte and the working electrode as an electrochemist checks them before a scan:
 * the junction at the reference, the conductivity, R_u of the disk and the peak current a
 * reversible probe should give. The numbers come from lib/document, as on the server.
 */
export function CellElectrochemistry({
  cell,
  electrolyte,
  editable,
  onChange,
}: CellElectrochemistryProps) {
  const stored = useStoredSolution(electrolyte?.blockId);
  const chem = useMemo(
    () =>
      evaluateCellElectrochemistry(
        cell,
        electrolyte,
        stored && electrolyte && !editable ? evaluationFromStored(electrolyte, stored) : undefined,
      ),
    [cell, electrolyte, stored, editable],
  );
  const probes = redoxProbeOptions();
  const choice = cell.redoxProbe ?? null;
  const probeOption = probes.find((p) => p.value === choice?.probe);
  const setProbe = (changes: Partial<RedoxProbeChoice> | null) =>
    onChange({
      redoxProbe:
        changes === null
          ? null
          : {
              probe: "",
              form: "reduced",
              concentrationMmolPerL: null,
              scanRateMVPerS: 100,
              ...choice,
              ...changes,
            },
    });
  const { junction, conductivity, resistance, peak } = chem;
  const reference = referenceElectrodeLabel(cell.referenceElectrode.type);
  const fieldError = (field: string) =>
    peak.status === "error" && peak.field === field ? peak.message : undefined;

  return (
    <div className="@container space-y-3" aria-label="Electrolyte and electrode" role="group">
      <h3 className="text-xs font-semibold tracking-wide text-ink uppercase">
        Electrolyte and electrode
      </h3>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <NumberField
          label="Disk radius"
          unit="mm"
          placeholder="from area"
          bounds={WORKING_ELECTRODE_RADIUS_MM}
          value={cell.workingElectrodeRadiusMm ?? null}
          disabled={!editable}
          onValueChange={(workingElectrodeRadiusMm) => onChange({ workingElectrodeRadiusMm })}
        />
        <SelectField
          label="Redox probe"
          className="col-span-2 sm:col-span-3"
          value={choice?.probe ?? ""}
          options={[{ value: "", label: "— none —" }, ...probes]}
          disabled={!editable}
          onValueChange={(probe) => {
            if (probe === "") return setProbe(null);
            const forms = probes.find((p) => p.value === probe)?.forms ?? [];
            const keep = forms.some((f) => f.value === choice?.form);
            setProbe({
              probe,
              form: (keep ? choice!.form : (forms[0]?.value ?? "reduced")) as "reduced",
            });
          }}
        />
        {choice ? (
          <>
            <SelectField
              label="Present in solution"
              className="col-span-2"
              value={choice.form}
              options={probeOption?.forms ?? []}
              disabled={!editable}
              error={fieldError("form")}
              onValueChange={(form) => setProbe({ form: form as RedoxProbeChoice["form"] })}
            />
            <NumberField
              label="Probe conc."
              unit="mmol/L"
              placeholder="from solution"
              bounds={{ min: -1e6, max: 1e6 }}
              value={choice.concentrationMmolPerL}
              disabled={!editable}
              error={fieldError("concentrationMolPerL")}
              onValueChange={(concentrationMmolPerL) => setProbe({ concentrationMmolPerL })}
            />
            <NumberField
              label="Scan rate"
              unit="mV/s"
              bounds={{ min: -1e9, max: 1e9 }}
              value={choice.scanRateMVPerS}
              disabled={!editable}
              error={fieldError("scanRateVPerS")}
              onValueChange={(scanRateMVPerS) => setProbe({ scanRateMVPerS })}
            />
          </>
        ) : null}
      </div>
      <div className="grid gap-3 @3xl:grid-cols-2" aria-live="polite">
        <Card
          title={`Liquid junction at the reference (${junction.status === "ok" ? junction.fillingLabel : reference} | electrolyte)`}
          testId="junction-potential"
          section={junction}
          value={
            junction.status === "ok" ? (
              <>
                E<sub>j</sub> {mV(junction.junctionPotentialV)} ±{" "}
                {(junction.uncertaintyV * 1000).toFixed(1)} mV
              </>
            ) : null
          }
          formula={junction.status === "ok" ? junction.formula : undefined}
        >
          {junction.status === "ok" ? (
            <>
              <p className="text-xs text-ink-soft">{junction.uncertaintyNote}</p>
              <label className="mt-1 flex items-start gap-2 text-xs text-ink">
                <input
                  type="checkbox"
                  className="mt-0.5"
                  checked={cell.applyJunctionPotential === true}
                  disabled={!editable}
                  onChange={(event) => onChange({ applyJunctionPotential: event.target.checked })}
                />
                Include it in potentials vs {reference} (a reading against this electrode contains
                +Ej)
              </label>
              <Notes notes={junction.notes} />
            </>
          ) : null}
        </Card>
        <Card
          title="Electrolyte conductivity (estimate)"
          testId="electrolyte-conductivity"
          section={conductivity}
          value={
            conductivity.status === "ok" ? (
              <>
                κ {formatSignificant(conductivity.conductivityMSPerCm, 4)} mS/cm{" "}
                <span className="font-sans text-xs text-ink-soft">
                  ({formatSignificant(conductivity.conductivitySPerM, 4)} S/m)
                </span>
              </>
            ) : null
          }
          formula={conductivity.status === "ok" ? conductivity.formula : undefined}
        >
          {conductivity.status === "ok" ? (
            <>
              <p className="text-xs text-ink-soft">
                Valid range: {conductivity.range}{" "}
                {conductivity.inRange ? "This electrolyte is inside it." : ""}
              </p>
              {conductivity.messages.length ? (
                <ul className="mt-1 list-disc pl-4 text-xs text-amber-900">
                  {conductivity.messages.map((m) => (
                    <li key={m}>{m}</li>
                  ))}
                </ul>
              ) : null}
              <Notes notes={conductivity.notes} />
            </>
          ) : null}
        </Card>
        <Card
          title="Uncompensated resistance of the disk"
          testId="uncompensated-resistance"
          section={resistance}
          value={
            resistance.status === "ok" ? (
              <>
                R<sub>u</sub> {formatSignificant(resistance.resistanceOhm, 3)} Ω{" "}
                <span className="font-sans text-xs text-ink-soft">
                  (r = {formatSignificant(resistance.radiusMm, 3)} mm)
                </span>
              </>
            ) : null
          }
          formula={resistance.status === "ok" ? resistance.formula : undefined}
        >
          {resistance.status === "ok" ? <Notes notes={resistance.notes} /> : null}
        </Card>
        <Card
          title="Expected reversible peak current (Randles–Ševčík)"
          testId="expected-peak-current"
          section={peak}
          value={
            peak.status === "ok" ? (
              <>
                i<sub>p</sub> {formatCurrentA(peak.peakCurrentA, 3)}{" "}
                <span className="font-sans text-xs text-ink-soft">
                  ({peak.forwardPeak} first, ΔEp {(peak.reversibleDeltaEpV * 1000).toFixed(1)} mV
                  {peak.iRDropV !== null ? `, iR ${mV(peak.iRDropV)}` : ""})
                </span>
              </>
            ) : null
          }
          formula={peak.status === "ok" ? peak.formula : undefined}
        >
          {peak.status === "ok" ? (
            <>
              <p className="text-xs text-ink-soft">
                {peak.probeName}, {formatSignificant(peak.concentrationMolPerL * 1000, 3)} mmol/L, A
                = {formatSignificant(peak.areaCm2, 3)} cm², D ={" "}
                {formatSignificant(peak.diffusionCoefficientCm2PerS, 3)} cm²/s at{" "}
                {chem.temperatureC} °C. {peak.sources.join("; ")}.
              </p>
              <Notes notes={peak.notes} />
            </>
          ) : null}
        </Card>
      </div>
    </div>
  );
}
