import { beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, useBrowser, signIn } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.email.startsWith("mira"))!;

const saveStatus = (page: Page) => page.getByTestId("save-status").getAttribute("data-status");
async function waitForStatus(page: Page, status: string) {
  await page.waitForFunction(
    (s) => document.querySelector('[data-testid="save-status"]')?.getAttribute("data-status") === s,
    status,
    { timeout: 20_000 },
  );
}

async function newBlankEntry(page: Page, title: string): Promise<string> {
  await page.goto(`${BASE_URL}/entries/new`);
  await page.getByLabel("Title").fill(title);
  await page.getByLabel(/^Blank page/).check();
  await page.getByRole("button", { name: "Create entry" }).click();
  await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/);
  return page.url();
}

describe("autosave", () => {
  const browser = useBrowser();

  beforeAll(async () => {
    const page = await browser.context.newPage();
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();
    await page.close();
  });

  it("keeps edits the server never received and saves them after a reload", async () => {
    const page = await browser.context.newPage();
    const url = await newBlankEntry(page, "E2E reload keeps edits");
    // The server is unreachable for saves: the edit can only live in this browser.
    await page.route("**/api/entries/*/content", (route) => route.abort("internetdisconnected"));
    await page.getByRole("textbox", { name: /^Text of/ }).click();
    await page.keyboard.type("Weighed 0.7455 g KCl.");
    await waitForStatus(page, "offline");
    await page.goto(url);
    await page.getByText("Restored edits this browser kept").waitFor();
    // The server comes back: the kept edit goes to it on the next retry.
    await page.unroute("**/api/entries/*/content");
    await waitForStatus(page, "saved");
    await page.goto(url);
    await page.getByText("Weighed 0.7455 g KCl.").waitFor();
    expect(await saveStatus(page)).toBe("saved");
    await page.close();
  });

  it("refuses to overwrite a newer revision saved from another tab and lets the user choose", async () => {
    const first = await browser.context.newPage();
    const url = await newBlankEntry(first, "E2E two tabs");
    const second = await browser.context.newPage();
    await second.goto(url);
    await second.getByRole("textbox", { name: /^Text of/ }).waitFor();

    await first.getByRole("textbox", { name: /^Text of/ }).click();
    await first.keyboard.type("Written in the first tab.");
    await waitForStatus(first, "saved");

    await second.getByRole("textbox", { name: /^Text of/ }).click();
    await second.keyboard.type("Written in the second tab.");
    await waitForStatus(second, "conflict");
    await second.getByRole("alertdialog").getByText("saved elsewhere").waitFor();
    await second.getByRole("button", { name: "Save my version as the newest revision" }).click();
    await waitForStatus(second, "saved");

    await first.goto(`${url}/revisions`);
    const revisions = await first.getByRole("link", { name: /^Revision \d+$/ }).allTextContents();
    expect(revisions.length).toBeGreaterThanOrEqual(2); // the first tab's version stays in the history
    await first.goto(url);
    await first.getByText("Written in the second tab.").waitFor();
    await first.close();
    await second.close();
  });
});
