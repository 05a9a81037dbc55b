import { describe, expect, it } from "vitest";
import { equivalentFallHeight, flyJump, groundAt, type ProfilePoint } from "~/analysis/flight/flight";
import { odexSolve } from "./odex-reference";

const flat = (z = 0): ProfilePoint[] => [
  { x: -1, z },
  { x: 2000, z },
];
const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;

describe("flyJump against textbook projectile examples", () => {
  it("70.0 m/s at 75.0 deg reaches 233 m at 6.90 s", () => {
    // OpenStax University Physics Vol. 1 (2016), section 4.3, Example 4.7 (g = 9.80)
    const r = flyJump({ speed: 70, faceAngleRad: rad(75), lip: { x: 0, z: 0 }, surface: flat(), g: 9.8 });
    expect(r.apex.z).toBeCloseTo(233, 0);
    expect(r.apex.t).toBeCloseTo(6.9, 2);
    expect(r.airtime).toBeCloseTo(2 * 6.9, 1);
  });

  it("30 m/s at 45 deg landing 10.0 m above launch: 3.79 s, 26.5 m/s, 36.9 deg below horizontal", () => {
    // OpenStax University Physics Vol. 1 (2016), section 4.3, Example 4.8 (g = 9.80)
    const surface = [
      { x: 0, z: 0 },
      { x: 60, z: 0 },
      { x: 61, z: 10 },
      { x: 200, z: 10 },
    ];
    const r = flyJump({ speed: 30, faceAngleRad: rad(45), lip: { x: 0, z: 0 }, surface, g: 9.8 });
    expect(r.airtime).toBeCloseTo(3.79, 2);
    expect(r.landing.z).toBeCloseTo(10, 9);
    expect(r.landing.speed).toBeCloseTo(26.5, 1);
    expect(deg(r.landing.flightPathRad)).toBeCloseTo(-36.9, 1);
    expect(r.segmentIndex).toBe(2);
  });
});

describe("equivalent fall height", () => {
  it("landing on flat ground at takeoff height gives EFH equal to the apex height", () => {
    // Derived from Levy, Hubbard, McNeil & Swedberg (2015), Sports Engineering 18:227-239
    const r = flyJump({ speed: 8, faceAngleRad: rad(35), lip: { x: 0, z: 0 }, surface: flat() });
    expect(r.landing.equivalentFallHeight).toBeCloseTo(r.apex.z, 9);
    expect(r.landing.z).toBeCloseTo(0, 9);
  });

  it("a touchdown tangent to the surface gives EFH 0", () => {
    // Derived from the EFH definition in Levy et al. (2015): the normal speed vanishes
    expect(equivalentFallHeight(7, rad(-32), rad(-32))).toBeCloseTo(0, 12);
    expect(equivalentFallHeight(7, rad(-32), rad(-31))).toBeGreaterThan(0);
  });

  it("6 m/s at 30 deg onto a 25 deg down-slope through (3.0, 0): t 0.6956 s, (3.6144, -0.2865), EFH 0.0821 m", () => {
    // Derived check listed in engine.md from the EFH formula of Levy et al. (2015), g = 9.81
    const surface = [
      { x: 0, z: 0 },
      { x: 3, z: 0 },
      { x: 10, z: -7 * Math.tan(rad(25)) },
    ];
    const r = flyJump({ speed: 6, faceAngleRad: rad(30), lip: { x: 0, z: 0 }, surface });
    expect(r.airtime).toBeCloseTo(0.6956, 4);
    expect(r.landing.x).toBeCloseTo(3.6144, 4);
    expect(r.landing.z).toBeCloseTo(-0.2865, 4);
    expect(r.landing.equivalentFallHeight).toBeCloseTo(0.0821, 4);
    expect(deg(r.landing.surfaceSlopeRad)).toBeCloseTo(-25, 9);
    const viaFormula = equivalentFallHeight(
      r.landing.speed,
      r.landing.flightPathRad,
      r.landing.surfaceSlopeRad,
    );
    expect(r.landing.equivalentFallHeight).toBeCloseTo(viaFormula, 12);
  });
});

describe("ground profiles", () => {
  const tabletop = [
    { x: -2, z: 0 },
    { x: 0, z: 0.4 },
    { x: 3, z: 0.4 },
    { x: 5, z: 0 },
    { x: 10, z: 0 },
  ];
  it("a slow car lands short on the table top, a faster one on the landing, a fast one beyond", () => {
    const base = {
      faceAngleRad: Math.atan(0.2),
      lip: { x: 0, z: 0.4 },
      surface: tabletop,
      landingRamp: { start: 3, end: 5 },
    };
    expect(flyJump({ ...base, speed: 3 }).landedOn).toBe("short");
    expect(flyJump({ ...base, speed: 9 }).landedOn).toBe("ramp");
    const far = flyJump({ ...base, speed: 12 });
    expect(far.landedOn).toBe("overshoot");
    expect(far.beyondProfile).toBe(false);
    const veryFar = flyJump({ ...base, speed: 16 });
    expect(veryFar.beyondProfile).toBe(true);
    expect(veryFar.landing.z).toBeCloseTo(0, 9);
  });

  it("hits the face of an up-slope landing short of its top", () => {
    const stepUp = [
      { x: 0, z: 0 },
      { x: 2, z: 0 },
      { x: 3, z: 0.8 },
      { x: 6, z: 0.8 },
    ];
    const r = flyJump({ speed: 6, faceAngleRad: rad(25), lip: { x: 0, z: 0 }, surface: stepUp });
    expect(r.segmentIndex).toBe(1);
    expect(r.landing.x).toBeGreaterThan(2);
    expect(r.landing.x).toBeLessThan(3);
    expect(groundAt(stepUp, r.landing.x).z).toBeCloseTo(r.landing.z, 9);
    expect(deg(r.landing.surfaceSlopeRad)).toBeCloseTo(deg(Math.atan(0.8)), 9);
  });

  it("refuses a surface that rises above the takeoff path at the lip and unordered points", () => {
    const steep = [
      { x: 0, z: 0 },
      { x: 1, z: 2 },
    ];
    expect(() => flyJump({ speed: 5, faceAngleRad: rad(30), lip: { x: 0, z: 0 }, surface: steep })).toThrow(
      /rises/,
    );
    const unordered = [
      { x: 0, z: 0 },
      { x: 0, z: 1 },
    ];
    expect(() =>
      flyJump({ speed: 5, faceAngleRad: rad(30), lip: { x: 0, z: 0 }, surface: unordered }),
    ).toThrow(/surface\[1\]\.x/);
  });
});

describe("flight with quadratic drag", () => {
  const surface = flat(-0.5);
  const base = { speed: 12, faceAngleRad: rad(30), lip: { x: 0, z: 0 }, surface };

  it("vanishing drag reproduces the exact parabola", () => {
    const exact = flyJump(base);
    const tiny = flyJump({ ...base, drag: { massKg: 1e9, cdA: 0.03 } });
    expect(tiny.landing.x).toBeCloseTo(exact.landing.x, 6);
    expect(tiny.airtime).toBeCloseTo(exact.airtime, 8);
  });

  it("agrees with an adaptive Gragg-Bulirsch-Stoer reference integration", () => {
    // Reference: odex (npm), a port of Hairer & Wanner's ODEX extrapolation solver
    const drag = { massKg: 1.6, cdA: 0.03, airDensity: 1.225 };
    const r = flyJump({ ...base, drag });
    const k = (0.5 * drag.airDensity * drag.cdA) / drag.massKg;
    const f = (_t: number, y: number[]) => {
      const v = Math.hypot(y[2], y[3]);
      return [y[2], y[3], -k * v * y[2], -9.81 - k * v * y[3]];
    };
    const y0 = [0, 0, 12 * Math.cos(rad(30)), 12 * Math.sin(rad(30))];
    const ref = odexSolve(f, 0, y0, r.airtime);
    expect(r.landing.x).toBeCloseTo(ref[0], 6);
    expect(ref[1]).toBeCloseTo(-0.5, 6);
    // drag shortens the jump by a few percent at these speeds (engine.md section 3)
    const exact = flyJump(base);
    const loss = 1 - r.landing.x / exact.landing.x;
    expect(loss).toBeGreaterThan(0.01);
    expect(loss).toBeLessThan(0.1);
  });
});
