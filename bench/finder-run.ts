/**
 * The solution finder at a million solution rows, measured side by side in one run (run by
 * bench/finder.ts in its own process, with the scripts' tsconfig so that server modules load):
 *
 * - p50/p95 of the finder's route handlers (production build, signed in) and of the bare SQL
 *   of the same query, for range + species (+ date) with a common and a rare species, a
 *   full-text query and a similar-solutions query;
 * - requests per second under autocannon (4 clients) of a bare Node.js handler, the
 *   signed-in no-op route /api/ping and the finder route, in rounds, with the median ratio;
 * - the save of an entry with 50 solution blocks where one block changed, through its route.
 *
 * The scratch database (scripts/seed-synthetic-solutions.ts) is created and seeded on the
 * first run. Exits 1 when a target is missed.
 */
import { sql } from "drizzle-orm";
import { PgDialect } from "drizzle-orm/pg-core";
import { createDatabase } from "@/db/client";
import { findBlockPoint, findSimilarCandidates } from "@/db/queries/similar-solutions";
import {
  findSolutionPage,
  findSolutionRows,
  solutionPageSql,
  type FinderFilter,
} from "@/db/queries/solution-finder";
import { prefixTsquery } from "@/db/queries/solution-finder-text";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import {
  COMMON_SPECIES,
  ensureSyntheticDatabase,
  RARE_SPECIES,
  SYNTHETIC_LAB_SLUG,
  SYNTHETIC_MEMBER_EMAIL,
  SYNTHETIC_PASSWORD,
} from "@/scripts/seed-synthetic-solutions";
import { ensureBuild, signIn, startApp, startBareServer } from "./finder-server";
import os from "node:os";
import {
  getOk,
  ms,
  requestsPerSecond,
  timePairs,
  timeRuns,
  warmUp,
  type Percentiles,
} from "./finder-measure";

const APP_PORT = Number(process.env.IONLEAF_BENCH_APP_PORT ?? 3460);
const BARE_PORT = APP_PORT + 1;
const CAP = 1_000;
const PAGE = { limit: 50, offset: 0 };
/** Requests-per-second rounds (odd, for a median) and each measurement's length. */
const RPS_ROUNDS = 5;
const RPS_SECONDS = 4;

interface Check {
  label: string;
  value: string;
  target: string;
  pass: boolean;
}

async function main() {
  const scratch = await ensureSyntheticDatabase();
  ensureBuild(scratch.url);
  const { db, pool } = createDatabase(scratch.url, 4);
  const checks: Check[] = [];
  try {
    const ids = await db.execute<{ lab: string; project: string }>(sql`
      select l.id as lab, (select p.id from projects p where p.lab_id = l.id order by p.name limit 1) as project
        from labs l where l.slug = ${SYNTHETIC_LAB_SLUG}`);
    const { lab: labId, project: projectId } = ids.rows[0];

    const base: FinderFilter = {
      labId,
      scale: "molal",
      species: [],
      speciesMatch: "all",
      includeHistory: false,
    };
    const dated = {
      savedFrom: new Date("2025-01-01T00:00:00Z"),
      savedBefore: new Date("2027-01-01T00:00:00Z"),
    };
    // The statement the finder's service runs for a query: the page with its count (species
    // the catalogue knows need no query of their own).
    const finderSql = (f: FinderFilter) => async () => {
      await findSolutionPage(db, f, { column: "saved", direction: "desc" }, PAGE, CAP);
    };

    // A block that contains the rare species, as a target for "similar solutions".
    const target = await db.execute<{ entry_id: string; block_id: string }>(sql`
      select entry_id, block_id from block_results
       where lab_id = ${labId} and to_revision is null and species @> ${sql.param([RARE_SPECIES])}::text[]
       order by id limit 1`);
    const { entry_id: entryId, block_id: blockId } = target.rows[0];
    const similarSql = async () => {
      const point = await findBlockPoint(db, labId, entryId, blockId);
      const ions = Object.keys(point!.composition);
      const candidates = await findSimilarCandidates(
        db,
        labId,
        { entryId, blockId, ionicStrengthMolal: point!.ionicStrengthMolal!, ions },
        200,
      );
      await findSolutionRows(
        db,
        labId,
        candidates.slice(0, 10).map((c) => c.id),
      );
    };

    const range = { iMin: "0.09", iMax: "0.11", from: "2025-01-01", to: "2026-12-31" };
    const cases = [
      {
        label: `I 0.09–0.11 + ${COMMON_SPECIES} (1 in 8) + dates`,
        route: new URLSearchParams({ ...range, species: COMMON_SPECIES }),
        sql: finderSql({
          ...base,
          ...dated,
          ionicStrengthMin: 0.09,
          ionicStrengthMax: 0.11,
          species: [COMMON_SPECIES],
        }),
        target: true,
      },
      {
        label: `I 0.09–0.11 + ${RARE_SPECIES} (1 in 1000) + dates`,
        route: new URLSearchParams({ ...range, species: RARE_SPECIES }),
        sql: finderSql({
          ...base,
          ...dated,
          ionicStrengthMin: 0.09,
          ionicStrengthMax: 0.11,
          species: [RARE_SPECIES],
        }),
        target: true,
      },
      {
        label: "full text 'ferrocenemeth' (prefix)",
        route: new URLSearchParams({ q: "ferrocenemeth" }),
        sql: finderSql({ ...base, tsquery: prefixTsquery("ferrocenemeth")! }),
        target: false,
      },
      {
        label: "newest 50, no filter",
        route: new URLSearchParams(),
        sql: finderSql(base),
        target: false,
      },
      {
        label: "similar solutions of one block",
        route: null,
        sql: similarSql,
        target: false,
      },
    ];

    // The plans PostgreSQL chooses for the two range + species queries.
    const dialect = new PgDialect();
    for (const species of [COMMON_SPECIES, RARE_SPECIES]) {
      const statement = dialect.sqlToQuery(
        solutionPageSql(
          { ...base, ...dated, ionicStrengthMin: 0.09, ionicStrengthMax: 0.11, species: [species] },
          { column: "saved", direction: "desc" },
          PAGE,
          CAP,
        ),
      );
      const plan = await pool.query<{ "QUERY PLAN": string }>(
        `explain ${statement.sql}`,
        statement.params,
      );
      const scans = plan.rows
        .map((r) => r["QUERY PLAN"].trim())
        .filter((line) => /Scan|Index/.test(line) && !/CTE Scan/.test(line) && !/Cond/.test(line))
        .map((line) => line.replace(/^->\s*/, "").replace(/\s+\(cost.*$/, ""));
      console.log(`plan for ${species}: ${scans.join("; ")}`);
    }

    const app = await startApp(scratch.url, APP_PORT);
    const bare = await startBareServer(BARE_PORT);
    try {
      const cookie = await signIn(app.url, SYNTHETIC_MEMBER_EMAIL, SYNTHETIC_PASSWORD);
      const routeUrlOf = (c: (typeof cases)[number]) =>
        c.route === null
          ? `${app.url}/api/solutions/similar?${new URLSearchParams({ entry: entryId, block: blockId }).toString()}`
          : `${app.url}/api/solutions?${c.route.toString()}`;
      // Steady state first: a freshly started server runs its request path unoptimized until
      // V8 has compiled it, and the first few thousand requests are measured slower for it.
      // Measured on this machine, one request at a time: the no-op route p50/p95 3.5/7.6 ms
      // in its first 650 requests, 1.4/2.3 ms once warm. Each route, and the bench's own SQL
      // path, is run under load for a few seconds before anything is timed.
      const warm = await warmUp(
        [`${app.url}/api/ping`, ...cases.map(routeUrlOf)],
        cookie,
        cases.map((c) => c.sql),
      );
      console.log(`
warm-up: ${warm.requests} requests to the app, ${warm.statements} SQL runs`);
      const noop = await timeRuns(() => getOk(`${app.url}/api/ping`, cookie));
      console.log(
        `\nsigned-in no-op route /api/ping, one request at a time: p50 ${ms(noop.p50)}, p95 ${ms(noop.p95)}`,
      );
      console.log(
        `\n${"query".padEnd(44)} ${"SQL p50".padStart(9)} ${"SQL p95".padStart(9)} ${"route p50".padStart(10)} ${"route p95".padStart(10)}  route/SQL p95`,
      );
      for (const c of cases) {
        const routeUrl = routeUrlOf(c);
        const [bareSql, route] = await timePairs(c.sql, () => getOk(routeUrl, cookie));
        const ratio = route.p95 / bareSql.p95;
        console.log(
          `${c.label.padEnd(44)} ${ms(bareSql.p50).padStart(9)} ${ms(bareSql.p95).padStart(9)} ${ms(route.p50).padStart(10)} ${ms(route.p95).padStart(10)}  ${ratio.toFixed(1)}×`,
        );
        if (c.target) {
          checks.push({
            label: `${c.label}: SQL p50`,
            value: ms(bareSql.p50),
            target: "< 5 ms",
            pass: bareSql.p50 < 5,
          });
          checks.push({
            label: `${c.label}: route p95 / SQL p95`,
            value: `${ratio.toFixed(1)}×`,
            target: "≤ 3×",
            pass: ratio <= 3,
          });
        }
      }

      const finderUrl = `${app.url}/api/solutions?${cases[0].route!.toString()}`;
      // Rounds of bare, no-op and finder back to back, and the median round: a burst of load
      // from elsewhere on this shared machine lands in one round, not in one of the three
      // figures of a single run (single 8 s runs of the same build gave 0.30 and 0.52).
      const rounds: { bare: number; ping: number; finder: number }[] = [];
      for (let round = 0; round < RPS_ROUNDS; round++) {
        rounds.push({
          bare: await requestsPerSecond(bare.url, null, 4, RPS_SECONDS),
          ping: await requestsPerSecond(`${app.url}/api/ping`, cookie, 4, RPS_SECONDS),
          finder: await requestsPerSecond(finderUrl, cookie, 4, RPS_SECONDS),
        });
      }
      for (const [i, r] of rounds.entries()) {
        console.log(
          `${i === 0 ? "\n" : ""}requests per second at 4 clients, round ${i + 1}: bare Node.js ${r.bare.toFixed(0)}, signed-in no-op /api/ping ${r.ping.toFixed(0)} (${(r.ping / r.bare).toFixed(3)} of bare), finder ${r.finder.toFixed(0)} (${(r.finder / r.ping).toFixed(2)} of no-op)`,
        );
      }
      const ratios = rounds.map((r) => r.finder / r.ping).sort((a, b) => a - b);
      const median = ratios[Math.floor(ratios.length / 2)];
      console.log(`finder ÷ no-op, median of ${rounds.length} rounds: ${median.toFixed(2)}`);
      checks.push({
        label: `finder route req/s / no-op route req/s (median of ${rounds.length} rounds)`,
        value: median.toFixed(2),
        target: "≥ 0.5",
        pass: median >= 0.5,
      });

      const save = await measureSave(app.url, cookie, projectId);
      console.log(
        `\nsave of an entry with 50 solution blocks, one changed: p50 ${ms(save.p50)}, p95 ${ms(save.p95)} (${save.runs} saves)`,
      );
      checks.push({
        label: "save, 50 blocks, one changed: p95",
        value: ms(save.p95),
        target: "< 100 ms",
        pass: save.p95 < 100,
      });
    } finally {
      await bare.stop();
      await app.stop();
    }
  } finally {
    await pool.end();
  }

  console.log(
    `\nload average now ${os
      .loadavg()
      .map((l) => l.toFixed(2))
      .join(" ")} (${os.cpus().length} CPUs)`,
  );
  for (const c of checks)
    console.log(`${c.pass ? "ok  " : "OVER"} ${c.label}: ${c.value} (target ${c.target})`);
  console.log(
    `\nThe scratch cluster keeps running for the next run; stop it with:\n  runuser -u postgres -- pg_ctl -D ${scratch.dataDir} stop   (pg_ctl from /usr/lib/postgresql/*/bin)`,
  );
  process.exitCode = checks.every((c) => c.pass) ? 0 : 1;
}

/** Creates an entry of 50 solution blocks through the API, then saves it changing one block each time. */
async function measureSave(url: string, cookie: string, projectId: string): Promise<Percentiles> {
  const headers = { cookie, "content-type": "application/json" };
  const created = await fetch(`${url}/api/entries`, {
    method: "POST",
    headers,
    body: JSON.stringify({
      projectId,
      title: `[synthetic] Save bench ${new Date().toISOString()}`,
    }),
  });
  const { id } = (await created.json()) as { id: string };
  const amounts = Array.from({ length: 50 }, (_, i) => 1 + i);
  const blocks = amounts.map((_, i) =>
    defaultSolutionBlockInput({ blockId: `bench-save-${i}`, name: `Block ${i}` }),
  );
  let revision = 0;
  let counter = 0;
  const saveOnce = async () => {
    // Each save changes one block to an amount never used before: one result is computed.
    counter += 1;
    amounts[counter % 50] = 100 + counter;
    const content = {
      type: "doc",
      content: [
        { type: "paragraph", content: [{ type: "text", text: "Fifty solutions." }] },
        ...blocks.map((b, i) => ({
          type: "solutionBlock",
          attrs: {
            ...b,
            components: [{ formula: "KCl", amount: amounts[i] / 1000, unit: "mol/kg" }],
          },
        })),
      ],
    };
    const response = await fetch(`${url}/api/entries/${id}/content`, {
      method: "PUT",
      headers,
      body: JSON.stringify({ baseRevision: revision, title: "Save bench", content }),
    });
    const body = (await response.json()) as { revision: number };
    if (response.status !== 200) throw new Error(`save answered ${response.status}`);
    revision = body.revision;
  };
  await saveOnce(); // the first save writes all 50 blocks; not what is measured
  return timeRuns(saveOnce, 100, 10);
}

main().catch((error: unknown) => {
  console.error("finder bench failed:", error);
  process.exitCode = 1;
});
