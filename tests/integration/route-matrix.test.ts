// @vitest-environment node
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { entries, revisions, users } from "@/db/schema";
import type { Actor } from "@/lib/access/actor";
import { initialActionState } from "@/lib/contract/action-state";
import { uploadAttachments } from "@/lib/attachments/upload";
import { createEntry } from "@/lib/notebook/entries";
import { submitEntry } from "@/lib/notebook/review";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers } from "../support/db";

/**
 * Every route handler under app/api and every server action under app/, found on disk so a
 * new one is covered without editing this file, run as: nobody, each role of the lab that
 * owns the data, each role of another lab, and with a corpus of bad input. It asserts what
 * must hold for all of them: no 500, a typed JSON error with a message for every refusal,
 * no stack trace, nothing of the other lab in any answer, and no change to the owning lab's
 * data from anything refused. The counts are printed at the end.
 */

const session = vi.hoisted(() => ({
  current: null as null | { user: { id: string; sessionVersion: number } },
}));
vi.mock("@/lib/auth", () => ({
  signIn: () => Promise.resolve(undefined),
  signOut: () => Promise.resolve(undefined),
  handlers: {},
}));
vi.mock("@/lib/auth/session-claims", () => ({
  sessionClaims: () =>
    Promise.resolve(
      session.current
        ? { userId: session.current.user.id, sessionVersion: session.current.user.sessionVersion }
        : null,
    ),
}));
// Outside Next.js there is no cache to revalidate; the actions' calls become no-ops.
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

const ROOT = path.resolve(__dirname, "../..");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
type Method = (typeof METHODS)[number];
type Handler = (request: Request, context: { params: Promise<unknown> }) => Promise<Response>;
type Action = (previous: unknown, form: FormData) => Promise<unknown>;

function walk(dir: string, match: (name: string) => boolean, out: string[] = []): string[] {
  for (const item of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, item.name);
    if (item.isDirectory()) walk(full, match, out);
    else if (match(item.name)) out.push(full);
  }
  return out;
}

/** app/api/entries/[id]/content/route.ts → /api/entries/[id]/content */
const routePathOf = (file: string) =>
  "/" + path.relative(path.join(ROOT, "app"), path.dirname(file)).split(path.sep).join("/");

const ROUTE_FILES = walk(path.join(ROOT, "app/api"), (n) => n === "route.ts")
  .filter((f) => !f.includes("[...nextauth]")) // Auth.js's own endpoints
  .sort();
const ACTION_FILES = walk(path.join(ROOT, "app"), (n) => n === "actions.ts")
  .filter((f) => readFileSync(f, "utf8").includes('"use server"'))
  .sort();
const PUBLIC_ROUTES = new Set(["/api/health"]);

interface Principal {
  name: string;
  actor: Actor | null;
  lab: "home" | "other" | null;
}

interface Outcome {
  status: number;
  text: string;
}

const counts = { routeCalls: 0, actionCalls: 0, byStatus: new Map<number, number>() };

function expectTypedRefusal(label: string, outcome: Outcome) {
  counts.byStatus.set(outcome.status, (counts.byStatus.get(outcome.status) ?? 0) + 1);
  expect(outcome.status, `${label}: ${outcome.text.slice(0, 300)}`).toBeLessThan(500);
  expect(outcome.text, label).not.toMatch(/\bat .+\.(ts|js|tsx|mjs):\d+/);
  if (outcome.status >= 400) {
    const body = JSON.parse(outcome.text) as { error?: { code?: unknown; message?: unknown } };
    expect(typeof body.error?.code, label).toBe("string");
    expect(
      (typeof body.error?.message === "string" ? body.error.message : "").length,
      label,
    ).toBeGreaterThan(3);
  }
}

describe("every route handler and server action, by principal and with bad input", () => {
  const home = { tag: "", labName: "", entryId: "", entryTitle: "", attachmentId: "" };
  const other = { tag: "" };
  const principals: Principal[] = [{ name: "signed out", actor: null, lab: null }];
  let homeResearcher: Actor;
  const handlers = new Map<string, Partial<Record<Method, Handler>>>();
  const actions = new Map<string, Action>();

  beforeAll(async () => {
    const a = await createLabWithMembers(["admin", "supervisor", "researcher"]);
    const b = await createLabWithMembers(["admin", "supervisor", "researcher"]);
    home.tag = a.tag;
    home.labName = a.lab.name;
    other.tag = b.tag;
    homeResearcher = a.members.researcher;
    for (const role of ["researcher", "supervisor", "admin"]) {
      principals.push({ name: `home ${role}`, actor: a.members[role], lab: "home" });
      principals.push({ name: `other-lab ${role}`, actor: b.members[role], lab: "other" });
    }
    const project = await insertProject(getDb(), {
      labId: a.lab.id,
      name: `Matrix project ${a.tag}`,
      createdById: a.members.admin.userId,
    });
    home.entryTitle = `Matrix entry ${a.tag}`;
    home.entryId = (
      await createEntry(homeResearcher, { projectId: project.id, title: home.entryTitle })
    ).id;
    await saveEntryContent(homeResearcher, home.entryId, {
      baseRevision: 0,
      title: home.entryTitle,
      content: {
        type: "doc",
        content: [{ type: "paragraph", content: [{ type: "text", text: `secret ${a.tag}` }] }],
      },
    });
    const form = new FormData();
    form.append("file", new Blob([`E/V,I/A\n0.1,1e-6\n0.2,2e-6\n# ${a.tag}\n`]), "trace.csv");
    const [attachment] = await uploadAttachments(
      homeResearcher,
      home.entryId,
      new Request("http://localhost/api/upload", { method: "POST", body: form }),
    );
    home.attachmentId = attachment.id;
    await submitEntry(homeResearcher, home.entryId, {});

    for (const file of ROUTE_FILES)
      handlers.set(routePathOf(file), (await import(file)) as Partial<Record<Method, Handler>>);
    for (const file of ACTION_FILES) {
      const exported = (await import(file)) as Record<string, unknown>;
      for (const [name, value] of Object.entries(exported))
        if (typeof value === "function")
          actions.set(`${path.relative(ROOT, file)}#${name}`, value as Action);
    }
  }, 60_000);

  afterAll(() => {
    console.log(
      `[route matrix] ${handlers.size} route files, ${actions.size} server actions; ` +
        `${counts.routeCalls} route calls, ${counts.actionCalls} action calls; statuses ` +
        [...counts.byStatus.entries()]
          .sort(([x], [y]) => x - y)
          .map(([s, n]) => `${s}×${n}`)
          .join(" "),
    );
  });

  const paramsFor = (routePath: string, override?: string) => {
    const params: Record<string, string> = {};
    for (const [, name] of routePath.matchAll(/\[([^\]]+)\]/g)) {
      if (override !== undefined) params[name] = override;
      else if (name === "number") params[name] = "1";
      else
        params[name] = routePath.startsWith("/api/attachments") ? home.attachmentId : home.entryId;
    }
    return params;
  };

  async function callRoute(
    principal: Principal,
    method: Method,
    routePath: string,
    init: {
      params?: Record<string, string>;
      query?: string;
      body?: BodyInit;
      headers?: Record<string, string>;
    },
  ): Promise<Outcome> {
    const handler = handlers.get(routePath)![method]!;
    const params = init.params ?? paramsFor(routePath);
    const concrete = routePath.replace(/\[([^\]]+)\]/g, (_, n: string) => {
      try {
        return encodeURIComponent(params[n]);
      } catch {
        return params[n]; // a lone surrogate cannot be encoded; the raw value is the test
      }
    });
    session.current = principal.actor
      ? { user: { id: principal.actor.userId, sessionVersion: 1 } }
      : null;
    counts.routeCalls += 1;
    const response = await handler(
      new Request(`http://localhost:3000${concrete}${init.query ?? ""}`, {
        method,
        headers: init.headers,
        body: method === "GET" ? undefined : init.body,
      }),
      { params: Promise.resolve(params) },
    );
    return { status: response.status, text: await response.text() };
  }

  /** A body each mutating route would accept from the right member (cross-lab attempts use it). */
  const plausibleBody = (routePath: string): unknown =>
    ({
      "/api/entries/[id]/content": {
        baseRevision: 1,
        title: "overwritten",
        content: { type: "doc", content: [{ type: "paragraph" }] },
      },
      "/api/entries/[id]/countersign": {
        revisionNumber: 1,
        password: "test-password-9",
        meaning: "reviewed",
      },
      "/api/entries/[id]/return": { revisionNumber: 1, comment: "please redo" },
      "/api/entries/[id]/amend": { reason: "a reason" },
      "/api/entries/[id]": { archived: true },
      "/api/entries": { projectId: "00000000-0000-4000-8000-000000000000", title: "x" },
      "/api/projects": { name: "x" },
    })[routePath] ?? {};

  async function homeState() {
    const [entry] = await getDb().select().from(entries).where(eq(entries.id, home.entryId));
    const revs = await getDb().select().from(revisions).where(eq(revisions.entryId, home.entryId));
    const [member] = await getDb().select().from(users).where(eq(users.id, homeResearcher.userId));
    return {
      status: entry.status,
      archived: entry.archivedAt,
      title: entry.title,
      revisions: revs.length,
      active: member.active,
      role: member.role,
    };
  }

  it("finds the routes and actions on disk", () => {
    expect(ROUTE_FILES.length).toBeGreaterThanOrEqual(20);
    expect(ACTION_FILES.length).toBeGreaterThanOrEqual(5);
    expect(actions.size).toBeGreaterThanOrEqual(10);
  });

  it("answers nobody with 401 and another lab with a refusal that leaks nothing", async () => {
    const before = await homeState();
    for (const [routePath, module] of handlers) {
      for (const method of METHODS) {
        if (!module[method]) continue;
        for (const principal of principals.filter((p) => p.lab !== "home")) {
          const label = `${principal.name} ${method} ${routePath}`;
          const outcome = await callRoute(principal, method, routePath, {
            body: method === "GET" ? undefined : JSON.stringify(plausibleBody(routePath)),
            headers: { "content-type": "application/json" },
          });
          expectTypedRefusal(label, outcome);
          if (PUBLIC_ROUTES.has(routePath)) continue;
          if (!principal.actor) {
            expect(outcome.status, label).toBe(401);
            continue;
          }
          // Another lab: a route about the home lab's entry or file is refused outright; a
          // list answers with the caller's own lab only.
          if (routePath.includes("[")) expect(outcome.status, label).toBeGreaterThanOrEqual(400);
          for (const secret of [home.tag, home.entryTitle, home.labName])
            expect(outcome.text, label).not.toContain(secret);
        }
      }
    }
    expect(await homeState()).toEqual(before);
  }, 120_000);

  it("refuses bad input to every route with a typed 4xx, and writes nothing", async () => {
    const before = await homeState();
    const member = principals.find((p) => p.name === "home researcher")!;
    const deep = "[".repeat(20_000) + "]".repeat(20_000);
    const bodies: [string, BodyInit, Record<string, string>][] = [
      ["text/plain JSON", '{"title":"x"}', { "content-type": "text/plain" }],
      ["no content type", '{"title":"x"}', {}],
      ["an empty body", "", { "content-type": "application/json" }],
      ["broken JSON", "{not json", { "content-type": "application/json" }],
      ["JSON null", "null", { "content-type": "application/json" }],
      ["a JSON array", "[1,2,3]", { "content-type": "application/json" }],
      ["a number beyond double", '{"baseRevision":1e400}', { "content-type": "application/json" }],
      ["deep nesting", deep, { "content-type": "application/json" }],
      [
        "a NUL byte",
        '{"title":"a\\u0000b","name":"a\\u0000b"}',
        { "content-type": "application/json" },
      ],
      [
        "a lone surrogate",
        '{"title":"\\ud800","name":"\\udfff"}',
        { "content-type": "application/json" },
      ],
      [
        "5 MB",
        JSON.stringify({ title: "x".repeat(5 * 1024 * 1024) }),
        { "content-type": "application/json" },
      ],
      [
        "multipart without a file",
        "--x--\r\n",
        { "content-type": "multipart/form-data; boundary=x" },
      ],
      [
        "another origin",
        JSON.stringify({ title: "x" }),
        {
          "content-type": "application/json",
          origin: "http://localhost:9999",
          "sec-fetch-site": "same-site",
        },
      ],
    ];
    const params = [
      "not-a-uuid",
      "00000000-0000-4000-8000-000000000000",
      "9".repeat(30),
      "-1",
      "1.5",
      "%E0%A4%A",
      "a\u0000b",
      "\ud800",
      "../../etc/passwd",
      "",
    ];
    const queries = [
      "?q=%00",
      `?q=${"x".repeat(5000)}`,
      "?q=%ED%A0%80",
      "?savedFrom=99999-12-31&savedTo=0000-00-00",
      "?ionicStrengthMin=1e400&ionicStrengthMax=-1",
      "?limit=-1&offset=99999999999999999999",
      "?sort=;drop%20table%20entries&direction=sideways",
      "?species=" + "NaCl,".repeat(500),
      "?temperatureMin=abc&scale=furlong",
      "?id=1&id=2&id=3",
    ];
    for (const [routePath, module] of handlers) {
      for (const method of METHODS) {
        if (!module[method]) continue;
        if (method !== "GET")
          for (const [name, body, headers] of bodies)
            expectTypedRefusal(
              `${method} ${routePath} with ${name}`,
              await callRoute(member, method, routePath, { body, headers }),
            );
        if (routePath.includes("["))
          for (const value of params)
            expectTypedRefusal(
              `${method} ${routePath} with parameter ${JSON.stringify(value)}`,
              await callRoute(member, method, routePath, {
                params: paramsFor(routePath, value),
                body: method === "GET" ? undefined : JSON.stringify(plausibleBody(routePath)),
                headers: { "content-type": "application/json" },
              }),
            );
        if (method === "GET")
          for (const query of queries)
            expectTypedRefusal(
              `GET ${routePath}${query.slice(0, 60)}`,
              await callRoute(member, method, routePath, { query }),
            );
      }
    }
    expect(await homeState()).toEqual(before);
  }, 300_000);

  it("runs every server action for nobody, another lab and bad forms without a crash or a leak", async () => {
    const before = await homeState();
    const ids = {
      entryId: home.entryId,
      id: home.entryId,
      userId: homeResearcher.userId,
      invitationId: "00000000-0000-4000-8000-000000000000",
      revisionNumber: "1",
      password: "test-password-9",
      confirmPassword: "test-password-9",
      meaning: "reviewed",
      comment: "a comment",
      reason: "a reason",
      role: "admin",
      active: "false",
      title: "renamed",
      email: `someone.${home.tag}@lab.example`,
      name: "Someone",
      token: "t".repeat(43),
      projectId: "00000000-0000-4000-8000-000000000000",
    };
    const forms: [string, Record<string, string>][] = [
      ["the home lab's ids", ids],
      ["nothing", {}],
      ["NUL bytes", Object.fromEntries(Object.keys(ids).map((k) => [k, "a\u0000b"]))],
      ["lone surrogates", Object.fromEntries(Object.keys(ids).map((k) => [k, "\ud800"]))],
      ["non-UUID ids", { ...ids, entryId: "1 or 1=1", id: "x", userId: "-1", invitationId: "%" }],
      ["huge strings", Object.fromEntries(Object.keys(ids).map((k) => [k, "x".repeat(200_000)]))],
      [
        "revision beyond integers",
        { entryId: home.entryId, id: home.entryId, revisionNumber: "9".repeat(40) },
      ],
    ];
    for (const [name, action] of actions) {
      for (const principal of principals) {
        for (const [formName, values] of forms) {
          // The home lab's own members get only the bad forms: the well-formed ones would
          // legitimately change their data (deactivate, archive…), which other tests cover.
          if (principal.lab === "home" && formName === "the home lab's ids") continue;
          const form = new FormData();
          for (const [k, v] of Object.entries(values)) form.append(k, v);
          session.current = principal.actor
            ? { user: { id: principal.actor.userId, sessionVersion: 1 } }
            : null;
          counts.actionCalls += 1;
          const label = `${principal.name} ${name} with ${formName}`;
          const result = await action(initialActionState, form).catch((error: unknown) => {
            // redirect() is how an action ends on success or for a visitor; anything else is a crash.
            const raw = (error as { digest?: unknown }).digest;
            const digest = typeof raw === "string" ? raw : "";
            if (digest.startsWith("NEXT_REDIRECT")) return { redirected: digest };
            throw new Error(`${label} threw: ${String(error)}`);
          });
          const text = JSON.stringify(result);
          expect(text, label).not.toMatch(/\bat .+\.(ts|js|tsx|mjs):\d+/);
          if (principal.lab === "other")
            for (const secret of [home.entryTitle, home.labName, `secret ${home.tag}`])
              expect(text, label).not.toContain(secret);
          const state = result as {
            ok?: boolean;
            message?: string;
            fieldErrors?: Record<string, string[]>;
            redirected?: string;
          };
          // A refusal says why: a message, or an error beside each field the form shows.
          if (!state.redirected && state.ok === false)
            expect(
              (state.message ?? "").length + Object.keys(state.fieldErrors ?? {}).length,
              label,
            ).toBeGreaterThan(0);
        }
      }
    }
    // Whatever an action accepted from another lab (an invitation into their own lab, a
    // resend of their own outbox) left the home lab exactly as it was.
    expect(await homeState()).toEqual(before);
  }, 300_000);
});
