/**
 * The JSON body of every API error: a code a client can switch on, a message a person can
 * read, and, for bad input, the fields concerned.
 */
export type ApiErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "invalid_input"
  | "rate_limited"
  | "payload_too_large"
  | "unsupported_media_type"
  | "gone"
  | "unavailable"
  | "range_not_satisfiable"
  | "internal";

export interface ApiErrorBody {
  error: {
    code: ApiErrorCode;
    message: string;
    fieldErrors?: Record<string, string[]>;
    details?: Record<string, unknown>;
  };
}
