"use client";

import { useEffect, useRef, useState, type KeyboardEvent } from "react";
import { UNITS_NEEDING_PER, type SolutionComponentInput } from "@/lib/document/block-schemas";
import { actionButtonClass } from "../ui/field-styles";
import { ComponentRow } from "./component-row";
import type { FieldMessages } from "./field-messages";

interface ComponentsTableProps {
  components: SolutionComponentInput[];
  errors: FieldMessages;
  editable: boolean;
  onChange: (components: SolutionComponentInput[]) => void;
}

/** The document schema's limit on rows per block. */
export const MAX_COMPONENT_ROWS = 40;

const emptyRow = (): SolutionComponentInput => ({ formula: "", amount: null, unit: "mol/kg" });

/**
 * The components of a solution, one row each. Keyboard: Enter moves to the next row and, on
 * the last row, adds one; Ctrl/Cmd+Backspace on an empty row removes it; focus follows to
 * the row a person expects.
 */
export function ComponentsTable({ components, errors, editable, onChange }: ComponentsTableProps) {
  const speciesInputs = useRef<(HTMLInputElement | null)[]>([]);
  const [focusRow, setFocusRow] = useState<number | null>(null);

  // The new row arrives through the editor (updateAttributes), a render or two after the
  // key press: wait until its input exists before moving focus.
  useEffect(() => {
    if (focusRow === null) return;
    const target = speciesInputs.current[focusRow];
    if (!target || focusRow >= components.length) return;
    target.focus();
    setFocusRow(null);
  }, [focusRow, components.length]);

  // The basis column (per mass of solvent or final volume) appears only when a weighed row needs it.
  const showBasis = components.some((row) => UNITS_NEEDING_PER.includes(row.unit));
  const update = (index: number, patch: Partial<SolutionComponentInput>) =>
    onChange(components.map((row, i) => (i === index ? { ...row, ...patch } : row)));
  const addRow = () => {
    if (components.length >= MAX_COMPONENT_ROWS) return;
    // A new row copies the unit above it: stocks are usually written in one unit.
    const last = components[components.length - 1];
    onChange([
      ...components,
      {
        ...emptyRow(),
        unit: last?.unit ?? "mol/kg",
        perAmount: last?.perAmount,
        perUnit: last?.perUnit,
      },
    ]);
    setFocusRow(components.length);
  };
  const removeRow = (index: number) => {
    onChange(components.filter((_, i) => i !== index));
    setFocusRow(Math.max(0, index - 1));
  };

  const rowKeyDown = (index: number) => (event: KeyboardEvent<HTMLInputElement>) => {
    const row = components[index];
    if (event.key === "Enter" && index === components.length - 1) {
      event.preventDefault();
      addRow();
    } else if (event.key === "Enter") {
      event.preventDefault();
      speciesInputs.current[index + 1]?.focus();
    } else if (
      event.key === "Backspace" &&
      (event.ctrlKey || event.metaKey) &&
      row.formula.trim() === "" &&
      row.amount === null
    ) {
      event.preventDefault();
      if (components.length > 1) removeRow(index);
    }
  };

  return (
    <div>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Components</caption>
        <thead>
          <tr className="border-b border-ink-faint/30 text-left text-[11px] tracking-wide text-ink-soft uppercase">
            <th scope="col" className="pr-2 pb-1 font-medium">
              Species
            </th>
            <th scope="col" className="pr-2 pb-1 text-right font-medium">
              Amount
            </th>
            <th scope="col" className="pr-2 pb-1 pl-1 font-medium">
              Unit
            </th>
            {showBasis ? (
              <th scope="col" className="pr-2 pb-1 font-medium">
                Basis
              </th>
            ) : null}
            <th scope="col" className="pb-1">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {components.map((component, index) => (
            <ComponentRow
              key={index}
              index={index}
              component={component}
              errors={errors}
              editable={editable}
              onChange={(patch) => update(index, patch)}
              onRemove={() => removeRow(index)}
              onKeyDown={rowKeyDown(index)}
              showBasis={showBasis}
              speciesRef={(element) => {
                speciesInputs.current[index] = element;
              }}
            />
          ))}
        </tbody>
      </table>
      {editable ? (
        <button
          type="button"
          className={`${actionButtonClass} mt-1`}
          onClick={addRow}
          disabled={components.length >= MAX_COMPONENT_ROWS}
        >
          <span aria-hidden>+</span> Add component
        </button>
      ) : null}
    </div>
  );
}
