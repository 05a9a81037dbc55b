/**
 * Layout analysis benchmark: `npm run bench:analysis`. Prints medians for the largest demo layout
 * (at least 40 sections and 8 jumps; its three car classes; every jump's verdict for all three
 * skill levels, which share one set-up plan per jump and class):
 * 1. the full analysis from a cold cache (target: under 150 ms): a fresh copy of the document
 *    (so no profile or window remembered from an earlier run) and an empty cache each round;
 * 2. the analysis with one section changed and the rest cached (target: under 5 ms): a straight
 *    lengthened, and for information a jump changed (its window, flight and plan recomputed);
 * 3. the analysis API against a trivial JSON route of the same server (autocannon): the web
 *    side's script, scripts/bench-analysis-api.ts, run from here when it exists.
 * The machine's load average is printed with the figures: on a shared machine they vary.
 */
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import {
  createAnalysisCache,
  type AnalysisCache,
  carPreset,
  analyseLayout,
  SKILL_LEVELS,
  measureLayout,
  lapSpeed,
  type LayoutDocument,
} from "~/analysis";
import { DEMO_LAYOUTS } from "~/db/demo-layouts";

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
};
const lines: string[] = [];
const report = (label: string, ms: number, target?: number) =>
  lines.push(
    `${label.padEnd(64)} ${`${ms.toFixed(2)} ms`.padStart(11)}  ${target === undefined ? "" : `target < ${target} ms: ${ms < target ? "met" : "MISSED"}`}`,
  );

const doc = [...DEMO_LAYOUTS].sort((a, b) => b.sections.length - a.sections.length)[0];
const jumps = doc.sections.filter((s) => s.kind === "jump").length;
if (doc.sections.length < 40 || jumps < 8 || doc.carClasses.length < 3) {
  throw new Error(
    `the largest demo layout is too small for this benchmark (${doc.sections.length} sections, ${jumps} jumps)`,
  );
}
const fresh = (): LayoutDocument => structuredClone(doc);

/** Median time (ms) of `run` over `rounds` rounds after `warmup` rounds; `setup` is not timed. */
function time<T>(
  rounds: number,
  warmup: number,
  setup: (round: number) => T,
  run: (input: T) => unknown,
): number {
  const per: number[] = [];
  for (let r = 0; r < warmup + rounds; r++) {
    const input = setup(r);
    const t0 = performance.now();
    run(input);
    if (r >= warmup) per.push(performance.now() - t0);
  }
  return median(per);
}

const header = `${doc.name}: ${doc.sections.length} sections, ${jumps} jumps, classes ${doc.carClasses.join(", ")}, skill levels ${SKILL_LEVELS.join(", ")}`;
const plans = (() => {
  const cache = createAnalysisCache();
  analyseLayout(fresh(), { cache });
  return cache.stats.missesByKind.plan ?? 0;
})();

// 1. Cold: an empty cache and a fresh document each round.
const cold = time(
  15,
  3,
  () => ({ d: fresh(), cache: createAnalysisCache() }),
  ({ d, cache }) => analyseLayout(d, { cache }),
);
report("full analysis, cold cache (median)", cold, 150);
const noCache = time(9, 1, fresh, (d) => analyseLayout(d));
report("full analysis, no cache at all (median)", noCache);

// 2. Warm: one section changed, everything else cached. Each round changes it by a different
// amount, so the whole-layout memo never answers.
function edited(cache: AnalysisCache, sectionId: string, change: (d: LayoutDocument, round: number) => void) {
  analyseLayout(fresh(), { cache });
  const k = doc.sections.findIndex((s) => s.id === sectionId);
  if (k < 0) throw new Error(`no section ${sectionId}`);
  return (round: number) => {
    const d = fresh();
    change(d, round);
    return d;
  };
}
const warmCache = createAnalysisCache();
const straightId = doc.sections.find((s) => s.kind === "straight")!.id;
const straightEdit = edited(warmCache, straightId, (d, r) => {
  const s = d.sections.find((x) => x.id === straightId)!;
  if (s.kind === "straight") s.length += 0.01 * (r + 1);
});
const warmStraight = time(101, 10, straightEdit, (d) => analyseLayout(d, { cache: warmCache }));
report(`one straight changed ("${straightId}"), rest cached (median)`, warmStraight, 5);

// Where the warm time goes: the plan measures and the lap model run again on every edit.
const measureMs = time(101, 10, straightEdit, (d) => measureLayout(d));
const geometry = measureLayout(fresh()).geometry;
const lapMs = time(
  101,
  10,
  () => geometry,
  (geo) => doc.carClasses.forEach((id) => lapSpeed(geo, carPreset(id)!)),
);
report("  of which: plan measures (geometry, lanes, sight, boundary)", measureMs);
report(`  of which: lap model for ${doc.carClasses.length} classes`, lapMs);

const repeat = time(
  31,
  5,
  () => fresh(),
  (d) => analyseLayout(d, { cache: warmCache }),
);
report("the same layout again, fully cached (median)", repeat);

/** The jump edit: a slightly higher face, so its window, flight (and plan) are recomputed. */
function jumpEdit(id: string) {
  const cache = createAnalysisCache();
  const make = edited(cache, id, (d, r) => {
    const s = d.sections.find((x) => x.id === id)!;
    if (s.kind === "jump" && "faceHeight" in s) s.faceHeight += 0.001 * (r + 1);
  });
  return time(15, 3, make, (d) => analyseLayout(d, { cache }));
}
const probe = analyseLayout(fresh());
const withPlan = probe.classes[0].jumps.find(
  (j) => j.plan !== null && j.preset !== "whoops" && j.preset !== "custom",
);
const withoutPlan = probe.classes[0].jumps.find(
  (j) => j.plan === null && j.preset !== "whoops" && j.preset !== "custom",
);
if (withoutPlan)
  report(
    `one jump changed ("${withoutPlan.sectionId}", no set-up plan), rest cached`,
    jumpEdit(withoutPlan.sectionId),
  );
if (withPlan)
  report(
    `one jump changed ("${withPlan.sectionId}", lands into a turn: 3 plans)`,
    jumpEdit(withPlan.sectionId),
  );

const [l1, l5] = loadavg();
console.log(`Layout analysis benchmark: ${header}`);
console.log(
  `set-up plans in a full analysis: ${plans}; load average ${l1.toFixed(2)} (1 min), ${l5.toFixed(2)} (5 min)`,
);
for (const line of lines) console.log(line);

// 3. The analysis API against a trivial JSON route (autocannon, 10 connections, loopback): the
// web side's part, in its own script so that this one stays free of the server.
const api = fileURLToPath(new URL("./bench-analysis-api.ts", import.meta.url));
if (existsSync(api)) {
  console.log("\nAnalysis API against a trivial JSON route (scripts/bench-analysis-api.ts):");
  const run = spawnSync(process.execPath, [...process.execArgv, api], { stdio: "inherit" });
  if (run.status !== 0) process.exitCode = run.status ?? 1;
} else {
  console.log(
    "\nAnalysis API against a trivial JSON route: scripts/bench-analysis-api.ts is not written yet.",
  );
}
