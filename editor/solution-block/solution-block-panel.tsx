"use client";

import { useMemo } from "react";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { TextField } from "../ui/text-field";
import { ComponentsTable, MAX_COMPONENT_ROWS } from "./components-table";
import { evaluateSolutionBlockCached } from "@/lib/document/evaluate-solution-block";
import { NO_MESSAGES, type FieldMessages } from "./field-messages";
import { SolutionResults } from "./solution-results";
import { SimilarLink } from "./similar-link";
import { SolutionSettings } from "./solution-settings";
import { StoredNotice } from "./stored-notice";
import { StocksSection } from "./stocks-section";
import { useStockLookups } from "./use-stock-lookups";
import { useStoredSolution } from "../stored-results";
import { describeEngineChange, evaluationFromStored } from "@/lib/document/stored-evaluation";

interface SolutionBlockPanelProps {
  value: SolutionBlockInput;
  onChange: (next: SolutionBlockInput) => void;
  editable?: boolean;
}

/**
 * The solution block's form and live results. Independent of tiptap: the node view passes the
 * node's attributes in and writes changes back with updateAttributes.
 */
export function SolutionBlockPanel({ value, onChange, editable = true }: SolutionBlockPanelProps) {
  const stored = useStoredSolution(value.blockId);
  const stocks = useStockLookups(value.dilution);
  const live = useMemo(() => evaluateSolutionBlockCached(value, stocks), [value, stocks]);
  // A saved revision shows its stored numbers; today's engine is asked only to compare.
  const showStored = stored !== null && !editable;
  const evaluation = useMemo(
    () => (showStored ? evaluationFromStored(value, stored) : live),
    [showStored, stored, value, live],
  );
  const engineChanges = useMemo(
    () => (showStored ? describeEngineChange(evaluation, live) : []),
    [showStored, evaluation, live],
  );
  const errors: FieldMessages = useMemo(
    () =>
      evaluation.status === "error" && evaluation.field
        ? new Map([[evaluation.field, evaluation.message]])
        : NO_MESSAGES,
    [evaluation],
  );
  const patch = (changes: Partial<SolutionBlockInput>) => onChange({ ...value, ...changes });
  const formulas = value.components
    .map((row) => row.formula)
    .filter((formula) => formula.trim() !== "");

  return (
    <section
      id={value.blockId ? `block-${value.blockId}` : undefined}
      data-live-block="solution"
      aria-label={`Solution block ${value.name || "(unnamed)"}`}
      className="my-4 scroll-mt-24 rounded-lg border border-ink-faint/40 bg-white/70 shadow-sm data-[highlighted=true]:ring-2 data-[highlighted=true]:ring-copper-500"
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
        <span className="rounded bg-lagoon-600 px-1.5 py-0.5 text-[10px] font-semibold tracking-wider text-white uppercase">
          Solution
        </span>
        <TextField
          label="Solution name"
          hideLabel
          maxLength={120}
          className="flex-1"
          placeholder="Name, e.g. Supporting electrolyte A"
          value={value.name}
          disabled={!editable}
          onValueChange={(name) => patch({ name })}
        />
        <span
          className="hidden font-mono text-[10px] text-ink-faint sm:inline"
          title={`Block id ${value.blockId ?? ""}`}
        >
          #{String(value.blockId ?? "").slice(0, 8)}
        </span>
        <SimilarLink blockId={value.blockId} />
      </header>
      <div className="space-y-4 px-3 py-3">
        <SolutionSettings value={value} errors={errors} editable={editable} onChange={patch} />
        <StocksSection
          value={value}
          stocks={stocks}
          evaluation={evaluation}
          errors={errors}
          editable={editable}
          onChange={patch}
        />
        <ComponentsTable
          components={value.components}
          errors={errors}
          editable={editable}
          onChange={(components) => patch({ components })}
        />
        <div className="space-y-3 border-t border-dashed border-ink-faint/40 pt-3">
          {showStored ? <StoredNotice stored={stored} engineChanges={engineChanges} /> : null}
          <SolutionResults
            evaluation={evaluation}
            formulas={formulas}
            onAddComponent={
              editable && value.components.length < MAX_COMPONENT_ROWS
                ? (row) => patch({ components: [...value.components, row] })
                : undefined
            }
          />
        </div>
      </div>
    </section>
  );
}
