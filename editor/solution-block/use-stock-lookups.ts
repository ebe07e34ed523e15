"use client";

import { useQueries } from "@tanstack/react-query";
import { useMemo } from "react";
import type { DilutionInput, StockRef } from "@/lib/document/block-schemas";
import { hasStocks, stockKey, type StockLookup, type StockLookups } from "@/lib/document/dilution";
import { apiFetch } from "@/lib/ui/api-client";

/** The route the server answers a stock's stored composition on (the same reading a save does). */
export function stockUrl(ref: Pick<StockRef, "entryId" | "blockId"> & { revision?: number }) {
  const params = new URLSearchParams({ entry: ref.entryId, block: ref.blockId });
  if (ref.revision !== undefined) params.set("revision", String(ref.revision));
  return `/api/solutions/stock?${params.toString()}`;
}

const NO_REFS: StockRef[] = [];

/**
 * The stored composition of each stock a block names, fetched once per reference (a saved
 * revision never changes, so the answer is kept for good).
 */
export function useStockLookups(dilution: DilutionInput | null | undefined): StockLookups {
  const refs = hasStocks(dilution) ? dilution.stocks : NO_REFS;
  const results = useQueries({
    queries: refs.map((ref) => ({
      queryKey: ["stock", ref.entryId, ref.blockId, ref.revision],
      queryFn: () => apiFetch<StockLookup>(stockUrl(ref)),
      staleTime: Infinity,
      retry: false,
    })),
  });
  const entries: [string, StockLookup][] = refs.map((ref, i) => {
    const q = results[i];
    if (q?.data) return [stockKey(ref), q.data];
    if (q?.error) return [stockKey(ref), { status: "unavailable", message: q.error.message }];
    return [stockKey(ref), { status: "loading" }];
  });
  const signature = JSON.stringify(entries);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed by content, not identity
  return useMemo(() => new Map(entries), [signature]);
}
