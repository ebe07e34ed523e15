import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { requireActor, type Actor } from "@/lib/access/actor";
import type { ApiErrorBody } from "@/lib/contract/api-error";
import { getEnv } from "@/lib/env";
import { AppError, isAppError } from "@/lib/errors";
import { appErrorFromDatabase } from "@/lib/errors/database";
import { checkUntrustedJson, checkUntrustedText } from "@/lib/validation/untrusted-input";
import { getDb } from "@/lib/server/database";

function errorResponse(error: AppError): Response {
  const body: ApiErrorBody = {
    error: {
      code: error.code,
      message: error.message,
      fieldErrors: error.fieldErrors,
      details: error.details,
    },
  };
  return Response.json(body, { status: error.status, headers: { "cache-control": "no-store" } });
}

/**
 * Wraps a route handler: typed errors become their status, database errors are translated
 * in one place (lib/errors/database.ts), anything else is a 500 without internals. Lab data
 * is never cached by a browser or a proxy.
 */
function route<C>(handler: (request: Request, context: C) => Promise<Response>) {
  return async (request: Request, context: C): Promise<Response> => {
    try {
      checkUntrustedText(Object.fromEntries(new URL(request.url).searchParams), 4000);
      const params = (
        context as { params?: Promise<Record<string, string | string[]>> } | undefined
      )?.params;
      if (params) checkUntrustedText(flatParams(await params), 1000);
      const response = await handler(request, context);
      if (!response.headers.has("cache-control")) response.headers.set("cache-control", "no-store");
      return response;
    } catch (error) {
      if (isAppError(error)) return errorResponse(error);
      const translated = appErrorFromDatabase(error);
      if (translated) return errorResponse(translated);
      console.error("[ionleaf] route failed", request.method, safePath(request), error);
      return Response.json(
        {
          error: {
            code: "internal",
            message: "Something went wrong on our side; nothing was changed.",
          },
        } satisfies ApiErrorBody,
        { status: 500, headers: { "cache-control": "no-store" } },
      );
    }
  };
}

function flatParams(params: Record<string, string | string[]>): Record<string, string> {
  return Object.fromEntries(
    Object.entries(params).map(([k, v]) => [k, Array.isArray(v) ? v.join("/") : v]),
  );
}

function safePath(request: Request): string {
  try {
    return new URL(request.url).pathname;
  } catch {
    return "(unparsable url)";
  }
}

/** Largest JSON body accepted (an entry document with many blocks is well under 1 MB). */
const MAX_JSON_BYTES = 4 * 1024 * 1024;

/**
 * Reads a JSON body: 415 unless it is declared as JSON (a plain HTML form cannot send that
 * without a CORS preflight), 413 when it is too large, 422 when it is not JSON.
 */
export async function readJson(request: Request, maxBytes = MAX_JSON_BYTES): Promise<unknown> {
  const type = (request.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();
  if (type !== "application/json") {
    throw new AppError("unsupported_media_type", "Send the request body as application/json.");
  }
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw new AppError("payload_too_large", "The request is too large.");
  const text = await request.text();
  if (text.length > maxBytes) throw new AppError("payload_too_large", "The request is too large.");
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("invalid_input", "The request body is not valid JSON.");
  }
  checkUntrustedJson(value);
  return value;
}

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A state-changing request must come from one of Ionleaf's own pages: a browser marks a
 * request from another site or port with its Origin and Sec-Fetch-Site headers. Clients that
 * send neither (scripts, the tests' HTTP client) are not browsers a page could hijack.
 */
function isCrossOrigin(request: Request): boolean {
  const site = request.headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") return true;
  const origin = request.headers.get("origin");
  if (!origin) return false;
  const own = new Set<string>([new URL(getEnv().APP_URL).origin]);
  try {
    own.add(new URL(request.url).origin);
  } catch {
    // an unparsable URL cannot be our own origin
  }
  const host = request.headers.get("host");
  if (host) {
    const proto =
      request.headers.get("x-forwarded-proto") ??
      new URL(getEnv().APP_URL).protocol.replace(":", "");
    own.add(`${proto}://${host}`);
  }
  return !own.has(origin);
}

/**
 * A route handler that needs a signed-in member: resolves the actor first (401 otherwise) and
 * refuses state-changing requests from another origin (403, recorded in the audit trail).
 */
export function authedRoute<P>(
  handler: (request: Request, actor: Actor, params: P) => Promise<Response>,
) {
  return route<{ params: Promise<P> }>(async (request, context) => {
    const actor = await requireActor();
    if (!SAFE_METHODS.has(request.method) && isCrossOrigin(request)) {
      await insertAuditEvent(getDb(), {
        labId: actor.labId,
        actorId: actor.userId,
        action: "request.cross_origin_refused",
        targetType: "route",
        targetId: safePath(request).slice(0, 200),
        details: {
          method: request.method,
          origin: (request.headers.get("origin") ?? "").slice(0, 200),
        },
      });
      throw new AppError(
        "forbidden",
        "This request did not come from an Ionleaf page; nothing was changed.",
      );
    }
    return handler(request, actor, await context.params);
  });
}

/** A JSON body that may be absent (an empty POST reads as `{}`). */
export async function readOptionalJson(request: Request): Promise<unknown> {
  if (request.headers.get("content-length") === "0" || !request.body) return {};
  return readJson(request);
}
