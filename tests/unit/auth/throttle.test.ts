import { describe, expect, it } from "vitest";
import { MAX_FAILURES, WINDOW_MS, throttleDecision } from "@/lib/auth/throttle";

const now = new Date("2026-12-01T12:00:00Z");
const ago = (ms: number) => new Date(now.getTime() - ms);
const failures = (n: number, spacingMs = 1000) =>
  Array.from({ length: n }, (_, i) => ({ succeeded: false, at: ago((i + 1) * spacingMs) }));

describe("sign-in throttling policy", () => {
  it("allows fewer failures than the limit", () => {
    expect(throttleDecision(failures(MAX_FAILURES - 1), now)).toEqual({ allowed: true });
  });

  it("refuses after the limit, until the oldest counted failure leaves the window", () => {
    const decision = throttleDecision(failures(MAX_FAILURES), now);
    expect(decision.allowed).toBe(false);
    if (!decision.allowed)
      expect(decision.retryAfterSeconds).toBe((WINDOW_MS - MAX_FAILURES * 1000) / 1000);
  });

  it("forgets failures older than the window", () => {
    const old = Array.from({ length: 10 }, (_, i) => ({
      succeeded: false,
      at: ago(WINDOW_MS + i * 1000 + 1),
    }));
    expect(throttleDecision(old, now)).toEqual({ allowed: true });
  });

  it("counts only failures since the last success", () => {
    const olderFailures = Array.from({ length: 10 }, (_, i) => ({
      succeeded: false,
      at: ago(6000 + i * 1000),
    }));
    const attempts = [
      ...failures(MAX_FAILURES - 1),
      { succeeded: true, at: ago(5500) },
      ...olderFailures,
    ];
    expect(throttleDecision(attempts, now)).toEqual({ allowed: true });
    expect(throttleDecision([...failures(MAX_FAILURES), ...attempts], now).allowed).toBe(false);
  });
});
