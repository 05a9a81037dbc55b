import { describe, expect, it } from "vitest";
import { planAirSetup } from "~/analysis/air/air-plan";
import { buildLinearGuide } from "~/analysis/air/air-plan-linear";
import { guideLanding } from "~/analysis/air/air-plan-search";
import { compileWheel } from "~/analysis/air/attitude-inputs";
import { simulateAttitude } from "~/analysis/air/attitude";
import { CAR_PRESETS } from "~/analysis/format/cars";

const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;
const car2 = CAR_PRESETS["buggy-2wd-10"];
const car4 = CAR_PRESETS["buggy-4wd-10"];

/** The long double into a hairpin of the summer demo layout, as the 4wd buggy flies it. */
const HAIRPIN_DOUBLE = {
  car: car4,
  speed: 8.9,
  airtime: 1.055,
  turn: "left" as const,
  turnAngleRad: rad(45),
  pitchChangeRad: rad(-57),
  takeoffPitchRad: rad(35),
};

describe("the linear guide with a brake or throttle pulse", () => {
  it("predicts the full model's landing roll and yaw for small steering, pulse early or late", () => {
    // Reference: the full gyrostat model (attitude.ts) at 1 ms steps.
    for (const car of [car2, car4]) {
      for (const pulse of [
        [
          [0.03, -3000],
          [0.0525, 0],
        ],
        [
          [0.6, -3000],
          [0.7, 0],
        ],
      ] as [number, number][][]) {
        const wheel = compileWheel(pulse, 8.9 / car.rearWheel.radius, Infinity);
        const guide = buildLinearGuide(car, 8.9, 1.055, wheel, rad(35));
        const base = simulateAttitude(car, {
          speed: 8.9,
          duration: 1.055,
          rearWheelAccel: pulse,
          initialPitchRad: rad(35),
        });
        expect(deg(guide.pitchChange)).toBeCloseTo(deg(base.pitchRad) - 35, 0);
        for (const [a, m, u] of [
          [0.05, 0.3, 3],
          [0.3, 0.6, 3],
          [0.6, 0.9, -3],
        ]) {
          const out = [0, 0];
          guideLanding(guide, { a, m, b: m, u1: rad(u), u2: 0, single: true }, out);
          const full = simulateAttitude(car, {
            speed: 8.9,
            duration: 1.055,
            steering: [
              [a, rad(u)],
              [m, 0],
            ],
            rearWheelAccel: pulse,
            initialPitchRad: rad(35),
          });
          expect(Math.abs(deg(out[0]) - deg(full.rollRad))).toBeLessThan(0.15);
          expect(Math.abs(deg(out[1]) - deg(full.yawRad))).toBeLessThan(0.15);
        }
      }
    }
  });
});

describe("pitch and yaw planned together", () => {
  it("the joint plan replayed through the attitude model gives the landing it reports", () => {
    const plan = planAirSetup(HAIRPIN_DOUBLE);
    expect(plan.feasible).toBe(true);
    const replay = simulateAttitude(car4, {
      speed: 8.9,
      duration: 1.055,
      steering: plan.steering,
      rearWheelAccel: plan.rearWheelAccel,
      initialPitchRad: plan.takeoffPitchRad,
    });
    expect(replay.yawRad).toBeCloseTo(plan.yawRad, 12);
    expect(replay.pitchRad).toBeCloseTo(plan.pitchRad, 12);
    expect(replay.rollRad).toBeCloseTo(plan.rollRad, 12);
    // Lands flat, nose toward the turn, pitched like the landing (world frame: 35 - 57 = -22 deg).
    expect(Math.abs(plan.rollRad)).toBeLessThanOrEqual(plan.rollToleranceRad);
    expect(deg(plan.pitchRad)).toBeCloseTo(-22, 0);
    expect(plan.pitchAimRad).toBeCloseTo(rad(-57), 9);
  });

  it("a 4wd car levelled by a brake still turns: the search moves and softens the pulse", () => {
    // A full brake right after takeoff slows all four wheels, front ones included, and leaves
    // little spin to turn the car with; the joint search finds a pulse that leaves the turn.
    const plan = planAirSetup({ ...HAIRPIN_DOUBLE, value: undefined });
    expect(plan.feasible).toBe(true);
    expect(deg(plan.yawRad)).toBeGreaterThan(15);
    const p = plan.pitchPulse;
    expect(p.kind).toBe("brake");
    expect(p.strength).toBeLessThan(1);
    expect(p.strength).toBeGreaterThan(0);
    // Within the car's limits, between takeoff and touchdown.
    expect(Math.abs(p.wheelAccel)).toBeLessThanOrEqual(car4.maxWheelBrake * p.strength + 1e-9);
    expect(p.start).toBeGreaterThanOrEqual(0);
    expect(p.start + p.duration).toBeLessThan(1.055);
  });

  it("when levelling costs the turn, the plan says what turning alone gives and what it gives up", () => {
    // The 4wd buggy on the summer layout's table into a hairpin: 0.56 s, nose down 52 deg.
    const input = {
      car: car4,
      speed: 5.61,
      airtime: 0.5625,
      turn: "right" as const,
      turnAngleRad: rad(45),
      pitchChangeRad: rad(-52),
      takeoffPitchRad: rad(27),
    };
    const plan = planAirSetup(input);
    const alone = plan.withoutLevelling!;
    expect(alone).not.toBeNull();
    const levelled = plan.feasible ? Math.abs(deg(plan.yawRad)) : 0;
    expect(Math.abs(deg(alone.yawRad))).toBeGreaterThan(levelled + 2);
    expect(deg(alone.yawRad)).toBeLessThan(0); // toward the right-hand turn
    // What it gives up: it lands far from the landing's pitch (27 - 52 = -25 deg).
    expect(deg(alone.pitchRad) + 25).toBeGreaterThan(20);
    // Turning alone is a plan in its own right: its steering replays to its landing.
    const replay = simulateAttitude(car4, {
      speed: 5.61,
      duration: 0.5625,
      steering: alone.steering,
      initialPitchRad: rad(27),
    });
    expect(replay.yawRad).toBeCloseTo(alone.yawRad, 12);
    expect(Math.abs(replay.rollRad)).toBeLessThanOrEqual(plan.rollToleranceRad);
    // The trade-off runs from turning alone to levelling fully, the turn shrinking as the pitch grows.
    expect(plan.tradeOff.length).toBeGreaterThanOrEqual(2);
    expect(plan.tradeOff[0].pitchChangeRad).toBe(0);
    expect(plan.tradeOff.at(-1)!.pitchChangeRad).toBeCloseTo(plan.pitchAimRad, 9);
    expect(plan.tradeOff[0].yawRad).toBeGreaterThan(plan.tradeOff.at(-1)!.yawRad);
    if (!plan.feasible) expect(plan.reason).toBe("levelling-costs-turn");
  });

  it("for the 2wd buggy, 10 m/s, 0.7 s, right turn, the plan without a pitch change still starts by steering away from the turn", () => {
    // Steering left turns the nose right in the air (common practice, no source).
    const plan = planAirSetup({ car: car2, speed: 10, airtime: 0.7, turn: "right" });
    expect(plan.feasible).toBe(true);
    expect(plan.pitchPulse.kind).toBe("none");
    expect(plan.steering[0][1]).toBeGreaterThan(0);
    expect(deg(plan.yawRad)).toBeLessThan(-2);
  });

  it("says not enough airtime only when the flight leaves no room to steer", () => {
    const short = planAirSetup({
      car: car2,
      speed: 10,
      airtime: 0.15,
      turn: "right",
      pitchChangeRad: rad(-20),
    });
    expect(short.reason).toBe("not-enough-airtime");
    // A long flight that levelling leaves without a turn is not called short of airtime.
    const levelling = planAirSetup({ ...HAIRPIN_DOUBLE, pitchChangeRad: rad(-150) });
    expect(levelling.reason).not.toBe("not-enough-airtime");
  });

  it("told what a turn is worth, it turns the nose less when that lands clean more often", () => {
    const free = planAirSetup({ car: car2, speed: 8.92, airtime: 1.06, turn: "left", turnAngleRad: rad(45) });
    const valued = planAirSetup({
      car: car2,
      speed: 8.92,
      airtime: 1.06,
      turn: "left",
      turnAngleRad: rad(45),
      airtimePerSpeed: 0.27,
      value: { secondsPerRad: 3 / 5.5, failCost: 3, minYawRad: rad(10) },
    });
    expect(Math.abs(valued.yawRad)).toBeLessThan(Math.abs(free.yawRad));
    expect(Math.abs(deg(valued.yawRad))).toBeGreaterThan(9.5);
    expect(valued.successRate.expert).toBeGreaterThan(free.successRate.expert);
  });
});

describe("the driver's errors", () => {
  it("the takeoff speed's spread lowers the success rate, and is named when it matters most", () => {
    const input = { ...HAIRPIN_DOUBLE, airtimePerSpeed: 0.27 };
    const steady = planAirSetup({ ...input, speedSigmas: { novice: 0.001, club: 0.001, expert: 0.001 } });
    const spread = planAirSetup(input);
    expect(spread.steering).toEqual(steady.steering);
    expect(spread.successRate.expert).toBeLessThan(steady.successRate.expert);
    expect(steady.successAlone.speed.expert).toBeGreaterThan(0.99);
    expect(spread.mainError.club).toBe("speed");
    expect(spread.successAlone.speed.club).toBeLessThan(spread.successAlone.steering.club);
  });

  it("the pulse's press and release get timing windows, with the pitch kept within its tolerance", () => {
    const plan = planAirSetup(HAIRPIN_DOUBLE);
    expect(plan.pulseSwitches.map((s) => s.t)).toEqual(plan.rearWheelAccel.map(([t]) => t));
    const [press] = plan.pulseSwitches;
    const late = press.lateMs / 1000;
    if (press.lateMs < 150) {
      const r = simulateAttitude(car4, {
        speed: 8.9,
        duration: 1.055,
        steering: plan.steering,
        rearWheelAccel: [
          [plan.rearWheelAccel[0][0] + late, plan.rearWheelAccel[0][1]],
          [plan.rearWheelAccel[1][0], 0],
        ],
        initialPitchRad: rad(35),
      });
      const offPitch = Math.abs(deg(r.pitchRad) - deg(plan.takeoffPitchRad + plan.pitchAimRad));
      const offRoll = Math.abs(deg(r.rollRad));
      // At the window's edge the landing is at one of its tolerances (within half a degree).
      expect(Math.min(Math.abs(offPitch - 10), Math.abs(offRoll - 5))).toBeLessThan(0.5);
    }
  });
});
