/**
 * The brake or throttle pulse that supplies the pitch rotation a flight needs (engine.md
 * section 5). Changing the driven wheels' spin by dW hands their angular momentum change to the
 * chassis: the pitch rate changes by J dW / Iyy (J: spin inertia of the driven wheels, in
 * rear-wheel terms), and that rate acts until touchdown. A pulse has a start, a strength (a share
 * of the car's full brake or full throttle) and a length; the set-up search (air-plan-joint.ts)
 * tries several starts and strengths together with the steering.
 */
import type { AttitudeCar } from "./attitude";

export type PulseKind = "brake" | "throttle" | "none";

export interface PitchPulse {
  kind: PulseKind;
  /** Start, s after takeoff. */
  start: number;
  /** Length, s. */
  duration: number;
  /** Driven-wheel angular acceleration during the pulse, rad/s^2 (negative = brake). */
  wheelAccel: number;
  /** Share of the car's full brake or full throttle, 0..1 (0 for no pulse). */
  strength: number;
  /** True when the car's limits (wheel stopped, motor top speed) cannot supply all of it. */
  limited: boolean;
  /** True when a brake pulse stops the wheels before it ends (holding it longer changes nothing). */
  stopsWheels: boolean;
}

/** Car data the pulse needs beyond the attitude model. */
export interface PulseLimits {
  /** Largest driven-wheel angular acceleration at full throttle, rad/s^2. */
  maxWheelAccel?: number;
  /** Largest driven-wheel angular deceleration on full brake (positive), rad/s^2. */
  maxWheelBrake?: number;
}

/** Pitch changes smaller than this (rad) get no pulse. */
export const PULSE_THRESHOLD_RAD = (0.5 * Math.PI) / 180;
/** Defaults when a car gives no limits, rad/s^2 (estimates). */
const DEFAULT_BRAKE = 3000;
const DEFAULT_THROTTLE = 2500;

/** Spin inertia driven by the rear-wheel acceleration, in rear-wheel terms, kg m^2. */
export function drivenSpinInertia(car: AttitudeCar): number {
  const rear = 2 * car.rearWheel.spinInertia;
  if (car.drive !== "4wd") return rear;
  return rear + 2 * car.frontWheel.spinInertia * (car.rearWheel.radius / car.frontWheel.radius);
}

/** The pulse that does nothing, starting at `start` s. */
export function noPulse(start: number): PitchPulse {
  return {
    kind: "none",
    start,
    duration: 0,
    wheelAccel: 0,
    strength: 0,
    limited: false,
    stopsWheels: false,
  };
}

/**
 * The pulse of the given strength starting at `start` s that changes the pitch by
 * `pitchChangeRad` (nose up positive) by `airtime` s, as short as that allows, within the
 * wheels' limits.
 * @param speed takeoff speed, m/s (the wheels start at speed / radius)
 * @param strength share of the full brake or throttle, (0, 1] (default 1)
 */
export function pitchPulse(
  car: AttitudeCar & PulseLimits,
  speed: number,
  airtime: number,
  pitchChangeRad: number,
  start: number,
  strength = 1,
): PitchPulse {
  const none = noPulse(start);
  if (Math.abs(pitchChangeRad) < PULSE_THRESHOLD_RAD || airtime <= start) return none;
  const brake = pitchChangeRad < 0;
  const share = Math.min(1, Math.max(1e-3, strength));
  const accel =
    share * (brake ? -(car.maxWheelBrake ?? DEFAULT_BRAKE) : (car.maxWheelAccel ?? DEFAULT_THROTTLE));
  const J = drivenSpinInertia(car);
  const iyy = car.inertia[1];
  const w0 = speed / car.rearWheel.radius;
  // Largest spin change: down to a stopped wheel, or up to the motor's top speed.
  const wTop = car.topSpeed ? car.topSpeed / car.rearWheel.radius : Infinity;
  const maxChange = brake ? w0 : Math.max(0, wTop - w0);
  if (J <= 0 || maxChange <= 0) return { ...none, limited: true };
  // Pitch change of a pulse of length d: (J a d / Iyy) (T - start - d / 2) = target.
  const span = airtime - start;
  const c = (pitchChangeRad * iyy) / (J * accel); // > 0
  const disc = span * span - 2 * c;
  let d = disc >= 0 ? span - Math.sqrt(disc) : span;
  let limited = disc < 0;
  const dMax = maxChange / Math.abs(accel);
  let stopsWheels = false;
  if (d >= dMax) {
    limited = limited || d > dMax + 1e-9;
    d = dMax;
    stopsWheels = brake;
  }
  return {
    kind: brake ? "brake" : "throttle",
    start,
    duration: d,
    wheelAccel: accel,
    strength: share,
    limited,
    stopsWheels,
  };
}

/**
 * Pitch change (rad) a pulse supplies by `airtime` s, from its length and strength:
 * (J a d / Iyy) (T - start - d / 2). The steering adds a little of its own (air-plan.ts).
 */
export function pulseSupplied(car: AttitudeCar, airtime: number, p: PitchPulse): number {
  if (p.kind === "none") return 0;
  return (
    ((drivenSpinInertia(car) * p.wheelAccel * p.duration) / car.inertia[1]) *
    (airtime - p.start - p.duration / 2)
  );
}

/** The pulse as a wheel acceleration timeline [[t s, rad/s^2], ...] for the attitude model. */
export function pulseTimeline(p: PitchPulse): Array<[number, number]> {
  if (p.kind === "none" || p.duration <= 0) return [];
  return [
    [p.start, p.wheelAccel],
    [p.start + p.duration, 0],
  ];
}

/** Shares of full brake or throttle the joint search tries (full, about a third, a tenth). */
export const PULSE_STRENGTHS: readonly number[] = [1, 0.35, 0.12];

/**
 * Pulses the joint search tries: each strength in PULSE_STRENGTHS started at `starts` s, each
 * sized for the wanted pitch change (or as much of it as the car can give from that start).
 */
export function pulseCandidates(
  car: AttitudeCar & PulseLimits,
  speed: number,
  airtime: number,
  pitchChangeRad: number,
  starts: readonly number[],
): PitchPulse[] {
  if (Math.abs(pitchChangeRad) < PULSE_THRESHOLD_RAD) return [];
  const out: PitchPulse[] = [];
  for (const start of starts)
    for (const strength of PULSE_STRENGTHS) {
      const p = pitchPulse(car, speed, airtime, pitchChangeRad, start, strength);
      if (p.kind !== "none" && p.start + p.duration < airtime) out.push(p);
    }
  return out;
}
