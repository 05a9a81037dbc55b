import { describe, expect, it } from "vitest";
import { bearingDeg, bearingDms, metres } from "~/lib/build-pack-format";
import { buildPackQuerySchema } from "~/lib/schemas/build-pack";

describe("build pack number formats", () => {
  it("prints metres to the millimetre without a negative zero, and bearings in 0 to 360", () => {
    expect(metres(12.3456)).toBe("12.346");
    expect(metres(-0.0001)).toBe("0.000");
    expect(bearingDeg(359.99999)).toBe("0.0000");
    expect(bearingDeg(36.19321)).toBe("36.1932");
  });

  it("gives degrees, minutes and seconds", () => {
    // Worked by hand: 36.1932° = 36° + 0.1932 × 60 = 11.592' = 11' + 0.592 × 60 = 35.5".
    expect(bearingDms(36.1932)).toBe(`36°11'35.5"`);
    expect(bearingDms(359.99999)).toBe(`0°00'00.0"`);
    expect(bearingDms(90)).toBe(`90°00'00.0"`);
  });
});

describe("build pack settings", () => {
  it("reads decimal commas and blanks, and names the missing half of a latitude and longitude", () => {
    const ok = buildPackQuerySchema.safeParse({ spacing: "2,5", lat: "", lon: "", a: "corner-2" });
    expect(ok.success && ok.data).toMatchObject({ spacing: 2.5, a: "corner-2" });
    const half = buildPackQuerySchema.safeParse({ lon: "-1.2" });
    expect(half.success).toBe(false);
    expect(half.error?.issues.map((i) => i.path.join("."))).toEqual(["lat"]);
    const typed = buildPackQuerySchema.safeParse({ b: "xy", by: "3" });
    expect(typed.error?.issues.map((i) => i.path.join("."))).toEqual(["bx"]);
  });
});
