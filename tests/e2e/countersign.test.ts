/**
 * The review flow with two demo accounts in two browsers: the researcher submits to a
 * supervisor, the mail arrives in the mail catcher, the supervisor countersigns with her
 * password, the entry shows countersigned and intact, an edit becomes an amendment, and the
 * PDF downloads with its signature manifest.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, openBrowser, screenshot, signIn } from "../support/e2e-browser";
import { pdfPageTexts } from "../support/pdf-text";

const lab = DEMO_LABS[0];
const researcher = lab.members.find((m) => m.email.startsWith("tobin"))!;
const supervisor = lab.members.find((m) => m.role === "supervisor")!;

async function caughtMail(to: string, subject: string): Promise<string> {
  const base = process.env.MAIL_CATCHER_URL;
  if (!base) throw new Error("MAIL_CATCHER_URL is not set: run the e2e tests through npm test");
  for (let i = 0; i < 40; i++) {
    const all = (await (await fetch(new URL("/messages", base))).json()) as {
      to: string[];
      subject: string;
      text: string;
    }[];
    const found = all.find((m) => m.to.includes(to) && m.subject === subject);
    if (found) return found.text;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`no mail "${subject}" to ${to}`);
}

describe("countersigning in the browser", () => {
  it("submit → mail → countersign with the password → intact → amendment → PDF with manifest", async () => {
    const title = `E2E signed electrolyte ${Date.now()}`;
    const author = await openBrowser();
    const reviewer = await openBrowser();
    try {
      // The researcher writes and submits to the supervisor by name.
      const page = await author.context.newPage();
      await signIn(page, researcher.email, DEMO_PASSWORD);
      await page.getByTestId("current-user").waitFor();
      await page.goto(`${BASE_URL}/entries/new`);
      await page.getByLabel("Title").fill(title);
      await page.getByLabel(/^Blank page/).check();
      await page.getByRole("button", { name: "Create entry" }).click();
      await page.waitForURL(/\/entries\/[0-9a-f-]{36}$/);
      const entryUrl = page.url();
      const entryId = entryUrl.split("/").at(-1)!;
      await page.getByRole("textbox", { name: `Text of ${title}` }).click();
      await page.keyboard.type("Perchlorate-free supporting electrolyte, weighed twice.");
      await page.waitForFunction(
        () =>
          document.querySelector('[data-testid="save-status"]')?.getAttribute("data-status") ===
          "saved",
        undefined,
        { timeout: 20_000 },
      );
      await page.reload();
      const submitForm = page.getByRole("form", { name: "Submit for countersignature" });
      await submitForm.getByLabel("Reviewer").selectOption({ label: supervisor.name });
      await submitForm.getByRole("button", { name: "Submit for countersignature" }).click();
      await page.getByText("Submitted for countersignature.").waitFor();

      const mail = await caughtMail(supervisor.email, `Review requested: ${title}`);
      const reviewLink = /https?:\/\/\S+\/review\/[0-9a-f-]{36}/.exec(mail)?.[0];
      expect(reviewLink).toBe(`${BASE_URL}/review/${entryId}`);

      // The supervisor follows the link and countersigns; a wrong password is refused first.
      const review = await reviewer.context.newPage();
      await signIn(review, supervisor.email, DEMO_PASSWORD);
      await review.getByTestId("current-user").waitFor();
      await review.goto(`${BASE_URL}/review/${entryId}`);
      const sign = review.getByRole("form", { name: "Countersign" });
      await sign.getByLabel(/^Approved/).check();
      await sign.getByLabel("Comment (optional)").fill("Weighings checked.");
      await sign.getByLabel("Your password").fill("not-my-password-1");
      await sign.getByRole("button", { name: "Countersign" }).click();
      await review.getByText("Enter your own password.").waitFor();
      await sign.getByLabel("Your password").fill(DEMO_PASSWORD);
      await sign.getByRole("button", { name: "Countersign" }).click();
      await review.waitForURL(entryUrl);
      await review.getByTestId("signature").first().waitFor();
      expect(await review.locator('[data-status="countersigned"]').count()).toBeGreaterThanOrEqual(
        1,
      );
      expect(await review.getByTestId("integrity").first().textContent()).toBe("intact");
      await screenshot(review, "countersigned-entry");

      // The author sees it signed; an edit is an amendment with a reason.
      await page.goto(entryUrl);
      await page.getByTestId("signature").first().waitFor();
      await page.getByRole("button", { name: "Amend…" }).click();
      const amend = page.getByRole("form", { name: "Amend the countersigned entry" });
      await amend.getByLabel("Reason for the amendment").fill("Second weighing added.");
      await amend.getByRole("button", { name: "Start amendment" }).click();
      await page.getByText(/Amendment of countersigned revision 1/).waitFor();
      await page.getByRole("textbox", { name: `Text of ${title}` }).click();
      await page.keyboard.press("End");
      await page.keyboard.type(" Second weighing 0.2 mg lower.");
      await page.waitForFunction(
        () =>
          document.querySelector('[data-testid="save-status"]')?.getAttribute("data-status") ===
          "saved",
        undefined,
        { timeout: 20_000 },
      );
      await page.reload();
      await page.getByTestId("amended-after").waitFor();

      // The PDF of the signed record downloads and ends with the manifest.
      const download = page.waitForEvent("download");
      await page.getByRole("link", { name: "PDF with signature manifest" }).click();
      const file = await (await download).path();
      const pages = await pdfPageTexts(new Uint8Array(readFileSync(file)));
      expect(pages.join(" ")).toContain(title);
      expect(pages.at(-1)).toContain("Signature manifest");
      expect(pages.at(-1)).toContain(supervisor.name);
      expect(pages.at(-1)).toContain("Weighings checked.");
    } finally {
      await author.close();
      await reviewer.close();
    }
  }, 180_000);
});
