import "server-only";
import { existsSync } from "node:fs";
import { chromium } from "playwright-core";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";

/**
 * HTML → PDF with Debian's headless Chromium: the same engine that shows the entry, so
 * formulas (MathML) and tables print as they read on screen. A browser is started per export
 * with no network at all (the page is handed over as a string and loads nothing).
 */
export async function htmlToPdf(html: string): Promise<Buffer> {
  const executablePath = getEnv().CHROMIUM_PATH;
  if (!existsSync(executablePath)) {
    throw new AppError(
      "unavailable",
      "PDF export needs Chromium on the server (Debian: apt-get install chromium); the JSON archive works without it.",
    );
  }
  const browser = await chromium.launch({
    executablePath,
    headless: true,
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  try {
    const page = await browser.newPage({ javaScriptEnabled: false });
    await page.route("**/*", (route) => route.abort());
    await page.setContent(html, { waitUntil: "load" });
    return await page.pdf({ format: "A4", printBackground: true, preferCSSPageSize: true });
  } finally {
    await browser.close();
  }
}
