import { describe, expect, it } from "vitest";
import { insidePolygon } from "~/analysis/track/geometry-checks";
import { inStretchOf, stretches } from "~/analysis/marshal/points";
import { BIG_DOUBLE, ovalWithJump } from "../analysis-fixtures";
import { riskOf } from "./fixtures";

describe("stretches: half way to each neighbour along the lap", () => {
  it("split the lap between the points, across the start line too", () => {
    const st = stretches([30, 10, 90], 100);
    expect(st).toEqual([
      { fromS: 20, toS: 60, length: 40 },
      { fromS: 0, toS: 20, length: 20 },
      { fromS: 60, toS: 0, length: 40 },
    ]);
    // Every lap distance belongs to exactly one stretch.
    for (let s = 0; s < 100; s += 0.5) expect(st.filter((x) => inStretchOf(x, s, 100))).toHaveLength(1);
    expect(stretches([42], 100)).toEqual([{ fromS: 92, toS: 92, length: 100 }]);
  });
});

describe("marshal point warnings", () => {
  // The oval: the start straight runs along y = 0 (3 m wide), the back straight along y = 6.
  const doc = ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10"] });
  const { plan: bare } = riskOf(doc);
  const zone = bare.zones.find((z) => z.id === "J1")!;
  doc.marshalPoints = [
    { x: zone.wedge.x + zone.wedge.near + 0.3, y: -2.5 }, // just past the landing, in its overshoot zone
    { x: 10, y: 0.5 }, // on the start straight
    { x: 10, y: -9.5 }, // 8 m outside the start straight's edge
    { x: 10, y: -3 }, // 1.5 m outside it: fine
  ];
  const { plan, analysis } = riskOf(doc);
  const lapLength = analysis.lapLength;
  const [inZone, onTrack, tooFar, fine] = plan.points;

  it("a point in a zone: which zone, why, what to do, and a spot to move it to", () => {
    expect(inZone.id).toBe("M1");
    expect(inZone.warnings.map((w) => [w.kind, w.zoneId])).toEqual([["in-zone", "J1"]]);
    const [w] = inZone.warnings;
    expect(w.text).toMatch(
      /^M1 stands in the overshoot zone of J1: cars that overshoot it can land or roll here/,
    );
    expect(w.action).toMatch(/^Move it out of the zone/);
    const [x, y] = w.moveTo!;
    for (const z of plan.zones) expect(insidePolygon(z.polygon, x, y)).toBe(false);
    expect(Math.hypot(x - inZone.x, y - inZone.y)).toBeLessThan(15);
  });

  it("on the track, or farther from the edge than the club's reach", () => {
    expect(onTrack.warnings.map((w) => w.kind)).toEqual(["on-track"]);
    expect(onTrack.edgeDistance).toBeCloseTo(-1, 9);
    expect(onTrack.warnings[0].text).toBe(
      "M2 stands on the track after the start line, 1 m inside the edge.",
    );
    expect(onTrack.warnings[0].action).toBe("Move it off the track, 1 to 3 m beyond the edge.");
    expect(tooFar.warnings.map((w) => w.kind)).toEqual(["too-far"]);
    expect(tooFar.edgeDistance).toBeCloseTo(8, 9);
    expect(tooFar.warnings[0].text).toBe(
      "M3 stands 8 m from the nearest track edge, farther than the club's reach of 3 m.",
    );
    expect(fine.warnings).toEqual([]);
    expect(fine.side).toBe("right");
    // A club whose marshals may stand up to 10 m off the edge.
    const { plan: wide } = riskOf(doc, { settings: { reach: 10 } });
    expect(wide.points[2].warnings).toEqual([]);
  });

  it("each point's stretch, what to watch there, and its jumps and turns", () => {
    const total = plan.points.reduce((a, p) => a + p.stretch.length, 0);
    expect(total).toBeCloseTo(lapLength, 6);
    const watched = plan.points.flatMap((p) => p.watch.map((w) => w.hotspotId)).sort();
    expect(watched).toEqual(plan.hotspots.map((h) => h.id).sort());
    // M1 stands past the jump, at the hairpin: the jump's landing and the hairpin are in its stretch.
    expect(inZone.jumps).toEqual(["J1"]);
    expect(inZone.turns).toEqual(["T1"]);
    for (const p of plan.points)
      for (const w of p.watch) {
        const h = plan.hotspots.find((x) => x.id === w.hotspotId)!;
        expect(w.distance).toBeCloseTo(Math.hypot(h.x - p.x, h.y - p.y), 9);
        expect(w.covered).toBe(w.distance <= plan.settings.coverDistance);
      }
  });
});
