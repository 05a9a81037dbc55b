/**
 * `npm run bench:reader-pages [-- --duration SECONDS] [--rounds N] [--identity]`: how many requests
 * per second the reader pages answer compared with a trivial JSON route of the same server under
 * the same load (docs/decisions/0459-reader-page-speed.md).
 *
 * Builds the app when its sources changed, starts it on a free loopback port with a fresh
 * temporary database holding the demo data, signs in as the demo driver and warms the summer
 * layout's analysis. Then autocannon (10 connections, loopback) alternates short rounds of
 * GET /api/health, the layout page, the jump page (a jump with a set-up plan) and, for
 * information, the layout page's loader data alone (`.data`), each request with the headers a
 * browser sends (session cookie, Accept-Encoding: gzip). Prints each round, the medians and the
 * median round-by-round ratios; target: at least 0.25 for both pages. Everything is removed after.
 * With LOFTLINE_BENCH_NODE_ARGS="--cpu-prof --cpu-prof-dir=DIR" the server writes a CPU profile.
 */
import http from "node:http";
import {
  alternatingRounds,
  browserHeaders,
  CONNECTIONS,
  parseBenchOptions,
  withBenchServer,
} from "./lib/bench";

const USAGE =
  "Usage: npm run bench:reader-pages [-- --duration SECONDS (1 to 60, default 5)] [--rounds N (1 to 20, default 5)] [--identity (no Accept-Encoding)]";
const TARGET = 0.25;

/** Bytes of an answer as sent with Accept-Encoding: gzip (fetch would decompress them). */
function sentBytes(url: string, cookie: string): Promise<number> {
  return new Promise((resolve, reject) => {
    http
      .get(url, { headers: browserHeaders(cookie, false) }, (res) => {
        let n = 0;
        res.on("data", (chunk: Buffer) => (n += chunk.length));
        res.on("end", () =>
          res.statusCode === 200 ? resolve(n) : reject(new Error(`${url}: ${res.statusCode}`)),
        );
      })
      .on("error", reject);
  });
}

/** Size of an answer as plain text and as sent gzip-compressed. */
async function sizes(url: string, cookie: string): Promise<string> {
  const plain = (await (await fetch(url, { headers: { cookie } })).arrayBuffer()).byteLength;
  const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;
  return `${kb(plain)}, ${kb(await sentBytes(url, cookie))} gzip-compressed`;
}

async function main() {
  const options = parseBenchOptions(process.argv.slice(2), USAGE);
  await withBenchServer(async ({ base, pid, cookie, summerId }) => {
    const api = await fetch(`${base}/api/layouts/${summerId}/analysis?class=buggy-2wd-10&skill=club`, {
      headers: { cookie },
    });
    const { analysis } = (await api.json()) as {
      analysis: { classes: { jumps: { sectionId: string; plan: unknown }[] }[] };
    };
    const jump = analysis.classes[0].jumps.find((j) => j.plan !== null) ?? analysis.classes[0].jumps[0];
    const layoutPage = `${base}/layouts/${summerId}`;
    const jumpPage = `${base}/layouts/${summerId}/jumps/${encodeURIComponent(jump.sectionId)}`;
    const layoutData = `${base}/layouts/${summerId}.data`;
    const cold = performance.now();
    const first = await fetch(layoutPage, { headers: { cookie } });
    await first.arrayBuffer();
    console.log(`summer layout page: first request ${(performance.now() - cold).toFixed(0)} ms`);
    for (const [name, url] of [
      ["layout page", layoutPage],
      ["jump page", jumpPage],
      ["layout page .data", layoutData],
    ])
      console.log(`${name}: ${await sizes(url, cookie)}`);
    console.log(
      `autocannon: ${CONNECTIONS} connections, loopback, ${options.rounds} rounds of ${options.duration} s per route, alternating, ${options.identity ? "no compression asked for" : "Accept-Encoding: gzip, deflate"}`,
    );
    const result = await alternatingRounds(
      { name: "health", url: `${base}/api/health` },
      [
        { name: "layout", url: layoutPage },
        { name: "jump", url: jumpPage },
        { name: "layout .data", url: layoutData },
      ],
      { ...options, headers: browserHeaders(cookie, options.identity), pid },
    );
    const cpu = (ms: number) => (Number.isFinite(ms) ? `; server CPU ${ms.toFixed(2)} ms a request` : "");
    console.log(
      `${"GET /api/health".padEnd(36)} median ${result.baseline.rate.toFixed(0)} req/s${cpu(result.baseline.cpuPerRequest)}`,
    );
    const paths: Record<string, string> = {
      layout: "GET /layouts/:id",
      jump: `GET /layouts/:id/jumps/${jump.sectionId}`,
      "layout .data": "GET /layouts/:id.data",
    };
    for (const r of result.routes) {
      const verdict = r.name === "layout .data" ? "(information)" : r.ratio >= TARGET ? "MET" : "NOT MET";
      console.log(
        `${paths[r.name].padEnd(36)} median ${r.rate.toFixed(0)} req/s, ratio ${r.ratio.toFixed(2)} ${r.name === "layout .data" ? "" : `(target at least ${TARGET.toFixed(2)}) `}${verdict}${cpu(r.cpuPerRequest)}`,
      );
    }
  });
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
