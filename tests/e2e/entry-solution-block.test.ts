import { describe, expect, it } from "vitest";
import type { Locator } from "playwright-core";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { parseShownNumber } from "@/lib/ui/format-number";
import { BASE_URL, useBrowser, screenshot, signIn, waitUntilSaved } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.role === "researcher")!;

/** The number a result cell shows ("0.1000", "7.780 × 10⁻¹"), as a number. */
async function shownNumber(cell: Locator): Promise<number> {
  const text = ((await cell.textContent()) ?? "")
    .replace(/^.*=\s*/, "")
    .replace(/\s*(mol\/kg|mol\/L|nm)$/, "");
  return parseShownNumber(text) ?? Number.NaN;
}

async function expectNaClNumbers(block: Locator) {
  const ionicStrength = block.getByTestId("result-Ionic strength (molal)");
  await expect.poll(() => shownNumber(ionicStrength), { timeout: 10_000 }).toBeCloseTo(0.1, 4);
  // γ±(NaCl, 0.1 mol/kg, 25 °C) = 0.778, Robinson & Stokes (1959) Appendix 8.10; every model
  // "auto" may choose here is within 1.5 % of it.
  const meanGamma = await shownNumber(block.getByTestId("mean-gamma-NaCl"));
  expect(meanGamma).toBeGreaterThan(0.766);
  expect(meanGamma).toBeLessThan(0.79);
}

describe("an entry with a live solution block", () => {
  const browser = useBrowser();

  it("creates an entry from the cell-preparation template, computes 0.1 mol/kg NaCl, and shows it again after a reload", async () => {
    const page = await browser.context.newPage();
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();

    await page.goto(`${BASE_URL}/entries/new`);
    await page.getByLabel("Title").fill("E2E cell preparation with NaCl");
    await page.getByLabel(/^Cell preparation/).check();
    await page.getByRole("button", { name: "Create entry" }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/);
    const entryUrl = page.url();

    await page.getByRole("textbox", { name: /^Text of/ }).click();
    await page.keyboard.press("Control+End");
    await page.getByRole("button", { name: "Insert solution block" }).click();
    const block = page.getByRole("region", { name: "Solution block (unnamed)" });
    await block.waitFor();
    await block.getByRole("combobox", { name: "Species, row 1" }).fill("NaCl");
    await block.getByRole("combobox", { name: "Species, row 1" }).press("Escape");
    await block.getByRole("textbox", { name: "Amount, row 1" }).fill("0.1");
    await expectNaClNumbers(block);
    await waitUntilSaved(page);
    await screenshot(page, "entry-solution-block");

    await page.goto(entryUrl);
    const reloaded = page.getByRole("region", { name: "Solution block (unnamed)" });
    await reloaded.waitFor();
    await expectNaClNumbers(reloaded);
    expect(await page.getByTestId("save-status").getAttribute("data-status")).toBe("saved");
    await page.close();
  });
});
