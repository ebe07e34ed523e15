import { describe, expect, it } from "vitest";
import { encode } from "next-auth/jwt";
import { claimsOfCookieHeader, usesSecureCookie } from "@/lib/auth/session-claims";

/**
 * The session claims are read from tokens that Auth.js itself encrypted (next-auth/jwt's
 * encode, the function its session action uses), under the cookie names Auth.js sets.
 */
const SECRET = "unit-test-secret-0123456789abcdef0123456789";
const PLAIN = "authjs.session-token";
const SECURE = "__Secure-authjs.session-token";

const tokenFor = (claims: Record<string, unknown>, salt: string, maxAge = 3600, secret = SECRET) =>
  encode({ token: claims, secret, salt, maxAge });

describe("session claims from the Auth.js cookie", () => {
  it("reads the member and session version of a token Auth.js encrypted", async () => {
    const token = await tokenFor({ uid: "user-1", sv: 4, labId: "lab-1" }, PLAIN);
    expect(await claimsOfCookieHeader(`theme=dark; ${PLAIN}=${token}`, false, SECRET)).toEqual({
      userId: "user-1",
      sessionVersion: 4,
    });
    // A token from before session versions counts as version 0, as the session callback did.
    const old = await tokenFor({ uid: "user-2" }, PLAIN);
    expect(await claimsOfCookieHeader(`${PLAIN}=${old}`, false, SECRET)).toEqual({
      userId: "user-2",
      sessionVersion: 0,
    });
  });

  it("reads only the __Secure- cookie on https, and only the plain one on http", async () => {
    const secure = await tokenFor({ uid: "user-3", sv: 1 }, SECURE);
    const plain = await tokenFor({ uid: "user-4", sv: 1 }, PLAIN);
    expect((await claimsOfCookieHeader(`${SECURE}=${secure}`, true, SECRET))?.userId).toBe(
      "user-3",
    );
    expect(await claimsOfCookieHeader(`${PLAIN}=${plain}`, true, SECRET)).toBeNull();
    expect(await claimsOfCookieHeader(`${SECURE}=${secure}`, false, SECRET)).toBeNull();
    // The salt is the cookie name: a token moved to the other cookie does not decrypt.
    expect(await claimsOfCookieHeader(`${SECURE}=${plain}`, true, SECRET)).toBeNull();
  });

  it("refuses a token of another secret, a tampered token and garbage", async () => {
    const foreign = await tokenFor({ uid: "user-5" }, PLAIN, 3600, `${SECRET}-other`);
    expect(await claimsOfCookieHeader(`${PLAIN}=${foreign}`, false, SECRET)).toBeNull();
    const token = await tokenFor({ uid: "user-5" }, PLAIN);
    const parts = token.split(".");
    parts[3] = parts[3].slice(0, -2) + (parts[3].endsWith("AA") ? "BB" : "AA");
    expect(await claimsOfCookieHeader(`${PLAIN}=${parts.join(".")}`, false, SECRET)).toBeNull();
    expect(await claimsOfCookieHeader(`${PLAIN}=not-a-token`, false, SECRET)).toBeNull();
    expect(await claimsOfCookieHeader("", false, SECRET)).toBeNull();
  });

  it("refuses a token without a member id", async () => {
    const token = await tokenFor({ sub: "user-6", sv: 1 }, PLAIN);
    expect(await claimsOfCookieHeader(`${PLAIN}=${token}`, false, SECRET)).toBeNull();
  });

  it("refuses an expired token, also one decrypted before while it was valid", async () => {
    const expired = await tokenFor({ uid: "user-7" }, PLAIN, -3600);
    expect(await claimsOfCookieHeader(`${PLAIN}=${expired}`, false, SECRET)).toBeNull();

    const token = await tokenFor({ uid: "user-8", sv: 2 }, PLAIN, 60);
    const cookie = `${PLAIN}=${token}`;
    expect(await claimsOfCookieHeader(cookie, false, SECRET)).not.toBeNull();
    expect(await claimsOfCookieHeader(cookie, false, SECRET, Date.now() + 30_000)).not.toBeNull();
    expect(await claimsOfCookieHeader(cookie, false, SECRET, Date.now() + 61_000)).toBeNull();
  });

  it("joins a token Auth.js split over numbered cookies", async () => {
    const token = await tokenFor({ uid: "user-9", sv: 3, pad: "x".repeat(5000) }, PLAIN);
    const half = Math.ceil(token.length / 2);
    const cookie = `${PLAIN}.0=${token.slice(0, half)}; ${PLAIN}.1=${token.slice(half)}`;
    expect(await claimsOfCookieHeader(cookie, false, SECRET)).toEqual({
      userId: "user-9",
      sessionVersion: 3,
    });
  });

  it("picks the cookie the way Auth.js does: by AUTH_URL, else the forwarded protocol", () => {
    const headers = new Headers({ "x-forwarded-proto": "http" });
    expect(usesSecureCookie(headers, "https://notebook.example")).toBe(true);
    expect(usesSecureCookie(new Headers(), "http://localhost:3000")).toBe(false);
    expect(usesSecureCookie(headers, undefined)).toBe(false);
    expect(usesSecureCookie(new Headers({ "x-forwarded-proto": "https" }), undefined)).toBe(true);
  });
});
