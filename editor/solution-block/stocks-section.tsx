"use client";

import { useState } from "react";
import {
  VOLUME_UNITS,
  type DilutionInput,
  type SolutionBlockInput,
  type StockRef,
} from "@/lib/document/block-schemas";
import { stockKey, type StockLookup, type StockLookups } from "@/lib/document/dilution";
import type { SolutionEvaluation } from "@/lib/document/evaluate-solution-block";
import { apiFetch } from "@/lib/ui/api-client";
import { formatSignificant } from "@/lib/ui/format-number";
import { NumberField } from "../ui/number-field";
import { SelectField } from "../ui/select-field";
import type { FieldMessages } from "./field-messages";
import { StockPicker } from "./stock-picker";
import { rememberStock, stockUrl } from "./use-stock-lookups";

const UNIT_OPTIONS = VOLUME_UNITS.map((u) => ({ value: u, label: u }));
/** A volume as measured: up to four significant digits, no padding ("10 mL", "99.82 mL"). */
const volumeText = (ml: number) => `${Number(ml.toPrecision(4))} mL`;
const EMPTY_DILUTION: DilutionInput = { stocks: [], finalVolume: null, finalVolumeUnit: "mL" };

/**
 * "Made from stocks": the stocks taken (each a saved solution block of the lab, at the revision
 * used), the volume of each and the final volume, with the arithmetic c₂ = c₁·V₁/V₂ shown per
 * component. The block's own rows below are what is added on top (e.g. a weighed salt).
 */
export function StocksSection({
  value,
  stocks,
  evaluation,
  errors,
  editable,
  onChange,
}: {
  value: SolutionBlockInput;
  stocks: StockLookups;
  evaluation: SolutionEvaluation;
  errors: FieldMessages;
  editable: boolean;
  onChange: (patch: Partial<SolutionBlockInput>) => void;
}) {
  const [picking, setPicking] = useState(false);
  const [pickError, setPickError] = useState<string | null>(null);
  const dilution = value.dilution ?? null;
  const setDilution = (next: DilutionInput | null) => onChange({ dilution: next });

  if (!dilution) {
    return editable ? (
      <button
        type="button"
        className="text-xs text-copper-700 hover:underline"
        onClick={() => {
          setDilution(EMPTY_DILUTION);
          setPicking(true);
        }}
      >
        + Made from stocks (dilute a saved solution)
      </button>
    ) : null;
  }

  const patchStock = (index: number, patch: Partial<StockRef>) =>
    setDilution({
      ...dilution,
      stocks: dilution.stocks.map((s, i) => (i === index ? { ...s, ...patch } : s)),
    });

  async function pick(hit: { entryId: string; blockId: string }) {
    setPickError(null);
    try {
      // The stock's current revision, read the way the server reads it on save.
      const lookup = await apiFetch<StockLookup>(stockUrl(hit));
      if (lookup.status !== "ok")
        throw new Error(lookup.status === "unavailable" ? lookup.message : "Not ready.");
      const ref: StockRef = {
        entryId: lookup.stock.entryId,
        blockId: lookup.stock.blockId,
        revision: lookup.stock.revision,
        volume: null,
        volumeUnit: "mL",
      };
      rememberStock(lookup);
      setDilution({ ...dilution!, stocks: [...dilution!.stocks, ref] });
      setPicking(false);
    } catch (error) {
      setPickError((error as Error).message);
    }
  }

  const lines = evaluation.status === "ok" ? (evaluation.dilution?.lines ?? []) : [];
  return (
    <fieldset
      className="space-y-2 rounded-md border border-lagoon-600/20 bg-lagoon-50/40 p-2"
      data-testid="stocks-section"
    >
      <legend className="px-1 text-xs font-semibold text-lagoon-700">Made from stocks</legend>
      {dilution.stocks.map((ref, i) => {
        const lookup = stocks.get(stockKey(ref));
        const stock = lookup?.status === "ok" ? lookup.stock : null;
        return (
          <div key={`${stockKey(ref)}:${i}`} className="flex flex-wrap items-end gap-2 text-sm">
            <NumberField
              label={`Volume of stock ${i + 1}`}
              hideLabel
              className="w-24"
              placeholder="volume"
              bounds={{ min: -1e9, max: 1e9 }}
              value={ref.volume}
              disabled={!editable}
              error={errors.get(`dilution.stocks[${i}].volume`)}
              onValueChange={(volume) => patchStock(i, { volume })}
            />
            <SelectField
              label={`Unit of stock ${i + 1}`}
              hideLabel
              className="w-20"
              value={ref.volumeUnit}
              options={UNIT_OPTIONS}
              disabled={!editable}
              onValueChange={(u) => patchStock(i, { volumeUnit: u as StockRef["volumeUnit"] })}
            />
            <span className="pb-1.5">
              of{" "}
              <a
                className="font-medium text-copper-700 hover:underline"
                href={`/entries/${ref.entryId}/revisions/${ref.revision}#block-${ref.blockId}`}
              >
                {stock?.name || "stock"}
              </a>{" "}
              <span className="text-xs text-ink-soft">
                ({stock?.entryTitle ?? "…"}, revision {ref.revision})
              </span>
              {lookup?.status === "unavailable" || errors.get(`dilution.stocks[${i}]`) ? (
                <span role="alert" className="block text-xs text-red-700">
                  {lookup?.status === "unavailable"
                    ? lookup.message
                    : errors.get(`dilution.stocks[${i}]`)}
                </span>
              ) : null}
            </span>
            {editable ? (
              <button
                type="button"
                className="pb-1.5 text-xs text-ink-soft hover:text-red-700"
                aria-label={`Remove stock ${i + 1}`}
                onClick={() => {
                  const rest = dilution.stocks.filter((_, j) => j !== i);
                  setDilution(
                    rest.length || dilution.finalVolume !== null
                      ? { ...dilution, stocks: rest }
                      : null,
                  );
                }}
              >
                ✕
              </button>
            ) : null}
          </div>
        );
      })}
      <div className="flex flex-wrap items-end gap-2 text-sm">
        <span className="pb-1.5">made up to</span>
        <NumberField
          label="Final volume"
          hideLabel
          className="w-24"
          placeholder="final"
          bounds={{ min: -1e9, max: 1e9 }}
          value={dilution.finalVolume}
          disabled={!editable}
          error={errors.get("dilution.finalVolume")}
          onValueChange={(finalVolume) => setDilution({ ...dilution, finalVolume })}
        />
        <SelectField
          label="Unit of the final volume"
          hideLabel
          className="w-20"
          value={dilution.finalVolumeUnit}
          options={UNIT_OPTIONS}
          disabled={!editable}
          onValueChange={(u) =>
            setDilution({ ...dilution, finalVolumeUnit: u as DilutionInput["finalVolumeUnit"] })
          }
        />
        {editable && !picking && dilution.stocks.length < 10 ? (
          <button
            type="button"
            className="pb-1.5 text-xs text-copper-700 hover:underline"
            onClick={() => setPicking(true)}
          >
            + Add a stock
          </button>
        ) : null}
        {editable && dilution.stocks.length === 0 ? (
          <button
            type="button"
            className="pb-1.5 text-xs text-ink-soft hover:underline"
            onClick={() => setDilution(null)}
          >
            Not made from stocks
          </button>
        ) : null}
      </div>
      {errors.get("dilution") ? (
        <p className="text-xs text-ink-soft" role="status">
          {errors.get("dilution")}
        </p>
      ) : null}
      {picking ? (
        <StockPicker
          excludeBlockId={value.blockId}
          onPick={pick}
          onClose={() => setPicking(false)}
        />
      ) : null}
      {pickError ? (
        <p role="alert" className="text-xs text-red-700">
          {pickError}
        </p>
      ) : null}
      {lines.length > 0 ? (
        <ul className="font-mono text-xs text-ink-soft" aria-label="Dilution arithmetic">
          {lines.map((l, i) => (
            <li key={i}>
              {l.formula}: {formatSignificant(l.stockMolarity)} mol/L × {volumeText(l.volumeMl)} /{" "}
              {volumeText(l.finalVolumeMl)} = {formatSignificant(l.molarity)} mol/L
            </li>
          ))}
        </ul>
      ) : null}
      {evaluation.status === "ok" && evaluation.dilution
        ? evaluation.dilution.notes.map((n) => (
            <p key={n} className="text-xs text-ink-soft">
              {n}
            </p>
          ))
        : null}
    </fieldset>
  );
}
