import type { NextConfig } from "next";
import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, securityHeaders } from "@/lib/http/security-headers";

// The directives are those of the W3C Content Security Policy Level 3 recommendation; which
// ones a notebook needs is our choice, checked here so a loosening is a visible change.

function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy.split(";").map((part) => {
      const [name, ...values] = part.trim().split(/\s+/);
      return [name, values];
    }),
  );
}

describe("contentSecurityPolicy", () => {
  it("allows scripts only from the app with this response's nonce, and no eval in production", () => {
    const policy = directives(contentSecurityPolicy("abc123==", false));
    expect(policy.get("script-src")).toEqual(["'self'", "'nonce-abc123=='", "'strict-dynamic'"]);
    expect(policy.get("object-src")).toEqual(["'none'"]);
    expect(policy.get("frame-ancestors")).toEqual(["'none'"]);
    expect(policy.get("base-uri")).toEqual(["'self'"]);
    expect(policy.get("form-action")).toEqual(["'self'"]);
    expect(policy.get("connect-src")).toEqual(["'self'"]);
    expect([...policy.values()].flat()).not.toContain("'unsafe-eval'");
    expect(policy.get("script-src")).not.toContain("'unsafe-inline'");
  });

  it("lets the development server evaluate and reload, and only it", () => {
    const policy = directives(contentSecurityPolicy("n", true));
    expect(policy.get("script-src")).toContain("'unsafe-eval'");
    expect(policy.get("connect-src")).toContain("ws:");
  });
});

describe("securityHeaders", () => {
  it("forbids sniffing and framing, and sends HSTS only over HTTPS", () => {
    const plain = securityHeaders(false);
    expect(plain["x-content-type-options"]).toBe("nosniff");
    expect(plain["x-frame-options"]).toBe("DENY");
    expect(plain).not.toHaveProperty("strict-transport-security");
    expect(securityHeaders(true)["strict-transport-security"]).toMatch(/max-age=\d+/);
  });
});

describe("the API's static headers (next.config.mjs)", () => {
  it("match the pages' security headers, with a policy that lets nothing run or frame", async () => {
    // @ts-expect-error -- next.config.mjs is plain JavaScript without type declarations.
    const imported = (await import("../../../next.config.mjs")) as { default: NextConfig };
    const config = imported.default;
    const rules = await config.headers!();
    const forApi = (https: boolean) =>
      Object.fromEntries(
        rules
          .filter((rule) => rule.source === "/:path*" || rule.source === "/api/:path*")
          .filter((rule) => https || !rule.has)
          .flatMap((rule) => rule.headers)
          .map(({ key, value }) => [key.toLowerCase(), value]),
      );
    for (const https of [false, true]) {
      const { "content-security-policy": policy, ...rest } = forApi(https);
      expect(rest).toEqual(securityHeaders(https));
      const api = directives(policy);
      expect(api.get("default-src")).toEqual(["'none'"]);
      expect(api.get("frame-ancestors")).toEqual(["'none'"]);
      expect(api.has("script-src")).toBe(false);
    }
  });
});
