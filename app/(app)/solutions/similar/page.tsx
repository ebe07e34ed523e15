import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireActor } from "@/lib/access/actor";
import { isAppError } from "@/lib/errors";
import { formulaAsText } from "@/lib/document/formula-text";
import { findSimilarSolutions } from "@/lib/notebook/similar-solutions";
import { formatSignificant } from "@/lib/ui/format-number";

export const metadata: Metadata = { title: "Similar solutions" };

type Search = Record<string, string | string[] | undefined>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function SimilarSolutionsPage({
  searchParams,
}: {
  searchParams: Promise<Search>;
}) {
  const actor = await requireActor();
  const search = await searchParams;
  let result: Awaited<ReturnType<typeof findSimilarSolutions>>;
  try {
    result = await findSimilarSolutions(actor, {
      entry: first(search.entry),
      block: first(search.block),
      revision: first(search.revision),
    });
  } catch (error) {
    if (isAppError(error) && (error.code === "not_found" || error.code === "invalid_input"))
      notFound();
    throw error;
  }
  const { target } = result;
  return (
    <div className="space-y-6">
      <div>
        <Link href="/solutions" className="text-sm text-copper-700 hover:underline">
          ← Solution finder
        </Link>
        <h1 className="mt-1 text-2xl font-semibold tracking-tight">
          Solutions similar to {target.name || "an unnamed solution"}
        </h1>
        <p className="text-sm text-ink-soft">
          {target.ions.map(formulaAsText).join(", ") || "no ions"} · I ={" "}
          {formatSignificant(target.ionicStrengthMolal)} mol/kg ·{" "}
          {formatSignificant(target.temperatureC, 3)} °C · {target.solvent} ·{" "}
          <Link
            href={`/entries/${target.entryId}#block-${encodeURIComponent(target.blockId)}`}
            className="text-copper-700 hover:underline"
          >
            open the block
          </Link>
        </p>
        <p className="mt-2 max-w-3xl text-xs text-ink-soft">
          Nearest first by composition distance, in decades of concentration: the root mean square
          of the log₁₀ differences of each ion&apos;s molality (an ion only one of them has counts
          as two decades), plus the log₁₀ ratio of ionic strengths, plus the temperature difference
          over 25 °C; a different solvent adds two decades.
        </p>
      </div>
      {result.note ? <p className="text-sm text-ink-soft">{result.note}</p> : null}
      {result.similar.length ? (
        <div className="overflow-x-auto card">
          <table className="w-full text-sm" aria-label="Similar solutions">
            <thead className="border-b border-ink/10 text-left text-xs tracking-wide text-ink-soft uppercase">
              <tr>
                <th scope="col" className="px-3 py-2.5">
                  Solution
                </th>
                <th scope="col" className="px-3 py-2.5">
                  How it differs
                </th>
                <th scope="col" className="px-3 py-2.5 text-right normal-case">
                  Distance
                </th>
                <th scope="col" className="px-3 py-2.5">
                  Composition
                </th>
                <th scope="col" className="px-3 py-2.5">
                  Entry
                </th>
                <th scope="col" className="px-3 py-2.5">
                  Author
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-ink/5">
              {result.similar.map((s) => (
                <tr key={s.id} data-testid="similar-row">
                  <th scope="row" className="px-3 py-2 text-left font-medium">
                    <Link href={s.href} className="hover:text-copper-700 hover:underline">
                      {s.name || "Unnamed solution"}
                    </Link>
                  </th>
                  <td className="px-3 py-2">{s.difference}</td>
                  <td className="px-3 py-2 text-right font-mono tabular">
                    {s.distance.toFixed(2)}
                  </td>
                  <td className="max-w-xs px-3 py-2 text-xs">{s.composition}</td>
                  <td className="px-3 py-2">{s.entryTitle}</td>
                  <td className="px-3 py-2 text-ink-soft">{s.authorName}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
