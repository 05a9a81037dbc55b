/**
 * Car profiles as people enter and exchange them (JSON files, forms): degrees for angles, SI for
 * everything else. Zod schemas for both sides, and conversions to the engine's radians.
 */
import { z } from "zod";
import type { AttitudeCar } from "../air/attitude";
import type { PulseLimits } from "../air/air-plan-pulse";
import { CAR_PRESET_IDS, carPreset, type CarParams } from "./cars";

const positive = (what: string) =>
  z.number({ error: `${what} must be a number` }).positive(`${what} must be above 0`);
const angleDeg = (what: string, max: number) =>
  z
    .number({ error: `${what} must be a number` })
    .min(0, `${what} must be 0 or more`)
    .max(max, `${what} must be at most ${max} deg`);

/** A wheel with its tyre: rolling radius (m), spin inertia about its axle (kg m^2), mass (kg). */
export const wheelSchema = z.object({
  radius: positive("radius").max(0.2, "radius must be at most 0.2 m"),
  spinInertia: z.number({ error: "spinInertia must be a number" }).min(0, "spinInertia must be 0 or more"),
  massKg: positive("massKg").optional(),
});

/** What the attitude model needs (the `attitude` command's car), plus optional drive data. */
export const attitudeCarSchema = z.object({
  inertia: z.tuple([positive("Ixx"), positive("Iyy"), positive("Izz")], {
    error: "inertia must be [Ixx, Iyy, Izz] in kg m^2",
  }),
  frontWheel: wheelSchema,
  rearWheel: wheelSchema,
  casterDeg: angleDeg("casterDeg", 60),
  steeringLockDeg: positive("steeringLockDeg").max(60, "steeringLockDeg must be at most 60 deg"),
  servoSecondsPer60: positive("servoSecondsPer60").max(2, "servoSecondsPer60 must be at most 2 s"),
  drive: z.enum(["2wd", "4wd"], { error: 'drive must be "2wd" or "4wd"' }).optional(),
  topSpeed: positive("topSpeed").optional(),
  maxWheelAccel: positive("maxWheelAccel").optional(),
  maxWheelBrake: positive("maxWheelBrake").optional(),
  wheelbase: positive("wheelbase").optional(),
});
export type AttitudeCarInput = z.infer<typeof attitudeCarSchema>;

/** A complete car profile: every number the flight, attitude, plan and lap models use. */
export const carProfileSchema = attitudeCarSchema.extend({
  label: z.string().trim().min(1, "label must not be empty").max(80, "label must be at most 80 characters"),
  massKg: positive("massKg").max(20, "massKg must be at most 20 kg"),
  wheelbase: positive("wheelbase").max(1, "wheelbase must be at most 1 m"),
  track: positive("track").max(1, "track must be at most 1 m"),
  frontWheel: wheelSchema.extend({ massKg: positive("massKg") }),
  rearWheel: wheelSchema.extend({ massKg: positive("massKg") }),
  drive: z.enum(["2wd", "4wd"], { error: 'drive must be "2wd" or "4wd"' }),
  topSpeed: positive("topSpeed").max(60, "topSpeed must be at most 60 m/s"),
  accel0: positive("accel0"),
  brakeDecel: positive("brakeDecel"),
  mu: positive("mu").max(3, "mu must be at most 3"),
  cdA: z.number({ error: "cdA must be a number" }).min(0, "cdA must be 0 or more"),
  maxWheelAccel: positive("maxWheelAccel"),
  maxWheelBrake: positive("maxWheelBrake"),
});
export type CarProfile = z.infer<typeof carProfileSchema>;

/** A car given either as a preset id or as an attitude car object. */
export const carRefSchema = z.union([
  z.string().refine((id) => carPreset(id) !== undefined, {
    message: `unknown car preset (known: ${CAR_PRESET_IDS.join(", ")})`,
  }),
  attitudeCarSchema,
]);

const RAD = Math.PI / 180;

/** The engine's attitude car (radians) from an attitude car input (degrees). */
export function attitudeCarFromInput(
  c: AttitudeCarInput,
): AttitudeCar & PulseLimits & { wheelbase?: number } {
  return {
    inertia: c.inertia,
    frontWheel: { radius: c.frontWheel.radius, spinInertia: c.frontWheel.spinInertia },
    rearWheel: { radius: c.rearWheel.radius, spinInertia: c.rearWheel.spinInertia },
    casterRad: c.casterDeg * RAD,
    steeringLockRad: c.steeringLockDeg * RAD,
    servoSecondsPer60: c.servoSecondsPer60,
    drive: c.drive,
    topSpeed: c.topSpeed,
    maxWheelAccel: c.maxWheelAccel,
    maxWheelBrake: c.maxWheelBrake,
    wheelbase: c.wheelbase,
  };
}

/** A preset id or a parsed car object, as the engine's car. */
export function resolveCar(
  ref: z.infer<typeof carRefSchema>,
): AttitudeCar & PulseLimits & { wheelbase?: number } {
  return typeof ref === "string" ? carPreset(ref)! : attitudeCarFromInput(ref);
}

/** The engine's car parameters from a user's profile; marked as the user's own numbers. */
export function carFromProfile(p: CarProfile, id = "custom"): CarParams {
  return {
    ...attitudeCarFromInput(p),
    id,
    label: p.label,
    massKg: p.massKg,
    wheelbase: p.wheelbase,
    track: p.track,
    frontWheel: {
      radius: p.frontWheel.radius,
      spinInertia: p.frontWheel.spinInertia,
      massKg: p.frontWheel.massKg,
    },
    rearWheel: {
      radius: p.rearWheel.radius,
      spinInertia: p.rearWheel.spinInertia,
      massKg: p.rearWheel.massKg,
    },
    drive: p.drive,
    topSpeed: p.topSpeed,
    accel0: p.accel0,
    brakeDecel: p.brakeDecel,
    mu: p.mu,
    cdA: p.cdA,
    maxWheelAccel: p.maxWheelAccel,
    maxWheelBrake: p.maxWheelBrake,
    estimate: false,
    notes: "Entered by the car's owner.",
  };
}

/** A profile (degrees) from the engine's car parameters, e.g. to start a new profile from a preset. */
export function profileFromCar(c: CarParams): CarProfile {
  return {
    label: c.label,
    massKg: c.massKg,
    inertia: [c.inertia[0], c.inertia[1], c.inertia[2]],
    wheelbase: c.wheelbase,
    track: c.track,
    frontWheel: { ...c.frontWheel },
    rearWheel: { ...c.rearWheel },
    casterDeg: c.casterRad / RAD,
    steeringLockDeg: c.steeringLockRad / RAD,
    servoSecondsPer60: c.servoSecondsPer60,
    drive: c.drive,
    topSpeed: c.topSpeed,
    accel0: c.accel0,
    brakeDecel: c.brakeDecel,
    mu: c.mu,
    cdA: c.cdA,
    maxWheelAccel: c.maxWheelAccel,
    maxWheelBrake: c.maxWheelBrake,
  };
}
