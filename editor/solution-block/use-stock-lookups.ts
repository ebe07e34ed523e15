"use client";

import { useEffect, useMemo, useState } from "react";
import type { DilutionInput, StockRef } from "@/lib/document/block-schemas";
import { hasStocks, stockKey, type StockLookup, type StockLookups } from "@/lib/document/dilution";
import { apiFetch } from "@/lib/ui/api-client";

/** The route the server answers a stock's stored composition on (the same reading a save does). */
export function stockUrl(ref: Pick<StockRef, "entryId" | "blockId"> & { revision?: number }) {
  const params = new URLSearchParams({ entry: ref.entryId, block: ref.blockId });
  if (ref.revision !== undefined) params.set("revision", String(ref.revision));
  return `/api/solutions/stock?${params.toString()}`;
}

/*
 * A saved revision's stored composition never changes, so an answer is kept for the life of
 * the page; a failure is shown but not kept (the next block that names the stock asks again).
 */
const answers = new Map<string, StockLookup>();
const failures = new Map<string, StockLookup>();
const pending = new Set<string>();
const listeners = new Set<() => void>();

function load(ref: StockRef) {
  const key = stockKey(ref);
  if (answers.has(key) || pending.has(key)) return;
  pending.add(key);
  failures.delete(key);
  apiFetch<StockLookup>(stockUrl(ref))
    .then(
      (lookup) => void answers.set(key, lookup),
      (error: Error) => void failures.set(key, { status: "unavailable", message: error.message }),
    )
    .finally(() => {
      pending.delete(key);
      listeners.forEach((notify) => notify());
    });
}

/** Keeps a composition the picker already fetched, so the block needs no second request. */
export function rememberStock(lookup: StockLookup) {
  if (lookup.status === "ok") answers.set(stockKey(lookup.stock), lookup);
}

/** The stored composition of each stock a block names, fetched once per reference. */
export function useStockLookups(dilution: DilutionInput | null | undefined): StockLookups {
  const [version, setVersion] = useState(0);
  useEffect(() => {
    const notify = () => setVersion((v) => v + 1);
    listeners.add(notify);
    return () => void listeners.delete(notify);
  }, []);
  const refs = useMemo(() => (hasStocks(dilution) ? dilution.stocks : []), [dilution]);
  const signature = refs.map(stockKey).join("|");
  useEffect(() => refs.forEach(load), [refs]);
  return useMemo(
    () =>
      new Map(
        refs.map((ref): [string, StockLookup] => {
          const key = stockKey(ref);
          return [key, answers.get(key) ?? failures.get(key) ?? { status: "loading" }];
        }),
      ),
    // version: an answer arrived; signature: the references changed.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [signature, version],
  );
}
