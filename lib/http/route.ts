import "server-only";
import { requireActor, type Actor } from "@/lib/access/actor";
import type { ApiErrorBody } from "@/lib/contract/api-error";
import { AppError, isAppError } from "@/lib/errors";

function errorResponse(error: AppError): Response {
  const body: ApiErrorBody = {
    error: {
      code: error.code,
      message: error.message,
      fieldErrors: error.fieldErrors,
      details: error.details,
    },
  };
  return Response.json(body, { status: error.status });
}

/** Wraps a route handler: typed errors become their status, anything else a 500 without internals. */
function route<C>(handler: (request: Request, context: C) => Promise<Response>) {
  return async (request: Request, context: C): Promise<Response> => {
    try {
      return await handler(request, context);
    } catch (error) {
      if (isAppError(error)) return errorResponse(error);
      console.error("[ionleaf] route failed", request.method, new URL(request.url).pathname, error);
      return Response.json(
        {
          error: {
            code: "internal",
            message: "Something went wrong on our side; nothing was changed.",
          },
        },
        { status: 500 },
      );
    }
  };
}

/** Largest JSON body accepted (an entry document with many blocks is well under 1 MB). */
const MAX_JSON_BYTES = 4 * 1024 * 1024;

/** Reads a JSON body: 413 when it is too large, 422 when it is not JSON. */
export async function readJson(request: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new AppError("payload_too_large", "The request is too large.");
  const text = await request.text();
  if (text.length > maxBytes) throw new AppError("payload_too_large", "The request is too large.");
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError("invalid_input", "The request body is not valid JSON.");
  }
}

/** A route handler that needs a signed-in member: resolves the actor first (401 otherwise). */
export function authedRoute<P>(
  handler: (request: Request, actor: Actor, params: P) => Promise<Response>,
) {
  return route<{ params: Promise<P> }>(async (request, context) => {
    const actor = await requireActor();
    return handler(request, actor, await context.params);
  });
}
