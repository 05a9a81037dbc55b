/**
 * `npm run bench:load [-- --duration SECONDS]`: the server under 50 connections (autocannon,
 * loopback) on what members use most: the layout page, the analysis API (a saved layout's
 * analysis, and a draft's as the editor posts it) and saving from the editor. Prints for each the
 * requests a second, latency p50 and p99, errors (failed connections, timeouts and answers other
 * than 2xx) and the server process's memory (resident set, its peak during the run and after).
 *
 * Builds the app when stale and starts it with a fresh temporary database of the demo data, signed
 * in as the demo director. The analyses are warmed first (these runs measure serving, not the
 * engine: bench:health-under-load measures the engine's effect). Saving: each connection saves
 * its own copy of the summer layout through the editor's endpoint, at the version it last saved,
 * so saves do not refuse one another. The per-account analysis rate is raised for the run
 * (LOFTLINE_ANALYSIS_RATE), since 50 connections of one account are far beyond any person.
 */
import fs from "node:fs";
import { createRequire } from "node:module";
import os from "node:os";
import { createClient } from "@libsql/client";
import { prepareApp, signIn } from "./lib/temp-app";
import type { AppServer } from "./lib/app-server";

type Histogram = { average: number; p50: number; p99: number; max: number };
type Result = { requests: Histogram; latency: Histogram; non2xx: number; errors: number; timeouts: number };
type Request = {
  method?: string;
  path?: string;
  headers?: Record<string, string>;
  body?: string;
  setupRequest?: (req: Request, context: Record<string, unknown>) => Request;
  onResponse?: (status: number, body: string, context: Record<string, unknown>) => void;
};
type Autocannon = (opts: {
  url: string;
  connections: number;
  duration: number;
  headers?: Record<string, string>;
  requests?: Request[];
}) => Promise<Result>;
const autocannon = createRequire(import.meta.url)("autocannon") as Autocannon;

const CONNECTIONS = 50;
const USAGE = "Usage: npm run bench:load [-- --duration SECONDS (3 to 120, default 10)]";

function parse(argv: string[]): number {
  if (argv.length === 0) return 10;
  const value = Number(argv[1]);
  if (argv[0] !== "--duration" || argv.length !== 2 || !Number.isInteger(value) || value < 3 || value > 120) {
    console.error(`${argv.join(" ")}: not understood. ${USAGE}`);
    process.exit(2);
  }
  return value;
}

/** Resident set of a process, MB (Linux /proc). */
function rssMb(pid: number): number {
  const status = fs.readFileSync(`/proc/${pid}/status`, "utf8");
  return Number(/VmRSS:\s+(\d+) kB/.exec(status)?.[1] ?? 0) / 1024;
}

async function measure(label: string, server: AppServer, run: () => Promise<Result>) {
  const pid = server.child.pid!;
  let peak = rssMb(pid);
  const sampler = setInterval(() => (peak = Math.max(peak, rssMb(pid))), 200);
  const r = await Promise.resolve(run()).finally(() => clearInterval(sampler));
  const errors = r.errors + r.timeouts + r.non2xx;
  console.log(
    `${label.padEnd(34)} ${r.requests.average.toFixed(0).padStart(6)} req/s  p50 ${String(r.latency.p50).padStart(5)} ms  p99 ${String(r.latency.p99).padStart(5)} ms  errors ${String(errors).padStart(4)}  memory peak ${peak.toFixed(0)} MB, after ${rssMb(pid).toFixed(0)} MB`,
  );
}

async function main() {
  const duration = parse(process.argv.slice(2));
  const app = await prepareApp();
  let server: AppServer | undefined;
  try {
    server = await app.start({ LOFTLINE_ANALYSIS_RATE: "1000000" });
    const base = app.base;
    const cookie = await signIn(base, "director");
    const db = createClient({ url: `file:${app.dbFile}` });
    const summer = String(
      (await db.execute("SELECT id FROM layouts WHERE name = 'Summer layout'")).rows[0].id,
    );
    const { document } = (await (
      await fetch(`${base}/api/layouts/${summer}`, { headers: { cookie } })
    ).json()) as {
      document: Record<string, unknown>;
    };
    const headers = { cookie, "accept-encoding": "gzip, deflate", origin: base };
    const json = { ...headers, "content-type": "application/json" };
    const draft = JSON.stringify({ document, classId: "buggy-2wd-10", skill: "club", layoutId: summer });

    // Copies to save into, one per connection and some spare; then warm every analysis and page.
    for (let i = 0; i < CONNECTIONS + 10; i++) {
      const r = await fetch(`${base}/layouts/${summer}/edit.data`, {
        method: "POST",
        headers: json,
        body: JSON.stringify({ intent: "save-copy", document }),
      });
      if (r.status !== 201) throw new Error(`making copy ${i}: status ${r.status}`);
    }
    const copies = (await db.execute("SELECT id, version FROM layouts WHERE name LIKE '% (copy)'")).rows;
    db.close();
    const free = copies.map((row) => ({ id: String(row.id), version: Number(row.version) }));
    const warm = [
      fetch(`${base}/layouts/${summer}`, { headers }),
      fetch(`${base}/api/layouts/${summer}/analysis?class=buggy-2wd-10`, { headers }),
      fetch(`${base}/api/analysis`, { method: "POST", headers: json, body: draft }),
    ];
    for (const r of await Promise.all(warm))
      if (r.status !== 200) throw new Error(`warm-up: ${r.status} ${r.url}`);

    console.log(
      `autocannon: ${CONNECTIONS} connections, ${duration} s per target, loopback; ${os.availableParallelism()} cores, load average ${os.loadavg()[0].toFixed(1)}; server memory at start ${rssMb(server.child.pid!).toFixed(0)} MB`,
    );
    const load = (opts: Parameters<Autocannon>[0]) => () => autocannon(opts);
    const common = { connections: CONNECTIONS, duration };
    await measure(
      "GET /layouts/:id (layout page)",
      server,
      load({ ...common, url: `${base}/layouts/${summer}`, headers }),
    );
    await measure(
      "GET /api/layouts/:id/analysis",
      server,
      load({ ...common, url: `${base}/api/layouts/${summer}/analysis?class=buggy-2wd-10`, headers }),
    );
    await measure(
      "POST /api/analysis (draft)",
      server,
      load({
        ...common,
        url: `${base}/api/analysis`,
        requests: [{ method: "POST", headers: json, body: draft }],
      }),
    );
    await measure(
      "POST /layouts/:id/edit (save)",
      server,
      load({
        ...common,
        url: base,
        requests: [
          {
            method: "POST",
            headers: json,
            setupRequest: (req, context) => {
              const layout = free.pop()!;
              context.layout = layout;
              return {
                ...req,
                path: `/layouts/${layout.id}/edit.data`,
                body: JSON.stringify({ intent: "save", baseVersion: layout.version, document }),
              };
            },
            onResponse: (status, _body, context) => {
              const layout = context.layout as { id: string; version: number };
              if (status === 200) layout.version += 1;
              free.push(layout);
            },
          },
        ],
      }),
    );
  } finally {
    await server?.stop();
    app.remove();
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
