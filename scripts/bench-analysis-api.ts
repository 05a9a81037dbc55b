/**
 * `npm run bench:analysis-api [-- --duration SECONDS]`: how many requests per second the analysis
 * API answers compared with a trivial JSON route of the same server under the same load.
 *
 * Builds the app when its sources changed, starts it on a free loopback port with a fresh
 * temporary database holding the demo data, signs in as the demo driver, warms the analysis of
 * the summer layout (41 sections, 9 jumps), then runs autocannon (10 connections, loopback only)
 * against GET /api/health and GET /api/layouts/:id/analysis in turn, for several rounds, each
 * request with the headers a browser sends (session cookie, Accept-Encoding: gzip). Prints each
 * round and the medians of both rates and of the round-by-round ratio (target: at least 0.5).
 * Alternating short rounds keeps other work on the machine from favouring one route.
 * Everything is removed afterwards.
 */
import fs from "node:fs";
import { createRequire } from "node:module";
import os from "node:os";
import path from "node:path";
import { createClient } from "@libsql/client";
import { closeDb, getDb, migrateDatabase } from "~/db/client.server";
import { DEMO_ACCOUNTS } from "~/db/demo-accounts";
import { seedDemoData } from "~/db/demo-data.server";
import { buildApp, freePort, startAppServer, type AppServer } from "./lib/app-server";

type Histogram = { average: number; p50: number; min: number; max: number };
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

const CONNECTIONS = 10;
const USAGE =
  "Usage: npm run bench:analysis-api [-- --duration SECONDS (1 to 60, default 5)] [--rounds N (1 to 20, default 5)] [--identity (no Accept-Encoding)]";

function parseOptions(argv: string[]): { duration: number; rounds: number; identity: boolean } {
  const options = { duration: 5, rounds: 5, identity: false };
  const limits = { duration: 60, rounds: 20 };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--identity") {
      options.identity = true;
      continue;
    }
    const name = argv[i].replace(/^--/, "");
    if (name !== "duration" && name !== "rounds") {
      console.error(`${argv[i]}: unknown option. ${USAGE}`);
      process.exit(2);
    }
    const value = Number(argv[++i]);
    if (!Number.isInteger(value) || value < 1 || value > limits[name]) {
      console.error(
        `--${name}: must be a whole number from 1 to ${limits[name]} (got "${argv[i] ?? ""}"). ${USAGE}`,
      );
      process.exit(2);
    }
    options[name] = value;
  }
  return options;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
};

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
  return cookie;
}

/** Requests per second over one autocannon run; throws when any answer was not 2xx. */
async function measure(url: string, duration: number, headers: Record<string, string>): Promise<number> {
  const r = await autocannon({ url, connections: CONNECTIONS, duration, headers });
  if (r.non2xx || r.errors || r.timeouts)
    throw new Error(`${url}: ${r.non2xx} answers other than 2xx, ${r.errors} errors, ${r.timeouts} timeouts`);
  return r.requests.average;
}

async function main() {
  const { duration, rounds, identity } = parseOptions(process.argv.slice(2));
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "loftline-bench-api-"));
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
    });
    const base = `http://127.0.0.1:${port}`;
    const db = createClient({ url: `file:${path.join(dataDir, "loftline.db")}` });
    const row = (await db.execute("select id from layouts where name = 'Summer layout'")).rows[0];
    db.close();
    const cookie = await signIn(base);
    const analysis = `${base}/api/layouts/${String(row.id)}/analysis?class=buggy-2wd-10&skill=club`;
    const health = `${base}/api/health`;

    const headers: Record<string, string> = identity
      ? { cookie }
      : { cookie, "accept-encoding": "gzip, deflate" };
    const cold = performance.now();
    const first = await fetch(analysis, { headers: { cookie } });
    const coldMs = performance.now() - cold;
    const size = (await first.arrayBuffer()).byteLength;
    const second = await fetch(analysis, { headers });
    const gzipped = Number(second.headers.get("content-length"));
    await second.arrayBuffer();
    if (first.status !== 200 || second.headers.get("x-analysis-cache") !== "hit")
      throw new Error(
        `the analysis did not warm up (status ${first.status}, then ${second.headers.get("x-analysis-cache")})`,
      );
    console.log(
      `summer layout analysis: first request ${coldMs.toFixed(0)} ms (cold); ${(size / 1024).toFixed(0)} KB of JSON, ${(gzipped / 1024).toFixed(0)} KB gzip-compressed`,
    );
    console.log(
      `autocannon: ${CONNECTIONS} connections, loopback, ${rounds} rounds of ${duration} s per route, alternating, ${identity ? "no compression asked for" : "Accept-Encoding: gzip, deflate"}`,
    );
    await measure(health, 1, headers); // warm-up, not counted
    const healthRates: number[] = [];
    const analysisRates: number[] = [];
    const ratios: number[] = [];
    for (let r = 1; r <= rounds; r++) {
      const h = await measure(health, duration, headers);
      const a = await measure(analysis, duration, headers);
      healthRates.push(h);
      analysisRates.push(a);
      ratios.push(a / h);
      console.log(
        `round ${r}: health ${h.toFixed(0)} req/s, analysis ${a.toFixed(0)} req/s, ratio ${(a / h).toFixed(2)}`,
      );
    }
    const ratio = median(ratios);
    console.log(`GET /api/health                median ${median(healthRates).toFixed(0)} req/s`);
    console.log(`GET /api/layouts/:id/analysis  median ${median(analysisRates).toFixed(0)} req/s (warm)`);
    console.log(
      `ratio analysis / health: median ${ratio.toFixed(2)} (target at least 0.50) ${ratio >= 0.5 ? "MET" : "NOT MET"}`,
    );
  } finally {
    await app?.stop();
    closeDb();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
