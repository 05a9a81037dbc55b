/**
 * The brake or throttle pulse that supplies the pitch rotation a flight needs (engine.md
 * section 5). Changing the driven wheels' spin by dW hands their angular momentum change to the
 * chassis: the pitch rate changes by J dW / Iyy (J: spin inertia of the driven wheels, in
 * rear-wheel terms), and that rate acts until touchdown.
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
  /** True when the car's limits (wheel stopped, motor top speed) cannot supply all of it. */
  limited: boolean;
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

/** Spin inertia driven by the rear-wheel acceleration, in rear-wheel terms, kg m^2. */
export function drivenSpinInertia(car: AttitudeCar): number {
  const rear = 2 * car.rearWheel.spinInertia;
  if (car.drive !== "4wd") return rear;
  return rear + 2 * car.frontWheel.spinInertia * (car.rearWheel.radius / car.frontWheel.radius);
}

/**
 * The shortest full-strength pulse starting at `start` s that changes the pitch by
 * `pitchChangeRad` (nose up positive) by `airtime` s, within the wheels' limits.
 * @param speed takeoff speed, m/s (the wheels start at speed / radius)
 */
export function pitchPulse(
  car: AttitudeCar & PulseLimits,
  speed: number,
  airtime: number,
  pitchChangeRad: number,
  start: number,
): PitchPulse {
  const none: PitchPulse = { kind: "none", start, duration: 0, wheelAccel: 0, limited: false };
  if (Math.abs(pitchChangeRad) < PULSE_THRESHOLD_RAD || airtime <= start) return none;
  const brake = pitchChangeRad < 0;
  const accel = brake ? -(car.maxWheelBrake ?? 3000) : (car.maxWheelAccel ?? 2500);
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
  if (d > dMax) {
    d = dMax;
    limited = true;
  }
  return { kind: brake ? "brake" : "throttle", start, duration: d, wheelAccel: accel, limited };
}

/** The pulse as a wheel acceleration timeline [[t s, rad/s^2], ...] for the attitude model. */
export function pulseTimeline(p: PitchPulse): Array<[number, number]> {
  if (p.kind === "none" || p.duration <= 0) return [];
  return [
    [p.start, p.wheelAccel],
    [p.start + p.duration, 0],
  ];
}
