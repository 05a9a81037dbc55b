import { describe, expect, it } from "vitest";
import type { LayoutDocument, LayoutSection } from "~/analysis/format/layout-document";
import { layoutGeometry, trackEdges } from "~/analysis/track/geometry";
import {
  cyclicRuns,
  farthestFromStand,
  findLaneConflicts,
  findOutsideBoundary,
  insidePolygon,
  marshalSpread,
  startStraight,
} from "~/analysis/track/geometry-checks";
import { findHiddenFromStand } from "~/analysis/track/sight";

function oval(L: number, R: number, extra: LayoutSection[] = []): Pick<LayoutDocument, "start" | "sections"> {
  return {
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [
      { id: "a", kind: "straight", length: L },
      ...extra,
      { id: "b", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
      { id: "c", kind: "straight", length: L },
      { id: "d", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
    ],
  };
}

describe("runs of flagged points round the lap", () => {
  it("joins a run that crosses the start line", () => {
    expect(cyclicRuns([1, 1, 0, 0, 1, 0, 1])).toEqual([
      [4, 4],
      [6, 1],
    ]);
    expect(cyclicRuns([0, 0])).toEqual([]);
    expect(cyclicRuns([1, 1, 1])).toEqual([[0, 2]]);
  });
});

describe("lanes too close", () => {
  it("finds none when the straights are width + margin apart or more", () => {
    // Straights 2R = 4.2 m apart, width 3 + margin 1 = 4 m.
    expect(findLaneConflicts(layoutGeometry(oval(30, 2.1)).line, 3, 1)).toEqual([]);
  });

  it("finds the two straights when they are closer, once per pair", () => {
    const g = layoutGeometry(oval(30, 1.8));
    const conflicts = findLaneConflicts(g.line, 3, 1);
    expect(conflicts).toHaveLength(1);
    const c = conflicts[0];
    expect(c.centreDistance).toBeCloseTo(3.6, 6);
    expect(c.edgeGap).toBeCloseTo(0.6, 6);
    // Nearly the whole first straight is flagged (the ends are within the ignored stretch).
    expect(c.toS - c.fromS).toBeGreaterThan(20);
  });
});

describe("site boundary, driver stand, start straight, marshals", () => {
  const g = layoutGeometry(oval(30, 8));
  const edges = trackEdges(g.line, 3);

  it("point in polygon", () => {
    const square: [number, number][] = [
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 1],
    ];
    expect(insidePolygon(square, 0.5, 0.5)).toBe(true);
    expect(insidePolygon(square, 1.5, 0.5)).toBe(false);
  });

  it("finds the stretch outside the boundary and how far out it goes", () => {
    // The far half turn reaches x = 30 + 8 + 1.5 = 39.5 on its outer edge; the boundary stops at 38.
    const boundary: [number, number][] = [
      [-20, -5],
      [38, -5],
      [38, 25],
      [-20, 25],
    ];
    const out = findOutsideBoundary(g.line, edges, boundary);
    expect(out).toHaveLength(1);
    expect(out[0].worstDistance).toBeCloseTo(1.5, 2);
    expect(out[0].fromS).toBeGreaterThan(30);
    expect(out[0].toS).toBeLessThan(30 + 8 * Math.PI);
    expect(
      findOutsideBoundary(g.line, edges, [
        [-20, -5],
        [45, -5],
        [45, 25],
        [-20, 25],
      ]),
    ).toEqual([]);
  });

  it("farthest point from a stand in the infield is the outer edge at a turn's apex", () => {
    const f = farthestFromStand(g.line, edges, { x: 15, y: 8 });
    expect(f.distance).toBeCloseTo(15 + 8 + 1.5, 6);
  });

  it("start straight: the plain straights around the start line", () => {
    const loop = oval(12, 8);
    loop.sections.push({ id: "e", kind: "straight", length: 9 });
    expect(startStraight(layoutGeometry(loop).sections)).toEqual({ length: 21, sectionIds: ["e", "a"] });
    const withJump = oval(12, 8, [
      { id: "j", kind: "jump", preset: "whoops", count: 3, bumpHeight: 0.1, spacing: 1 },
    ]);
    expect(startStraight(layoutGeometry(withJump).sections).length).toBe(12);
  });

  it("marshal spread: 1 when even, larger when bunched", () => {
    const lap = g.lapLength;
    const even = marshalSpread(g.line, [
      { x: 15, y: -3 },
      { x: 15, y: 19 },
    ]);
    expect(even.ratio).toBeCloseTo(1, 2);
    expect(even.evenShare).toBeCloseTo(lap / 2, 9);
    const bunched = marshalSpread(g.line, [
      { x: 10, y: -3 },
      { x: 20, y: -3 },
    ]);
    expect(bunched.largestGap).toBeCloseTo(lap - 10, 1);
    expect(marshalSpread(g.line, []).ratio).toBeNull();
  });
});

describe("hidden from the driver stand", () => {
  // A steep-sided block 1 m high on the first straight (x = 10 .. 12.2) and a stand behind the
  // start line, 10 m back, eyes 3 m up. Similar triangles over the block's far top edge (x = 12)
  // give where a car's top (0.15 m) comes back into view: x + 10 = 2.85 (12 + 10) / (3 - 1).
  const block: LayoutSection = {
    id: "block",
    kind: "jump",
    preset: "custom",
    profile: [
      [0, 0],
      [0.2, 1],
      [2, 1],
      [2.2, 0],
    ],
    lipIndex: 1,
    landingStartIndex: 2,
    landingEndIndex: 3,
  };
  const loop = {
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [
      { id: "run-up", kind: "straight", length: 10 },
      block,
      { id: "beyond", kind: "straight", length: 30 },
      { id: "far", kind: "turn", radius: 8, angleDeg: 180, direction: "left" },
      { id: "back", kind: "straight", length: 42.2 },
      { id: "near", kind: "turn", radius: 8, angleDeg: 180, direction: "left" },
    ],
  } satisfies Pick<LayoutDocument, "start" | "sections">;
  const g = layoutGeometry(loop);

  it("hides the track behind a tall mound up to where the line of sight clears it (exact geometry)", () => {
    // A point-sized car first: pure line of sight.
    const stand = { x: -10, y: 0, eyeHeight: 3 };
    const hidden = findHiddenFromStand(g.line, g.sections, 3, stand, { carLength: 0 });
    expect(hidden.length).toBeGreaterThan(0);
    const first = hidden[0];
    expect(first.blockedBy).toBe("block");
    expect(first.fromS).toBeGreaterThan(12);
    expect(first.fromS).toBeLessThan(12.3);
    const clear = (2.85 * 22) / 2 - 10;
    expect(first.toS).toBeGreaterThan(clear - 0.26);
    expect(first.toS).toBeLessThan(clear + 0.01);
    // A real car is hidden only where all of it is: the stretch shrinks by about a car length.
    const car = findHiddenFromStand(g.line, g.sections, 3, stand)[0];
    expect(first.length - car.length).toBeGreaterThan(0.3);
    expect(first.length - car.length).toBeLessThan(0.6);
  });

  it("hides nothing behind a low tabletop seen from a high stand beside it", () => {
    const table: LayoutSection = {
      id: "table",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.3,
      faceAngleDeg: 25,
      tableLength: 2,
      landingAngleDeg: 25,
    };
    const low = { ...loop, sections: loop.sections.map((s) => (s.id === "block" ? table : s)) };
    const gl = layoutGeometry(low);
    expect(findHiddenFromStand(gl.line, gl.sections, 3, { x: 15, y: -12, eyeHeight: 8 })).toEqual([]);
    // The same tabletop does hide the foot of its landing from a low stand far behind it.
    const fromBehind = findHiddenFromStand(gl.line, gl.sections, 3, { x: -30, y: 0, eyeHeight: 1.2 });
    expect(fromBehind.map((h) => h.blockedBy)).toContain("table");
  });
});
