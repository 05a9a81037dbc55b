import { describe, expect, it } from "vitest";
import { hotspotMarks, marshalPlanFits, zoneOnScreen } from "~/lib/editor/marshal-drawing";

// A 10 m square zone, the view 4 px per m with the plan origin at (100, 200) px (Y up on the plan).
const square: [number, number][] = [
  [0, 0],
  [10, 0],
  [10, 10],
  [0, 10],
];
const view = { scale: 4, ox: 100, oy: 200 };

describe("a marshal zone on the plan canvas", () => {
  it("puts the outline in screen space through the view (plan Y up, screen y down)", () => {
    expect(zoneOnScreen(square, view).outline).toEqual([100, 200, 140, 200, 140, 160, 100, 160]);
  });

  it("hatches inside the outline with lines the asked spacing apart at 45°", () => {
    const { hatch } = zoneOnScreen(square, view, 8);
    // a 40 px square is 40 * √2 ≈ 56.6 px across its diagonal: lines 8 px apart, about 7 of them
    expect(hatch.length).toBeGreaterThanOrEqual(6);
    expect(hatch.length).toBeLessThanOrEqual(8);
    for (const [x1, y1, x2, y2] of hatch) {
      for (const [x, y] of [
        [x1, y1],
        [x2, y2],
      ]) {
        expect(x).toBeGreaterThanOrEqual(100 - 1e-9);
        expect(x).toBeLessThanOrEqual(140 + 1e-9);
        expect(y).toBeGreaterThanOrEqual(160 - 1e-9);
        expect(y).toBeLessThanOrEqual(200 + 1e-9);
      }
      expect(Math.abs(Math.abs(x2 - x1) - Math.abs(y2 - y1))).toBeLessThan(1e-9);
    }
    // zooming in keeps the spacing in px, so more lines cross the larger square
    expect(zoneOnScreen(square, { ...view, scale: 8 }, 8).hatch.length).toBeGreaterThan(hatch.length);
  });

  it("draws nothing inside a degenerate polygon", () => {
    expect(zoneOnScreen(square.slice(0, 2), view).hatch).toEqual([]);
  });
});

describe("whether a marshal plan still fits the drawing", () => {
  const doc = { sections: [], start: { x: 0, y: 0, headingDeg: 0 }, trackWidth: 4, carClasses: ["a"] };
  it("fits the same track and classes, even with other points", () => {
    expect(marshalPlanFits(doc, { ...doc })).toBe(true);
  });
  it("does not fit after a change of the track, the width or the classes, nor without a plan", () => {
    expect(marshalPlanFits(doc, { ...doc, sections: [] })).toBe(false);
    expect(marshalPlanFits(doc, { ...doc, trackWidth: 5 })).toBe(false);
    expect(marshalPlanFits(doc, { ...doc, carClasses: ["a"] })).toBe(false);
    expect(marshalPlanFits(null, doc)).toBe(false);
  });
});

describe("the hotspot marks on the plan canvas", () => {
  const spots = [
    { id: "H1", x: 0, y: 0 },
    { id: "H2", x: 2, y: 0 },
    { id: "H3", x: 20, y: 0 },
  ];
  it("puts each in screen space, and close ones share a mark at the zoom shown", () => {
    // 4 px per m: H1 and H2 are 8 px apart, under the 17.5 px a mark needs
    expect(hotspotMarks(spots, view)).toEqual([
      { ids: ["H1", "H2"], x: 100, y: 200 },
      { ids: ["H3"], x: 180, y: 200 },
    ]);
    // zoomed in to 20 px per m they stand apart
    expect(hotspotMarks(spots, { ...view, scale: 20 }).map((g) => g.ids)).toEqual([["H1"], ["H2"], ["H3"]]);
  });
});
