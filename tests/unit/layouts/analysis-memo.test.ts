import { gunzipSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import {
  canonicalJson,
  type LayoutDocument,
  type SkillLevel,
  analyseLayout,
  createAnalysisCache,
  fnv1a64,
} from "~/analysis";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import {
  cachedBody,
  createAnalysisMemo,
  inputsText,
  type AnalysisInputs,
} from "~/layouts/analysis-memo.server";

const inputs = (document: LayoutDocument, skill: SkillLevel = "club", classIds = document.carClasses) =>
  ({ document, classIds, skill, guidance: "club", overrides: {} }) satisfies AnalysisInputs;

/** The engine's per-jump memo, shared by the tests so repeats of the same jumps are cheap. */
const perJump = createAnalysisCache(4000);

/** The real engine (as a worker runs it), counting its runs. */
function engine() {
  const counter = { runs: 0 };
  const compute = (i: AnalysisInputs) => async () => {
    counter.runs += 1;
    return analyseLayout(i.document, { ...i, cache: perJump });
  };
  return { counter, compute };
}

describe("the analysis memo's keys", () => {
  it("uses the engine's hash of the canonical inputs: key order does not matter, any change does", () => {
    const base = inputs(SUMMER_LAYOUT, "club", ["sct-10"]);
    const reordered = JSON.parse(canonicalJson(SUMMER_LAYOUT)) as LayoutDocument;
    const key = (i: AnalysisInputs) => `analysis:${fnv1a64(inputsText(i))}`;
    expect(key({ ...base, document: reordered })).toBe(key(base));
    expect(key({ ...base, skill: "expert" })).not.toBe(key(base));
    expect(key({ ...base, overrides: { minTrackWidth: 3 } })).not.toBe(key(base));
    expect(key(base)).toMatch(/^analysis:[0-9a-f]{16}$/);
  });
});

describe("the analysis memo", () => {
  it("runs the engine once for a repeat, and once for concurrent requests of the same inputs", async () => {
    const memo = createAnalysisMemo();
    const { counter, compute } = engine();
    const i = inputs(WET_WEATHER_LAYOUT);
    const [a, b] = await Promise.all([memo.recall(i, compute(i)), memo.recall(i, compute(i))]);
    expect(counter.runs).toBe(1);
    expect(a.entry).toBe(b.entry);
    expect([a.hit, b.hit].sort()).toEqual([false, true]);
    const again = await memo.recall(inputs(structuredClone(WET_WEATHER_LAYOUT)), compute(i));
    expect(again).toMatchObject({ hit: true, entry: a.entry });
    expect(counter.runs).toBe(1);
    expect(memo.stats()).toMatchObject({ hits: 2, misses: 1, size: 1 });
  });

  it("stays within its byte bound, forgetting the least recently used entries first", async () => {
    const probe = createAnalysisMemo();
    const { compute } = engine();
    const first = inputs(SUMMER_LAYOUT, "novice");
    const one = (await probe.recall(first, compute(first))).entry.bytes;
    // Room for about two and a half entries of the summer layout.
    const memo = createAnalysisMemo({ maxBytes: Math.round(one * 2.5) });
    const counted = engine();
    const levels: SkillLevel[] = ["novice", "club", "expert"];
    for (const skill of levels) await memo.recall(inputs(SUMMER_LAYOUT, skill), counted.compute(first));
    const stats = memo.stats();
    expect(stats.bytes).toBeLessThanOrEqual(Math.round(one * 2.5));
    expect(stats.size).toBe(2);
    expect(stats.evictions).toBe(1);
    // The novice entry (least recently used) went; the expert one is still there.
    expect((await memo.recall(inputs(SUMMER_LAYOUT, "expert"), counted.compute(first))).hit).toBe(true);
    expect((await memo.recall(inputs(SUMMER_LAYOUT, "novice"), counted.compute(first))).hit).toBe(false);
    expect(counted.counter.runs).toBe(4);
  });

  it("counts what is made from an entry in its bytes, so big answers push others out", async () => {
    const { compute } = engine();
    const wet = inputs(WET_WEATHER_LAYOUT);
    const summer = inputs(SUMMER_LAYOUT);
    const probe = createAnalysisMemo();
    const wetBytes = (await probe.recall(wet, compute(wet))).entry.bytes;
    const summerBytes = (await probe.recall(summer, compute(summer))).entry.bytes;
    const memo = createAnalysisMemo({ maxBytes: wetBytes + summerBytes + 1000 });
    const { entry } = await memo.recall(wet, compute(wet));
    await memo.recall(summer, compute(summer));
    expect(memo.stats().size).toBe(2);
    // Using the wet entry again makes the summer one the least recently used; making the wet
    // one's JSON answer and its gzip form adds their bytes to it, which pushes the summer one out.
    expect((await memo.recall(wet, compute(wet))).hit).toBe(true);
    const body = cachedBody(entry, "all", () => ({ analysis: entry.value }), memo);
    expect(entry.bytes).toBe(wetBytes + body.bytes.byteLength);
    const zipped = await body.gzip();
    expect(await body.gzip()).toBe(zipped);
    expect(entry.bytes).toBe(wetBytes + body.bytes.byteLength + zipped.byteLength);
    expect(JSON.parse(gunzipSync(zipped).toString("utf8")).analysis.lapLength).toBeCloseTo(
      entry.value.lapLength,
      2,
    );
    expect(memo.stats()).toMatchObject({ size: 1, evictions: 1 });
    expect(memo.stats().bytes).toBe(entry.bytes);
  });

  it("answers a different input that shares the hash with its own analysis, never the other one's", async () => {
    const memo = createAnalysisMemo({ hash: () => "0000000000000000" });
    const { counter, compute } = engine();
    const wet = inputs(WET_WEATHER_LAYOUT);
    const summer = inputs(SUMMER_LAYOUT);
    const a = await memo.recall(wet, compute(wet));
    const b = await memo.recall(summer, compute(summer));
    expect(b.hit).toBe(false);
    expect(b.entry.value.name).toBe(SUMMER_LAYOUT.name);
    expect(a.entry.value.name).toBe(WET_WEATHER_LAYOUT.name);
    expect(counter.runs).toBe(2);
    expect(memo.stats().collisions).toBe(1);
  });

  it("finds a stored layout's entry by its alias until the entry is forgotten", async () => {
    const memo = createAnalysisMemo();
    const { compute } = engine();
    const wet = inputs(WET_WEATHER_LAYOUT);
    const { entry } = await memo.recall(wet, compute(wet));
    memo.setAlias("layout-1@3", entry);
    expect(memo.byAlias("layout-1@3")).toBe(entry);
    expect(memo.byAlias("layout-1@4")).toBeUndefined();
    memo.clear();
    expect(memo.byAlias("layout-1@3")).toBeUndefined();
  });
});
