import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, useBrowser, screenshot, signIn, waitUntilSaved } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.role === "researcher")!;

describe("a dilution made from a stock", () => {
  const browser = useBrowser();

  it("picks the demo KCl stock through the finder, dilutes it, and finds the use on the stock list", async () => {
    const page = await browser.context.newPage();
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();

    const title = `E2E 10 mM KCl from the stock ${Date.now()}`;
    await page.goto(`${BASE_URL}/entries/new`);
    await page.getByLabel("Title").fill(title);
    await page.getByRole("button", { name: "Create entry" }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/, { timeout: 120_000 });

    await page.getByRole("textbox", { name: /^Text of/ }).click();
    await page.getByRole("button", { name: "Insert solution block" }).click();
    const block = page.getByRole("region", { name: "Solution block (unnamed)" });
    await block.waitFor();
    await block.getByRole("textbox", { name: "Solution name" }).fill("10 mM KCl");
    const named = page.getByRole("region", { name: "Solution block 10 mM KCl" });
    await named.getByRole("button", { name: /Made from stocks/ }).click();
    const picker = named.getByTestId("stock-picker");
    await picker.getByRole("textbox", { name: "Search the lab's solutions" }).fill("KCl stock");
    await picker
      .getByRole("button", { name: /3 mol\/L KCl filling solution/ })
      .first()
      .click({ timeout: 90_000 });
    await named.getByRole("textbox", { name: "Volume of stock 1" }).fill("1");
    await named.getByRole("textbox", { name: "Final volume" }).fill("300");
    // The stock's current revision (amended: 22.37 g KCl made up to 99.82 mL, so
    // 22.37 g / 74.551 g/mol / 0.09982 L = 3.006 mol/L, M(KCl) from IUPAC 2021 atomic weights);
    // c₂ = c₁·V₁/V₂ = 3.006 mol/L × 1 mL / 300 mL = 0.01002 mol/L (common practice).
    await expect
      .poll(() => named.getByLabel("Dilution arithmetic").textContent(), { timeout: 15_000 })
      .toMatch(/KCl: 3\.006 mol\/L × 1 mL \/ 300 mL = 0\.01002 mol\/L/);
    await waitUntilSaved(page);
    await screenshot(page, "stock-dilution-block");

    await page.getByRole("link", { name: "Stocks", exact: true }).click();
    await page.waitForURL(/\/stocks$/, { timeout: 120_000 });
    const stock = page
      .getByTestId("stock")
      .filter({ has: page.getByRole("heading", { name: "3 mol/L KCl filling solution" }) });
    await expect.poll(() => stock.count()).toBeGreaterThan(0);
    const use = stock.getByRole("row").filter({ hasText: title });
    await expect.poll(() => use.count()).toBe(1);
    // Autosave kept the block before its volumes were typed; the link starts with the first
    // revision in which they made sense. Stock revision 2 is the amended stock.
    expect(await use.textContent()).toMatch(/from \d+ \(current\)21 mL → 300 mL$/);
    await screenshot(page, "stock-list");
    await page.close();
    // A dev server compiles each page on its first visit.
  }, 240_000);
});
