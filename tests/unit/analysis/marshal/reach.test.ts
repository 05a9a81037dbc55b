import { describe, expect, it } from "vitest";
import { jumpProfile, type JumpProfile } from "~/analysis/track/jump-profile";
import { escapeReach, overshootReach, stoppingDistance } from "~/analysis/marshal/reach";

const RAD = Math.PI / 180;

/** A lip at ground level with flat ground beyond it: a projectile launched from level ground. */
function levelLaunch(angleDeg: number): JumpProfile {
  const a = angleDeg * RAD;
  return {
    d: [0, 1, 2],
    h: [-Math.tan(a), 0, 0],
    lipIndex: 1,
    landingStartIndex: 1,
    landingEndIndex: 2,
    length: 2,
    faceAngle: a,
    sweetSpot: 1.5,
  };
}

describe("overshoot reach: ballistic flight to first ground contact, then the roll-out", () => {
  it("flies as far as the textbook range: 31.9 m/s at 30 deg reaches 90.0 m", () => {
    // OpenStax University Physics Vol. 1 (2016), section 4.3, Example 4.9 (g = 9.80 m/s^2).
    const r = overshootReach(levelLaunch(30), 31.9, 8, 9.8);
    expect(r.flightDistance).toBeCloseTo(90.0, 0);
    expect(Math.abs(r.flightDistance - 90.0)).toBeLessThan(0.1);
    // Time of flight on level ground 2 v sin(a) / g (same section, projectile motion).
    expect(r.airtime).toBeCloseTo((2 * 31.9 * Math.sin(30 * RAD)) / 9.8, 9);
  });

  it("off a raised lip lands where the range formula for a landing h below launch says", () => {
    // Range with the landing h below the launch: x = v cos a (v sin a + sqrt(v^2 sin^2 a + 2 g h)) / g,
    // from y = h + v sin(a) t - g t^2 / 2 = 0 (OpenStax University Physics Vol. 1, section 4.3).
    const table = jumpProfile({
      id: "t",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.45,
      faceAngleDeg: 30,
      tableLength: 4,
      landingAngleDeg: 25,
    });
    const g = 9.81;
    const v = 12;
    const a = 30 * RAD;
    const h = 0.45;
    const x = ((v * Math.cos(a)) / g) * (v * Math.sin(a) + Math.sqrt(v * v * Math.sin(a) ** 2 + 2 * g * h));
    const r = overshootReach(table, v, 8, g);
    expect(x).toBeCloseTo(13.449, 3);
    expect(r.flightDistance).toBeCloseTo(x, 6);
    // On flat ground the vertical part of the speed is lost: the car rolls on at v cos a.
    expect(r.rollOutSpeed).toBeCloseTo(v * Math.cos(a), 9);
    // Stopping distance v^2 / (2 a), from v^2 = v0^2 + 2 a (x - x0) (OpenStax University Physics
    // Vol. 1, section 3.4, motion with constant acceleration).
    expect(r.stoppingDistance).toBeCloseTo((v * Math.cos(a)) ** 2 / (2 * 8), 9);
    expect(r.reach).toBeCloseTo(r.flightDistance + r.stoppingDistance, 9);
    // Landing on flat ground: EFH = the apex height above that ground, h + (v sin a)^2 / (2 g)
    // (derived from the EFH definition of Levy, Hubbard, McNeil & Swedberg 2015).
    expect(r.equivalentFallHeight).toBeCloseTo(h + (v * Math.sin(a)) ** 2 / (2 * g), 9);
  });

  it("a slower takeoff lands on the ramp with a gentler landing and a shorter reach", () => {
    const table = jumpProfile({
      id: "t",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.45,
      faceAngleDeg: 30,
      tableLength: 4,
      landingAngleDeg: 25,
    });
    const slow = overshootReach(table, 7.3, 8);
    const fast = overshootReach(table, 12, 8);
    expect(slow.reach).toBeLessThan(fast.reach);
    expect(slow.equivalentFallHeight).toBeLessThan(fast.equivalentFallHeight);
  });
});

describe("escape reach past a turn and the stopping distance", () => {
  it("is v^2 / (2 a): 12 m/s under 8 m/s^2 stops in 9 m (OpenStax University Physics Vol. 1, section 3.4)", () => {
    expect(stoppingDistance(12, 8)).toBe(9);
    expect(escapeReach(12, 8)).toEqual({ speed: 12, reach: 9 });
    expect(() => stoppingDistance(12, 0)).toThrow(/decel/);
  });
});
