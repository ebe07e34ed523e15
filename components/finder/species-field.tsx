"use client";

import { useEffect, useId, useState, type KeyboardEvent } from "react";
import { cx } from "@/lib/ui/class-names";

interface Suggestion {
  formula: string;
  name: string;
  source: "lab" | "catalogue";
}

/** The term being typed: what follows the last comma. */
const lastTerm = (value: string) => value.slice(value.lastIndexOf(",") + 1).trim();

/**
 * The finder's species field: several species separated by commas, with type-ahead for the
 * one being typed from the catalogue and the lab's own species (GET /api/solutions/species).
 * ARIA 1.2 combobox: arrows move, Enter picks (replacing the term with its formula), Escape
 * closes. Free text stays allowed; the server says by field which name it does not know.
 */
export function SpeciesField({
  name,
  defaultValue,
  error,
}: {
  name: string;
  defaultValue: string;
  error?: string;
}) {
  const id = useId();
  const [value, setValue] = useState(defaultValue);
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(0);
  const [suggestions, setSuggestions] = useState<Suggestion[]>([]);
  const term = lastTerm(value);

  useEffect(() => {
    if (!open || term === "") return;
    const controller = new AbortController();
    // A short pause so that fast typing asks once, not once per key.
    const timer = setTimeout(() => {
      fetch(`/api/solutions/species?q=${encodeURIComponent(term)}`, {
        signal: controller.signal,
      })
        .then((r) => (r.ok ? (r.json() as Promise<{ suggestions: Suggestion[] }>) : null))
        .then((body) => {
          if (body) setSuggestions(body.suggestions);
        })
        .catch(() => undefined);
    }, 120);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
  }, [open, term]);

  const shown = open && term !== "" ? suggestions : [];
  const showList = shown.length > 0;

  const pick = (s: Suggestion) => {
    const head = value.slice(0, value.lastIndexOf(",") + 1);
    setValue(`${head}${head ? " " : ""}${s.formula}, `);
    setOpen(false);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (!showList) return;
    if (event.key === "ArrowDown") {
      event.preventDefault();
      setActive((i) => (i + 1) % shown.length);
    } else if (event.key === "ArrowUp") {
      event.preventDefault();
      setActive((i) => (i - 1 + shown.length) % shown.length);
    } else if (event.key === "Enter" && shown[active]) {
      event.preventDefault();
      pick(shown[active]);
    } else if (event.key === "Escape") {
      event.preventDefault();
      setOpen(false);
    }
  };

  return (
    <div className="relative">
      <label htmlFor={id} className="mb-1 label">
        Species
      </label>
      <input
        id={id}
        name={name}
        type="text"
        role="combobox"
        aria-expanded={showList}
        aria-controls={`${id}-list`}
        aria-autocomplete="list"
        aria-activedescendant={showList ? `${id}-opt-${active}` : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : `${id}-hint`}
        autoComplete="off"
        spellCheck={false}
        maxLength={400}
        placeholder="NaCl, sulfate, K+"
        value={value}
        className="input w-full font-mono"
        onChange={(event) => {
          setValue(event.target.value);
          setOpen(true);
          setActive(0);
        }}
        onBlur={() => setOpen(false)}
        onKeyDown={onKeyDown}
      />
      <span id={`${id}-hint`} className="sr-only">
        Separate species with commas; formulas or names.
      </span>
      {showList ? (
        <ul
          id={`${id}-list`}
          role="listbox"
          aria-label="Species suggestions"
          className="absolute top-full left-0 z-20 mt-1 max-h-64 w-80 overflow-auto rounded-md border border-ink-faint/40 bg-white py-1 shadow-lg"
        >
          {shown.map((s, index) => (
            <li
              key={`${s.source}-${s.formula}`}
              id={`${id}-opt-${index}`}
              role="option"
              aria-selected={index === active}
              // mousedown, not click: the input's blur would close the list first.
              onMouseDown={(event) => {
                event.preventDefault();
                pick(s);
              }}
              className={cx(
                "flex cursor-pointer items-baseline justify-between gap-3 px-3 py-1 text-sm",
                index === active ? "bg-copper-50 text-ink" : "text-ink-soft",
              )}
            >
              <span className="font-mono text-ink">{s.formula}</span>
              <span className="truncate text-xs">
                {s.name}
                {s.source === "lab" ? " · lab" : ""}
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      {error ? (
        <span id={`${id}-error`} role="alert" className="mt-1 block text-xs text-red-700">
          {error}
        </span>
      ) : null}
    </div>
  );
}
