/**
 * `npm run bench:health-under-load [-- --duration SECONDS] [--inline]`: does the server stay
 * responsive while the heaviest analyses it accepts run? Target: GET /api/health answers within
 * 100 ms at the 99th percentile while four such analyses are in progress.
 *
 * Builds the app when stale and starts it on a loopback port with a fresh temporary database of
 * the demo data. Four clients (two accounts, each at its limit of two analyses at once) POST
 * /api/analysis again and again, each time a different layout at the work budget (40 doubles
 * landing into hairpins, 4 car classes: 160 jump analyses, so the memo never helps), keeping four
 * analyses in progress; meanwhile one client asks GET /api/health back to back (10 ms apart) and
 * records each answer's time. First the same probe runs for 5 s with nothing else going on.
 * `--inline` runs the analyses on the request thread instead of the pool (LOFTLINE_ANALYSIS_THREADS=0),
 * to compare. Also times the refusal (422) of a 500-jump layout. Everything is removed afterwards.
 */
import os from "node:os";
import { heaviestAccepted, overBudget } from "./lib/worst-case-layout";
import { prepareApp, signIn } from "./lib/temp-app";
import type { AppServer } from "./lib/app-server";

const USAGE =
  "Usage: npm run bench:health-under-load [-- --duration SECONDS (5 to 300, default 30)] [--inline]";
const TARGET_P99_MS = 100;

function parse(argv: string[]) {
  const out = { duration: 30, inline: false };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === "--inline") out.inline = true;
    else if (argv[i] === "--duration") {
      out.duration = Number(argv[++i]);
      if (!Number.isInteger(out.duration) || out.duration < 5 || out.duration > 300) {
        console.error(`--duration: must be a whole number from 5 to 300 (got "${argv[i] ?? ""}"). ${USAGE}`);
        process.exit(2);
      }
    } else {
      console.error(`${argv[i]}: unknown option. ${USAGE}`);
      process.exit(2);
    }
  }
  return out;
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];

/** Asks /api/health back to back until `until()` says stop; returns each answer's time, ms. */
async function probeHealth(base: string, until: () => boolean): Promise<number[]> {
  const times: number[] = [];
  while (!until()) {
    const started = performance.now();
    const response = await fetch(`${base}/api/health`);
    await response.arrayBuffer();
    if (response.status !== 200) throw new Error(`/api/health answered ${response.status}`);
    times.push(performance.now() - started);
    await new Promise((r) => setTimeout(r, 10));
  }
  return times.sort((a, b) => a - b);
}

function describe(label: string, times: number[]): number {
  const p99 = percentile(times, 99);
  console.log(
    `${label}: ${times.length} answers, p50 ${percentile(times, 50).toFixed(1)} ms, p90 ${percentile(times, 90).toFixed(1)} ms, p99 ${p99.toFixed(1)} ms, max ${times[times.length - 1].toFixed(1)} ms`,
  );
  return p99;
}

async function main() {
  const { duration, inline } = parse(process.argv.slice(2));
  const app = await prepareApp();
  let server: AppServer | undefined;
  try {
    server = await app.start(inline ? { LOFTLINE_ANALYSIS_THREADS: "0" } : {});
    const base = app.base;
    const cookies = [await signIn(base, "director"), await signIn(base, "driver")];
    console.log(
      `machine: ${os.availableParallelism()} cores, load average ${os.loadavg()[0].toFixed(1)}; analyses ${inline ? "on the request thread (--inline)" : "in the worker pool"}`,
    );
    describe("GET /api/health, idle          ", await probeHealth(base, deadline(5)));

    const post = (cookie: string, document: unknown) =>
      fetch(`${base}/api/analysis`, {
        method: "POST",
        headers: { cookie, "Content-Type": "application/json", Origin: base },
        body: JSON.stringify({ document }),
      });
    const refusals: number[] = [];
    for (let i = 0; i < 5; i++) {
      const started = performance.now();
      const r = await post(cookies[0], overBudget(i));
      await r.arrayBuffer();
      if (r.status !== 422) throw new Error(`the 500-jump layout was answered ${r.status}, not 422`);
      refusals.push(performance.now() - started);
    }
    console.log(
      `500-jump layout (72 kB): refused with 422 in ${Math.min(...refusals).toFixed(0)}-${Math.max(...refusals).toFixed(0)} ms`,
    );

    let stop = false;
    let next = 1;
    const done: { status: number; ms: number }[] = [];
    const worker = async (cookie: string) => {
      while (!stop) {
        const started = performance.now();
        const r = await post(cookie, heaviestAccepted(next++));
        await r.arrayBuffer();
        done.push({ status: r.status, ms: performance.now() - started });
      }
    };
    const clients = [0, 0, 1, 1].map((k) => worker(cookies[k]));
    await new Promise((r) => setTimeout(r, 300)); // all four sent and in progress
    const busy = await probeHealth(base, deadline(duration));
    stop = true;
    await Promise.all(clients);
    const p99 = describe(`GET /api/health, 4 analyses on`, busy);
    const statuses = [...new Set(done.map((d) => d.status))].join(", ");
    const mean = done.reduce((s, d) => s + d.ms, 0) / Math.max(1, done.length);
    console.log(
      `analyses at the budget (160 jump analyses each): ${done.length} answered (status ${statuses}), ${(mean / 1000).toFixed(1)} s each on average from request to answer`,
    );
    console.log(
      `health p99 while 4 run: ${p99.toFixed(1)} ms (target at most ${TARGET_P99_MS} ms) ${p99 <= TARGET_P99_MS ? "MET" : "NOT MET"}; load average now ${os.loadavg()[0].toFixed(1)}`,
    );
  } finally {
    await server?.stop();
    app.remove();
  }
}

function deadline(seconds: number) {
  const end = Date.now() + seconds * 1000;
  return () => Date.now() >= end;
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
