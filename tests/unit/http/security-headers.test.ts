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
