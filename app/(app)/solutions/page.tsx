import type { Metadata } from "next";
import Link from "next/link";
import { requireActor } from "@/lib/access/actor";
import { listSolvents } from "@/lib/chem";
import { isAppError } from "@/lib/errors";
import { searchSolutions } from "@/lib/notebook/solution-finder";

export const metadata: Metadata = { title: "Solution finder" };

type Search = Record<string, string | undefined>;
const fmt = (x: number | null, digits = 4) =>
  x === null ? "—" : Number(x.toPrecision(digits)).toString();

export default async function SolutionFinderPage({
  searchParams,
}: {
  searchParams: Promise<Search>;
}) {
  const actor = await requireActor();
  const query = await searchParams;
  let rows: Awaited<ReturnType<typeof searchSolutions>> = [];
  let fieldErrors: Record<string, string[]> = {};
  try {
    rows = await searchSolutions(actor, query);
  } catch (error) {
    if (!isAppError(error)) throw error;
    fieldErrors = error.fieldErrors ?? {};
  }
  const field = (name: string, label: string, placeholder: string, width = "w-28") => (
    <label className="text-sm">
      <span className="mb-1 label">{label}</span>
      <input
        name={name}
        defaultValue={query[name] ?? ""}
        placeholder={placeholder}
        className={`input ${width}`}
        aria-invalid={Boolean(fieldErrors[name])}
      />
      {fieldErrors[name] ? (
        <span role="alert" className="mt-1 block text-xs text-red-700">
          {fieldErrors[name].join(" ")}
        </span>
      ) : null}
    </label>
  );
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Solution finder</h1>
        <p className="text-sm text-ink-soft">
          Every solution block in the lab&apos;s current revisions, as the server computed it.
        </p>
      </div>
      <form
        className="flex flex-wrap items-end gap-3 card p-5"
        role="search"
        aria-label="Find solutions"
      >
        {field("iMin", "I from (mol/kg)", "0.05")}
        {field("iMax", "I to (mol/kg)", "0.5")}
        {field("species", "Species (all of)", "NaCl, K+", "w-48")}
        {field("tMin", "T from (°C)", "20")}
        {field("tMax", "T to (°C)", "30")}
        <label className="text-sm">
          <span className="mb-1 label">Solvent</span>
          <select name="solvent" defaultValue={query.solvent ?? ""} className="input w-44">
            <option value="">Any solvent</option>
            {listSolvents().map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          <span className="mb-1 label">Author</span>
          <select name="author" defaultValue={query.author ?? "anyone"} className="input w-32">
            <option value="anyone">Anyone</option>
            <option value="me">Me</option>
          </select>
        </label>
        {field("from", "Saved from", "2026-11-01")}
        {field("to", "Saved until", "2026-12-31")}
        <button type="submit" className="btn-primary">
          Search
        </button>
      </form>
      <div className="overflow-x-auto card">
        <table className="w-full text-sm" aria-label="Solutions found">
          <thead className="border-b border-ink/10 text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th className="px-4 py-2.5">Solution</th>
              <th className="px-4 py-2.5">Entry</th>
              <th className="px-4 py-2.5 text-right normal-case">I / mol kg⁻¹</th>
              <th className="px-4 py-2.5 text-right normal-case">
                λ<sub>D</sub> / nm
              </th>
              <th className="px-4 py-2.5 text-right normal-case">T / °C</th>
              <th className="px-4 py-2.5">Solvent</th>
              <th className="px-4 py-2.5">Model</th>
              <th className="px-4 py-2.5">Species</th>
              <th className="px-4 py-2.5">Author</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-ink/5">
            {rows.length === 0 ? (
              <tr>
                <td colSpan={9} className="px-4 py-6 text-ink-soft">
                  No solution matches.
                </td>
              </tr>
            ) : null}
            {rows.map((r) => (
              <tr key={r.id}>
                <td className="px-4 py-2.5 font-medium">{r.name || "Unnamed solution"}</td>
                <td className="px-4 py-2.5">
                  <Link
                    className="hover:text-copper-700 hover:underline"
                    href={`/entries/${r.entryId}`}
                  >
                    {r.entryTitle}
                  </Link>
                </td>
                <td className="px-4 py-2.5 text-right font-mono text-lagoon-700 tabular">
                  {fmt(r.ionicStrengthMolal)}
                </td>
                <td className="px-4 py-2.5 text-right font-mono tabular">
                  {fmt(r.debyeLengthNm, 3)}
                </td>
                <td className="px-4 py-2.5 text-right font-mono tabular">
                  {fmt(r.temperatureC, 3)}
                </td>
                <td className="px-4 py-2.5">{r.solvent}</td>
                <td className="px-4 py-2.5 text-ink-soft">{r.modelUsed ?? "—"}</td>
                <td className="px-4 py-2.5 font-mono text-xs">{r.species.join(" · ")}</td>
                <td className="px-4 py-2.5 text-ink-soft">{r.authorName}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
