import type { Metadata } from "next";
import Link from "next/link";
import { FinderForm } from "@/components/finder/finder-form";
import { requireActor } from "@/lib/access/actor";
import { ACTIVITY_MODELS, listSolvents } from "@/lib/chem";
import { ENTRY_STATUSES, ENTRY_STATUS_LABELS } from "@/lib/contract/vocabulary";
import { isAppError } from "@/lib/errors";
import { listMembers } from "@/lib/labs/members";
import { searchSolutions, type SolutionSearchResult } from "@/lib/notebook/solution-finder";
import { listProjects } from "@/lib/projects/service";
import { FINDER_QUERY_KEYS, type FinderSortKey } from "@/lib/validation/solution-finder";
import { finderExportHref, finderHref, ResultsTable } from "./results-table";

export const metadata: Metadata = { title: "Solution finder" };

type Search = Record<string, string | string[] | undefined>;

/** The URL's query, one string per known key (a repeated key keeps its first value). */
function queryOf(search: Search): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of FINDER_QUERY_KEYS) {
    const v = search[key];
    const first = Array.isArray(v) ? v[0] : v;
    if (first) out[key] = first;
  }
  return out;
}

export default async function SolutionFinderPage({
  searchParams,
}: {
  searchParams: Promise<Search>;
}) {
  const actor = await requireActor();
  const query = queryOf(await searchParams);
  const [members, projects] = await Promise.all([listMembers(actor), listProjects(actor)]);
  let result: SolutionSearchResult | null = null;
  let fieldErrors: Record<string, string[]> = {};
  try {
    result = await searchSolutions(actor, query);
  } catch (error) {
    if (!isAppError(error)) throw error;
    fieldErrors = error.fieldErrors ?? { _form: [error.message] };
  }
  const { page: _page, sort: _sort, dir: _dir, ...filters } = query;
  const sort = (result ? (query.sort ?? "saved") : "saved") as FinderSortKey;
  const dir = (query.dir ?? (sort === "saved" ? "desc" : "asc")) as "asc" | "desc";
  const scale = query.scale === "molar" ? "molar" : "molal";

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Solution finder</h1>
          <p className="text-sm text-ink-soft">
            Every solution block in the lab&apos;s current revisions, as the server computed it.
          </p>
        </div>
        {result ? (
          <a href={finderExportHref(query)} className="btn-quiet" download>
            Export CSV
          </a>
        ) : null}
      </div>
      <FinderForm
        key={JSON.stringify(filters)}
        values={query}
        fieldErrors={fieldErrors}
        solvents={listSolvents().map((s) => ({ value: s.id, label: s.name }))}
        models={ACTIVITY_MODELS.filter((m) => m.id !== "auto").map((m) => ({
          value: m.id,
          label: m.label,
        }))}
        members={members.map((m) => ({ value: m.id, label: m.name }))}
        projects={projects.map((p) => ({ value: p.id, label: p.name }))}
        statuses={ENTRY_STATUSES.map((s) => ({ value: s, label: ENTRY_STATUS_LABELS[s] }))}
      />
      {fieldErrors.page || fieldErrors._form ? (
        <p role="alert" className="text-sm text-red-700">
          {[...(fieldErrors.page ?? []), ...(fieldErrors._form ?? [])].join(" ")}{" "}
          <Link href={finderHref(query, {})} className="text-copper-700 underline">
            Go to the first page
          </Link>
        </p>
      ) : null}
      {result ? (
        <>
          <p className="text-sm text-ink-soft" role="status">
            {result.capped ? `More than ${result.total.toLocaleString("en")}` : result.total}{" "}
            solution{result.total === 1 ? "" : "s"}
            {result.capped
              ? ` · page ${result.page}`
              : result.pages > 1
                ? ` · page ${result.page} of ${result.pages}`
                : ""}
          </p>
          <ResultsTable
            solutions={result.solutions}
            query={query}
            sort={sort}
            dir={dir}
            scale={scale}
          />
          {result.pages > 1 ? (
            <nav className="flex items-center gap-3 text-sm" aria-label="Pages">
              {result.page > 1 ? (
                <Link
                  href={finderHref(query, { page: String(result.page - 1) })}
                  className="btn-quiet"
                  rel="prev"
                >
                  ← Previous
                </Link>
              ) : null}
              <span className="text-ink-soft">
                Page {result.page}
                {result.capped ? "" : ` of ${result.pages}`}
              </span>
              {result.page < result.pages ? (
                <Link
                  href={finderHref(query, { page: String(result.page + 1) })}
                  className="btn-quiet"
                  rel="next"
                >
                  Next →
                </Link>
              ) : null}
            </nav>
          ) : null}
        </>
      ) : null}
    </div>
  );
}
