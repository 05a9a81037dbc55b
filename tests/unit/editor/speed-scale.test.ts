import { describe, expect, it } from "vitest";
import { binStyle, legendTicks, scaleColour, speedBin, speedRuns } from "~/lib/editor/speed-scale";

describe("speed scale", () => {
  it("bins speeds between the range ends, clamping outside", () => {
    expect(speedBin(2, 2, 14, 12)).toBe(0);
    expect(speedBin(14, 2, 14, 12)).toBe(11);
    expect(speedBin(8.5, 2, 14, 12)).toBe(6);
    expect(speedBin(-5, 2, 14, 12)).toBe(0);
    expect(speedBin(5, 3, 3, 12)).toBe(0);
  });

  it("gets wider and changes colour as speed grows (not colour alone)", () => {
    expect(binStyle(11).width).toBeGreaterThan(binStyle(0).width);
    expect(binStyle(0).colour).not.toBe(binStyle(11).colour);
    expect(scaleColour(0)).toBe("rgb(43, 92, 138)");
    expect(scaleColour(1)).toBe("rgb(163, 38, 27)");
  });

  it("joins samples of the same bin into runs that share their end samples", () => {
    expect(speedRuns([2, 2, 2, 14, 14, 2], 2, 14, 12)).toEqual([
      { bin: 0, from: 0, to: 3 },
      { bin: 11, from: 3, to: 5 },
    ]);
    expect(speedRuns([2, 2, 2], 2, 14, 12)).toEqual([{ bin: 0, from: 0, to: 2 }]);
    expect(legendTicks(2, 14)).toEqual([2, 5, 8, 11, 14]);
  });
});
