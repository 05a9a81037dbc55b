import { describe, expect, it } from "vitest";
import { insidePolygon, marshalSpread } from "~/analysis/track/geometry-checks";
import { layoutRuleReport, measureLayout } from "~/analysis/track/layout-measure";
import type { LayoutDocument } from "~/analysis/format/layout-document";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import { ruleOval } from "../analysis-fixtures";
import { placeMarshals } from "~/analysis/marshal/placement";
import { riskOf } from "./fixtures";

/** Distance from a plan point to the nearest track edge, m (negative on the track), on a 0.1 m line. */
function edgeDistance(doc: LayoutDocument, x: number, y: number): number {
  const { line } = measureLayout(doc).geometry;
  let d2 = Infinity;
  for (let i = 0; i < line.count; i++) d2 = Math.min(d2, (line.x[i] - x) ** 2 + (line.y[i] - y) ** 2);
  return Math.sqrt(d2) - doc.trackWidth / 2;
}

describe("the suggested marshal plan", () => {
  const { plan } = riskOf(SUMMER_LAYOUT, { suggest: true });
  const suggested = plan.suggested!;

  it("has as many points as the largest heat (10 by default), none in a zone, all off the track and within reach", () => {
    expect(suggested.asked).toBe(10);
    expect(suggested.points).toHaveLength(10);
    expect(suggested.points.map((p) => p.id)).toEqual(suggested.points.map((_, i) => `M${i + 1}`));
    for (const p of suggested.points) {
      for (const z of plan.zones) expect(insidePolygon(z.polygon, p.x, p.y)).toBe(false);
      const edge = edgeDistance(SUMMER_LAYOUT, p.x, p.y);
      expect(edge).toBeGreaterThanOrEqual(plan.settings.setback - 0.01);
      expect(edge).toBeLessThanOrEqual(plan.settings.reach + 0.01);
      expect(insidePolygon(SUMMER_LAYOUT.siteBoundary!, p.x, p.y)).toBe(true);
      expect(p.warnings).toEqual([]);
    }
  });

  it("spreads them evenly: the layout with them passes the guidance's marshal spread rule", () => {
    const withPoints = { ...SUMMER_LAYOUT, marshalPoints: suggested.points.map((p) => ({ x: p.x, y: p.y })) };
    const m = measureLayout(withPoints);
    const spread = marshalSpread(m.geometry.line, withPoints.marshalPoints);
    expect(spread.ratio!).toBeLessThanOrEqual(1.5);
    expect(suggested.gapRatio).toBeCloseTo(spread.ratio!, 1);
    const rule = layoutRuleReport(withPoints, m).checks.find((c) => c.id === "maxMarshalGapRatio")!;
    expect(rule.status).toBe("pass");
  });

  it("covers every hotspot when there are enough points, each from the point whose stretch holds it", () => {
    const { plan: fifteen } = riskOf(SUMMER_LAYOUT, { suggest: true, settings: { heatSize: 15 } });
    expect(fifteen.hotspots.length).toBeGreaterThan(15);
    expect(fifteen.suggested!.uncovered).toEqual([]);
    const { plan: wet } = riskOf(WET_WEATHER_LAYOUT, { suggest: true });
    expect(wet.suggested!.uncovered).toEqual([]);
    for (const p of wet.suggested!.points)
      for (const w of p.watch) expect(w.distance).toBeLessThanOrEqual(wet.settings.coverDistance);
    // Too few points cannot reach every hotspot: the plan says which are left.
    const { plan: five } = riskOf(SUMMER_LAYOUT, { suggest: true, settings: { heatSize: 5 } });
    expect(five.suggested!.uncovered.length).toBeGreaterThan(0);
  });

  it("on a plain oval without hotspots, spaces them within a metre or two of an even share", () => {
    const doc = ruleOval(3);
    const { plan: oval, analysis } = riskOf(doc, { suggest: true, settings: { heatSize: 8 } });
    const s = oval.suggested!.points.map((p) => p.s);
    const share = analysis.lapLength / 8;
    for (let k = 0; k < 8; k++) {
      const gap = (s[(k + 1) % 8] - s[k] + analysis.lapLength) % analysis.lapLength;
      expect(Math.abs(gap - share)).toBeLessThan(2.5);
    }
  });

  it("keeps to the site: with the boundary hugging the outside edge, every point stands in the infield", () => {
    const doc = ruleOval(3);
    doc.siteBoundary = [
      [-9.6, -1.6],
      [49.6, -1.6],
      [49.6, 17.6],
      [-9.6, 17.6],
    ];
    const { plan: cramped } = riskOf(doc, { suggest: true });
    expect(cramped.suggested!.points).toHaveLength(10);
    for (const p of cramped.suggested!.points) {
      expect(p.side).toBe("left"); // the inside of an oval driven anticlockwise
      expect(insidePolygon(doc.siteBoundary, p.x, p.y)).toBe(true);
    }
  });

  it("places fewer points than asked where the ground leaves no room", () => {
    const none = placeMarshals({
      spots: [],
      hotspots: [],
      lapLength: 100,
      count: 10,
      maxGapRatio: 1.5,
      coverDistance: 10,
    });
    expect(none).toEqual([]);
    const spots = [0, 1, 2].map((s) => ({ s, x: s, y: 2, side: "left" as const, edgeDistance: 1 }));
    const few = placeMarshals({
      spots,
      hotspots: [],
      lapLength: 100,
      count: 10,
      maxGapRatio: 1.5,
      coverDistance: 10,
    });
    expect(few.length).toBeGreaterThan(0);
    expect(few.length).toBeLessThanOrEqual(3);
    expect(new Set(few).size).toBe(few.length); // never the same spot twice
  });
});
