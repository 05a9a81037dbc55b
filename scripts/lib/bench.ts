/**
 * Used by the analysis API's and the reader pages' benchmarks (scripts/bench-analysis-api.ts,
 * scripts/bench-reader-pages.ts):
 * options, a built app on loopback with a fresh demo database, signing in as the demo driver, and
 * alternating autocannon rounds of several routes against a baseline route.
 */
import fs from "node:fs";
import { createRequire } from "node:module";
import os from "node:os";
import path from "node:path";
import { createClient } from "@libsql/client";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { seedDemoData } from "~/db/demo-data.server";
import { buildApp, freePort, startAppServer, type AppServer } from "./app-server";

type Histogram = { average: number; p50: number; min: number; max: number; total: number };
type AutocannonResult = {
  requests: Histogram;
  latency: Histogram;
  non2xx: number;
  errors: number;
  timeouts: number;
};
type Autocannon = (opts: {
  url: string;
  connections: number;
  duration: number;
  headers?: Record<string, string>;
}) => Promise<AutocannonResult>;
const autocannon = createRequire(import.meta.url)("autocannon") as Autocannon;

/** Connections autocannon keeps open. */
export const CONNECTIONS = 10;

export interface BenchOptions {
  /** Seconds per route and round. */
  duration: number;
  rounds: number;
  /** No Accept-Encoding (measure without compression). */
  identity: boolean;
}

/** Reads `--duration S`, `--rounds N` and `--identity`; exits 2 naming a wrong option. */
export function parseBenchOptions(argv: string[], usage: string): BenchOptions {
  const options = { duration: 5, rounds: 5, identity: false };
  const limits = { duration: 60, rounds: 20 };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--identity") {
      options.identity = true;
      continue;
    }
    const name = argv[i].replace(/^--/, "");
    if (name !== "duration" && name !== "rounds") {
      console.error(`${argv[i]}: unknown option. ${usage}`);
      process.exit(2);
    }
    const value = Number(argv[++i]);
    if (!Number.isInteger(value) || value < 1 || value > limits[name]) {
      console.error(
        `--${name}: must be a whole number from 1 to ${limits[name]} (got "${argv[i] ?? ""}"). ${usage}`,
      );
      process.exit(2);
    }
    options[name] = value;
  }
  return options;
}

export const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
};

/**
 * The demo driver's session cookie ("name=value") as a browser holds it after its first page: the
 * sign-in leaves a one-time notice in the cookie, which the next page shows and clears with a new
 * cookie. A load tool that kept the first cookie would see the notice (and a new cookie signed)
 * on every request.
 */
async function signIn(base: string): Promise<string> {
  const driver = DEMO_ACCOUNTS.find((a) => a.role === "driver")!;
  const response = await fetch(`${base}/sign-in`, {
    method: "POST",
    redirect: "manual",
    headers: { "Content-Type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ email: driver.email, password: driver.password }).toString(),
  });
  const cookie = response.headers.get("set-cookie")?.split(";")[0];
  if (!cookie || response.status >= 400)
    throw new Error(`signing in as ${driver.email} failed (status ${response.status})`);
  const next = await fetch(new URL(response.headers.get("location") ?? "/", base), { headers: { cookie } });
  await next.arrayBuffer();
  return next.headers.get("set-cookie")?.split(";")[0] ?? cookie;
}

export interface BenchServer {
  base: string;
  /** The server's process id (for its CPU time). */
  pid: number;
  /** The signed-in demo driver's cookie. */
  cookie: string;
  /** Id of the demo summer layout. */
  summerId: string;
}

/**
 * Builds the app when stale, starts it on a free loopback port with a fresh temporary database
 * holding the demo data, signs in as the demo driver and runs `work`; removes everything after.
 * `LOFTLINE_BENCH_NODE_ARGS` (space-separated) go to the server's Node, e.g.
 * `--cpu-prof --cpu-prof-dir=/tmp/prof` for a CPU profile written when it stops.
 */
export async function withBenchServer(work: (server: BenchServer) => Promise<void>): Promise<void> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-bench-"));
  process.env.DATA_DIR = dataDir;
  delete process.env.DATABASE_URL;
  let app: AppServer | undefined;
  try {
    await migrateDatabase();
    await seedDemoData(await getDb());
    closeDb();
    const built = buildApp({ quiet: true });
    if (built !== null) console.log(`built the app in ${built.toFixed(1)} s`);
    const port = await freePort();
    const nodeArgs = process.env.LOFTLINE_BENCH_NODE_ARGS?.split(/\s+/).filter(Boolean);
    app = await startAppServer({
      port,
      output: "ignore",
      env: {
        NODE_ENV: "production",
        HOST: "127.0.0.1",
        LOFTLINE_DEMO: "1",
        LOFTLINE_INSECURE_COOKIE: "1",
        DATA_DIR: dataDir,
        DATABASE_URL: `file:${path.join(dataDir, "loftline.db")}`,
        SESSION_SECRET: "bench-session-secret",
        APP_URL: `http://127.0.0.1:${port}`,
        // One account asks thousands of times here: the per-account rate would answer 429.
        LOFTLINE_ANALYSIS_RATE: "1000000",
      },
      nodeArgs,
    });
    const base = `http://127.0.0.1:${port}`;
    const db = createClient({ url: `file:${path.join(dataDir, "loftline.db")}` });
    const row = (await db.execute("select id from layouts where name = 'Summer layout'")).rows[0];
    db.close();
    await work({ base, pid: app.child.pid!, cookie: await signIn(base), summerId: String(row.id) });
  } finally {
    await app?.stop();
    closeDb();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

/** The headers a browser sends (with the session cookie), or without Accept-Encoding. */
export function browserHeaders(cookie: string, identity: boolean): Record<string, string> {
  return identity ? { cookie } : { cookie, "accept-encoding": "gzip, deflate" };
}

/** CPU time (user + system) a process has used so far, ms; NaN where /proc is not there. */
export function cpuMs(pid: number): number {
  try {
    const fields = fs.readFileSync(`/proc/${pid}/stat`, "utf8").split(") ")[1].split(" ");
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / 100; // clock ticks, 100 a second on Linux
  } catch {
    return NaN;
  }
}

/**
 * Requests per second over one autocannon run, and the server's CPU time per request (ms; steadier
 * than the rate on a shared machine); throws when any answer was not 2xx.
 */
export async function measure(
  url: string,
  duration: number,
  headers: Record<string, string>,
  pid?: number,
): Promise<{ rate: number; cpuPerRequest: number }> {
  const before = pid === undefined ? NaN : cpuMs(pid);
  const r = await autocannon({ url, connections: CONNECTIONS, duration, headers });
  if (r.non2xx || r.errors || r.timeouts)
    throw new Error(`${url}: ${r.non2xx} answers other than 2xx, ${r.errors} errors, ${r.timeouts} timeouts`);
  const cpu = pid === undefined ? NaN : cpuMs(pid) - before;
  return { rate: r.requests.average, cpuPerRequest: cpu / r.requests.total };
}

export interface Route {
  /** Short name printed in each round. */
  name: string;
  url: string;
}

/**
 * Alternates short autocannon runs of the baseline and each route, `rounds` times, printing each
 * round; returns per route the median rate, the median of its round-by-round ratio to the
 * baseline (alternating keeps other work on the shared machine from favouring one route) and the
 * median server CPU time per request.
 */
export async function alternatingRounds(
  baseline: Route,
  routes: Route[],
  opts: BenchOptions & { headers: Record<string, string>; pid?: number },
): Promise<{
  baseline: { rate: number; cpuPerRequest: number };
  routes: { name: string; rate: number; ratio: number; cpuPerRequest: number }[];
}> {
  await measure(baseline.url, 1, opts.headers); // warm-up, not counted
  for (const r of routes) await measure(r.url, 1, opts.headers);
  const base: { rate: number; cpuPerRequest: number }[] = [];
  const runs = routes.map(() => [] as { rate: number; cpuPerRequest: number; ratio: number }[]);
  for (let round = 1; round <= opts.rounds; round++) {
    const h = await measure(baseline.url, opts.duration, opts.headers, opts.pid);
    base.push(h);
    const parts = [`${baseline.name} ${h.rate.toFixed(0)} req/s`];
    for (const [i, r] of routes.entries()) {
      const m = await measure(r.url, opts.duration, opts.headers, opts.pid);
      runs[i].push({ ...m, ratio: m.rate / h.rate });
      parts.push(`${r.name} ${m.rate.toFixed(0)} req/s (${(m.rate / h.rate).toFixed(2)})`);
    }
    console.log(`round ${round}: ${parts.join(", ")}`);
  }
  return {
    baseline: {
      rate: median(base.map((b) => b.rate)),
      cpuPerRequest: median(base.map((b) => b.cpuPerRequest)),
    },
    routes: routes.map((r, i) => ({
      name: r.name,
      rate: median(runs[i].map((x) => x.rate)),
      ratio: median(runs[i].map((x) => x.ratio)),
      cpuPerRequest: median(runs[i].map((x) => x.cpuPerRequest)),
    })),
  };
}
