/**
 * The engine never hands out Infinity or NaN: a result that overflows (or is undefined) comes
 * from inputs beyond any physical range, and is a ChemInputError naming the field to check.
 */
import { ChemInputError } from "./errors";

export function finiteResult(value: number, field: string, what: string): number {
  if (!Number.isFinite(value))
    throw new ChemInputError(
      `${what} cannot be computed for these inputs (a value is far outside any physical range).`,
      { field, code: "out_of_range" },
    );
  return value;
}
