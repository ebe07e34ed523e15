import type { ApiErrorBody } from "@/lib/contract/api-error";

/**
 * The browser's side of Ionleaf's JSON API: one fetch helper that turns the typed error
 * body ({ error: { code, message, fieldErrors } }) into an ApiError the UI can switch on.
 */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, {
      ...init,
      headers: { "content-type": "application/json", ...(init.headers ?? {}) },
    });
  } catch {
    throw new ApiError(
      0,
      "offline",
      "The server cannot be reached. Your work is kept in this browser.",
    );
  }
  const body = (await response.json().catch(() => null)) as Partial<ApiErrorBody> | null;
  if (!response.ok) {
    const e = body?.error;
    throw new ApiError(
      response.status,
      e?.code ?? "http_error",
      e?.message ?? `The server answered ${response.status}.`,
      e?.fieldErrors,
      e?.details,
    );
  }
  return body as T;
}
