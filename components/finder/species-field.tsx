"use client";

import { useEffect, useId, useState, type KeyboardEvent } from "react";
import { handleListboxKey, SpeciesListbox } from "@/components/ui/species-listbox";

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
    handleListboxKey(event, {
      count: shown.length,
      active,
      setActive,
      pick: (index) => pick(shown[index]),
      close: () => setOpen(false),
    });
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
        <SpeciesListbox
          id={id}
          label="Species suggestions"
          options={shown.map((s) => ({ ...s, note: s.source === "lab" ? "lab" : undefined }))}
          active={active}
          onPick={(index) => pick(shown[index])}
          widthClass="w-80"
        />
      ) : null}
      {error ? (
        <span id={`${id}-error`} role="alert" className="mt-1 block text-xs text-red-700">
          {error}
        </span>
      ) : null}
    </div>
  );
}
