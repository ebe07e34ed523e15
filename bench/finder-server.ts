/**
 * The production build of Ionleaf against the scratch benchmark database, for the finder
 * bench: built once per version of the app's sources into `.next-test` (the folder `npm test` builds into, so no
 * other build is touched), started with `next start`, and a member signed in through
 * Auth.js's own credentials endpoint, as a browser would.
 */
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, lstatSync, readFileSync, writeFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import path from "node:path";

const ROOT = new URL("..", import.meta.url).pathname;
const DIST = ".next-test";
const STAMP = path.join(ROOT, DIST, "IONLEAF_BENCH_COMMIT");

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
    APP_URL: `http://localhost:${port}`,
    AUTH_URL: `http://localhost:${port}`,
    UPLOAD_DIR: path.join(ROOT, ".data/bench/uploads"),
  };
}

/** What the build is made of: the committed tree of these paths, or "uncommitted". */
const BUILD_INPUTS = [
  "app",
  "lib",
  "db",
  "components",
  "editor",
  "proxy.ts",
  "next.config.mjs",
  "package-lock.json",
];

function currentCommit(): string {
  const tree = execFileSync("git", ["ls-tree", "HEAD", "--", ...BUILD_INPUTS], {
    cwd: ROOT,
    encoding: "utf8",
  });
  const dirty = execFileSync("git", ["status", "--porcelain", "--", ...BUILD_INPUTS], {
    cwd: ROOT,
    encoding: "utf8",
  }).trim();
  const id = createHash("sha256").update(tree).digest("hex");
  return dirty ? `${id}+uncommitted` : id;
}

/** Builds the app unless this commit's build is already there (an uncommitted tree always builds). */
export function ensureBuild(databaseUrl: string): void {
  const commit = currentCommit();
  if (
    !commit.endsWith("+uncommitted") &&
    existsSync(STAMP) &&
    readFileSync(STAMP, "utf8") === commit
  ) {
    console.log(`production build of ${commit.slice(0, 10)} found in ${DIST}`);
    return;
  }
  console.log(
    `building the app for ${commit.slice(0, 10)} (next build into ${DIST}; a few minutes)`,
  );
  const started = performance.now();
  // Turbopack refuses a node_modules that is a link to outside the project (a git worktree
  // sharing another checkout's packages); webpack builds the same app from it.
  const linked = lstatSync(path.join(ROOT, "node_modules")).isSymbolicLink();
  const args = [
    path.join(ROOT, "node_modules/next/dist/bin/next"),
    "build",
    ...(linked ? ["--webpack"] : []),
  ];
  execFileSync(process.execPath, args, {
    cwd: ROOT,
    env: appEnv(databaseUrl, 0),
    stdio: ["ignore", "ignore", "inherit"],
  });
  writeFileSync(STAMP, commit);
  console.log(`built in ${((performance.now() - started) / 1000).toFixed(0)} s`);
}

export interface RunningApp {
  url: string;
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
  const url = `http://localhost:${port}`;
  await waitFor(`${url}/api/health`, 90);
  return { url, stop: stopper(child) };
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
  // The proxy and the route both set a CSRF cookie; the browser keeps the last one.
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
