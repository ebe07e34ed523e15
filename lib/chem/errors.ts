/**
 * The one error type `lib/chem` throws for bad input. `field` names the input that is
 * wrong (e.g. "components[2].amount", "temperatureC") so forms can show it in place.
 * Messages are written for a chemist, not a programmer.
 */
export class ChemInputError extends Error {
  readonly field?: string;
  readonly code: string;

  constructor(message: string, options: { field?: string; code?: string } = {}) {
    super(message);
    this.name = "ChemInputError";
    this.field = options.field;
    this.code = options.code ?? "invalid_input";
  }
}

export function isChemInputError(error: unknown): error is ChemInputError {
  return error instanceof ChemInputError;
}
