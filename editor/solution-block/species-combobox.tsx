"use client";

import { useId, useMemo, useState, type KeyboardEvent } from "react";
import { cx } from "@/lib/ui/class-names";
import { handleListboxKey, SpeciesListbox } from "@/components/ui/species-listbox";
import { FieldError } from "../ui/field-error";
import { inputClass, invalidClass } from "../ui/field-styles";
import { searchSpeciesOptions, type SpeciesOption } from "../chem-catalogue";

interface SpeciesComboboxProps {
  value: string;
  onValueChange: (formula: string) => void;
  label: string;
  error?: string;
  disabled?: boolean;
  /** Keys the row handles itself (Enter on the last row, Ctrl+Backspace) when no list is open. */
  onRowKeyDown?: (event: KeyboardEvent<HTMLInputElement>) => void;
  inputRef?: (element: HTMLInputElement | null) => void;
}

/**
 * Species input with type-ahead over the catalogue, matching formula and name. Free text
 * stays allowed: the engine says whether it knows the species, in place.
 * ARIA 1.2 combobox pattern: the input owns a listbox; arrows move, Enter picks, Escape closes.
 */
export function SpeciesCombobox({
  value,
  onValueChange,
  label,
  error,
  disabled,
  onRowKeyDown,
  inputRef,
}: SpeciesComboboxProps) {
  const id = useId();
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const options = useMemo<SpeciesOption[]>(
    () => (open ? searchSpeciesOptions(value, 8) : []),
    [open, value],
  );
  const showList = open && options.length > 0 && !disabled;
  // While suggestions are open the person is still choosing: the engine's "unknown species"
  // for a half-typed name would only be noise. It shows as soon as the list closes.
  const shownError = showList ? undefined : error;

  const pick = (option: SpeciesOption) => {
    onValueChange(option.formula);
    setOpen(false);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    const handled =
      showList &&
      handleListboxKey(event, {
        count: options.length,
        active,
        setActive,
        pick: (index) => pick(options[index]),
        close: () => setOpen(false),
      });
    if (!handled) onRowKeyDown?.(event);
  };

  return (
    <div className="relative">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <input
        id={id}
        ref={inputRef}
        type="text"
        role="combobox"
        aria-expanded={showList}
        aria-controls={`${id}-list`}
        aria-autocomplete="list"
        aria-activedescendant={showList ? `${id}-opt-${active}` : undefined}
        aria-invalid={shownError ? true : undefined}
        aria-describedby={shownError ? `${id}-error` : undefined}
        autoComplete="off"
        spellCheck={false}
        maxLength={80}
        placeholder="e.g. KCl or potassium chloride"
        disabled={disabled}
        value={value}
        className={cx(inputClass, "font-mono", shownError && invalidClass)}
        onChange={(event) => {
          onValueChange(event.target.value);
          setOpen(true);
          setActive(0);
        }}
        onFocus={() => setOpen(value.trim() !== "")}
        onBlur={() => setOpen(false)}
        onKeyDown={onKeyDown}
      />
      {showList ? (
        <SpeciesListbox
          id={id}
          label={`${label} suggestions`}
          options={options}
          active={active}
          onPick={(index) => pick(options[index])}
          widthClass="w-72"
        />
      ) : null}
      <FieldError id={`${id}-error`} message={shownError} />
    </div>
  );
}
