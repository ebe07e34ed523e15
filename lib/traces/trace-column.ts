/** The column that holds a quantity (by the summary's roles), or null. */
import type { ParsedTrace, Quantity } from "./types";

export function traceColumn(trace: ParsedTrace, quantity: Quantity): Float64Array | null {
  const index = trace.summary.roles[quantity];
  return index === undefined ? null : (trace.columns[index] ?? null);
}
