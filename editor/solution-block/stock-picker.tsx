"use client";

import { useQuery } from "@tanstack/react-query";
import { useState } from "react";
import { apiFetch } from "@/lib/ui/api-client";
import { formatSignificant } from "@/lib/ui/format-number";

/** The fields of the solution finder's answer (GET /api/solutions) the picker shows. */
interface FinderHit {
  id: string;
  name: string;
  composition: string;
  entryId: string;
  entryTitle: string;
  authorName: string;
  blockId: string;
  ionicStrengthMolar: number | null;
}

/**
 * Picks a stock among the lab's saved solutions through the solution finder (its full-text
 * search over entries, newest first). Only saved solutions can be stocks: the block records
 * the revision it used.
 */
export function StockPicker({
  excludeBlockId,
  onPick,
  onClose,
}: {
  excludeBlockId: string;
  onPick: (hit: { entryId: string; blockId: string }) => void;
  onClose: () => void;
}) {
  const [text, setText] = useState("");
  const q = text.trim();
  const search = useQuery({
    queryKey: ["stock-picker", q],
    queryFn: () =>
      apiFetch<{ solutions: FinderHit[] }>(
        `/api/solutions${q ? `?${new URLSearchParams({ q }).toString()}` : ""}`,
      ),
    staleTime: 30_000,
    retry: false,
  });
  const hits = (search.data?.solutions ?? []).filter((h) => h.blockId !== excludeBlockId);
  return (
    <div
      className="space-y-2 rounded-md border border-lagoon-600/30 bg-white p-2"
      data-testid="stock-picker"
    >
      <div className="flex items-center gap-2">
        <input
          aria-label="Search the lab's solutions"
          className="input flex-1 text-sm"
          placeholder="Search entries and solutions, e.g. KCl stock"
          value={text}
          maxLength={200}
          onChange={(e) => setText(e.target.value)}
        />
        <button type="button" className="btn-quiet text-xs" onClick={onClose}>
          Close
        </button>
      </div>
      {search.error ? (
        <p role="alert" className="text-xs text-red-700">
          {search.error.message}
        </p>
      ) : null}
      <ul className="max-h-56 overflow-y-auto text-sm" aria-label="Solutions found">
        {hits.map((hit) => (
          <li key={hit.id}>
            <button
              type="button"
              className="w-full rounded px-2 py-1 text-left hover:bg-lagoon-50"
              onClick={() => onPick({ entryId: hit.entryId, blockId: hit.blockId })}
            >
              <span className="font-medium">{hit.name || "Unnamed solution"}</span>{" "}
              <span className="text-ink-soft">{hit.composition}</span>
              <span className="block text-xs text-ink-faint">
                {hit.entryTitle} · {hit.authorName}
                {hit.ionicStrengthMolar !== null
                  ? ` · I = ${formatSignificant(hit.ionicStrengthMolar)} mol/L`
                  : ""}
              </span>
            </button>
          </li>
        ))}
        {search.isSuccess && hits.length === 0 ? (
          <li className="px-2 py-1 text-xs text-ink-soft">No saved solution matches.</li>
        ) : null}
      </ul>
    </div>
  );
}
