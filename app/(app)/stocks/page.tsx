import type { Metadata } from "next";
import Link from "next/link";
import { requireActor } from "@/lib/access/actor";
import { formulaAsText } from "@/lib/document/formula-text";
import { listLabStocks } from "@/lib/notebook/lineage/stocks";

export const metadata: Metadata = { title: "Stocks" };

const when = (iso: string) =>
  new Date(iso).toLocaleString("en-GB", {
    dateStyle: "medium",
    timeStyle: "short",
    timeZone: "UTC",
  });

const volume = (ml: number) => `${Number(ml.toPrecision(4))} mL`;

/**
 * The lab's stocks: every solution block some other solution was made from, where and by whom
 * it was made, and every entry that used it, with the revisions on both sides.
 */
export default async function StocksPage() {
  const actor = await requireActor();
  const stocks = await listLabStocks(actor);
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Stocks</h1>
        <p className="text-sm text-ink-soft">
          Every solution block of the lab that another solution was made from, and where it was
          used. Concentrations are carried over from the revision each use names.
        </p>
      </div>
      {stocks.length === 0 ? (
        <p className="card p-5 text-sm text-ink-soft" data-testid="no-stocks">
          No solution has been made from another yet. In a solution block, choose “Made from stocks”
          and pick a saved solution.
        </p>
      ) : (
        <ul className="space-y-4" aria-label="Stocks">
          {stocks.map((stock) => (
            <li
              key={`${stock.entryId}/${stock.blockId}`}
              className="space-y-3 card p-4"
              data-testid="stock"
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h2 className="text-base font-semibold">
                  <Link href={stock.href} className="hover:underline">
                    {stock.name || "Unnamed solution"}
                  </Link>
                </h2>
                <span className="font-mono text-xs text-ink-soft">
                  {stock.species
                    .filter((s) => !/[+-]$/.test(s))
                    .map(formulaAsText)
                    .join(" · ")}
                </span>
              </div>
              <p className="text-sm">
                Made in{" "}
                <Link href={stock.href} className="text-copper-700 hover:underline">
                  {stock.entryTitle}
                </Link>{" "}
                <span className="font-mono text-xs text-ink-faint">#block-{stock.blockId}</span>
                {stock.currentRevision > Math.max(...stock.made.map((m) => m.revision)) ? (
                  <span className="ml-2 chip bg-amber-50 text-amber-800">
                    entry now at revision {stock.currentRevision}
                  </span>
                ) : null}
              </p>
              <ul className="text-xs text-ink-soft">
                {stock.made.map((m) => (
                  <li key={m.revision}>
                    <Link href={m.href} className="text-copper-700 hover:underline">
                      revision {m.revision}
                    </Link>{" "}
                    saved by {m.byName}, {when(m.at)} UTC
                  </li>
                ))}
              </ul>
              {stock.hazards.length > 0 ? (
                <ul className="rounded-md border border-red-200 bg-red-50 px-3 py-2 text-xs text-red-900">
                  {stock.hazards.map((h) => (
                    <li key={h}>⚠ {h}</li>
                  ))}
                </ul>
              ) : null}
              <table className="w-full text-sm">
                <caption className="pb-1 text-left text-xs font-medium text-ink-soft">
                  Used in
                </caption>
                <thead>
                  <tr className="text-left text-xs text-ink-soft">
                    <th scope="col" className="py-1 pr-3 font-normal">
                      Entry
                    </th>
                    <th scope="col" className="py-1 pr-3 font-normal">
                      Its revisions
                    </th>
                    <th scope="col" className="py-1 pr-3 font-normal">
                      Stock revision used
                    </th>
                    <th scope="col" className="py-1 font-normal">
                      Taken
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {stock.uses.map((use) => (
                    <tr
                      key={`${use.entryId}/${use.blockId}/${use.fromRevision}`}
                      className="border-t border-ink/5"
                    >
                      <td className="py-1 pr-3">
                        <Link href={use.href} className="text-copper-700 hover:underline">
                          {use.entryTitle}
                        </Link>
                      </td>
                      <td className="py-1 pr-3 tabular-nums">
                        {use.toRevision === null
                          ? `from ${use.fromRevision} (current)`
                          : use.toRevision - 1 === use.fromRevision
                            ? `${use.fromRevision}`
                            : `${use.fromRevision}–${use.toRevision - 1}`}
                      </td>
                      <td className="py-1 pr-3 tabular-nums">{use.stockRevision}</td>
                      <td className="py-1 tabular-nums">
                        {volume(use.volumeMl)} → {volume(use.finalVolumeMl)}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </li>
          ))}
        </ul>
      )}
      <p className="text-xs text-ink-soft">
        Concentrations carried over from a stock are as good as the stock&apos;s record: check the
        stock&apos;s label and age before you dilute it, and handle concentrated acids and toxic
        salts by their safety data sheets.
      </p>
    </div>
  );
}
