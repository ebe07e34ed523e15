/**
 * Stored content is data, never markup: a link saved through the API keeps only its href (a
 * class or style that would lay it over the whole page is refused), and script vectors saved
 * as text, as a link or in an equation neither run nor change the page when the entry opens.
 */
import { describe, expect, it } from "vitest";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, signIn, useBrowser } from "../support/e2e-browser";

const researcher = DEMO_LABS[0].members.find((m) => m.role === "researcher")!;

const paragraph = (...content: unknown[]) => ({ type: "paragraph", content });
const text = (value: string, marks?: unknown[]) => ({ type: "text", text: value, marks });
const link = (attrs: Record<string, unknown>) => [{ type: "link", attrs }];

describe("hostile stored content", () => {
  const browser = useBrowser();

  it("refuses an overlay link, and nothing stored runs or covers the page", async () => {
    const page = await browser.context.newPage();
    const dialogs: string[] = [];
    page.on("dialog", (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    await signIn(page, researcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();
    const api = browser.context.request;
    const projects = (await (await api.get(`${BASE_URL}/api/projects`)).json()).projects as {
      id: string;
    }[];
    const created = await api.post(`${BASE_URL}/api/entries`, {
      data: { projectId: projects[0].id, title: "Hostile content" },
    });
    const { id } = (await created.json()) as { id: string };
    const save = (content: unknown, baseRevision: number) =>
      api.put(`${BASE_URL}/api/entries/${id}/content`, {
        data: { baseRevision, title: "Hostile content", content: { type: "doc", content } },
      });

    const overlay = await save(
      [
        paragraph(
          text("click anywhere", link({ href: "https://example.org", class: "fixed inset-0" })),
        ),
      ],
      0,
    );
    expect(overlay.status()).toBe(422);
    for (const attrs of [
      { href: "https://example.org", style: "position:fixed;inset:0" },
      { href: "https://example.org", target: "_self" },
      { href: "javascript:alert(1)" },
      { href: "/\\evil.example" },
    ]) {
      expect((await save([paragraph(text("x", link(attrs)))], 0)).status(), attrs.href).toBe(422);
    }

    const stored = await save(
      [
        paragraph(text("<script>alert('text')</script><img src=x onerror=alert('img')>")),
        paragraph(text("a datasheet", link({ href: "https://example.org/sds" }))),
        { type: "blockMath", attrs: { latex: "\\href{javascript:alert('tex')}{E^0}" } },
      ],
      0,
    );
    expect(stored.status()).toBe(200);

    await page.goto(`${BASE_URL}/entries/${id}`);
    await page.locator(".ionleaf-prose").first().waitFor();
    await page.waitForLoadState("networkidle");
    await page.getByText("<script>alert('text')</script>", { exact: false }).waitFor();

    const anchor = page.locator(".ionleaf-prose a[href='https://example.org/sds']");
    expect(await anchor.getAttribute("rel")).toBe("noopener noreferrer nofollow");
    expect(await anchor.getAttribute("target")).toBe("_blank");
    expect(await anchor.getAttribute("class")).toBeNull();
    const box = (await anchor.boundingBox())!;
    const viewport = page.viewportSize()!;
    expect(box.width * box.height).toBeLessThan((viewport.width * viewport.height) / 50);
    // KaTeX draws the untrusted \href as text, not as a link.
    expect(await page.locator(".ionleaf-prose a[href^='javascript']").count()).toBe(0);
    expect(await page.locator(".ionleaf-prose img, .ionleaf-prose script").count()).toBe(0);

    const before = page.url();
    await page.mouse.click(viewport.width / 2, viewport.height - 20);
    await page.waitForTimeout(300);
    expect(page.url()).toBe(before);
    expect(dialogs).toEqual([]);
    await page.close();
  });
});
