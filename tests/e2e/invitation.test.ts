import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, openBrowser, useBrowser, signIn } from "../support/e2e-browser";

const admin = DEMO_LABS[1].members.find((m) => m.role === "admin")!;
const otherLabAdmin = DEMO_LABS[0].members.find((m) => m.role === "admin")!;

describe("inviting a member through the mail catcher", () => {
  const browser = useBrowser();

  it("admin invites, the invitee follows the mailed link, sets a password and signs in; the link then stops working", async () => {
    const email = `e2e.newcomer.${Date.now()}@ridgeback.example`;
    const page = await browser.context.newPage();
    await signIn(page, admin.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();
    await page.goto(`${BASE_URL}/lab`);
    await page.getByRole("form", { name: "Invite a member" }).getByLabel("E-mail").fill(email);
    await page
      .getByRole("form", { name: "Invite a member" })
      .getByLabel("Role", { exact: true })
      .selectOption("researcher");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${email}.`).waitFor();

    await page.goto(`${BASE_URL}/lab/mail`);
    const mail = page.getByTestId("caught-message").filter({ hasText: email }).first();
    const body = (await mail.textContent()) ?? "";
    const link = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/.exec(body)?.[0];
    expect(link).toBeDefined();
    await page.close();

    // The other lab's admin reads the same catcher but never sees this lab's mail.
    const other = await openBrowser();
    const otherPage = await other.context.newPage();
    await signIn(otherPage, otherLabAdmin.email, DEMO_PASSWORD);
    await otherPage.getByTestId("current-user").waitFor();
    await otherPage.goto(`${BASE_URL}/lab/mail`);
    await otherPage.getByRole("heading", { name: "Mail catcher" }).waitFor();
    expect(await otherPage.getByText(email).count()).toBe(0);
    expect(await otherPage.getByText(/\/invitations\/[A-Za-z0-9_-]{20,}/).count()).toBe(0);
    await other.close();

    // The invitee is another person with another browser.
    const invitee = await openBrowser();
    const page2 = await invitee.context.newPage();
    await page2.goto(link!);
    await page2.getByRole("heading", { name: /Join Ridgeback Battery Cells Lab/ }).waitFor();
    // The page does not say whom the link was for; the one who follows it must know.
    expect(await page2.getByText(email).count()).toBe(0);
    await page2.getByLabel("E-mail").fill("someone.else@ridgeback.example");
    await page2.getByLabel("Your name").fill("Newcomer E2E");
    await page2.getByLabel("Choose a password").fill("short");
    await page2.getByLabel("Repeat the password").fill("short");
    await page2.getByRole("button", { name: "Join the lab" }).click();
    await page2.getByText("Use at least 10 characters.").waitFor(); // field error from the shared schema

    await page2.getByLabel("Choose a password").fill("lithium-foil-88");
    await page2.getByLabel("Repeat the password").fill("lithium-foil-88");
    await page2.getByRole("button", { name: "Join the lab" }).click();
    await page2.getByText("This invitation was sent to a different address.").waitFor();

    await page2.getByLabel("E-mail").fill(email.toUpperCase());
    await page2.getByLabel("Choose a password").fill("lithium-foil-88");
    await page2.getByLabel("Repeat the password").fill("lithium-foil-88");
    await page2.getByRole("button", { name: "Join the lab" }).click();
    await page2.waitForURL(/\/sign-in\?joined=1/);
    await signIn(page2, email, "lithium-foil-88");
    await page2.getByTestId("current-role").waitFor();
    expect(await page2.getByTestId("current-role").textContent()).toBe("researcher");

    await invitee.close();

    const stranger = await openBrowser();
    const page3 = await stranger.context.newPage();
    await page3.goto(link!);
    await page3.getByTestId("invitation-closed").getByText("already been used").waitFor();
    await stranger.close();
  });
});
