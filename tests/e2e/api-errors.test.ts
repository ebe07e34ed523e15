import { describe, expect, it } from "vitest";
import { request as playwrightRequest } from "playwright-core";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { BASE_URL, openBrowser, signIn, useBrowser } from "../support/e2e-browser";

const saltmarshResearcher = DEMO_LABS[0].members.find((m) => m.role === "researcher")!;
const ridgebackResearcher = DEMO_LABS[1].members.find((m) => m.role === "researcher")!;

describe("the JSON API answers bad requests with typed errors", () => {
  const browser = useBrowser();

  it("401 without a session, with a JSON error body and no stack trace", async () => {
    const anonymous = await playwrightRequest.newContext({ baseURL: BASE_URL });
    const response = await anonymous.get("/api/entries");
    expect(response.status()).toBe(401);
    const body = await response.json();
    expect(body.error.code).toBe("unauthenticated");
    expect(JSON.stringify(body)).not.toMatch(/at .*\.(ts|js):\d+/);
    await anonymous.dispose();
  });

  it("422, 404 and 409 for a member, and 404 for another lab's entry", async () => {
    const page = await browser.context.newPage();
    await signIn(page, saltmarshResearcher.email, DEMO_PASSWORD);
    await page.getByTestId("current-user").waitFor();
    const api = browser.context.request;

    const projects = (await (await api.get(`${BASE_URL}/api/projects`)).json()).projects as {
      id: string;
    }[];
    const created = await api.post(`${BASE_URL}/api/entries`, {
      data: { projectId: projects[0].id, title: "API errors" },
    });
    expect(created.status()).toBe(201);
    const { id } = await created.json();

    const notJson = await api.put(`${BASE_URL}/api/entries/${id}/content`, {
      data: "{not json",
      headers: { "content-type": "application/json" },
    });
    expect(notJson.status()).toBe(422);

    const badTitle = await api.post(`${BASE_URL}/api/entries`, {
      data: { projectId: projects[0].id, title: "" },
    });
    expect(badTitle.status()).toBe(422);
    expect((await badTitle.json()).error.fieldErrors.title).toBeDefined();

    expect((await api.get(`${BASE_URL}/api/entries/not-an-id`)).status()).toBe(404);
    expect(
      (await api.get(`${BASE_URL}/api/entries/00000000-0000-4000-8000-000000000000`)).status(),
    ).toBe(404);

    const doc = {
      type: "doc",
      content: [{ type: "paragraph", content: [{ type: "text", text: "v1" }] }],
    };
    expect(
      (
        await api.put(`${BASE_URL}/api/entries/${id}/content`, {
          data: { baseRevision: 0, title: "API errors", content: doc },
        })
      ).status(),
    ).toBe(200);
    const stale = await api.put(`${BASE_URL}/api/entries/${id}/content`, {
      data: { baseRevision: 0, title: "API errors", content: doc },
    });
    expect(stale.status()).toBe(409);
    expect((await stale.json()).error.details.currentRevision).toBe(1);

    // Text PostgreSQL cannot store, or that is not Unicode, is refused at the boundary with
    // the field named, in a body, a query string and a form-like JSON title alike.
    const nulText = await api.put(`${BASE_URL}/api/entries/${id}/content`, {
      data: `{"baseRevision":1,"title":"API errors","content":{"type":"doc","content":[{"type":"paragraph","content":[{"type":"text","text":"KCl\\u0000"}]}]}}`,
      headers: { "content-type": "application/json" },
    });
    expect(nulText.status()).toBe(422);
    expect((await nulText.json()).error.message).toMatch(/NUL byte/);
    const loneSurrogate = await api.post(`${BASE_URL}/api/entries`, {
      data: `{"projectId":"${projects[0].id}","title":"Ag\\ud800"}`,
      headers: { "content-type": "application/json" },
    });
    expect(loneSurrogate.status()).toBe(422);
    expect((await loneSurrogate.json()).error.fieldErrors.title[0]).toMatch(/lone surrogate/);
    const nulQuery = await api.get(`${BASE_URL}/api/entries?q=a%00b`);
    expect(nulQuery.status()).toBe(422);

    await page.close();

    // Another lab's researcher, in a browser of their own.
    const theirs = await openBrowser();
    const theirPage = await theirs.context.newPage();
    await signIn(theirPage, ridgebackResearcher.email, DEMO_PASSWORD);
    await theirPage.getByTestId("current-user").waitFor();
    expect((await theirs.context.request.get(`${BASE_URL}/api/entries/${id}`)).status()).toBe(404);
    const write = await theirs.context.request.put(`${BASE_URL}/api/entries/${id}/content`, {
      data: { baseRevision: 1, title: "x", content: doc },
    });
    expect(write.status()).toBe(404);
    await theirs.close();
  });
});
