import "server-only";
import { headers } from "next/headers";
import { getToken } from "next-auth/jwt";
import { getEnv } from "@/lib/env";

/** What the server needs from a session token: whose it is and which session version. */
export interface SessionClaims {
  userId: string;
  sessionVersion: number;
}

/**
 * Tokens already decrypted by this process, by their exact text (an encrypted, authenticated
 * token decrypts to the same claims every time), until the token's own expiry. Auth.js's
 * auth() runs its whole session action for every call: key derivation, decryption, a new
 * token encrypted for a cookie that a route handler then throws away. That was about a third
 * of a signed-in API request's CPU (bench/finder-profile.ts). Revocation does not depend on
 * this: the member and the session version are read from the database on every request
 * (lib/access/actor.ts).
 */
const decoded = new Map<string, { claims: SessionClaims; expiresAtMs: number }>();
const MAX_DECODED = 2_000;

/**
 * The session cookie Auth.js itself reads (@auth/core's createActionURL): the secure
 * `__Secure-` one when the app's URL (AUTH_URL) is https, or without it the request's
 * forwarded protocol.
 */
export function usesSecureCookie(requestHeaders: Headers, authUrl: string | undefined): boolean {
  if (authUrl) return new URL(authUrl).protocol === "https:";
  return (requestHeaders.get("x-forwarded-proto") ?? "https") === "https";
}

/**
 * The claims of the session token in a Cookie header, or null when there is none or it does
 * not decrypt with the secret or has expired. Only the cookie is read: a token in an
 * Authorization header (which getToken would also take) is not a way in.
 */
export async function claimsOfCookieHeader(
  cookie: string,
  secure: boolean,
  secret: string,
  nowMs = Date.now(),
): Promise<SessionClaims | null> {
  const req = { headers: { cookie } };
  const token = await getToken({ req, secret, secureCookie: secure, raw: true });
  if (!token) return null;
  const known = decoded.get(token);
  if (known) {
    if (known.expiresAtMs > nowMs) return known.claims;
    decoded.delete(token);
    return null;
  }
  const payload = await getToken({ req, secret, secureCookie: secure });
  if (!payload || typeof payload.uid !== "string" || typeof payload.exp !== "number") return null;
  const expiresAtMs = payload.exp * 1000;
  if (expiresAtMs <= nowMs) return null;
  const claims: SessionClaims = {
    userId: payload.uid,
    sessionVersion: typeof payload.sv === "number" ? payload.sv : 0,
  };
  if (decoded.size >= MAX_DECODED) decoded.delete(decoded.keys().next().value!);
  decoded.set(token, { claims, expiresAtMs });
  return claims;
}

/** The current request's session claims (route handlers, server actions, server components). */
export async function sessionClaims(): Promise<SessionClaims | null> {
  const requestHeaders = await headers();
  return claimsOfCookieHeader(
    requestHeaders.get("cookie") ?? "",
    usesSecureCookie(requestHeaders, process.env.AUTH_URL),
    getEnv().AUTH_SECRET,
  );
}
