/**
 * One production build of the app for the benches and the crash-safety test, in `.next-test`
 * (the folder `npm test` builds into, so no other build is touched), rebuilt only when the
 * app's sources change: the committed tree of the paths below is stamped into the build.
 */
import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, lstatSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";

const ROOT = new URL("../..", import.meta.url).pathname;
export const PRODUCTION_DIST = ".next-test";
const DIST = PRODUCTION_DIST;
const STAMP = path.join(ROOT, DIST, "IONLEAF_BENCH_COMMIT");

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

/**
 * Builds the app unless this commit's build is already there (an uncommitted tree always
 * builds). `env` is the environment of the build (NODE_ENV=production, NEXT_DIST_DIR).
 */
export function ensureBuild(env: NodeJS.ProcessEnv): void {
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
    env: { ...env, NEXT_DIST_DIR: DIST },
    stdio: ["ignore", "ignore", "inherit"],
  });
  writeFileSync(STAMP, commit);
  console.log(`built in ${((performance.now() - started) / 1000).toFixed(0)} s`);
}
