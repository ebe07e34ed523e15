/**
 * From solution to measurement in Chromium: an entry from the cell-preparation template (a
 * ferri/ferrocyanide electrolyte and a cell block linked to it), the disk radius and a redox
 * probe typed into the cell block, a simulated cyclic voltammogram uploaded and linked to the
 * cell: the trace block shows the expected and the measured peaks side by side.
 */
import path from "node:path";
import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { cvTrace, simulateReversibleCv, writeTraceFile } from "@/lib/traces/simulate";
import { BASE_URL, signIn, useBrowser } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.email.startsWith("tobin"))!;

/** 5 mM ferrocyanide (D 6.7×10⁻⁶ cm²/s), 1.5 mm disk, 100 mV/s: what the cell block expects. */
const cvText = writeTraceFile(
  cvTrace(
    simulateReversibleCv({
      concentrationMolPerL: 5e-3,
      diffusionCoefficientCm2PerS: 6.7e-6,
      electrodeAreaCm2: Math.PI * 0.15 ** 2,
      scanRateVPerS: 0.1,
      formalPotentialV: 0.25,
      startPotentialV: -0.05,
      vertexPotentialV: 0.55,
      startingSpecies: "reduced",
    }),
  ),
  {
    delimiter: "\t",
    decimal: ".",
    headerStyle: "equals",
    nameStyle: "vs-reference",
    potentialUnit: "V",
    currentUnit: "µA",
    cycleColumn: true,
    newline: "\n",
  },
);

const number = (text: string | null) =>
  Number((text ?? "").replace("−", "-").replace(/[^\d.eE+-]/g, ""));

describe("cell block and voltammogram, expected against measured", () => {
  const browser = useBrowser();

  it("the cell block computes from its solution; the linked voltammogram shows both", async () => {
    const page = await browser.context.newPage();
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor({ timeout: 120_000 });
    await page.goto(`${BASE_URL}/entries/new`);
    await page.getByLabel("Title").fill(`E2E cell electrochemistry ${Date.now()}`);
    await page.getByLabel(/^Cell preparation/).check();
    await page.getByRole("button", { name: "Create entry" }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/, { timeout: 120_000 });

    const cell = page.getByRole("region", { name: "Cell block Cell 1" });
    await cell.waitFor({ timeout: 120_000 });
    await cell.getByLabel("Disk radius").fill("1.5");
    await cell.getByLabel("Redox probe").selectOption("ferricyanide/ferrocyanide");
    // Ferrocyanide present (the first form offered), its 5 mM read from the solution.
    const expectedCard = cell.getByTestId("expected-peak-current");
    await expect.poll(() => expectedCard.getByTestId("value").textContent()).toMatch(/µA/);
    // Randles–Ševčík, 25 °C form 2.69×10⁵ n^{3/2} A D^½ C v^½ (Bard & Faulkner 2001,
    // eq. 6.2.19): 77.8 µA for this cell.
    const ip = /ip ([\d.]+) µA/.exec((await expectedCard.getByTestId("value").textContent()) ?? "");
    expect(Number(ip?.[1])).toBeCloseTo(77.7, 0);
    await expect
      .poll(() => cell.getByTestId("uncompensated-resistance").getByTestId("value").textContent())
      .toMatch(/Ω/);
    await expect
      .poll(() => cell.getByTestId("junction-potential").getByTestId("value").textContent())
      .toMatch(/mV/);
    await expect
      .poll(() => cell.getByTestId("electrolyte-conductivity").getByTestId("value").textContent())
      .toMatch(/mS\/cm/);

    // The voltammogram, below the cell block.
    await page.locator(".ionleaf-prose p").last().click();
    await page
      .getByTestId("attach-input")
      .setInputFiles([
        { name: "cv-ferro-100mVs.txt", mimeType: "text/plain", buffer: Buffer.from(cvText) },
      ]);
    const trace = page.locator('[data-live-block="trace"]').first();
    await trace.waitFor({ timeout: 120_000 });
    await trace.getByTestId("trace-plot").waitFor({ timeout: 120_000 });
    await trace.getByLabel("Cell block", { exact: true }).selectOption({ label: "Cell 1" });

    const panel = trace.getByRole("region", { name: "Expected and measured" });
    await panel.waitFor({ timeout: 120_000 });
    const measuredDeltaEp = number(await panel.getByTestId("measured-delta-ep").textContent());
    const expectedDeltaEp = number(await panel.getByTestId("expected-delta-ep").textContent());
    // Reversible: 57–58 mV at 25 °C (Bard & Faulkner 2001, Table 6.2.1); 2.218 RT/F = 57.0 mV.
    expect(measuredDeltaEp).toBeGreaterThan(56);
    expect(measuredDeltaEp).toBeLessThan(60);
    expect(expectedDeltaEp).toBeCloseTo(57.0, 1);
    const measuredPeak = number(await panel.getByTestId("measured-anodic-peak").textContent());
    const expectedPeak = number(await panel.getByTestId("expected-peak").textContent());
    expect(Math.abs(measuredPeak / expectedPeak - 1)).toBeLessThan(0.03);
    expect(await panel.getByTestId("voltammogram-verdict").textContent()).toMatch(
      /^ΔEp 5\d mV: reversible \(Nernstian\)/,
    );
    // iR at the peak: the cell block's R_u (1/(4κr), Newman 1966) times the peak current.
    expect(await panel.getByTestId("ir-drop").textContent()).toMatch(/^\d+\.\d mV$/);
    await panel.getByTestId("scan-rate-plot").waitFor();

    const dir = process.env.E2E_SCREENSHOT_DIR;
    if (dir) {
      for (const width of [1360, 768]) {
        await page.setViewportSize({ width, height: 900 });
        await page.waitForTimeout(500);
        await cell.screenshot({ path: path.join(dir, `cell-block-${width}.png`) });
        await trace.screenshot({ path: path.join(dir, `trace-panel-${width}.png`) });
      }
    }
    await page.close();
  }, 400_000);
});
