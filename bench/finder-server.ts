/**
 * The production build of Ionleaf against the scratch benchmark database, for the finder
 * and load benches: built once per version of the app's sources into `.next-test`
 * (scripts/support/production-build.ts), started with `next start`, and a member signed in through
 * Auth.js's own credentials endpoint, as a browser would.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { createServer, type Server } from "node:http";
import path from "node:path";
import {
  ensureBuild as ensureProductionBuild,
  PRODUCTION_DIST,
} from "@/scripts/support/production-build";

const ROOT = new URL("..", import.meta.url).pathname;
const DIST = PRODUCTION_DIST;

const BENCH_AUTH_SECRET = "bench-secret-not-for-production-0123456789abcdef";

function appEnv(databaseUrl: string, port: number): NodeJS.ProcessEnv {
  return {
    ...process.env,
    NODE_ENV: "production",
    NEXT_DIST_DIR: DIST,
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: databaseUrl,
    AUTH_SECRET: BENCH_AUTH_SECRET,
    AUTH_TRUST_HOST: "true",
    APP_URL: `http://127.0.0.1:${port}`,
    AUTH_URL: `http://127.0.0.1:${port}`,
    UPLOAD_DIR: path.join(ROOT, ".data/bench/uploads"),
  };
}

/** Builds the app unless this commit's build is already there (an uncommitted tree always builds). */
export function ensureBuild(databaseUrl: string): void {
  ensureProductionBuild(appEnv(databaseUrl, 0));
}

export interface RunningApp {
  url: string;
  /** The `next start` process (its server may run in children of it). */
  pid: number;
  stop: () => Promise<void>;
}

async function waitFor(url: string, seconds: number): Promise<void> {
  const deadline = Date.now() + seconds * 1000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${url} did not answer within ${seconds} s`);
}

function stopper(child: ChildProcess): () => Promise<void> {
  return () =>
    new Promise((resolve) => {
      if (child.exitCode !== null) return resolve();
      child.once("exit", () => resolve());
      child.kill("SIGTERM");
    });
}

/** `next start` on the port; `nodeArgs` (e.g. --cpu-prof) go to Node. */
export async function startApp(
  databaseUrl: string,
  port: number,
  nodeArgs: string[] = [],
): Promise<RunningApp> {
  const child = spawn(
    process.execPath,
    [...nodeArgs, path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-p", String(port)],
    { cwd: ROOT, env: appEnv(databaseUrl, port), stdio: ["ignore", "ignore", "inherit"] },
  );
  // The address, not "localhost": a client resolving that name on every request measured it.
  const url = `http://127.0.0.1:${port}`;
  await waitFor(`${url}/api/health`, 90);
  return { url, pid: child.pid!, stop: stopper(child) };
}

/** A bare Node.js HTTP handler answering what the no-op route answers: the floor. */
export async function startBareServer(
  port: number,
): Promise<{ url: string; stop: () => Promise<void> }> {
  const server: Server = createServer((_req, res) => {
    res.setHeader("content-type", "application/json");
    res.end('{"ok":true}');
  });
  await new Promise<void>((resolve) => server.listen(port, "127.0.0.1", resolve));
  return {
    url: `http://127.0.0.1:${port}`,
    stop: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

/** Signs in with e-mail and password through Auth.js; returns the Cookie header to send. */
export async function signIn(url: string, email: string, password: string): Promise<string> {
  const csrf = await fetch(`${url}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  // Keep the last CSRF cookie of each name, as a browser would.
  const jar = new Map(
    csrf.headers.getSetCookie().map((c) => {
      const pair = c.split(";")[0];
      return [pair.slice(0, pair.indexOf("=")), pair] as const;
    }),
  );
  const response = await fetch(`${url}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: {
      "content-type": "application/x-www-form-urlencoded",
      cookie: [...jar.values()].join("; "),
    },
    body: new URLSearchParams({ csrfToken, email, password, callbackUrl: url }),
  });
  const session = response.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .find((c) => c.startsWith("authjs.session-token="));
  if (!session) throw new Error(`sign-in as ${email} failed (${response.status})`);
  return session;
}
