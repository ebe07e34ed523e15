import "server-only";
import type { Executor } from "@/db/client";
import { findStockResults } from "@/db/queries/lineage";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import {
  hasStocks,
  stockComponentsFromResult,
  stockKey,
  type StockLookup,
} from "@/lib/document/dilution";
import { AppError } from "@/lib/errors";

export interface ResolvedStocks {
  /** What the pure evaluation needs: each referenced stock's stored composition. */
  lookups: Map<string, StockLookup>;
  /** The stored result each reference read, for the lineage rows. */
  resultIds: Map<string, string>;
}

/**
 * Reads the stored composition of every stock the given blocks are made from, from the
 * referenced revision of a solution block of the lab's own entries; the client's numbers are
 * never used. A reference that does not resolve (another lab's entry, a revision not saved, a
 * block that revision did not show) or a block made from itself refuses the save with 422,
 * the same answer whether or not such an entry exists elsewhere.
 */
export async function resolveStocks(
  tx: Executor,
  labId: string,
  entryId: string,
  blocks: SolutionBlockInput[],
): Promise<ResolvedStocks> {
  const refs = blocks.flatMap((b) => (hasStocks(b.dilution) ? b.dilution.stocks : []));
  for (const block of blocks) {
    if (!hasStocks(block.dilution)) continue;
    if (block.dilution.stocks.some((s) => s.entryId === entryId && s.blockId === block.blockId))
      throw refused(`"${block.name || "A solution"}" cannot be made from itself.`);
  }
  const unique = [...new Map(refs.map((r) => [stockKey(r), r])).values()];
  const rows = await findStockResults(tx, labId, unique);
  const lookups = new Map<string, StockLookup>();
  const resultIds = new Map<string, string>();
  for (const row of rows) {
    const key = stockKey(row);
    resultIds.set(key, row.resultId);
    lookups.set(key, lookupOf(row));
  }
  const missing = unique.filter((r) => !resultIds.has(stockKey(r)));
  if (missing.length > 0)
    throw refused(
      "A stock this solution is made from was not found among your lab's saved solutions at the revision named.",
    );
  return { lookups, resultIds };
}

function refused(message: string) {
  return new AppError("invalid_input", `${message} The previous revision is unchanged.`, {
    fieldErrors: { content: [message] },
  });
}

/** A stored block row read as a stock: its composition, or why it has none. */
export function lookupOf(row: Awaited<ReturnType<typeof findStockResults>>[number]): StockLookup {
  const components = stockComponentsFromResult(row.results);
  if (!components)
    return {
      status: "unavailable",
      message: `The stock "${row.name || "unnamed"}" has no computed composition at revision ${row.revision}.`,
    };
  return {
    status: "ok",
    stock: {
      entryId: row.entryId,
      blockId: row.blockId,
      revision: row.revision,
      name: row.name,
      entryTitle: row.entryTitle,
      solvent: row.solvent,
      temperatureC: row.temperatureC,
      components,
    },
  };
}
