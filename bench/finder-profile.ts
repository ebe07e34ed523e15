/**
 * Where a signed-in API request spends its time: the production build on the scratch
 * benchmark database, started under `node --cpu-prof`, driven by autocannon on the signed-in
 * no-op route /api/ping (and, with an argument, any other path), then the CPU profile summed
 * by package and by function. Not part of `npm run bench`; run it by hand:
 *
 *   npx tsx --tsconfig tsconfig.scripts.json bench/finder-profile.ts [/api/solutions?iMin=0.09]
 *
 * The profile stays in .data/bench/profiles/ for Chrome DevTools.
 */
import { mkdirSync, readdirSync, readFileSync, rmSync } from "node:fs";
import path from "node:path";
import {
  ensureSyntheticDatabase,
  SYNTHETIC_MEMBER_EMAIL,
  SYNTHETIC_PASSWORD,
} from "@/scripts/seed-synthetic-solutions";
import { requestsPerSecond } from "./finder-measure";
import { ensureBuild, signIn, startApp } from "./finder-server";

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
}

/** "next", "jose", "@auth/core", "pg", "(app)" for our own chunks, "(node)" for Node's. */
function packageOf(url: string): string {
  const modules = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (modules) return modules[1];
  if (url.includes("/.next-test/")) return "(app bundle)";
  if (url.startsWith("node:") || url === "") return "(node and native)";
  return url;
}

function summarise(file: string): void {
  const profile = JSON.parse(readFileSync(file, "utf8")) as Profile;
  const byId = new Map(profile.nodes.map((n) => [n.id, n]));
  const self = new Map<number, number>();
  profile.samples.forEach((id, i) =>
    self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)),
  );
  const total = [...self.values()].reduce((a, b) => a + b, 0);
  const byPackage = new Map<string, number>();
  const byFunction = new Map<string, number>();
  for (const [id, time] of self) {
    const frame = byId.get(id)!.callFrame;
    const pkg = packageOf(frame.url);
    byPackage.set(pkg, (byPackage.get(pkg) ?? 0) + time);
    const fn = `${frame.functionName || "(anonymous)"} [${pkg}]`;
    byFunction.set(fn, (byFunction.get(fn) ?? 0) + time);
  }
  const top = (map: Map<string, number>, n: number) =>
    [...map]
      .sort((a, b) => b[1] - a[1])
      .slice(0, n)
      .map(([k, t]) => `  ${((100 * t) / total).toFixed(1).padStart(5)} %  ${k}`)
      .join("\n");
  console.log(`\n${file}: ${(total / 1e6).toFixed(1)} s sampled`);
  console.log(`self time by package:\n${top(byPackage, 15)}`);
  console.log(`self time by function:\n${top(byFunction, 25)}`);
}

async function main() {
  const target = process.argv[2] ?? "/api/ping";
  const scratch = await ensureSyntheticDatabase();
  ensureBuild(scratch.url);
  const dir = path.resolve(".data/bench/profiles");
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  const app = await startApp(scratch.url, 3470, ["--cpu-prof", `--cpu-prof-dir=${dir}`]);
  try {
    const cookie = await signIn(app.url, SYNTHETIC_MEMBER_EMAIL, SYNTHETIC_PASSWORD);
    const rps = await requestsPerSecond(`${app.url}${target}`, cookie, 4, 10);
    console.log(`${target}: ${rps.toFixed(0)} requests per second at 4 clients while profiled`);
  } finally {
    await app.stop();
  }
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".cpuprofile"))) {
    summarise(path.join(dir, file));
  }
}

main().catch((error: unknown) => {
  console.error("profile failed:", error);
  process.exitCode = 1;
});
