"use client";

import { lazy, Suspense, useState } from "react";
import { actionButtonClass } from "../ui/field-styles";
import { SafetyCaution } from "../ui/safety-caution";
import { hazardNotesFor } from "../chem-catalogue";
import type { SolutionComponentInput } from "@/lib/document/block-schemas";
import type { SolutionEvaluation, SolutionResult } from "@/lib/document/evaluate-solution-block";
import { ChargeBalanceOffer } from "./charge-balance-offer";
import { ComponentResults } from "./component-results";
import { describeField } from "./describe-field";
import { FormulaApplied } from "./formula-applied";
import { IonTable, SaltList } from "./ion-table";
import { MessagesList } from "./messages-list";
import { ResultsSummary } from "./results-summary";
import { SpeciationTable } from "./speciation-table";

// recharts is only fetched when a researcher opens a chart, so the editor's first load stays light.
const GammaChart = lazy(() => import("./gamma-chart"));

interface SolutionResultsProps {
  evaluation: SolutionEvaluation;
  /** Species typed in the block, for hazard notes even while the engine refuses the input. */
  formulas: string[];
  /** Appends a component row (the counter-ion that balances the charge); absent when read-only. */
  onAddComponent?: (row: SolutionComponentInput) => void;
}

export function SolutionResults({ evaluation, formulas, onAddComponent }: SolutionResultsProps) {
  const [chartOpen, setChartOpen] = useState(false);
  const [chartSalt, setChartSalt] = useState<string | null>(null);
  const hazards = hazardNotesFor(
    formulas,
    evaluation.status === "ok" ? evaluation.result : undefined,
  );

  // Results stored by an engine before 2026.12.2 carry no density or charge balance.
  const { density, chargeBalance } =
    evaluation.status === "ok" ? (evaluation.result as Partial<SolutionResult>) : {};

  if (evaluation.status === "empty") {
    return (
      <p className="text-sm text-ink-soft">
        Add a species and an amount to see ionic strength and activities.
      </p>
    );
  }

  return (
    <div className="space-y-3" aria-live="polite">
      {evaluation.status === "error" ? (
        <p
          role="status"
          className="rounded-md border border-red-300 bg-red-50 px-3 py-2 text-sm text-red-900"
        >
          {evaluation.field
            ? `Results paused until ${describeField(evaluation.field)} is corrected (marked above).`
            : evaluation.message}
        </p>
      ) : (
        <>
          <ResultsSummary result={evaluation.result} />
          <p className="text-xs text-ink-soft">
            <span className="font-medium text-ink">Model: {evaluation.result.model.label}</span>
            {evaluation.result.model.reason ? <> — {evaluation.result.model.reason}</> : null}
          </p>
          <MessagesList
            title="Model changed"
            tone="validity"
            messages={evaluation.result.modelChange ? [evaluation.result.modelChange] : []}
          />
          {density ? (
            <p className="text-xs text-ink-soft" data-testid="density-used">
              <span className="font-medium text-ink">Density:</span> {density.label}
            </p>
          ) : null}
          {chargeBalance && !chargeBalance.balanced ? (
            <ChargeBalanceOffer offers={chargeBalance.offers} onAdd={onAddComponent} />
          ) : null}
          <div className="grid gap-4 overflow-x-auto xl:grid-cols-[3fr_2fr]">
            <IonTable result={evaluation.result} />
            <SaltList result={evaluation.result} />
          </div>
          {evaluation.result.speciation ? (
            <div className="overflow-x-auto">
              <SpeciationTable speciation={evaluation.result.speciation} />
            </div>
          ) : null}
          <div className="overflow-x-auto">
            <ComponentResults result={evaluation.result} />
          </div>
          <FormulaApplied result={evaluation.result} />
          <MessagesList
            title="Outside the model's range"
            tone="validity"
            messages={evaluation.result.validity.messages.filter(
              (message) => message !== evaluation.result.modelChange,
            )}
          />
          <MessagesList title="Warnings" tone="warning" messages={evaluation.result.warnings} />
          <MessagesList title="Notes" tone="note" messages={evaluation.result.notes ?? []} />
          {evaluation.result.salts.length > 0 ? (
            <div>
              <button
                type="button"
                className={actionButtonClass}
                aria-expanded={chartOpen}
                onClick={() => setChartOpen((open) => !open)}
              >
                {chartOpen ? "Hide" : "Show"} γ± against √I for each model
              </button>
              {chartOpen ? (
                <Suspense fallback={<p className="mt-2 text-xs text-ink-soft">Loading chart…</p>}>
                  <GammaChart
                    input={evaluation.input}
                    result={evaluation.result}
                    salt={chartSalt}
                    onSaltChange={setChartSalt}
                  />
                </Suspense>
              ) : null}
            </div>
          ) : null}
        </>
      )}
      <MessagesList title="Hazard notes" tone="hazard" messages={hazards} />
      <SafetyCaution />
    </div>
  );
}
