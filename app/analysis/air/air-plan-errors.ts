/**
 * The driver's errors on a set-up plan (docs/decisions/0104 and 0111): each steering switch, the
 * pulse's press and release, and the takeoff speed, each moved alone through the full attitude
 * model; from those the timing windows, the success rate per skill level and the error that
 * matters most (air-plan-robustness.ts).
 */
import type { AttitudeCar } from "./attitude";
import { pulseTimeline, type PitchPulse } from "./air-plan-pulse";
import type { PlanSim } from "./air-plan-refine";
import {
  landingModel,
  mainErrors,
  PROBE_SHIFTS,
  PULSE_SHIFTS,
  SPEED_SHIFTS,
  successRates,
  timingWindows,
  type CleanLanding,
  type SkillSigmas,
} from "./air-plan-robustness";
import type { ErrorSource } from "../words";
import { simulateAttitude } from "./attitude";
import type { AirPlan } from "./air-plan-types";

export interface PlanErrorInput {
  sim: PlanSim;
  car: AttitudeCar;
  speed: number;
  airtime: number;
  takeoffPitch: number;
  steering: Array<[number, number]>;
  pulse: PitchPulse;
  /** Change of airtime per m/s of takeoff speed, s per m/s. */
  airtimePerSpeed: number;
  clean: CleanLanding;
  sigmas: SkillSigmas;
  speedSigmas: SkillSigmas;
  seed: number;
}

/** Step of the probing simulations, s (differences from 1 ms steps about 1e-3 deg). */
const PROBE_DT = 0.008;
/** Shortest airtime a speed error may leave, s. */
const MIN_AIRTIME = 0.05;

/** Timing windows, success rates and the main error of a plan. */
export function planErrors(
  k: PlanErrorInput,
): Pick<
  AirPlan,
  "switches" | "pulseSwitches" | "timingWindowMs" | "successRate" | "successAlone" | "mainError"
> {
  const { sim, steering, pulse } = k;
  const accel = pulseTimeline(pulse);
  const hasPulse = accel.length === 2;
  const errors: { source: ErrorSource; shifts: readonly number[] }[] = [
    ...steering.map(() => ({ source: "steering" as const, shifts: PROBE_SHIFTS })),
    ...(hasPulse ? [0, 1].map(() => ({ source: "pulse" as const, shifts: PULSE_SHIFTS })) : []),
    { source: "speed", shifts: SPEED_SHIFTS },
  ];
  const n = steering.length;
  const landing = (r: { rollRad: number; pitchRad: number }) => ({ roll: r.rollRad, pitch: r.pitchRad });
  const landingWith = (index: number, shift: number) => {
    if (index < n) {
      const moved = steering.map(
        ([t, v], i) => [Math.max(0, i === index ? t + shift : t), v] as [number, number],
      );
      moved.sort((x, y) => x[0] - y[0]);
      return landing(sim(moved, accel, PROBE_DT));
    }
    if (hasPulse && index < n + 2) {
      let on = accel[0][0];
      let off = accel[1][0];
      if (index === n) on = Math.min(off, Math.max(0, on + shift));
      else off = Math.max(on, off + shift);
      const moved: Array<[number, number]> =
        off > on
          ? [
              [on, pulse.wheelAccel],
              [off, 0],
            ]
          : [];
      return landing(sim(steering, moved, PROBE_DT));
    }
    const speed = k.speed + shift;
    const duration = Math.max(MIN_AIRTIME, k.airtime + k.airtimePerSpeed * shift);
    return landing(
      simulateAttitude(k.car, {
        speed: Math.max(0.1, speed),
        duration,
        steering,
        rearWheelAccel: accel,
        dt: PROBE_DT,
        initialPitchRad: k.takeoffPitch,
      }),
    );
  };
  const base = sim(steering, accel, PROBE_DT);
  const model = landingModel(base.rollRad, base.pitchRad, errors, landingWith);
  const steeringIdx = steering.map((_, i) => i);
  // A set-up succeeds when it lands flat (roll): the pitch is the pulse's business, needed with
  // or without a set-up; the pulse's own windows say how far it may move with the pitch in tolerance.
  const flat: CleanLanding = { ...k.clean, pitchTol: null };
  const switches = timingWindows(
    model,
    steeringIdx,
    steering.map(([t]) => t),
    flat,
  );
  const pulseSwitches = hasPulse ? timingWindows(model, [n, n + 1], [accel[0][0], accel[1][0]], k.clean) : [];
  const all = [...switches, ...pulseSwitches];
  const timingWindowMs = all.length ? Math.min(...all.map((s) => s.earlyMs + s.lateMs)) : 0;
  const rates = successRates(model, flat, k.sigmas, k.speedSigmas, k.seed);
  return {
    switches,
    pulseSwitches,
    timingWindowMs,
    successRate: rates.rate,
    successAlone: rates.alone,
    mainError: mainErrors(rates),
  };
}
