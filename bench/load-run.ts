/**
 * Load: 50 signed-in members saving entries and searching at once, against the production
 * build on loopback (run by bench/load.ts in its own process, with the scripts' tsconfig).
 *
 * Every member signs in once through Auth.js's credentials endpoint and owns one entry; ten of
 * them have it open in a second tab as well (60 clients in all), so two clients save the same
 * entry and a stale base revision answers 409 now and then: that is the expected answer, the
 * tab takes the newer revision as its base and goes on, and it is counted apart from errors.
 * Each client alternates a save (PUT /api/entries/:id/content with the base it last got: a
 * paragraph and a solution block whose amount changes every time) and a search
 * (/api/solutions), through autocannon, one autocannon instance per client so each keeps its
 * own base revision.
 *
 * Figures are printed against a baseline measured in the same run with the same 60 clients:
 * the signed-in no-op route /api/ping. Afterwards the database is checked: every entry's
 * revisions are 1..n without a gap, the entry points at n, and every revision answered 200
 * exists once with the hash it was answered with. Exits 1 on any error, timeout or lost
 * revision. `--duration S` (default 60) sets the length of the mixed run.
 */
// @ts-expect-error -- autocannon ships no type declarations; the little used here is typed below.
import autocannonUntyped from "autocannon";
import os from "node:os";
import { createDatabase } from "@/db/client";
import { insertLab } from "@/db/queries/labs";
import { insertProject } from "@/db/queries/projects";
import { insertUser } from "@/db/queries/users";
import { hashPassword } from "@/lib/auth/password";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { runMigrations } from "@/scripts/migrate";
import { ensureScratchDatabase } from "@/scripts/support/scratch-database";
import { ensureBuild, signIn, startApp } from "./finder-server";

const MEMBERS = 50;
const SECOND_TABS = 10;
const APP_PORT = Number(process.env.IONLEAF_LOAD_APP_PORT ?? 3470);
const PASSWORD = "load-bench-password-5";
/** A request without an answer after this long counts as a timeout (autocannon's default). */
const TIMEOUT_S = 10;

interface RequestSpec {
  method: "GET" | "PUT";
  path: string;
  setupRequest?: (req: RequestSpec) => RequestSpec;
  onResponse?: (status: number, body: string) => void;
  headers?: Record<string, string>;
  body?: string;
}
interface AutocannonResult {
  requests: { total: number };
  errors: number;
  timeouts: number;
  non2xx: number;
}
type Autocannon = (options: {
  url: string;
  connections: number;
  duration: number;
  timeout: number;
  headers: Record<string, string>;
  requests: RequestSpec[];
}) => Promise<AutocannonResult>;
const autocannon = autocannonUntyped as Autocannon;

/** One kind of request: its latencies (ms) and answers by status. */
class Tally {
  readonly latencies: number[] = [];
  readonly statuses = new Map<number, number>();
  add(status: number, ms: number) {
    this.latencies.push(ms);
    this.statuses.set(status, (this.statuses.get(status) ?? 0) + 1);
  }
  count(status: number) {
    return this.statuses.get(status) ?? 0;
  }
  get total() {
    return this.latencies.length;
  }
  percentile(p: number) {
    const sorted = [...this.latencies].sort((a, b) => a - b);
    return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] ?? NaN;
  }
  describe() {
    return [...this.statuses].map(([s, n]) => `${s}: ${n}`).join(", ");
  }
}

interface Client {
  cookie: string;
  entryId: string;
}

function parseDuration(): number {
  const i = process.argv.indexOf("--duration");
  const value = i >= 0 ? Number(process.argv[i + 1]) : 60;
  if (!Number.isFinite(value) || value < 5) throw new Error("--duration needs seconds (≥ 5)");
  return value;
}

async function main() {
  const duration = parseDuration();
  console.log(
    `load average at the start ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")}`,
  );
  const scratch = ensureScratchDatabase("ionleaf_load");
  await runMigrations(scratch.url);
  ensureBuild(scratch.url);
  const { db, pool } = createDatabase(scratch.url, 4);
  const tag = Date.now().toString(36);
  const lab = await insertLab(db, { name: `Load lab ${tag}`, slug: `load-${tag}` });
  const hash = await hashPassword(PASSWORD);
  const members: { id: string; email: string; name: string }[] = [];
  for (let i = 0; i < MEMBERS; i++)
    members.push(
      await insertUser(db, {
        labId: lab.id,
        email: `member${i}.${tag}@load.example`,
        name: `Load member ${i}`,
        role: "researcher",
        passwordHash: hash,
      }),
    );
  const project = await insertProject(db, {
    labId: lab.id,
    name: "Load",
    createdById: members[0].id,
  });

  const app = await startApp(scratch.url, APP_PORT);
  let failed = false;
  try {
    // Sign in once each, and each member creates an entry through the API.
    const clients: Client[] = [];
    const signInStarted = performance.now();
    const openSession = async (member: (typeof members)[number]): Promise<Client> => {
      const cookie = await signIn(app.url, member.email, PASSWORD);
      const created = await fetch(`${app.url}/api/entries`, {
        method: "POST",
        headers: { cookie, "content-type": "application/json" },
        body: JSON.stringify({ projectId: project.id, title: `Load ${member.name}` }),
      });
      if (created.status !== 201) throw new Error(`creating an entry answered ${created.status}`);
      const { id } = (await created.json()) as { id: string };
      return { cookie, entryId: id };
    };
    // Five at a time: each sign-in verifies an argon2id hash.
    for (let i = 0; i < members.length; i += 5)
      clients.push(...(await Promise.all(members.slice(i, i + 5).map(openSession))));
    for (let i = 0; i < SECOND_TABS; i++) clients.push({ ...clients[i] });
    console.log(
      `${MEMBERS} members signed in and created their entries in ${((performance.now() - signInStarted) / 1000).toFixed(1)} s; ${clients.length} clients (${SECOND_TABS} members with a second tab)`,
    );

    const timed = (tally: Tally, spec: RequestSpec): RequestSpec => {
      let sentAt = performance.now();
      const setup = spec.setupRequest ?? ((r: RequestSpec) => r);
      return {
        ...spec,
        setupRequest: (req) => {
          sentAt = performance.now();
          return setup(req);
        },
        onResponse: (status, body) => {
          tally.add(status, performance.now() - sentAt);
          spec.onResponse?.(status, body);
        },
      };
    };

    // Baseline: the signed-in no-op route, same clients, one third of the duration (≥ 10 s).
    const baselineSeconds = Math.max(10, Math.round(duration / 3));
    const ping = new Tally();
    const baseline = await Promise.all(
      clients.map((c) =>
        autocannon({
          url: app.url,
          connections: 1,
          duration: baselineSeconds,
          timeout: TIMEOUT_S,
          headers: { cookie: c.cookie },
          requests: [timed(ping, { method: "GET", path: "/api/ping" })],
        }),
      ),
    );

    // The mixed run.
    const saves = new Tally();
    const searches = new Tally();
    const answered: { entryId: string; revision: number; contentHash: string }[] = [];
    let counter = 0;
    const mixed = await Promise.all(
      clients.map((c, index) => {
        let base = 0;
        const save: RequestSpec = {
          method: "PUT",
          path: `/api/entries/${c.entryId}/content`,
          headers: { cookie: c.cookie, "content-type": "application/json" },
          setupRequest: (req) => {
            counter += 1;
            const content = {
              type: "doc",
              content: [
                {
                  type: "paragraph",
                  content: [{ type: "text", text: `Save ${counter} from client ${index}.` }],
                },
                {
                  type: "solutionBlock",
                  attrs: {
                    ...defaultSolutionBlockInput({ blockId: "load-block", name: "Electrolyte" }),
                    components: [
                      { formula: "KCl", amount: 0.001 * (1 + (counter % 997)), unit: "mol/kg" },
                    ],
                  },
                },
              ],
            };
            return {
              ...req,
              body: JSON.stringify({ baseRevision: base, title: `Load ${index}`, content }),
            };
          },
          onResponse: (status, body) => {
            if (status === 200) {
              const r = JSON.parse(body) as { revision: number; contentHash: string };
              base = r.revision;
              answered.push({ entryId: c.entryId, ...r });
            } else if (status === 409) {
              // The other tab saved first: take its revision as the base, as "keep mine" does.
              const r = JSON.parse(body) as { error: { details: { currentRevision: number } } };
              base = r.error.details.currentRevision;
            }
          },
        };
        const search: RequestSpec = {
          method: "GET",
          path: "/api/solutions?iMin=0.001&iMax=0.5&species=KCl",
          headers: { cookie: c.cookie },
        };
        return autocannon({
          url: app.url,
          connections: 1,
          duration,
          timeout: TIMEOUT_S,
          headers: { cookie: c.cookie },
          requests: [timed(saves, save), timed(searches, search)],
        });
      }),
    );

    // The database afterwards.
    const rows = await pool.query<{
      entry_id: string;
      numbers: number[];
      hashes: string[];
      current: number;
    }>(
      `select e.id as entry_id, e.current_revision_number as current,
              coalesce(array_agg(r.number order by r.number) filter (where r.number is not null), '{}') as numbers,
              coalesce(array_agg(r.content_hash order by r.number) filter (where r.number is not null), '{}') as hashes
         from entries e left join revisions r on r.entry_id = e.id
        where e.lab_id = $1 group by e.id`,
      [lab.id],
    );
    let gaps = 0;
    let stored = 0;
    const byEntry = new Map<string, Map<number, string>>();
    for (const row of rows.rows) {
      stored += row.numbers.length;
      const ok = row.numbers.every((n, i) => n === i + 1) && row.current === row.numbers.length;
      if (!ok) gaps++;
      byEntry.set(row.entry_id, new Map(row.numbers.map((n, i) => [n, row.hashes[i]])));
    }
    const seen = new Set<string>();
    let lost = 0;
    let duplicated = 0;
    for (const a of answered) {
      const key = `${a.entryId}:${a.revision}`;
      if (seen.has(key)) duplicated++;
      seen.add(key);
      if (byEntry.get(a.entryId)?.get(a.revision) !== a.contentHash) lost++;
    }

    const sum = (rs: AutocannonResult[], f: (r: AutocannonResult) => number) =>
      rs.reduce((s, r) => s + f(r), 0);
    const unexpected =
      saves.total -
      saves.count(200) -
      saves.count(409) +
      (searches.total - searches.count(200)) +
      (ping.total - ping.count(200));
    // autocannon counts a timeout as an error too; the two are reported apart.
    const timeouts = sum(mixed, (r) => r.timeouts) + sum(baseline, (r) => r.timeouts);
    const errors = sum(mixed, (r) => r.errors) + sum(baseline, (r) => r.errors) - timeouts;
    const pingRps = ping.total / baselineSeconds;
    const mixedRps = (saves.total + searches.total) / duration;
    const ms = (x: number) => `${x.toFixed(0)} ms`;
    console.log(
      `\nbaseline /api/ping, ${clients.length} clients, ${baselineSeconds} s: ${ping.total} requests, ${pingRps.toFixed(1)}/s, p50 ${ms(ping.percentile(50))}, p95 ${ms(ping.percentile(95))}`,
    );
    console.log(
      `mixed run, ${clients.length} clients, ${duration} s: ${saves.total + searches.total} requests, ${mixedRps.toFixed(1)}/s (${(mixedRps / pingRps).toFixed(2)} of the baseline's rate)`,
    );
    console.log(
      `  saves: ${saves.total} (${saves.describe()}), ${(saves.total / duration).toFixed(1)}/s, p50 ${ms(saves.percentile(50))}, p95 ${ms(saves.percentile(95))} (${(saves.percentile(95) / ping.percentile(95)).toFixed(1)}× the baseline's p95)`,
    );
    console.log(
      `  searches: ${searches.total} (${searches.describe()}), p50 ${ms(searches.percentile(50))}, p95 ${ms(searches.percentile(95))} (${(searches.percentile(95) / ping.percentile(95)).toFixed(1)}× the baseline's p95)`,
    );
    console.log(
      `  expected 409s (stale base from the other tab): ${saves.count(409)}; unexpected answers: ${unexpected}; connection errors: ${errors}; timeouts (no answer within ${TIMEOUT_S} s): ${timeouts}`,
    );
    console.log(
      `  database: ${stored} revisions in ${rows.rows.length} entries, ${answered.length} answered 200 ` +
        `(${stored - answered.length} committed without an answer recorded: in flight when the run ended, or timed out); entries with a gap: ${gaps}; answered but lost: ${lost}; answered twice: ${duplicated}`,
    );
    console.log(
      `load average now ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(" ")}`,
    );
    failed =
      unexpected > 0 ||
      errors > 0 ||
      timeouts > 0 ||
      gaps > 0 ||
      lost > 0 ||
      duplicated > 0 ||
      saves.count(200) === 0;
    console.log(
      failed ? "FAILED: see the figures above" : "ok: no errors, no lost or duplicated revision",
    );
  } finally {
    await app.stop();
    await pool.end();
  }
  process.exitCode = failed ? 1 : 0;
}

main().catch((error: unknown) => {
  console.error("load bench failed:", error);
  process.exitCode = 1;
});
