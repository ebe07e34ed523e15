import { describe, expect, it } from "vitest";
import { throttleDecision, WINDOW_MS } from "@/lib/auth/throttle";

// The policy's numbers are Ionleaf's own choices (lib/auth/throttle.ts), not a standard.
const now = new Date("2026-12-01T12:00:00Z");
const ago = (ms: number) => new Date(now.getTime() - ms);
const failures = (n: number, clientKey: string, firstAgoMs = 0, spacingMs = 1000) =>
  Array.from({ length: n }, (_, i) => ({
    succeeded: false,
    clientKey,
    at: ago(firstAgoMs + i * spacingMs),
  }));

describe("sign-in throttling policy", () => {
  it("lets the first three failures of one client on one address through", () => {
    expect(throttleDecision(failures(2, "a"), [], "a", now)).toEqual({ allowed: true });
  });

  it("then makes that client wait 2, 4, 8 … seconds after its last failure, up to 5 min", () => {
    expect(throttleDecision(failures(3, "a"), [], "a", now)).toEqual({
      allowed: false,
      retryAfterSeconds: 2,
    });
    expect(throttleDecision(failures(5, "a"), [], "a", now)).toEqual({
      allowed: false,
      retryAfterSeconds: 8,
    });
    expect(throttleDecision(failures(15, "a", 0, 100), [], "a", now)).toEqual({
      allowed: false,
      retryAfterSeconds: 300,
    });
    // The wait runs from the last failure: 8 s after it, the client may try again.
    expect(throttleDecision(failures(5, "a", 8000), [], "a", now)).toEqual({ allowed: true });
  });

  it("does not slow the member on another client for a guesser's few failures", () => {
    expect(throttleDecision(failures(10, "guesser"), [], "member", now)).toEqual({
      allowed: true,
    });
  });

  it("slows every client by at most 30 s when many clients guess one address", () => {
    const spread = Array.from({ length: 20 }, (_, i) => ({
      succeeded: false,
      clientKey: `client-${i}`,
      at: ago(i * 1000),
    }));
    expect(throttleDecision(spread, [], "member", now)).toEqual({
      allowed: false,
      retryAfterSeconds: 30,
    });
  });

  it("stops one client trying many addresses until its failures leave the window", () => {
    const clientFailures = Array.from({ length: 30 }, (_, i) => ago(i * 1000));
    expect(throttleDecision([], clientFailures, "sprayer", now)).toEqual({
      allowed: false,
      retryAfterSeconds: (WINDOW_MS - 29_000) / 1000,
    });
  });

  it("forgets failures older than the window and counts the pair only since a success", () => {
    expect(throttleDecision(failures(10, "a", WINDOW_MS + 1), [], "a", now)).toEqual({
      allowed: true,
    });
    const attempts = [
      ...failures(2, "a"),
      { succeeded: true, clientKey: "a", at: ago(2500) },
      ...failures(5, "a", 3000),
    ];
    expect(throttleDecision(attempts, [], "a", now)).toEqual({ allowed: true });
  });
});
