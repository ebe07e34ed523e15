"use client";

import { createContext, useContext, type ReactNode } from "react";
import type { StoredSolution } from "@/lib/document/stored-evaluation";

/**
 * The stored result of each solution block of the revision on screen, by block id. Given for
 * saved, read-only revisions (submitted, countersigned, history): their blocks show the
 * numbers computed when they were saved. A draft being edited has none and computes live.
 */
const StoredResultsContext = createContext<Readonly<Record<string, StoredSolution>> | null>(null);

export function StoredResultsProvider({
  results,
  children,
}: {
  results: Readonly<Record<string, StoredSolution>> | null;
  children: ReactNode;
}) {
  return <StoredResultsContext.Provider value={results}>{children}</StoredResultsContext.Provider>;
}

export function useStoredSolution(blockId: string | undefined): StoredSolution | null {
  const results = useContext(StoredResultsContext);
  return (blockId && results?.[blockId]) || null;
}
