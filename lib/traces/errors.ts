/**
 * The one error type `lib/traces` throws. It is for misuse (a mapping with a unit that does
 * not fit its quantity, pushing text after `finish()`), never for a bad file: what a file
 * gets wrong goes into the summary's `problems` so the upload can show it.
 */
export class TraceParseError extends Error {
  readonly code: string;

  constructor(message: string, code = "invalid_input") {
    super(message);
    this.name = "TraceParseError";
    this.code = code;
  }
}

export function isTraceParseError(error: unknown): error is TraceParseError {
  return error instanceof TraceParseError;
}
