import { describe, expect, it } from "vitest";
import { planAirSetup } from "~/analysis/air/air-plan";
import { nutationPeriod } from "~/analysis/air/air-plan-linear";
import { DEFAULT_SKILL_SIGMAS, DEFAULT_SPEED_SIGMAS } from "~/analysis/air/air-plan-robustness";
import { simulateAttitude } from "~/analysis/air/attitude";
import { CAR_PRESETS, CAR_PRESET_IDS } from "~/analysis/format/cars";
import { seededNormal } from "~/analysis/math/vec";

const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;

describe("mid-air set-up plan", () => {
  it.each(CAR_PRESET_IDS)(
    "%s: replayed through the attitude model, the plan gives the landing it reports",
    (id) => {
      const car = CAR_PRESETS[id];
      const plan = planAirSetup({ car, speed: 11, airtime: 0.7, turn: "right", pitchChangeRad: rad(-25) });
      expect(plan.feasible).toBe(true);
      const replay = simulateAttitude(car, {
        speed: 11,
        duration: 0.7,
        steering: plan.steering,
        rearWheelAccel: plan.rearWheelAccel,
      });
      expect(replay.yawRad).toBeCloseTo(plan.yawRad, 12);
      expect(replay.pitchRad).toBeCloseTo(plan.pitchRad, 12);
      expect(replay.rollRad).toBeCloseTo(plan.rollRad, 12);
      // It lands flat, nose toward the turn, and the pulse brings the pitch round.
      expect(Math.abs(plan.rollRad)).toBeLessThanOrEqual(plan.rollToleranceRad);
      expect(deg(plan.yawRad)).toBeLessThan(-5);
      expect(deg(plan.yawRad)).toBeGreaterThan(-45.25);
      expect(plan.pitchPulse.kind).toBe("brake");
      expect(Math.abs(deg(plan.pitchRad) + 25)).toBeLessThan(0.6);
      // Wheels straight again before touchdown.
      const last = plan.steering[plan.steering.length - 1];
      expect(last[1]).toBe(0);
      expect(last[0] + 0.5 / (Math.PI / 3 / car.servoSecondsPer60)).toBeLessThan(0.7);
    },
  );

  it.each(CAR_PRESET_IDS)(
    "%s: a right-hand turn is set up by steering left first (common practice, no source)",
    (id) => {
      // Holds in the model for flights shorter than about 0.6 of the wheels' nutation period
      // (docs/decisions/0103); checked here at 0.45 and 0.55 of it, at two speeds. (Much shorter flights leave
      // no room for a plan that lands flat: the planner then reports it as not feasible.)
      const car = CAR_PRESETS[id];
      for (const speed of [8, 13]) {
        for (const share of [0.45, 0.55]) {
          const airtime = share * nutationPeriod(car, speed);
          const plan = planAirSetup({ car, speed, airtime, turn: "right" });
          expect(plan.feasible).toBe(true);
          expect(plan.steering[0][1]).toBeGreaterThan(0);
          expect(deg(plan.yawRad)).toBeLessThan(-2);
        }
      }
    },
  );

  it("a left-hand turn gets the mirror image of the right-hand plan", () => {
    const car = CAR_PRESETS["buggy-2wd-10"];
    const right = planAirSetup({ car, speed: 10, airtime: 0.6, turn: "right" });
    const left = planAirSetup({ car, speed: 10, airtime: 0.6, turn: "left" });
    expect(left.steering.length).toBe(right.steering.length);
    left.steering.forEach(([t, a], i) => {
      expect(t).toBeCloseTo(right.steering[i][0], 6);
      expect(a).toBeCloseTo(-right.steering[i][1], 6);
    });
    expect(left.yawRad).toBeCloseTo(-right.yawRad, 6);
    expect(left.successRate.club).toBeCloseTo(right.successRate.club, 2);
  });

  it("never turns the nose past the turn's angle", () => {
    const plan = planAirSetup({
      car: CAR_PRESETS["sct-10"],
      speed: 10,
      airtime: 0.8,
      turn: "left",
      turnAngleRad: rad(15),
    });
    expect(plan.feasible).toBe(true);
    expect(deg(plan.yawRad)).toBeGreaterThan(10);
    expect(deg(plan.yawRad)).toBeLessThan(15.3);
  });

  it("timing windows match full simulations at their edges", () => {
    const car = CAR_PRESETS["buggy-4wd-10"];
    const input = { car, speed: 10, airtime: 0.6, turn: "right" as const };
    const plan = planAirSetup(input);
    const rollAt = (i: number, shift: number) => {
      const steering = plan.steering.map(
        ([t, a], k) => [Math.max(0, k === i ? t + shift : t), a] as [number, number],
      );
      steering.sort((x, y) => x[0] - y[0]);
      return deg(simulateAttitude(car, { speed: 10, duration: 0.6, steering }).rollRad);
    };
    const tol = deg(plan.rollToleranceRad);
    plan.switches.forEach((s, i) => {
      if (s.lateMs < 150) expect(Math.abs(rollAt(i, s.lateMs / 1000))).toBeCloseTo(tol, 0);
      if (s.lateMs > 12) expect(Math.abs(rollAt(i, (s.lateMs - 10) / 1000))).toBeLessThan(tol);
      if (s.earlyMs < s.t * 1000 - 1) expect(Math.abs(rollAt(i, -s.earlyMs / 1000))).toBeCloseTo(tol, 0);
    });
    expect(plan.timingWindowMs).toBe(
      Math.min(...[...plan.switches, ...plan.pulseSwitches].map((s) => s.earlyMs + s.lateMs)),
    );
    expect(plan.timingWindowMs).toBeGreaterThan(10);
  });

  it("success rates agree with a seeded Monte Carlo over full simulations with every error", () => {
    // Reference: 300 full attitude simulations per skill level, each with every steering switch
    // and both pulse edges moved by an independent normal timing error and the takeoff speed by
    // its spread (the airtime following it), against the plan's additive-model estimate.
    const car = CAR_PRESETS["sct-10"];
    const input = {
      car,
      speed: 10,
      airtime: 0.8,
      turn: "right" as const,
      pitchChangeRad: rad(-30),
      takeoffPitchRad: rad(25),
      airtimePerSpeed: 0.1,
    };
    const plan = planAirSetup(input);
    expect(plan.pulseSwitches).toHaveLength(2);
    // The plan samples the engine's default spreads; the reference uses the same.
    const sigmas = DEFAULT_SKILL_SIGMAS;
    const spread = DEFAULT_SPEED_SIGMAS;
    const [on, off] = plan.rearWheelAccel;
    for (const level of ["novice", "club", "expert"] as const) {
      const z = seededNormal(4242);
      let ok = 0;
      const n = 300;
      for (let k = 0; k < n; k++) {
        const steering = plan.steering.map(
          ([t, a]) => [Math.max(0, t + sigmas[level] * z()), a] as [number, number],
        );
        steering.sort((x, y) => x[0] - y[0]);
        const press = Math.max(0, on[0] + sigmas[level] * z());
        const release = Math.max(press, off[0] + sigmas[level] * z());
        const dv = spread[level] * z();
        const r = simulateAttitude(car, {
          speed: 10 + dv,
          duration: 0.8 + 0.1 * dv,
          steering,
          rearWheelAccel: [
            [press, on[1]],
            [release, 0],
          ],
          initialPitchRad: rad(25),
          dt: 0.002,
        });
        if (Math.abs(r.rollRad) <= plan.rollToleranceRad) ok++;
      }
      expect(Math.abs(plan.successRate[level] - ok / n)).toBeLessThan(0.08);
    }
    expect(plan.successRate.expert).toBeGreaterThan(plan.successRate.club);
    expect(plan.successRate.club).toBeGreaterThan(plan.successRate.novice);
    // Each source alone spoils no more landings than all of them together.
    for (const source of ["steering", "pulse", "speed"] as const)
      expect(plan.successAlone[source].club).toBeGreaterThanOrEqual(plan.successRate.club - 0.02);
    const main = plan.mainError.club!;
    for (const source of ["steering", "pulse", "speed"] as const)
      expect(plan.successAlone[main].club).toBeLessThanOrEqual(plan.successAlone[source].club);
  });

  it("is deterministic for a seed", () => {
    const input = { car: CAR_PRESETS["buggy-8"], speed: 12, airtime: 0.7, turn: "left" as const, seed: 7 };
    expect(planAirSetup(input)).toEqual(planAirSetup(input));
  });

  it("reports when no plan fits, and refuses bad input naming the field", () => {
    const car = CAR_PRESETS["buggy-2wd-10"];
    const short = planAirSetup({ car, speed: 10, airtime: 0.15, turn: "right" });
    expect(short.feasible).toBe(false);
    expect(short.reason).toBe("not-enough-airtime");
    expect(short.steering).toEqual([]);
    const still = planAirSetup({
      car: { ...car, frontWheel: { ...car.frontWheel, spinInertia: 0 } },
      speed: 10,
      airtime: 0.8,
      turn: "right",
    });
    expect(still.reason).toBe("no-wheel-spin");
    expect(() => planAirSetup({ car, speed: 10, airtime: -1, turn: "right" })).toThrow(/airtime/);
    expect(() => planAirSetup({ car, speed: 10, airtime: 1, turn: "up" as "left" })).toThrow(/turn/);
  });
});
