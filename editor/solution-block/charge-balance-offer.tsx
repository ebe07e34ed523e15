"use client";

import { useState } from "react";
import { ChemFormula } from "@/lib/ui/chem-formula";
import { formatSignificant } from "@/lib/ui/format-number";
import type { SolutionResult } from "@/lib/document/evaluate-solution-block";
import { AMOUNT_UNITS, type SolutionComponentInput } from "@/lib/document/block-schemas";
import { actionButtonClass, inputClass } from "../ui/field-styles";

type Offer = SolutionResult["chargeBalance"]["offers"][number];
type AmountUnit = SolutionComponentInput["unit"];

const isAmountUnit = (unit: string): unit is AmountUnit =>
  (AMOUNT_UNITS as readonly string[]).includes(unit);

interface ChargeBalanceOfferProps {
  offers: readonly Offer[];
  /** Appends a component row; absent when the block is read-only or full. */
  onAdd?: (row: SolutionComponentInput) => void;
}

/**
 * The ions do not balance: the researcher picks a counter-ion and adds it as a component
 * row, in the amount that balances the charge exactly (mol/kg).
 */
export function ChargeBalanceOffer({ offers, onAdd }: ChargeBalanceOfferProps) {
  const [chosen, setChosen] = useState(0);
  // lib/chem gives the balancing amount in mol/kg; an offer in any other unit is not shown.
  const usable = offers.filter((o) => isAmountUnit(o.component.unit));
  if (usable.length === 0 || !onAdd) return null;
  const index = Math.min(chosen, usable.length - 1);
  const offer = usable[index];
  return (
    <div
      role="group"
      aria-label="Balance the charge"
      className="flex flex-wrap items-center gap-2 rounded-md border border-amber-300/70 bg-amber-50 px-3 py-2 text-xs text-amber-900"
    >
      <label htmlFor="charge-balance-counter-ion" className="font-semibold">
        Balance with
      </label>
      <select
        id="charge-balance-counter-ion"
        className={`${inputClass} w-auto text-xs`}
        value={index}
        onChange={(event) => setChosen(Number(event.target.value))}
      >
        {usable.map((o, i) => (
          <option key={o.formula} value={i}>
            {o.name ? `${o.name} (${o.formula})` : o.formula}
          </option>
        ))}
      </select>
      <span>
        {formatSignificant(offer.component.amount)} {offer.component.unit} of{" "}
        <ChemFormula formula={offer.formula} />
      </span>
      <button
        type="button"
        className={actionButtonClass}
        onClick={() =>
          onAdd({
            formula: offer.component.formula,
            amount: offer.component.amount,
            unit: offer.component.unit as AmountUnit,
          })
        }
      >
        Add counter-ion
      </button>
    </div>
  );
}
