/**
 * Uncompensated resistance of a disk electrode in an insulating plane, with the counter
 * electrode far away, from the primary current distribution (Newman 1966, J. Electrochem.
 * Soc. 113, 501–502):
 *   R_u = 1 / (4 κ r)
 * κ the electrolyte conductivity, r the disk radius. A reference electrode tip at a finite
 * distance sees less than this (the value is the upper bound for a distant reference).
 * The ohmic drop at a current i is i R_u (Ohm's law).
 */
import { ChemInputError } from "../errors";
import { finiteResult } from "../finite-result";

function positive(value: number, field: string, what: string): void {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0)
    throw new ChemInputError(`${what} must be a positive number.`, { field, code: "bad_value" });
}

export function uncompensatedResistanceDisk(input: {
  radiusM: number;
  conductivitySPerM: number;
}): number {
  positive(input.radiusM, "radiusM", "The disk radius");
  positive(input.conductivitySPerM, "conductivitySPerM", "The electrolyte conductivity");
  return finiteResult(
    1 / (4 * input.conductivitySPerM * input.radiusM),
    "conductivitySPerM",
    "The uncompensated resistance",
  );
}

/** Ohmic (iR) drop in volts, with the sign of the current. */
export function iRDrop(input: { currentA: number; resistanceOhm: number }): number {
  if (typeof input.currentA !== "number" || !Number.isFinite(input.currentA))
    throw new ChemInputError("The current must be a number in amperes.", {
      field: "currentA",
      code: "bad_value",
    });
  if (
    typeof input.resistanceOhm !== "number" ||
    !Number.isFinite(input.resistanceOhm) ||
    input.resistanceOhm < 0
  )
    throw new ChemInputError("The resistance must be a number ≥ 0 Ω.", {
      field: "resistanceOhm",
      code: "bad_value",
    });
  return finiteResult(input.currentA * input.resistanceOhm, "currentA", "The iR drop");
}
