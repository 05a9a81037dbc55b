import { describe, expect, it } from "vitest";
import { hatchSegments, type XY } from "~/lib/hatch";

const len = ([a, b]: [XY, XY]) => Math.hypot(b[0] - a[0], b[1] - a[1]);

describe("hatchSegments", () => {
  it("fills a 10 x 10 square with horizontal lines 1 apart, each 10 long", () => {
    const square: XY[] = [
      [0, 0],
      [10, 0],
      [10, 10],
      [0, 10],
    ];
    const lines = hatchSegments(square, 1, 0);
    expect(lines.length).toBeGreaterThanOrEqual(10);
    for (const l of lines) expect(len(l)).toBeCloseTo(10, 9);
  });

  it("hatches at 45 degrees with a total length of about area / spacing, inside the shape", () => {
    const square: XY[] = [
      [0, 0],
      [20, 0],
      [20, 20],
      [0, 20],
    ];
    const lines = hatchSegments(square, 0.5, 45);
    const total = lines.reduce((t, l) => t + len(l), 0);
    // Area 400 over spacing 0.5: 800, give or take a line at each end.
    expect(total).toBeGreaterThan(780);
    expect(total).toBeLessThan(820);
    for (const [a, b] of lines)
      for (const [x, y] of [a, b]) {
        expect(x).toBeGreaterThanOrEqual(-1e-9);
        expect(x).toBeLessThanOrEqual(20 + 1e-9);
        expect(y).toBeGreaterThanOrEqual(-1e-9);
        expect(y).toBeLessThanOrEqual(20 + 1e-9);
      }
  });

  it("leaves the notch of an L shape empty (two pieces on a line across it)", () => {
    const ell: XY[] = [
      [0, 0],
      [10, 0],
      [10, 4],
      [4, 4],
      [4, 10],
      [0, 10],
    ];
    const across = hatchSegments(ell, 1, 90).filter(([a]) => Math.abs(a[0] - 7) < 1e-9);
    expect(across).toHaveLength(1);
    const ys = [across[0][0][1], across[0][1][1]].sort((p, q) => p - q);
    expect(ys[0]).toBeCloseTo(0, 9);
    expect(ys[1]).toBeCloseTo(4, 9);
  });

  it("gives nothing for a degenerate shape or spacing", () => {
    expect(
      hatchSegments(
        [
          [0, 0],
          [1, 1],
        ],
        1,
      ),
    ).toEqual([]);
    expect(
      hatchSegments(
        [
          [0, 0],
          [1, 0],
          [0, 1],
        ],
        0,
      ),
    ).toEqual([]);
  });
});
