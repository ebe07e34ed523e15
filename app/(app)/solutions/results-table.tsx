import Link from "next/link";
import { StatusChip } from "@/components/entries/status-chip";
import type { EntryStatus } from "@/lib/contract/vocabulary";
import type { FoundSolution } from "@/lib/finder/found-solution";
import { formatSignificant } from "@/lib/ui/format-number";
import type { FinderSortKey } from "@/lib/validation/solution-finder";

type Query = Record<string, string>;

/** The URL of this search with some parameters changed (and the page reset unless given). */
export function finderHref(query: Query, changes: Query): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...query, page: "", ...changes })) if (v) params.set(k, v);
  const text = params.toString();
  return text ? `/solutions?${text}` : "/solutions";
}

/**
 * The CSV export of this search: every match in the table's order, so the filters with the
 * sort and its direction, and no page.
 */
export function finderExportHref(query: Query): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) if (v && k !== "page") params.set(k, v);
  const text = params.toString();
  return text ? `/api/solutions/export?${text}` : "/api/solutions/export";
}

/**
 * The table's columns. Quantities keep their symbols' case ("λD / nm"); author and date fold
 * into the entry cell below desktop width so that a tablet shows the table without scrolling.
 */
const COLUMNS: {
  key: FinderSortKey | null;
  label: string;
  numeric?: boolean;
  wide?: boolean;
}[] = [
  { key: "name", label: "Solution" },
  { key: null, label: "Composition" },
  { key: "ionicStrength", label: "I", numeric: true },
  { key: "debye", label: "λD / nm", numeric: true },
  { key: "temperature", label: "T / °C", numeric: true },
  { key: "entry", label: "Entry" },
  { key: "author", label: "Author", wide: true },
  { key: "saved", label: "Saved", wide: true },
  { key: "status", label: "Status" },
];

function SortHeader({
  column,
  query,
  sort,
  dir,
  unit,
}: {
  column: (typeof COLUMNS)[number];
  query: Query;
  sort: FinderSortKey;
  dir: "asc" | "desc";
  unit: string;
}) {
  const label = column.key === "ionicStrength" ? `I / ${unit}` : column.label;
  const align = [
    column.numeric ? "text-right normal-case" : "text-left",
    column.wide ? "hidden lg:table-cell" : "",
  ].join(" ");
  if (!column.key) {
    return (
      <th scope="col" className={`px-3 py-2.5 ${align}`}>
        {label}
      </th>
    );
  }
  const active = sort === column.key;
  const next =
    active && dir === "asc" ? "desc" : active ? "asc" : column.key === "saved" ? "desc" : "asc";
  return (
    <th
      scope="col"
      className={`px-3 py-2.5 ${align}`}
      aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : "none"}
    >
      <Link
        href={finderHref(query, { sort: column.key, dir: next })}
        className="inline-flex items-center gap-1 hover:text-copper-700"
      >
        {label}
        <span aria-hidden className={active ? "text-copper-700" : "text-ink-faint"}>
          {active ? (dir === "asc" ? "▲" : "▼") : "↕"}
        </span>
        <span className="sr-only">, sort {next === "asc" ? "ascending" : "descending"}</span>
      </Link>
    </th>
  );
}

/** The finder's results: sortable headers (links, so the sort is in the URL), one row each. */
export function ResultsTable({
  solutions,
  query,
  sort,
  dir,
  scale,
}: {
  solutions: FoundSolution[];
  query: Query;
  sort: FinderSortKey;
  dir: "asc" | "desc";
  scale: "molal" | "molar";
}) {
  const unit = scale === "molar" ? "mol L⁻¹" : "mol kg⁻¹";
  return (
    <div className="overflow-x-auto card">
      <table className="w-full text-sm" aria-label="Solutions found">
        <thead className="border-b border-ink/10 text-xs tracking-wide text-ink-soft uppercase">
          <tr>
            {COLUMNS.map((c) => (
              <SortHeader
                key={c.label}
                column={c}
                query={query}
                sort={sort}
                dir={dir}
                unit={unit}
              />
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-ink/5">
          {solutions.length === 0 ? (
            <tr>
              <td colSpan={COLUMNS.length} className="px-3 py-6 text-ink-soft">
                No solution matches.
              </td>
            </tr>
          ) : null}
          {solutions.map((s) => (
            <tr key={s.id} data-testid="finder-row">
              <th scope="row" className="px-3 py-2 text-left font-medium">
                <Link href={s.href} className="hover:text-copper-700 hover:underline">
                  {s.name || "Unnamed solution"}
                </Link>
                <Link
                  href={s.similarHref}
                  className="mt-0.5 block text-xs font-normal text-copper-700 hover:underline"
                >
                  Similar solutions
                </Link>
              </th>
              <td className="max-w-xs px-3 py-2 text-xs">
                {s.composition || "—"}
                {s.toRevision !== null ? (
                  <span className="mt-0.5 block text-ink-soft">
                    revision {s.fromRevision}
                    {s.toRevision - 1 > s.fromRevision ? `–${s.toRevision - 1}` : ""} (earlier)
                  </span>
                ) : null}
              </td>
              <td className="px-3 py-2 text-right font-mono text-lagoon-700 tabular">
                {formatSignificant(scale === "molar" ? s.ionicStrengthMolar : s.ionicStrengthMolal)}
              </td>
              <td className="px-3 py-2 text-right font-mono tabular">
                {formatSignificant(s.debyeLengthNm, 3)}
              </td>
              <td className="px-3 py-2 text-right font-mono tabular">
                {formatSignificant(s.temperatureC, 3)}
              </td>
              <td className="px-3 py-2">
                <Link href={s.href} className="hover:text-copper-700 hover:underline">
                  {s.entryTitle}
                </Link>
                <span className="block text-xs text-ink-soft">{s.projectName}</span>
                <span className="block text-xs text-ink-soft lg:hidden">
                  {s.authorName} · {s.savedAt.slice(0, 10)}
                </span>
              </td>
              <td className="hidden px-3 py-2 text-ink-soft lg:table-cell">{s.authorName}</td>
              <td className="hidden px-3 py-2 font-mono text-xs whitespace-nowrap lg:table-cell">
                {s.savedAt.slice(0, 10)}
              </td>
              <td className="px-3 py-2">
                <StatusChip status={s.entryStatus as EntryStatus} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
