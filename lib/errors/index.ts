import type { ApiErrorCode } from "@/lib/contract/api-error";

/**
 * Ionleaf's error taxonomy. An AppError carries a public message (safe to show a user)
 * and an HTTP status; anything else that escapes is logged and shown as a generic error,
 * never as a stack trace.
 */
export type AppErrorCode = Exclude<ApiErrorCode, "internal">;

const STATUS: Record<AppErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  invalid_input: 422,
  rate_limited: 429,
  payload_too_large: 413,
  unsupported_media_type: 415,
  gone: 410,
  unavailable: 503,
  range_not_satisfiable: 416,
};

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly status: number;
  readonly fieldErrors?: FieldErrors;
  readonly details?: Record<string, unknown>;

  constructor(
    code: AppErrorCode,
    message: string,
    extra: { fieldErrors?: FieldErrors; details?: Record<string, unknown> } = {},
  ) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.status = STATUS[code];
    this.fieldErrors = extra.fieldErrors;
    this.details = extra.details;
  }
}

export const isAppError = (e: unknown): e is AppError => e instanceof AppError;

/** zod issues → { "field.path": ["message"] } for forms and API responses. */
export function fieldErrorsFromZod(
  issues: { path: PropertyKey[]; message: string }[],
): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
