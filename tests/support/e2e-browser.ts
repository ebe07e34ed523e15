import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll } from "vitest";

export const BASE_URL = process.env.E2E_BASE_URL ?? "http://localhost:3000";

/** Debian's Chromium, headless, with the flags this closed network needs. */
export async function openBrowser(): Promise<{
  context: BrowserContext;
  close: () => Promise<void>;
}> {
  const profile = mkdtempSync(path.join(tmpdir(), "ionleaf-e2e-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    viewport: { width: 1360, height: 900 },
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
  return {
    context,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

export async function screenshot(page: Page, name: string): Promise<void> {
  const dir = process.env.E2E_SCREENSHOT_DIR;
  if (dir) await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}

/** One browser per test file: opened before its tests, closed after them. */
export function useBrowser(): { readonly context: BrowserContext } {
  const holder: { context?: BrowserContext; close?: () => Promise<void> } = {};
  beforeAll(async () => {
    const opened = await openBrowser();
    holder.context = opened.context;
    holder.close = opened.close;
  });
  afterAll(async () => {
    await holder.close?.();
  });
  return {
    get context() {
      if (!holder.context) throw new Error("the browser is not open yet");
      return holder.context;
    },
  };
}

/** Until the entry page says its autosave reached the server. */
export async function waitUntilSaved(page: Page) {
  await page.waitForFunction(
    () =>
      document.querySelector('[data-testid="save-status"]')?.getAttribute("data-status") ===
      "saved",
    null,
    { timeout: 20_000 },
  );
}
