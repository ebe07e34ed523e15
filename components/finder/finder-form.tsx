"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import type { FormEvent, ReactNode } from "react";
import { FINDER_QUERY_KEYS } from "@/lib/validation/solution-finder";
import { SpeciesField } from "./species-field";

interface FinderOption {
  value: string;
  label: string;
}

export interface FinderFormProps {
  /** The query as it stands in the URL. */
  values: Record<string, string>;
  fieldErrors: Record<string, string[]>;
  solvents: FinderOption[];
  models: FinderOption[];
  members: FinderOption[];
  projects: FinderOption[];
  statuses: FinderOption[];
}

/** Values that are the defaults are left out of the URL, so shared links stay short. */
const DEFAULTS: Record<string, string> = { scale: "molal", match: "all", history: "0" };

/**
 * The finder's form as URL parameters: empty and default values dropped, the page reset, the
 * keys in one fixed order so that the same search is always the same link.
 */
function queryOf(form: HTMLFormElement): string {
  const data = new FormData(form);
  const params = new URLSearchParams();
  for (const key of FINDER_QUERY_KEYS) {
    const value = data.get(key);
    if (typeof value !== "string") continue;
    const v = value.trim().replace(/,\s*$/, "");
    if (v !== "" && DEFAULTS[key] !== v) params.set(key, v);
  }
  return params.toString();
}

/**
 * The solution finder's filters. Submitting puts the query in the URL (the page, a server
 * component, searches from it), so a search can be bookmarked and shared and the browser's
 * back and forward buttons step through searches. Without JavaScript it is a plain GET form.
 */
export function FinderForm(props: FinderFormProps) {
  const router = useRouter();
  const { values, fieldErrors } = props;
  const error = (name: string) => fieldErrors[name]?.join(" ");

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const query = queryOf(event.currentTarget);
    router.push(query ? `/solutions?${query}` : "/solutions");
  };

  return (
    <form
      method="get"
      action="/solutions"
      onSubmit={onSubmit}
      role="search"
      aria-label="Find solutions"
      className="space-y-4 card p-5"
    >
      <div className="grid gap-3 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto]">
        <Field label="Text in entries" name="q" error={error("q")}>
          <input
            id="finder-q"
            name="q"
            type="search"
            maxLength={400}
            defaultValue={values.q ?? ""}
            placeholder="ferrocyanide, glassy carbon"
            className="input w-full"
            aria-invalid={error("q") ? true : undefined}
          />
        </Field>
        <SpeciesField name="species" defaultValue={values.species ?? ""} error={error("species")} />
        <Select
          label="Species match"
          name="match"
          value={values.match ?? "all"}
          error={error("match")}
          options={[
            { value: "all", label: "All of them" },
            { value: "any", label: "Any of them" },
          ]}
        />
      </div>
      <div className="flex flex-wrap items-start gap-3">
        <NumberField label="I from" name="iMin" values={values} error={error("iMin")} />
        <NumberField label="I to" name="iMax" values={values} error={error("iMax")} />
        <Select
          label="Scale"
          name="scale"
          value={values.scale ?? "molal"}
          error={error("scale")}
          options={[
            { value: "molal", label: "molal (mol/kg)" },
            { value: "molar", label: "molar (mol/L)" },
          ]}
        />
        <NumberField label="T from (°C)" name="tMin" values={values} error={error("tMin")} />
        <NumberField label="T to (°C)" name="tMax" values={values} error={error("tMax")} />
        <Select
          label="Solvent"
          name="solvent"
          value={values.solvent ?? ""}
          error={error("solvent")}
          options={[{ value: "", label: "Any solvent" }, ...props.solvents]}
        />
        <Select
          label="Model used"
          name="model"
          value={values.model ?? ""}
          error={error("model")}
          options={[{ value: "", label: "Any model" }, ...props.models]}
        />
      </div>
      <div className="flex flex-wrap items-start gap-3">
        <Select
          label="Author"
          name="author"
          value={values.author ?? ""}
          error={error("author")}
          options={[{ value: "", label: "Anyone" }, { value: "me", label: "Me" }, ...props.members]}
        />
        <Select
          label="Project"
          name="project"
          value={values.project ?? ""}
          error={error("project")}
          options={[{ value: "", label: "Any project" }, ...props.projects]}
        />
        <Select
          label="Entry status"
          name="status"
          value={values.status ?? ""}
          error={error("status")}
          options={[{ value: "", label: "Any status" }, ...props.statuses]}
        />
        <Field label="Saved from" name="from" error={error("from")}>
          <input
            id="finder-from"
            type="date"
            name="from"
            defaultValue={values.from ?? ""}
            className="input"
            aria-invalid={error("from") ? true : undefined}
          />
        </Field>
        <Field label="Saved until" name="to" error={error("to")}>
          <input
            id="finder-to"
            type="date"
            name="to"
            defaultValue={values.to ?? ""}
            className="input"
            aria-invalid={error("to") ? true : undefined}
          />
        </Field>
      </div>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            name="history"
            value="1"
            defaultChecked={values.history === "1"}
            className="size-4"
          />
          Include earlier revisions
        </label>
        {/* The table's sort survives a new search; the page starts again at 1. */}
        {values.sort ? <input type="hidden" name="sort" value={values.sort} /> : null}
        {values.dir ? <input type="hidden" name="dir" value={values.dir} /> : null}
        <div className="flex gap-2">
          <Link href="/solutions" className="btn-quiet">
            Clear
          </Link>
          <button type="submit" className="btn-primary">
            Search
          </button>
        </div>
      </div>
    </form>
  );
}

function Field({
  label,
  name,
  error,
  children,
}: {
  label: string;
  name: string;
  error?: string;
  children: ReactNode;
}) {
  return (
    <div className="text-sm">
      <label htmlFor={`finder-${name}`} className="mb-1 label">
        {label}
      </label>
      {children}
      {error ? (
        <span role="alert" className="mt-1 block max-w-56 text-xs text-red-700">
          {error}
        </span>
      ) : null}
    </div>
  );
}

function NumberField({
  label,
  name,
  values,
  error,
}: {
  label: string;
  name: string;
  values: Record<string, string>;
  error?: string;
}) {
  return (
    <Field label={label} name={name} error={error}>
      <input
        id={`finder-${name}`}
        name={name}
        inputMode="decimal"
        maxLength={30}
        defaultValue={values[name] ?? ""}
        className="input w-24 font-mono"
        aria-invalid={error ? true : undefined}
      />
    </Field>
  );
}

function Select({
  label,
  name,
  value,
  options,
  error,
}: {
  label: string;
  name: string;
  value: string;
  options: FinderOption[];
  error?: string;
}) {
  return (
    <Field label={label} name={name} error={error}>
      <select
        id={`finder-${name}`}
        name={name}
        defaultValue={value}
        className="input max-w-52"
        aria-invalid={error ? true : undefined}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </Field>
  );
}
