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
import {
  alternatingRounds,
  browserHeaders,
  CONNECTIONS,
  parseBenchOptions,
  withBenchServer,
} from "./lib/bench";

const USAGE =
  "Usage: npm run bench:analysis-api [-- --duration SECONDS (1 to 60, default 5)] [--rounds N (1 to 20, default 5)] [--identity (no Accept-Encoding)]";
const TARGET = 0.5;

async function main() {
  const options = parseBenchOptions(process.argv.slice(2), USAGE);
  await withBenchServer(async ({ base, cookie, summerId, pid }) => {
    const analysis = `${base}/api/layouts/${summerId}/analysis?class=buggy-2wd-10&skill=club`;
    const headers = browserHeaders(cookie, options.identity);
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
      `autocannon: ${CONNECTIONS} connections, loopback, ${options.rounds} rounds of ${options.duration} s per route, alternating, ${options.identity ? "no compression asked for" : "Accept-Encoding: gzip, deflate"}`,
    );
    const result = await alternatingRounds(
      { name: "health", url: `${base}/api/health` },
      [{ name: "analysis", url: analysis }],
      { ...options, headers, pid },
    );
    const [a] = result.routes;
    console.log(`GET /api/health                median ${result.baseline.rate.toFixed(0)} req/s`);
    console.log(`GET /api/layouts/:id/analysis  median ${a.rate.toFixed(0)} req/s (warm)`);
    console.log(
      `ratio analysis / health: median ${a.ratio.toFixed(2)} (target at least ${TARGET.toFixed(2)}) ${a.ratio >= TARGET ? "MET" : "NOT MET"}`,
    );
  });
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
