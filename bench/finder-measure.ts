/** Timing helpers for the finder bench: percentiles of sequential runs, and autocannon. */
// @ts-expect-error -- autocannon ships no type declarations; the little used here is typed below.
import autocannonUntyped from "autocannon";
import http from "node:http";

export interface Percentiles {
  p50: number;
  p95: number;
  runs: number;
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

/** Runs `once` `warmup` times unmeasured, then `runs` times one after another (ms). */
export async function timeRuns(
  once: () => Promise<unknown>,
  runs = 200,
  warmup = 20,
): Promise<Percentiles> {
  for (let i = 0; i < warmup; i++) await once();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const started = performance.now();
    await once();
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return { p50: percentile(times, 50), p95: percentile(times, 95), runs };
}

/**
 * Two things measured in alternation, `runs` times each after a warm-up: on a shared machine a
 * burst of load then slows both alike, so their ratio stays meaningful.
 */
export async function timePairs(
  first: () => Promise<unknown>,
  second: () => Promise<unknown>,
  runs = 300,
  warmup = 20,
): Promise<[Percentiles, Percentiles]> {
  for (let i = 0; i < warmup; i++) {
    await first();
    await second();
  }
  const a: number[] = [];
  const b: number[] = [];
  for (let i = 0; i < runs; i++) {
    let started = performance.now();
    await first();
    a.push(performance.now() - started);
    started = performance.now();
    await second();
    b.push(performance.now() - started);
  }
  const summary = (times: number[]): Percentiles => {
    times.sort((x, y) => x - y);
    return { p50: percentile(times, 50), p95: percentile(times, 95), runs };
  };
  return [summary(a), summary(b)];
}

/**
 * One kept-alive connection for the timed GETs. Node's fetch (undici) spent 1 to 3 ms of its
 * own per request here (a no-op route, measured side by side on this machine: p50 2.8 / p95
 * 6.8 ms through fetch, 1.8 / 5.2 ms through node:http), time that belongs to the client,
 * not to the route being measured. autocannon, which measures requests per second, has its
 * own lean client too.
 */
const keepAlive = new http.Agent({ keepAlive: true, maxSockets: 1 });

/** A GET that must answer 200 (a bench of error pages would measure nothing); reads the body. */
export function getOk(url: string, cookie: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const request = http.get(url, { agent: keepAlive, headers: { cookie } }, (response) => {
      response.on("data", () => {});
      response.on("error", reject);
      response.on("end", () =>
        response.statusCode === 200
          ? resolve()
          : reject(new Error(`${url} answered ${response.statusCode}`)),
      );
    });
    request.on("error", reject);
  });
}

interface AutocannonResult {
  requests: { average: number; total: number };
  non2xx: number;
  errors: number;
}
type Autocannon = (options: {
  url: string;
  connections: number;
  duration: number;
  headers?: Record<string, string>;
}) => Promise<AutocannonResult>;

const autocannon = autocannonUntyped as Autocannon;

/** Requests per second at `connections` concurrent clients for `seconds`, all answered 200. */
export async function requestsPerSecond(
  url: string,
  cookie: string | null,
  connections = 4,
  seconds = 8,
): Promise<number> {
  const result = await autocannon({
    url,
    connections,
    duration: seconds,
    headers: cookie ? { cookie } : undefined,
  });
  if (result.non2xx || result.errors) {
    throw new Error(`${url}: ${result.non2xx} answers other than 2xx, ${result.errors} errors`);
  }
  return result.requests.total / seconds;
}

/**
 * Brings a freshly started server and the bench's own SQL path to steady state before
 * anything is timed: each URL under autocannon for `seconds` (4 clients), then each SQL
 * function `statements` times. Returns how many requests and SQL runs that took.
 */
export async function warmUp(
  urls: string[],
  cookie: string,
  sqlRuns: (() => Promise<unknown>)[],
  seconds = 3,
  statements = 300,
): Promise<{ requests: number; statements: number }> {
  let requests = 0;
  for (const url of urls) {
    requests += Math.round((await requestsPerSecond(url, cookie, 4, seconds)) * seconds);
  }
  for (const run of sqlRuns) for (let i = 0; i < statements; i++) await run();
  return { requests, statements: sqlRuns.length * statements };
}

export const ms = (x: number) => `${x.toFixed(1)} ms`;
