import { describe, expect, it } from "vitest";
import type { LayoutDocument, LayoutSection } from "~/analysis/format/layout-document";
import { CAR_PRESETS } from "~/analysis/format/cars";
import { layoutGeometry } from "~/analysis/track/geometry";
import { jumpProfile } from "~/analysis/track/jump-profile";
import { ballisticJumpWindow, ballisticTouchdown, speedToReach } from "~/analysis/track/lap-jumps";
import { cornerSpeed, lapSpeed, minimumTurnRadius, type LapCar } from "~/analysis/track/speed";

const DEG = Math.PI / 180;
const buggy = CAR_PRESETS["buggy-2wd-10"];

function oval(L: number, R: number, extra: LayoutSection[] = []): Pick<LayoutDocument, "start" | "sections"> {
  return {
    start: { x: 0, y: 0, headingDeg: 0 },
    sections: [
      { id: "a", kind: "straight", length: L },
      { id: "b", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
      ...extra,
      { id: "c", kind: "straight", length: L },
      { id: "d", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
    ],
  };
}

/** Index of the sample nearest a lap distance. */
function at(line: { s: Float64Array; count: number }, s: number): number {
  let best = 0;
  for (let i = 0; i < line.count; i++) if (Math.abs(line.s[i] - s) < Math.abs(line.s[best] - s)) best = i;
  return best;
}

describe("turn speed", () => {
  it("flat curve: v = sqrt(mu g R)", () => {
    // OpenStax College Physics, section 6.3 "Centripetal Force", worked example: a car on an
    // unbanked 500.0 m radius curve at 25.00 m/s needs mu_s = 0.13 (g = 9.80 m/s^2).
    const car: LapCar = { ...buggy, topSpeed: 100 };
    expect(cornerSpeed({ ...car, mu: 0.13 }, 500, 9.8)).toBeCloseTo(25.0, 0);
    expect(cornerSpeed({ ...car, mu: 1 }, 5, 9.81)).toBeCloseTo(Math.sqrt(49.05), 12);
    // Grip does not limit where top speed does.
    expect(cornerSpeed({ ...car, topSpeed: 10, mu: 1 }, 100)).toBe(10);
  });

  it("in a lap the car holds sqrt(mu g R) through the middle of a turn", () => {
    const g = layoutGeometry(oval(30, 6));
    const lap = lapSpeed(g, buggy);
    const mid = at(g.line, 30 + 3 * Math.PI);
    expect(lap.speed[mid]).toBeCloseTo(Math.sqrt(buggy.mu * 9.81 * 6), 9);
  });

  it("a turn tighter than the car can steer is capped at its minimum radius and reported", () => {
    // Kinematic bicycle model R = L / tan(delta): Lynch & Park, Modern Robotics (2017).
    const car: LapCar = { ...buggy, wheelbase: 0.5, steeringLockRad: 20 * DEG };
    const rMin = 0.5 / Math.tan(20 * DEG);
    expect(minimumTurnRadius(car)).toBeCloseTo(rMin, 12);
    const g = layoutGeometry(oval(30, 1));
    const lap = lapSpeed(g, car);
    expect(lap.speed[at(g.line, 30 + Math.PI / 2)]).toBeCloseTo(Math.sqrt(car.mu * 9.81 * rMin), 9);
    expect(lap.tightTurns.map((t) => t.sectionId)).toEqual(["b", "d"]);
  });
});

describe("forward and backward passes", () => {
  const L = 80;
  const R = 6;
  const g = layoutGeometry(oval(L, R));
  const lap = lapSpeed(g, buggy);
  const vc = Math.sqrt(buggy.mu * 9.81 * R);
  const start = L + Math.PI * R; // start of the back straight "c"

  it("accelerates out of a turn as a(v) = a0 (1 - v / vTop) gives", () => {
    // Exact integral of v dv/ds = a0 (1 - v/vT) (derived from the model's own equation):
    // s = (vT / a0) [vT ln((vT - v1) / (vT - v2)) - (v2 - v1)].
    const vT = buggy.topSpeed;
    const a0 = buggy.accel0;
    const i1 = at(g.line, start);
    const i2 = at(g.line, start + 15);
    const v1 = lap.speed[i1];
    const v2 = lap.speed[i2];
    expect(lap.speed[i1 - 1]).toBeCloseTo(vc, 9);
    const s = (vT / a0) * (vT * Math.log((vT - v1) / (vT - v2)) - (v2 - v1));
    expect(Math.abs(s - (g.line.s[i2] - g.line.s[i1])) / 15).toBeLessThan(0.01);
  });

  it("brakes into a turn at the car's deceleration: v^2 = vc^2 + 2 b d", () => {
    // Constant acceleration kinematics, OpenStax University Physics Vol. 1, section 3.4.
    const entry = L + Math.PI * R + L; // start of turn "d"
    const d = 2;
    const i = at(g.line, entry - d);
    expect(lap.speed[i]).toBeCloseTo(Math.sqrt(vc * vc + 2 * buggy.brakeDecel * (entry - g.line.s[i])), 9);
  });

  it("lap time of an ideal car is 2L / vTop + 2 pi R / vc", () => {
    // An idealised car that changes speed almost at once (the limit of the model).
    const ideal: LapCar = { ...buggy, accel0: 1e7, brakeDecel: 1e7, topSpeed: 12 };
    const t = lapSpeed(g, ideal).lapTime;
    const expected = (2 * L) / 12 + (2 * Math.PI * R) / vc;
    expect(Math.abs(t - expected) / expected).toBeLessThan(0.005);
  });

  it("refuses a car with a missing or impossible number, naming it", () => {
    expect(() => lapSpeed(g, { ...buggy, mu: Number.NaN })).toThrow("car.mu");
    expect(() => lapSpeed(g, { ...buggy, brakeDecel: 0 })).toThrow("car.brakeDecel");
  });

  it("every class gives finite speeds within its top speed", () => {
    for (const car of Object.values(CAR_PRESETS)) {
      const r = lapSpeed(g, car);
      expect(r.lapTime).toBeGreaterThan(0);
      expect(r.minSpeed).toBeGreaterThan(0);
      expect(r.maxSpeed).toBeLessThanOrEqual(car.topSpeed + 1e-9);
    }
  });
});

describe("jump ballistics (drag-free)", () => {
  it("speed to reach a point matches textbook projectile examples", () => {
    // OpenStax University Physics Vol. 1, section 4.3, Example 4.9: a 90.0 m range at 30 deg needs 31.9 m/s.
    expect(speedToReach(90, 0, 30 * DEG, 9.8)).toBeCloseTo(31.9, 1);
    // Example 4.8: 30 m/s at 45 deg lands 10.0 m above launch after 3.79 s (so 80.4 m ahead).
    expect(speedToReach(30 * Math.cos(45 * DEG) * 3.79, 10, 45 * DEG, 9.8)).toBeCloseTo(30, 1);
    expect(speedToReach(1, 2, 30 * DEG)).toBeNull();
  });

  it("flies the range formula over flat ground at lip height", () => {
    // Range R = v^2 sin(2 theta) / g: OpenStax University Physics Vol. 1, section 4.3.
    const s: LayoutSection = {
      id: "p",
      kind: "jump",
      preset: "custom",
      profile: [
        [0, 0],
        [1, Math.tan(30 * DEG)],
        [60, Math.tan(30 * DEG)],
        [61, 0],
      ],
      lipIndex: 1,
      landingStartIndex: 2,
      landingEndIndex: 3,
    };
    const p = jumpProfile(s);
    const td = ballisticTouchdown(p, 8, 9.81);
    expect(td.d - 1).toBeCloseTo((64 * Math.sin(60 * DEG)) / 9.81, 9);
    expect(td.airtime).toBeCloseTo((2 * 8 * Math.sin(30 * DEG)) / 9.81, 9);
  });

  it("the speed window brackets the sweet spot, and each lands where it says", () => {
    const p = jumpProfile({
      id: "t",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.45,
      faceAngleDeg: 30,
      tableLength: 3,
      landingAngleDeg: 25,
    });
    const w = ballisticJumpWindow(p);
    expect(w.windowMin!).toBeLessThan(w.sweetSpotSpeed!);
    expect(w.sweetSpotSpeed!).toBeLessThan(w.windowMax!);
    expect(ballisticTouchdown(p, w.windowMin!).d).toBeCloseTo(p.d[p.landingStartIndex], 4);
    expect(ballisticTouchdown(p, w.sweetSpotSpeed!).d).toBeCloseTo(p.sweetSpot, 4);
    expect(ballisticTouchdown(p, w.windowMax!).d).toBeCloseTo(p.d[p.landingEndIndex], 4);
  });
});

describe("jumps in the lap", () => {
  const table: LayoutSection = {
    id: "table",
    kind: "jump",
    preset: "tabletop",
    faceHeight: 0.45,
    faceAngleDeg: 30,
    tableLength: 3,
    landingAngleDeg: 25,
  };

  it("a jump on a long straight is taken at the sweet-spot speed and lands on the sweet spot", () => {
    const loop = oval(40, 6, [
      { id: "run", kind: "straight", length: 25 },
      table,
      { id: "out", kind: "straight", length: 20 },
    ]);
    loop.sections[2] = { id: "run", kind: "straight", length: 25 };
    const g = layoutGeometry(loop);
    const lap = lapSpeed(g, buggy);
    const j = lap.jumps[0];
    const p = jumpProfile(table);
    expect(j.sectionId).toBe("table");
    expect(j.approachMaxSpeed).toBeGreaterThan(j.sweetSpotSpeed!);
    expect(j.plannedTakeoffSpeed).toBe(j.sweetSpotSpeed);
    expect(j.touchdownD).toBeCloseTo(p.sweetSpot, 4);
    expect(j.airtime).toBeCloseTo(
      (j.touchdownD - p.d[p.lipIndex]) / (j.plannedTakeoffSpeed * Math.cos(30 * DEG)),
      9,
    );
    expect(j.cannotClear).toBe(false);
    expect(j.landingOverspeed).toBe(0);
    const airborne = lap.airborne.reduce((a, b) => a + b, 0) * 0.1;
    expect(airborne).toBeCloseTo(j.touchdownS - j.lipS, 0);
  });

  it("a big jump straight out of a hairpin cannot be cleared", () => {
    const triple: LayoutSection = {
      id: "triple",
      kind: "jump",
      preset: "triple",
      faceHeight: 0.45,
      faceAngleDeg: 30,
      gap: 7,
      landingHeight: 0.45,
      landingAngleDeg: 25,
    };
    const loop = oval(40, 2.5, [{ id: "run", kind: "straight", length: 1 }, triple]);
    const lap = lapSpeed(layoutGeometry(loop), buggy);
    const j = lap.jumps[0];
    expect(j.cannotClear).toBe(true);
    expect(j.plannedTakeoffSpeed).toBe(j.approachMaxSpeed);
    expect(j.approachMaxSpeed).toBeLessThan(j.windowMin!);
  });

  it("a jump under another jump's flight is reported as flown over", () => {
    const loop = oval(40, 6, [
      { id: "run", kind: "straight", length: 30 },
      table,
      { id: "gap", kind: "straight", length: 1 },
    ]);
    loop.sections.splice(5, 0, {
      id: "small",
      kind: "jump",
      preset: "whoops",
      count: 2,
      bumpHeight: 0.1,
      spacing: 1,
    });
    // No speed window for the table: the car leaves it as fast as the approach allows and flies on.
    const lap = lapSpeed(layoutGeometry(loop), buggy, {
      jumpWindow: (s, p) =>
        s.id === "table"
          ? { windowMin: null, sweetSpotSpeed: null, windowMax: null }
          : ballisticJumpWindow(p),
    });
    const [big, small] = lap.jumps;
    expect(big.plannedTakeoffSpeed).toBe(big.approachMaxSpeed);
    expect(big.touchdownS).toBeGreaterThan(small.lipS);
    expect(small.flownOverBy).toBe("table");
    expect(small.airtime).toBe(0);
    expect(big.flownOverBy).toBeNull();
  });

  it("a landing too fast for the hairpin right after it is reported", () => {
    const loop = oval(40, 6);
    loop.sections[0] = { id: "a", kind: "straight", length: 30 };
    loop.sections.splice(1, 0, {
      id: "big",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 0.6,
      faceAngleDeg: 35,
      tableLength: 6,
      landingAngleDeg: 25,
    });
    loop.sections[2] = { id: "b", kind: "turn", radius: 1.5, angleDeg: 180, direction: "left" };
    const soft: LapCar = { ...buggy, brakeDecel: 2 };
    const lap = lapSpeed(layoutGeometry(loop), soft);
    const j = lap.jumps[0];
    expect(j.landingOverspeed).toBeGreaterThan(1);
    expect(j.landingOverspeed).toBeCloseTo(j.landingSpeed - lap.speed[j.touchdownIndex], 9);
    expect(lap.airborne[j.touchdownIndex]).toBe(0);
    expect(lap.airborne[j.touchdownIndex - 1]).toBe(1);
  });
});
