/**
 * axe-core's WCAG 2 A and AA rules on every main page, signed out and signed in as each
 * role: zero serious or critical violations.
 */
import type { Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { axeViolations, serious } from "../support/axe";
import { BASE_URL, openBrowser, signIn, useBrowser } from "../support/e2e-browser";

const lab = DEMO_LABS[0];
const byRole = (role: string) => lab.members.find((m) => m.role === role)!;

async function check(page: Page, path: string) {
  await page.goto(`${BASE_URL}${path}`);
  await page.waitForLoadState("networkidle");
  const found = serious(await axeViolations(page));
  expect(found, `${path}: ${JSON.stringify(found, null, 1)}`).toEqual([]);
}

describe("accessibility (axe-core, WCAG 2 A and AA)", () => {
  const browser = useBrowser();

  it("signed out: sign-in and an unknown invitation link", async () => {
    const page = await browser.context.newPage();
    await check(page, "/sign-in");
    await check(page, "/invitations/not-a-real-token");
    await page.close();
  });

  for (const role of ["researcher", "supervisor", "admin"] as const) {
    it(`signed in as ${role}: every page that role reaches`, async () => {
      const own = await openBrowser();
      try {
        const page = await own.context.newPage();
        await signIn(page, byRole(role).email, DEMO_PASSWORD);
        await page.getByTestId("current-user").waitFor();
        const paths = ["/", "/entries", "/entries/new", "/solutions"];
        if (role === "supervisor") paths.push("/review");
        if (role === "admin") paths.push("/lab", "/lab/mail");
        for (const path of paths) await check(page, path);
        // Entries with live solution and cell blocks, and their history.
        await page.goto(`${BASE_URL}/entries`);
        const links = page.locator("table a[href^='/entries/']");
        await links.first().waitFor();
        const hrefs = (
          await links.evaluateAll((as) => as.map((a) => a.getAttribute("href")!))
        ).slice(0, 4);
        expect(hrefs.length).toBeGreaterThan(0);
        for (const href of hrefs) {
          await check(page, href);
          await page.locator(".ionleaf-prose").first().waitFor();
          expect(serious(await axeViolations(page))).toEqual([]);
        }
        await check(page, `${hrefs[0]}/revisions`);
      } finally {
        await own.close();
      }
    }, 180_000); // a dozen pages, each checked twice by axe: slow on a busy two-core machine
  }
});
