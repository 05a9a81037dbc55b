/**
 * Car class presets: every parameter the flight, attitude, set-up plan and lap models need.
 * All values are estimates from memory (no car was measured); each preset says so and explains
 * its inertias. Users can replace any of them with measured values in their own car profiles.
 */
import type { AttitudeCar } from "../air/attitude";

/** One wheel with its tyre: rolling radius (m), spin inertia about the axle (kg m^2), mass (kg). */
export interface WheelParams {
  radius: number;
  spinInertia: number;
  massKg: number;
}

/** A car class or a user's car, SI units and radians. */
export interface CarParams extends AttitudeCar {
  id: string;
  label: string;
  /** Ready-to-run mass, kg. */
  massKg: number;
  /** Whole car, wheels included as if locked: [Ixx roll, Iyy pitch, Izz yaw], kg m^2. */
  inertia: readonly [number, number, number];
  /** Axle to axle, m. */
  wheelbase: number;
  /** Tyre centre to tyre centre across an axle, m. */
  track: number;
  frontWheel: WheelParams;
  rearWheel: WheelParams;
  drive: "2wd" | "4wd";
  /** Top speed on the flat, m/s. */
  topSpeed: number;
  /** Standing-start acceleration a0 in a(v) = a0 (1 - v / topSpeed), m/s^2. */
  accel0: number;
  /** Braking deceleration on the ground, m/s^2. */
  brakeDecel: number;
  /** Tyre grip coefficient on the club's usual surface (dimensionless). */
  mu: number;
  /** Drag coefficient times frontal area, m^2. */
  cdA: number;
  /** Largest driven-wheel angular acceleration in the air at full throttle, rad/s^2. */
  maxWheelAccel: number;
  /** Largest driven-wheel angular deceleration in the air on full brake (a positive number), rad/s^2. */
  maxWheelBrake: number;
  /** True when the values are estimates rather than measurements. */
  estimate: boolean;
  /** Where the values come from and how the inertias were reasoned. */
  notes: string;
}

/** A simple mass model: the wheels at the corners, the rest of the mass as a uniform box. */
export interface MassModel {
  massKg: number;
  wheelbase: number;
  track: number;
  frontWheel: { radius: number; massKg: number };
  rearWheel: { radius: number; massKg: number };
  /** The box holding the chassis mass (battery, motor, electronics, shell), m. */
  core: { length: number; width: number; height: number };
}

/** Spin inertia of a wheel and tyre: most mass sits in the tyre near the rim, so about 0.7 m r^2. */
export function wheelSpinInertia(massKg: number, radius: number): number {
  return 0.7 * massKg * radius * radius;
}

/**
 * Principal inertias [Ixx, Iyy, Izz] (kg m^2) of the mass model: the core as a uniform box of the
 * mass left after the four wheels; each wheel a point mass at its corner (axle height taken as the
 * centre-of-mass height) plus its own inertia (0.7 m r^2 about the axle, 0.4 m r^2 across it).
 */
export function estimateInertia(m: MassModel): [number, number, number] {
  const wheelMass = 2 * (m.frontWheel.massKg + m.rearWheel.massKg);
  const core = m.massKg - wheelMass;
  if (!(core > 0)) throw new RangeError("the wheels weigh more than the car");
  const { length: l, width: w, height: h } = m.core;
  let ixx = (core * (w * w + h * h)) / 12;
  let iyy = (core * (l * l + h * h)) / 12;
  let izz = (core * (l * l + w * w)) / 12;
  const x = m.wheelbase / 2;
  const y = m.track / 2;
  for (const wheel of [m.frontWheel, m.rearWheel]) {
    const mw = 2 * wheel.massKg;
    const r2 = wheel.radius * wheel.radius;
    ixx += mw * y * y + 0.4 * mw * r2;
    iyy += mw * x * x + 0.7 * mw * r2;
    izz += mw * (x * x + y * y) + 0.4 * mw * r2;
  }
  return [ixx, iyy, izz];
}

const DEG = Math.PI / 180;

interface PresetSpec
  extends
    MassModel,
    Omit<
      CarParams,
      "inertia" | "frontWheel" | "rearWheel" | "estimate" | "notes" | "casterRad" | "steeringLockRad"
    > {
  casterDeg: number;
  steeringLockDeg: number;
  why: string;
}

function preset(spec: PresetSpec): CarParams {
  const wheel = (w: { radius: number; massKg: number }): WheelParams => ({
    radius: w.radius,
    massKg: w.massKg,
    spinInertia: wheelSpinInertia(w.massKg, w.radius),
  });
  const inertia = estimateInertia(spec);
  const { core, casterDeg, steeringLockDeg, why, ...rest } = spec;
  return {
    ...rest,
    inertia,
    frontWheel: wheel(spec.frontWheel),
    rearWheel: wheel(spec.rearWheel),
    casterRad: casterDeg * DEG,
    steeringLockRad: steeringLockDeg * DEG,
    estimate: true,
    notes:
      `Estimate from memory, not measured. ${why} ` +
      `Inertias from a mass model: the four wheels at the corners, the remaining ` +
      `${(spec.massKg - 2 * (spec.frontWheel.massKg + spec.rearWheel.massKg)).toFixed(2)} kg as a uniform box ` +
      `${core.length} x ${core.width} x ${core.height} m; wheel spin inertia 0.7 m r^2 (tyre mass near the rim, ` +
      `between a disc's 0.5 and a ring's 1.0). Motor rotor and gears are left out of the spin inertia ` +
      `(a few percent of the wheels' angular momentum).`,
  };
}

/** Car class presets by id. Every value is an estimate; see each preset's `notes`. */
export const CAR_PRESETS: Readonly<Record<string, CarParams>> = Object.freeze({
  "buggy-2wd-10": preset({
    id: "buggy-2wd-10",
    label: "1/10 two-wheel-drive buggy",
    massKg: 1.6,
    wheelbase: 0.285,
    track: 0.21,
    frontWheel: { radius: 0.041, massKg: 0.04 },
    rearWheel: { radius: 0.043, massKg: 0.055 },
    core: { length: 0.32, width: 0.13, height: 0.07 },
    casterDeg: 28,
    steeringLockDeg: 32,
    servoSecondsPer60: 0.08,
    drive: "2wd",
    topSpeed: 17,
    accel0: 9,
    brakeDecel: 8,
    mu: 1.0,
    cdA: 0.03,
    maxWheelAccel: 2500,
    maxWheelBrake: 3000,
    why: "Caster 28 deg: 1/10 2wd buggies run roughly 25 to 30 deg (common practice).",
  }),
  "buggy-4wd-10": preset({
    id: "buggy-4wd-10",
    label: "1/10 four-wheel-drive buggy",
    massKg: 1.75,
    wheelbase: 0.29,
    track: 0.21,
    frontWheel: { radius: 0.042, massKg: 0.05 },
    rearWheel: { radius: 0.043, massKg: 0.055 },
    core: { length: 0.32, width: 0.13, height: 0.07 },
    casterDeg: 25,
    steeringLockDeg: 32,
    servoSecondsPer60: 0.08,
    drive: "4wd",
    topSpeed: 17,
    accel0: 11,
    brakeDecel: 9,
    mu: 1.05,
    cdA: 0.03,
    maxWheelAccel: 2000,
    maxWheelBrake: 3000,
    why: "Wider front tyres than the 2wd; the motor drives all four wheels, so throttle and brake act on both axles.",
  }),
  "sct-10": preset({
    id: "sct-10",
    label: "1/10 short-course truck",
    massKg: 1.8,
    wheelbase: 0.33,
    track: 0.25,
    frontWheel: { radius: 0.055, massKg: 0.105 },
    rearWheel: { radius: 0.055, massKg: 0.105 },
    core: { length: 0.36, width: 0.16, height: 0.1 },
    casterDeg: 25,
    steeringLockDeg: 30,
    servoSecondsPer60: 0.09,
    drive: "2wd",
    topSpeed: 15,
    accel0: 7,
    brakeDecel: 7,
    mu: 0.9,
    cdA: 0.06,
    maxWheelAccel: 1500,
    maxWheelBrake: 2000,
    why: "Heavy, large-diameter tyres give far more wheel spin momentum than a buggy; the tall shell adds drag.",
  }),
  "buggy-8": preset({
    id: "buggy-8",
    label: "1/8 buggy",
    massKg: 3.4,
    wheelbase: 0.325,
    track: 0.27,
    frontWheel: { radius: 0.057, massKg: 0.15 },
    rearWheel: { radius: 0.057, massKg: 0.15 },
    core: { length: 0.4, width: 0.16, height: 0.08 },
    casterDeg: 18,
    steeringLockDeg: 33,
    servoSecondsPer60: 0.07,
    drive: "4wd",
    topSpeed: 22,
    accel0: 10,
    brakeDecel: 9,
    mu: 1.0,
    cdA: 0.05,
    maxWheelAccel: 1500,
    maxWheelBrake: 2500,
    why: "Four-wheel drive through three differentials; caster lower than a 1/10 buggy (kick-up plus caster block, from memory).",
  }),
});

/** Preset ids in display order. */
export const CAR_PRESET_IDS = ["buggy-2wd-10", "buggy-4wd-10", "sct-10", "buggy-8"] as const;
export type CarPresetId = (typeof CAR_PRESET_IDS)[number];

/** The preset with this id, or undefined. */
export function carPreset(id: string): CarParams | undefined {
  return Object.prototype.hasOwnProperty.call(CAR_PRESETS, id) ? CAR_PRESETS[id] : undefined;
}
