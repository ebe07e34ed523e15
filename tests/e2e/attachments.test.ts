/**
 * Attachments in Chromium: files chosen in the picker, a photo dropped on the text, and an
 * instrument export pasted as text each end up in the entry: exports as plotted trace blocks
 * with their peaks, the photo as a figure with its thumbnail.
 */
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { cvTrace, simulateReversibleCv, writeTraceFile } from "@/lib/traces/simulate";
import { BASE_URL, screenshot, signIn, useBrowser } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.email.startsWith("tobin"))!;
const cvText = (cycles: number, decimal: "." | ",") =>
  writeTraceFile(cvTrace(simulateReversibleCv({ cycles })), {
    delimiter: decimal === "," ? ";" : "\t",
    decimal,
    headerStyle: "equals",
    nameStyle: "vs-reference",
    potentialUnit: "V",
    currentUnit: "µA",
    cycleColumn: true,
    newline: "\n",
  });

describe("attachments in the browser", () => {
  const browser = useBrowser();

  it("picker, drop and paste: trace blocks with peaks and a photo figure", async () => {
    const page = await browser.context.newPage();
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();
    await page.goto(`${BASE_URL}/entries/new`);
    await page.getByLabel("Title").fill(`E2E attachments ${Date.now()}`);
    await page.getByLabel(/^Blank page/).check();
    await page.getByRole("button", { name: "Create entry" }).click();
    await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/);
    await page.locator(".ionleaf-prose").first().click();
    await page.keyboard.type("Files of the run:");

    // The picker (several files at once).
    await page
      .getByTestId("attach-input")
      .setInputFiles([
        { name: "cv-run1.txt", mimeType: "text/plain", buffer: Buffer.from(cvText(2, ".")) },
      ]);
    const traces = page.locator('[data-live-block="trace"]');
    await traces.first().waitFor({ timeout: 30_000 });
    await page.getByTestId("trace-plot").first().waitFor({ timeout: 30_000 });
    const deltaEp = Number(await page.getByTestId("delta-ep-1").first().textContent());
    // Reversible wave: 57–58 mV at 25 °C (Bard & Faulkner 2001, Table 6.2.1).
    expect(deltaEp).toBeGreaterThan(56);
    expect(deltaEp).toBeLessThan(60);

    // A photo dropped onto the text.
    const jpeg = await sharp({
      create: { width: 80, height: 60, channels: 3, background: "#22807a" },
    })
      .jpeg()
      .toBuffer();
    const dropped = await page.evaluate(
      (bytes) => {
        const file = new File([new Uint8Array(bytes)], "cell-photo.jpg", { type: "image/jpeg" });
        const dt = new DataTransfer();
        dt.items.add(file);
        const target = document.querySelector(".ionleaf-prose p")!;
        target.scrollIntoView({ block: "center" });
        const box = target.getBoundingClientRect();
        // A drop lands where the pointer is: ProseMirror places it by these coordinates.
        const drop = new DragEvent("drop", {
          dataTransfer: dt,
          bubbles: true,
          cancelable: true,
          clientX: box.left + 10,
          clientY: box.top + box.height / 2,
        });
        target.dispatchEvent(drop);
        // The editor took the files: it stops the browser from opening them.
        return drop.defaultPrevented;
      },
      [...jpeg],
    );
    expect(dropped).toBe(true);
    const figure = page.locator("figure img").first();
    await figure.waitFor({ timeout: 30_000 });
    await page.waitForFunction(() => {
      const img = document.querySelector<HTMLImageElement>("figure img");
      return Boolean(img?.complete && img.naturalWidth > 0);
    });

    // An export pasted as text (decimal commas, semicolons).
    await page.locator(".ionleaf-prose p").first().click();
    const pasted = await page.evaluate(
      (text) => {
        const dt = new DataTransfer();
        dt.setData("text/plain", text);
        const paste = new ClipboardEvent("paste", {
          clipboardData: dt,
          bubbles: true,
          cancelable: true,
        });
        document.querySelector(".ionleaf-prose")!.dispatchEvent(paste);
        return paste.defaultPrevented;
      },
      cvText(1, ","),
    );
    expect(pasted).toBe(true);
    await expect.poll(() => traces.count(), { timeout: 30_000 }).toBe(2);
    await page.getByTestId("trace-plot").nth(1).waitFor({ timeout: 30_000 });

    // Everything is saved: after a reload the blocks come back from the server.
    await page.waitForFunction(
      () =>
        document.querySelector('[data-testid="save-status"]')?.getAttribute("data-status") ===
        "saved",
      undefined,
      { timeout: 30_000 },
    );
    await page.reload();
    await expect.poll(() => traces.count(), { timeout: 30_000 }).toBe(2);
    await page.locator("figure img").first().waitFor();
    await screenshot(page, "attachments");
    await page.close();
  }, 120_000);
});
