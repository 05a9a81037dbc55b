import { describe, expect, it } from "vitest";
import {
  cacheKey,
  cacheKeyOf,
  canonicalJson,
  createAnalysisCache,
  fnv1a64,
  hashOnce,
} from "~/analysis/layout/analysis-cache";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import type { LayoutDocument } from "~/analysis/format/layout-document";

const clone = (d: LayoutDocument): LayoutDocument => structuredClone(d);

describe("canonical JSON and the hash", () => {
  it("gives equal text for equal data whatever the key order", () => {
    expect(canonicalJson({ b: 1, a: [1, { d: 2, c: 3 }] })).toBe(
      canonicalJson({ a: [1, { c: 3, d: 2 }], b: 1 }),
    );
    expect(canonicalJson({ a: 1, skip: undefined })).toBe('{"a":1}');
    expect(canonicalJson(new Float64Array([1.5, 2]))).toBe("[1.5,2]");
    // Non-finite numbers stay distinct from each other and from null.
    expect(canonicalJson([Infinity, NaN, null])).toBe('["Infinity","NaN",null]');
  });

  it("FNV-1a 32-bit half matches the published test vectors (Fowler/Noll/Vo FNV reference page: '' -> 811c9dc5, 'a' -> e40c292c, 'foobar' -> bf9cf968)", () => {
    expect(fnv1a64("").slice(0, 8)).toBe("811c9dc5");
    expect(fnv1a64("a").slice(0, 8)).toBe("e40c292c");
    expect(fnv1a64("foobar").slice(0, 8)).toBe("bf9cf968");
    expect(fnv1a64("foobar")).toHaveLength(16);
  });

  it("keys differ for different inputs and kinds", () => {
    expect(cacheKey("plan", { v: 1 })).not.toBe(cacheKey("plan", { v: 1.0001 }));
    expect(cacheKey("plan", { v: 1 })).not.toBe(cacheKey("flight", { v: 1 }));
    expect(cacheKey("plan", { v: 1 })).toMatch(/^plan:[0-9a-f]{16}$/);
    expect(cacheKeyOf("flight", "p1", 6.5)).not.toBe(cacheKeyOf("flight", "p1", 6.51));
    expect(cacheKeyOf("flight", "p1", 6.5)).toBe(`flight:${fnv1a64("p1|6.5")}`);
  });

  it("hashOnce remembers the hash of an object", () => {
    const profile = { d: [0, 1], h: [0, 0.3] };
    expect(hashOnce(profile)).toBe(fnv1a64(canonicalJson(profile)));
    expect(hashOnce(profile)).toBe(hashOnce({ h: [0, 0.3], d: [0, 1] }));
    expect(hashOnce(profile)).not.toBe(hashOnce({ d: [0, 1], h: [0, 0.31] }));
  });
});

describe("the LRU memo", () => {
  it("computes once per key and counts hits and misses", () => {
    const cache = createAnalysisCache(10);
    let calls = 0;
    const compute = () => ++calls;
    expect(cache.memo("x:1", compute)).toBe(1);
    expect(cache.memo("x:1", compute)).toBe(1);
    expect(calls).toBe(1);
    expect(cache.stats).toMatchObject({ hits: 1, misses: 1, missesByKind: { x: 1 } });
  });

  it("drops the least recently used entry beyond its size", () => {
    const cache = createAnalysisCache(2);
    cache.memo("k:a", () => "a");
    cache.memo("k:b", () => "b");
    cache.memo("k:a", () => "a again"); // a is now the most recent
    cache.memo("k:c", () => "c");
    expect(cache.has("k:a")).toBe(true);
    expect(cache.has("k:b")).toBe(false);
    expect(cache.has("k:c")).toBe(true);
    expect(cache.size).toBe(2);
    expect(cache.stats.evictions).toBe(1);
    expect(() => createAnalysisCache(0)).toThrow(/maxEntries/);
  });
});

describe("analyseLayout with the cache", () => {
  it("gives the same analysis with and without a cache", () => {
    const cache = createAnalysisCache();
    expect(analyseLayout(clone(SUMMER_LAYOUT), { cache })).toEqual(analyseLayout(clone(SUMMER_LAYOUT)));
  });

  it("a repeat analysis does no jump recomputation", () => {
    const cache = createAnalysisCache();
    const first = analyseLayout(clone(SUMMER_LAYOUT), { cache });
    const misses = cache.stats.misses;
    // 9 jumps x 3 classes: a speed window and a flight each, but the whoops row (one per class)
    // has its own analysis of the ways through it instead.
    expect(cache.stats.missesByKind.window).toBe(24);
    expect(cache.stats.missesByKind.flight).toBe(24);
    expect(cache.stats.missesByKind.whoops).toBe(3);
    const again = analyseLayout(clone(SUMMER_LAYOUT), { cache });
    expect(cache.stats.misses).toBe(misses);
    expect(again).toEqual(first);
    // Another skill level is a new analysis, but every jump's window, flight and plan is reused
    // (whole analyses are the server's memo's, app/layouts/analysis-memo.server.ts).
    analyseLayout(clone(SUMMER_LAYOUT), { cache, skill: "expert" });
    expect(cache.stats.missesByKind.layout).toBeUndefined();
    expect(cache.stats.misses).toBe(misses);
  });

  it("changing one jump recomputes only that jump (once per class)", () => {
    const cache = createAnalysisCache();
    analyseLayout(clone(SUMMER_LAYOUT), { cache });
    const before = { ...cache.stats.missesByKind };
    const edited = clone(SUMMER_LAYOUT);
    const k = edited.sections.findIndex((s) => s.id === "step-down");
    const jump = edited.sections[k];
    if (jump.kind !== "jump" || jump.preset !== "step-down")
      throw new Error("demo layout changed: no step-down");
    jump.faceHeight += 0.05;
    const a = analyseLayout(edited, { cache });
    const after = cache.stats.missesByKind;
    expect(after["lap-window"] - before["lap-window"]).toBe(1);
    expect(after.window - before.window).toBe(3);
    expect(after.flight - before.flight).toBe(3);
    expect((after.plan ?? 0) - (before.plan ?? 0)).toBe(0);
    // ...and the edit shows in the result.
    expect(a).toEqual(analyseLayout(clone(edited)));
  });

  it("lengthening a straight far from any landing recomputes no jump physics", () => {
    const cache = createAnalysisCache();
    const base = analyseLayout(clone(SUMMER_LAYOUT), { cache });
    const before = { ...cache.stats.missesByKind };
    const edited = clone(SUMMER_LAYOUT);
    const start = edited.sections[0];
    if (start.kind !== "straight") throw new Error("demo layout changed: no start straight");
    start.length += 2;
    const a = analyseLayout(edited, { cache });
    const after = cache.stats.missesByKind;
    for (const kind of ["lap-window", "window", "flight", "plan"])
      expect((after[kind] ?? 0) - (before[kind] ?? 0)).toBe(0);
    // Positions along the lap moved, the jumps' own numbers did not.
    expect(a.lapLength).toBeCloseTo(base.lapLength + 2, 9);
    expect(a.classes[0].jumps[0].lip.s).toBeCloseTo(base.classes[0].jumps[0].lip.s + 2, 6);
    expect(a.classes[0].jumps[0].airtime).toBe(base.classes[0].jumps[0].airtime);
  });
});
