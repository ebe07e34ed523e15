/**
 * The production build under its Content-Security-Policy: every answer carries the policy
 * and the security headers, each page gets a fresh nonce that Next.js puts on its scripts,
 * and the main screens (sign-in, lists, an entry with live blocks, formulas and plots) run
 * without a single violation.
 */
import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, signIn, useBrowser } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.role === "researcher")!;

describe("security headers and CSP", () => {
  const browser = useBrowser();

  it("sends the policy with a new nonce per page, and the security headers", async () => {
    const first = await fetch(`${BASE_URL}/sign-in`);
    const second = await fetch(`${BASE_URL}/sign-in`);
    const policy = first.headers.get("content-security-policy") ?? "";
    expect(policy).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]+' 'strict-dynamic'/);
    expect(policy).not.toContain("unsafe-eval");
    const nonce = /'nonce-([^']+)'/.exec(policy)![1];
    expect(second.headers.get("content-security-policy")).not.toContain(nonce);
    // Every inline script of the page carries this response's nonce.
    const html = await first.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    expect(first.headers.get("x-content-type-options")).toBe("nosniff");
    expect(first.headers.get("x-frame-options")).toBe("DENY");
    // API answers (outside the proxy) carry them from next.config.mjs.
    const api = await fetch(`${BASE_URL}/api/health`);
    expect(api.headers.get("content-security-policy")).toContain("default-src 'none'");
    expect(api.headers.get("x-frame-options")).toBe("DENY");
  });

  it("runs sign-in, the lists and an entry with live blocks without a violation", async () => {
    const page = await browser.context.newPage();
    await page.addInitScript(() => {
      (window as unknown as { cspViolations: string[] }).cspViolations = [];
      document.addEventListener("securitypolicyviolation", (event) => {
        (window as unknown as { cspViolations: string[] }).cspViolations.push(
          `${event.violatedDirective} ${event.blockedURI}`,
        );
      });
    });
    const violations: string[] = [];
    const collect = async () => {
      violations.push(
        ...(await page.evaluate(
          () => (window as unknown as { cspViolations: string[] }).cspViolations,
        )),
      );
    };
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();
    await collect();
    for (const path of ["/entries", "/solutions", "/entries/new"]) {
      await page.goto(`${BASE_URL}${path}`);
      await page.waitForLoadState("networkidle");
      await collect();
    }
    // Entries found through their solutions hold solution blocks, hence formulas.
    await page.goto(`${BASE_URL}/solutions`);
    const links = page.locator("main a[href^='/entries/']");
    await links.first().waitFor();
    const hrefs = await links.evaluateAll((as) => as.map((a) => a.getAttribute("href")!));
    let formulas = 0;
    for (const href of [...new Set(hrefs)].slice(0, 3)) {
      await page.goto(`${BASE_URL}${href}`);
      await page.locator(".ionleaf-prose").first().waitFor();
      await page.waitForLoadState("networkidle");
      formulas += await page.locator(".katex").count();
      await collect();
    }
    expect(formulas, "the entries visited show KaTeX formulas").toBeGreaterThan(0);
    expect(violations).toEqual([]);
    await page.close();
  });
});
