import { describe, expect, it } from "vitest";
import type { LayoutDocument, LayoutSection } from "~/analysis/format/layout-document";
import { advancePose, layoutGeometry, nearestSample, trackEdges, wrapAngle } from "~/analysis/track/geometry";
import { jumpProfile, profileHeightAt } from "~/analysis/track/jump-profile";

type Loop = Pick<LayoutDocument, "start" | "sections">;

/** An oval: straight L, left half turn R, straight L, left half turn R. */
function oval(L: number, R: number): Loop {
  return {
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [
      { id: "a", kind: "straight", length: L },
      { id: "b", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
      { id: "c", kind: "straight", length: L },
      { id: "d", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
    ],
  };
}

describe("layout geometry", () => {
  it("a closed oval's lap is 2L + 2 pi R and it closes exactly", () => {
    // Exact geometry (a half circle of radius R is pi R long): common practice, no source needed.
    const g = layoutGeometry(oval(30, 8));
    expect(g.lapLength).toBeCloseTo(2 * 30 + 2 * Math.PI * 8, 9);
    expect(g.closure.gap).toBeLessThan(1e-9);
    expect(g.closure.headingDeg).toBe(0);
  });

  it("removing a section leaves the expected gap", () => {
    // Without the back straight the second half turn ends at (L, 0): a gap of L, heading closed.
    const withoutStraight = oval(30, 8);
    withoutStraight.sections.splice(2, 1);
    const g1 = layoutGeometry(withoutStraight);
    expect(g1.closure.gap).toBeCloseTo(30, 9);
    expect(g1.closure.headingDeg).toBeCloseTo(0, 9);
    // Without the last half turn the lap ends at (0, 2R) pointing back along -X: 2R and 180 deg.
    const withoutTurn = oval(30, 8);
    withoutTurn.sections.pop();
    const g2 = layoutGeometry(withoutTurn);
    expect(g2.closure.gap).toBeCloseTo(16, 9);
    expect(Math.abs(g2.closure.headingDeg)).toBeCloseTo(180, 9);
  });

  it("a quarter turn left of radius R ends at (R, R) heading +Y", () => {
    const p = advancePose({ x: 0, y: 0, heading: 0 }, (Math.PI / 2) * 5, 1 / 5);
    expect(p.x).toBeCloseTo(5, 12);
    expect(p.y).toBeCloseTo(5, 12);
    expect(p.heading).toBeCloseTo(Math.PI / 2, 12);
    const q = advancePose({ x: 0, y: 0, heading: 0 }, (Math.PI / 2) * 5, -1 / 5);
    expect(q.y).toBeCloseTo(-5, 12);
  });

  it("samples at most 0.1 m apart with a sample on every section boundary", () => {
    const g = layoutGeometry(oval(30.05, 8));
    const { line } = g;
    for (let i = 1; i < line.count; i++) {
      const step = line.s[i] - line.s[i - 1];
      expect(step).toBeGreaterThan(0);
      expect(step).toBeLessThanOrEqual(0.1 + 1e-12);
      // Plan chord between samples is never longer than the arc between them.
      expect(Math.hypot(line.x[i] - line.x[i - 1], line.y[i] - line.y[i - 1])).toBeLessThanOrEqual(
        step + 1e-9,
      );
    }
    for (let k = 0; k < g.sections.length; k++) {
      expect(line.s[line.sectionStart[k]]).toBeCloseTo(g.sections[k].startS, 12);
      expect(line.x[line.sectionStart[k]]).toBeCloseTo(g.sections[k].start.x, 9);
    }
    expect(line.s[line.count - 1]).toBeCloseTo(g.lapLength, 12);
  });

  it("edges lie half the width either side of the centre line", () => {
    const g = layoutGeometry(oval(30, 8));
    const e = trackEdges(g.line, 3);
    for (let i = 0; i < g.line.count; i += 37) {
      expect(Math.hypot(e.leftX[i] - e.rightX[i], e.leftY[i] - e.rightY[i])).toBeCloseTo(3, 12);
    }
    // Left of the first (eastbound) straight is +Y.
    expect(e.leftY[10]).toBeCloseTo(1.5, 12);
  });

  it("carries jump heights onto the centre line", () => {
    const jump: LayoutSection = {
      id: "j",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.4,
      faceAngleDeg: 30,
      tableLength: 2,
      landingAngleDeg: 25,
    };
    const loop = oval(30, 8);
    loop.sections.splice(1, 0, jump);
    const g = layoutGeometry(loop);
    const p = jumpProfile(jump);
    const first = g.line.sectionStart[1];
    for (let i = first; i < g.line.sectionStart[2]; i++)
      expect(g.line.z[i]).toBeCloseTo(profileHeightAt(p, g.line.s[i] - 30), 12);
    expect(Math.max(...g.line.z)).toBeCloseTo(0.4, 12);
    expect(g.lapLength).toBeCloseTo(60 + 16 * Math.PI + p.length, 9);
  });

  it("finds the nearest centre-line sample", () => {
    const g = layoutGeometry(oval(30, 8));
    const n = nearestSample(g.line, 12.02, -2);
    expect(n.s).toBeCloseTo(12, 9);
    expect(n.distance).toBeCloseTo(Math.hypot(0.02, 2), 9);
  });

  it("wraps angles to (-pi, pi]", () => {
    expect(wrapAngle(3 * Math.PI)).toBeCloseTo(Math.PI, 12);
    expect(wrapAngle(-Math.PI)).toBeCloseTo(Math.PI, 12);
    expect(wrapAngle(2 * Math.PI + 0.1)).toBeCloseTo(0.1, 12);
  });
});
