"use client";

import type { Dispatch, KeyboardEvent, SetStateAction } from "react";
import { cx } from "@/lib/ui/class-names";

export interface ListedSpecies {
  formula: string;
  name: string;
  /** Where the suggestion comes from, when that is worth saying (e.g. "lab"). */
  note?: string;
}

/**
 * The suggestion list of a species combobox (ARIA 1.2): options carry ids the input points
 * at with aria-activedescendant (`${id}-opt-${index}`); the list is `${id}-list`.
 */
export function SpeciesListbox({
  id,
  label,
  options,
  active,
  onPick,
  widthClass,
}: {
  id: string;
  label: string;
  options: readonly ListedSpecies[];
  active: number;
  onPick: (index: number) => void;
  widthClass: string;
}) {
  return (
    <ul
      id={`${id}-list`}
      role="listbox"
      aria-label={label}
      className={cx(
        "absolute top-full left-0 z-20 mt-1 max-h-64 overflow-auto rounded-md border border-ink-faint/40 bg-white py-1 shadow-lg",
        widthClass,
      )}
    >
      {options.map((option, index) => (
        <li
          key={`${option.note ?? ""}-${option.formula}-${option.name}`}
          id={`${id}-opt-${index}`}
          role="option"
          aria-selected={index === active}
          // mousedown, not click: the input's blur would close the list first.
          onMouseDown={(event) => {
            event.preventDefault();
            onPick(index);
          }}
          className={cx(
            "flex cursor-pointer items-baseline justify-between gap-3 px-3 py-1 text-sm",
            index === active ? "bg-copper-50 text-ink" : "text-ink-soft",
          )}
        >
          <span className="font-mono text-ink">{option.formula}</span>
          <span className="truncate text-xs">
            {option.name}
            {option.note ? ` · ${option.note}` : ""}
          </span>
        </li>
      ))}
    </ul>
  );
}

/**
 * The list's keys on the input: arrows move, Enter picks, Escape closes. True when the key
 * was the list's (the caller then leaves it alone).
 */
export function handleListboxKey(
  event: KeyboardEvent<HTMLInputElement>,
  list: {
    count: number;
    active: number;
    setActive: Dispatch<SetStateAction<number>>;
    pick: (index: number) => void;
    close: () => void;
  },
): boolean {
  const { count, active, setActive, pick, close } = list;
  if (event.key === "ArrowDown") setActive((i) => (i + 1) % count);
  else if (event.key === "ArrowUp") setActive((i) => (i - 1 + count) % count);
  else if (event.key === "Enter" && active < count) pick(active);
  else if (event.key === "Escape") close();
  else return false;
  event.preventDefault();
  return true;
}
