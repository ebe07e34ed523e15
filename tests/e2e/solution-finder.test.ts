import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, screenshot, signIn, useBrowser } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.role === "researcher")!;
/** The demo's mixed electrolyte: 0.1 mol/kg NaCl + 0.0667 mol/kg Na2SO4, I = 0.3 mol/kg. */
const MIXED = "Chloride–sulfate mix, I ≈ 0.3";

describe("the solution finder in a browser", () => {
  const browser = useBrowser();

  it("finds a demo solution by ionic strength and species, opens its block highlighted, and the URL reproduces the search", async () => {
    const page = await browser.context.newPage();
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();

    await page.goto(`${BASE_URL}/solutions`);
    const form = page.getByRole("search", { name: "Find solutions" });
    await form.getByLabel("I from").fill("0.25");
    await form.getByLabel("I to").fill("0.35");
    // Type-ahead from the catalogue: a name finds the salt, Enter puts its formula in.
    const species = form.getByRole("combobox", { name: "Species", exact: true });
    await species.fill("sodium sulf");
    await page.getByRole("option", { name: /^Na2SO4/ }).waitFor();
    await species.press("Enter");
    expect(await species.inputValue()).toBe("Na2SO4, ");
    await form.getByRole("button", { name: "Search" }).click();
    await page.waitForURL(/\/solutions\?iMin=0\.25&iMax=0\.35&species=Na2SO4$/);

    const rows = page.getByTestId("finder-row");
    await expect.poll(() => rows.count(), { timeout: 10_000 }).toBe(1);
    await expect.poll(() => rows.first().getByRole("rowheader").textContent()).toContain(MIXED);
    expect(await page.getByRole("status").filter({ hasText: "solution" }).textContent()).toBe(
      "1 solution",
    );
    const searchUrl = page.url();
    await screenshot(page, "solution-finder-desktop");
    await page.setViewportSize({ width: 768, height: 1000 });
    await screenshot(page, "solution-finder-tablet");
    await page.setViewportSize({ width: 1360, height: 900 });

    await rows.first().getByRole("link", { name: MIXED }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]{36}#block-[\w-]+$/);
    const blockId = decodeURIComponent(new URL(page.url()).hash.slice(1));
    const block = page.locator(`[id="${blockId}"]`);
    await expect
      .poll(() => block.getAttribute("data-highlighted"), { timeout: 15_000 })
      .toBe("true");
    expect(await block.getAttribute("aria-label")).toBe(`Solution block ${MIXED}`);
    const box = await block.boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y).toBeGreaterThanOrEqual(0);
    expect(box!.y).toBeLessThan(900);
    await screenshot(page, "solution-finder-highlighted-block");

    // Back returns to the same search.
    await page.goBack();
    await page.waitForURL(searchUrl);
    await expect.poll(() => page.getByTestId("finder-row").count()).toBe(1);

    // The URL alone reproduces the search in a new tab.
    const tab = await browser.context.newPage();
    await tab.goto(searchUrl);
    const again = tab.getByTestId("finder-row");
    await expect.poll(() => again.count(), { timeout: 10_000 }).toBe(1);
    expect(await again.first().getByRole("rowheader").textContent()).toContain(MIXED);
    const tabForm = tab.getByRole("search", { name: "Find solutions" });
    expect(await tabForm.getByLabel("I from").inputValue()).toBe("0.25");
    expect(await tabForm.getByRole("combobox", { name: "Species", exact: true }).inputValue()).toBe(
      "Na2SO4",
    );

    // Similar solutions of the found block: the demo's NaCl + CuCl₂ bath shares Na⁺ and Cl⁻.
    await again.first().getByRole("link", { name: "Similar solutions" }).click();
    await tab.waitForURL(/\/solutions\/similar\?entry=/);
    await expect
      .poll(() => tab.getByTestId("similar-row").count(), { timeout: 10_000 })
      .toBeGreaterThan(0);
    await screenshot(tab, "similar-solutions");
    await tab.close();
    await page.close();
  });

  it("says by field what is wrong with a bad search, with no server error", async () => {
    // The browser is still signed in from the first test unless this one runs alone.
    const page = await browser.context.newPage();
    await page.goto(`${BASE_URL}/solutions`);
    if (new URL(page.url()).pathname === "/sign-in") {
      await signIn(page, researcher.email, DEMO_PASSWORD);
      await page.getByTestId("current-user").waitFor();
    }
    const alerts = page.getByRole("search", { name: "Find solutions" }).getByRole("alert");
    const inverted = await page.goto(`${BASE_URL}/solutions?iMin=0.5&iMax=0.1`);
    expect(inverted?.status()).toBe(200);
    await expect
      .poll(() => alerts.allTextContents())
      .toEqual(["The highest ionic strength is below the lowest."]);
    const unknown = await page.goto(`${BASE_URL}/solutions?species=unobtainium`);
    expect(unknown?.status()).toBe(200);
    await expect
      .poll(() => alerts.allTextContents())
      .toEqual([
        '"unobtainium" is not a species of the catalogue or of the lab; type a formula (NaCl, SO4^2-) or choose from the list.',
      ]);
    await screenshot(page, "solution-finder-bad-input");
    await page.close();
  });
});
