import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, openBrowser, screenshot, signIn, useBrowser } from "../support/e2e-browser";

const lab = DEMO_LABS[0];
const byRole = (role: string) => lab.members.find((m) => m.role === role)!;

const EXPECTED_NAV: Record<string, string[]> = {
  researcher: ["Bench", "Entries", "Solution finder", "Stocks"],
  supervisor: ["Bench", "Entries", "Solution finder", "Stocks", "Review queue"],
  admin: ["Bench", "Entries", "Solution finder", "Stocks", "Lab settings"],
};

describe("signing in as each demo role", () => {
  const browser = useBrowser();

  it("sends a visitor without a session to sign-in", async () => {
    const page = await browser.context.newPage();
    await page.goto(`${BASE_URL}/lab`);
    await page.waitForURL(/\/sign-in/);
    expect(await page.getByRole("heading", { name: "Sign in to your lab" }).isVisible()).toBe(true);
    await page.close();
  });

  it("refuses a wrong password without saying whether the address exists", async () => {
    const page = await browser.context.newPage();
    await signIn(page, byRole("researcher").email, "not-the-password-1");
    // (Next.js's route announcer is also role=alert, so the form's message is found by its text.)
    const message = "That e-mail and password do not match an active account.";
    await page.getByRole("alert").filter({ hasText: message }).waitFor();
    await signIn(page, "nobody@saltmarsh.example", "not-the-password-1");
    await page.getByRole("alert").filter({ hasText: message }).waitFor();
    expect(await page.getByTestId("current-user").count()).toBe(0);
    await page.close();
  });

  for (const role of ["researcher", "supervisor", "admin"] as const) {
    it(`shows a ${role} the ${role}'s navigation`, async () => {
      // A browser of their own: a sign-out in a shared profile can race link prefetches
      // that refresh the session cookie.
      const own = await openBrowser();
      const page = await own.context.newPage();
      const member = byRole(role);
      await signIn(page, member.email, DEMO_PASSWORD);
      await page.getByTestId("current-role").waitFor();
      expect(await page.getByTestId("current-role").textContent()).toBe(role);
      const links = await page
        .getByRole("navigation", { name: "Main" })
        .getByRole("link")
        .allTextContents();
      expect(links.map((l) => l.replace(/\d+$/, "").trim())).toEqual(EXPECTED_NAV[role]);
      await screenshot(page, `bench-${role}`);
      await page.getByRole("button", { name: "Sign out" }).click();
      await page.waitForURL(/\/sign-in/);
      await own.close();
    });
  }
});
