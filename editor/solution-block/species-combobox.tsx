"use client";

import { useId, useMemo, useState, type KeyboardEvent } from "react";
import { cx } from "@/lib/ui/class-names";
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
    if (showList && event.key === "ArrowDown") {
      event.preventDefault();
      setActive((i) => (i + 1) % options.length);
    } else if (showList && event.key === "ArrowUp") {
      event.preventDefault();
      setActive((i) => (i - 1 + options.length) % options.length);
    } else if (showList && event.key === "Enter" && options[active]) {
      event.preventDefault();
      pick(options[active]);
    } else if (showList && event.key === "Escape") {
      event.preventDefault();
      setOpen(false);
    } else {
      onRowKeyDown?.(event);
    }
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
        <ul
          id={`${id}-list`}
          role="listbox"
          aria-label={`${label} suggestions`}
          className="absolute top-full left-0 z-20 mt-1 max-h-60 w-72 overflow-auto rounded-md border border-ink-faint/40 bg-white py-1 shadow-lg"
        >
          {options.map((option, index) => (
            <li
              key={`${option.formula}-${option.name}`}
              id={`${id}-opt-${index}`}
              role="option"
              aria-selected={index === active}
              // mousedown, not click: the input's blur would close the list first.
              onMouseDown={(event) => {
                event.preventDefault();
                pick(option);
              }}
              className={cx(
                "flex cursor-pointer items-baseline justify-between gap-3 px-3 py-1 text-sm",
                index === active ? "bg-copper-50 text-ink" : "text-ink-soft",
              )}
            >
              <span className="font-mono text-ink">{option.formula}</span>
              <span className="truncate text-xs">{option.name}</span>
            </li>
          ))}
        </ul>
      ) : null}
      <FieldError id={`${id}-error`} message={shownError} />
    </div>
  );
}
