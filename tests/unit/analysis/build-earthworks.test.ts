import { describe, expect, it } from "vitest";
import { earthworks, profileEarth, truckLoads } from "~/analysis/build/earthworks";
import type { LayoutDocument } from "~/analysis/format/layout-document";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";

/** A straight, a tabletop and a straight: the tabletop of docs/examples/example-oval.json. */
const TABLETOP_ONLY: Pick<LayoutDocument, "start" | "sections" | "trackWidth"> = {
  start: { x: 0, y: 0, headingDeg: 0 },
  trackWidth: 3,
  sections: [
    { id: "in", kind: "straight", length: 5 },
    {
      id: "table",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.4,
      faceAngleDeg: 30,
      tableLength: 2.5,
      landingAngleDeg: 25,
    },
    { id: "out", kind: "straight", length: 5 },
  ],
};

describe("earthworks", () => {
  it("a tabletop's earth matches the prism formula worked by hand", () => {
    // Worked by hand (prism and wedge volumes, school geometry):
    //   height H = 0.4 m, face run a = H / tan 30° = 0.692820 m, landing run b = H / tan 25° = 0.857803 m,
    //   table T = 2.5 m, track width W = 3 m, side slopes at the mounds' back angle θ = 40°,
    //   cot 40° = 1.191754.
    // Long section (a trapezoid): A = H (T + (a + b) / 2) = 0.4 × (2.5 + 0.775311) = 1.310125 m².
    // Main prism across the track: W A = 3 × 1.310125 = 3.930374 m³.
    // Two side slopes, each a triangle of area h² cot θ / 2 per metre: along the table
    //   H² cot θ T / 2 each, along the face and the landing (h rising linearly) H² cot θ (a + b) / 6
    //   each; both sides: H² cot θ (T + (a + b) / 3) = 0.16 × 1.191754 × 3.017541 = 0.575259 m³.
    // Total V = 3.930374 + 0.575259 = 4.505633 m³; in 2 m³ loads: 4.505633 / 2 = 2.25, so 3 loads.
    const result = earthworks(TABLETOP_ONLY, 2);
    expect(result.jumps).toHaveLength(1);
    const [jump] = result.jumps;
    expect(jump.fillSection).toBeCloseTo(1.310125, 5);
    expect(jump.fill).toBeCloseTo(4.505633, 5);
    expect(jump.cut).toBe(0);
    expect(jump.fillLoads).toBe(3);
    expect(jump.maxHeight).toBeCloseTo(0.4, 12);
    expect(result.fill).toBeCloseTo(4.505633, 5);
    expect(result.fillLoads).toBe(3);
  });

  it("counts a dip below the ground as cut, splitting a piece where it crosses the ground", () => {
    // Worked by hand: a V-shaped dip 0.5 m deep over 2 m, W = 3 m, θ = 40°:
    //   ∫|h| = 2 × 0.5 / 2 = 0.5 m², ∫h² = 2 × (1 × 0.25 / 3) = 0.166667 m³/m,
    //   cut = 3 × 0.5 + 1.191754 × 0.166667 = 1.698626 m³.
    const dip = profileEarth([0, 1, 2], [0, -0.5, 0], 3);
    expect(dip.cut).toBeCloseTo(1.698626, 5);
    expect(dip.fill).toBe(0);
    expect(dip.cutSection).toBeCloseTo(0.5, 12);
    // A piece from +0.2 to -0.2 over 1 m crosses at its middle: two triangles of 0.05 m² each.
    const cross = profileEarth([0, 1], [0.2, -0.2], 2);
    expect(cross.fillSection).toBeCloseTo(0.05, 12);
    expect(cross.cutSection).toBeCloseTo(0.05, 12);
    expect(cross.fill).toBeCloseTo(cross.cut, 12);
  });

  it("gives every jump of the summer layout a volume and totals the whole loads of the sum", () => {
    const result = earthworks(SUMMER_LAYOUT, 6);
    expect(result.jumps).toHaveLength(9);
    for (const j of result.jumps) {
      expect(j.fill).toBeGreaterThan(0);
      // Never less than the bare prism of the long section over the track width.
      expect(j.fill).toBeGreaterThanOrEqual(j.fillSection * SUMMER_LAYOUT.trackWidth);
    }
    const sum = result.jumps.reduce((t, j) => t + j.fill, 0);
    expect(result.fill).toBeCloseTo(sum, 9);
    expect(result.fillLoads).toBe(Math.ceil(sum / 6));
  });

  it("rounds loads up and refuses a truck load out of range", () => {
    expect(truckLoads(6, 6)).toBe(1);
    expect(truckLoads(6.01, 6)).toBe(2);
    expect(truckLoads(0, 6)).toBe(0);
    expect(() => earthworks(TABLETOP_ONLY, 0)).toThrow(/truck load/);
  });
});
