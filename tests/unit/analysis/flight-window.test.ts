import { describe, expect, it } from "vitest";
import { flyJump } from "~/analysis/flight/flight";
import { speedToLandAt, speedWindow, sweetSpotSpeed } from "~/analysis/flight/flight-window";

const rad = (d: number) => (d * Math.PI) / 180;

describe("speed to land at a point", () => {
  it("a 90.0 m range at 30 deg needs 31.9 m/s", () => {
    // OpenStax University Physics Vol. 1 (2016), section 4.3, Example 4.9 (g = 9.80)
    const surface = [
      { x: -1, z: 0 },
      { x: 500, z: 0 },
    ];
    const v = speedToLandAt(
      { faceAngleRad: rad(30), lip: { x: 0, z: 0 }, surface, g: 9.8, maxSpeed: 60 },
      90,
    );
    expect(v).not.toBeNull();
    expect(v!).toBeCloseTo(31.9, 1);
    expect(v!).toBeCloseTo(Math.sqrt((9.8 * 90) / Math.sin(rad(60))), 5);
  });
});

describe("speed window of a tabletop", () => {
  const jump = {
    faceAngleRad: Math.atan(0.2),
    lip: { x: 0, z: 0.4 },
    surface: [
      { x: -2, z: 0 },
      { x: 0, z: 0.4 },
      { x: 3, z: 0.4 },
      { x: 5, z: 0 },
      { x: 10, z: 0 },
    ],
    landingRamp: { start: 3, end: 5 },
  };

  it("its edges land on the ends of the landing ramp", () => {
    const w = speedWindow(jump)!;
    expect(w.maxIsSearchLimit).toBe(false);
    expect(flyJump({ ...jump, speed: w.min }).landing.x).toBeCloseTo(3, 4);
    expect(flyJump({ ...jump, speed: w.max }).landing.x).toBeCloseTo(5, 4);
    expect(flyJump({ ...jump, speed: w.min - 0.02 }).landedOn).toBe("short");
    expect(flyJump({ ...jump, speed: w.max + 0.02 }).landedOn).toBe("overshoot");
    expect(w.max).toBeGreaterThan(w.min);
  });

  it("the sweet spot lands one third of the way down the ramp and lies inside the window", () => {
    const w = speedWindow(jump)!;
    const v = sweetSpotSpeed(jump)!;
    expect(flyJump({ ...jump, speed: v }).landing.x).toBeCloseTo(3 + 2 / 3, 4);
    expect(v).toBeGreaterThan(w.min);
    expect(v).toBeLessThan(w.max);
  });

  it("no window when the ramp is out of reach, and a bad ramp is refused", () => {
    expect(speedWindow({ ...jump, maxSpeed: 5 })).toBeNull();
    expect(() => speedWindow({ ...jump, landingRamp: { start: 5, end: 3 } })).toThrow(/landingRamp/);
  });
});

describe("speed window of a double with drag", () => {
  // Face up 0.5 m over 1.2 m, a 3 m gap, the second hump's face, then the landing down-slope.
  const jump = {
    faceAngleRad: Math.atan(0.5 / 1.2),
    lip: { x: 0, z: 0.5 },
    surface: [
      { x: -1.2, z: 0 },
      { x: 0, z: 0.5 },
      { x: 1, z: 0 },
      { x: 3, z: 0 },
      { x: 4, z: 0.5 },
      { x: 5.5, z: 0 },
      { x: 12, z: 0 },
    ],
    landingRamp: { start: 4, end: 5.5 },
    drag: { massKg: 1.6, cdA: 0.03 },
  };

  it("below the window the car hits the second face; drag asks for a little more speed", () => {
    const w = speedWindow(jump)!;
    const short = flyJump({ ...jump, speed: w.min - 0.05 });
    expect(short.landedOn).toBe("short");
    expect(short.landing.surfaceSlopeRad).toBeGreaterThan(0);
    const noDrag = speedWindow({ ...jump, drag: undefined })!;
    expect(w.min).toBeGreaterThan(noDrag.min);
    expect(w.min / noDrag.min - 1).toBeLessThan(0.05);
  });
});
