/**
 * Car profiles as people enter and exchange them (JSON files, forms): degrees for angles, SI for
 * everything else. Zod schemas for both sides, and conversions to the engine's radians.
 */
import { z } from "zod";
import type { AttitudeCar } from "../air/attitude";
import type { PulseLimits } from "../air/air-plan-pulse";
import { CAR_LABEL_MAX, CAR_NUMBER_FIELDS } from "./car-fields";
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

const FIELD_BY_NAME = new Map(CAR_NUMBER_FIELDS.map((f) => [f.name, f]));

/** A profile number with the bounds, unit and label of its field (car-fields.ts). */
function bounded(name: string) {
  const f = FIELD_BY_NAME.get(name);
  if (!f) throw new Error(`no car field ${name}`);
  const u = f.unit ? ` ${f.unit}` : "";
  return z
    .number({ error: `${f.label} must be a number${f.unit ? ` (${f.unit})` : ""}` })
    .min(f.min, `${f.label} must be at least ${f.min}${u}`)
    .max(f.max, `${f.label} must be at most ${f.max}${u}`);
}

const profileWheel = (end: "front" | "rear") =>
  z.object(
    {
      radius: bounded(`${end}Wheel.radius`),
      spinInertia: bounded(`${end}Wheel.spinInertia`),
      massKg: bounded(`${end}Wheel.massKg`),
    },
    { error: `${end}Wheel must be an object { radius, spinInertia, massKg }` },
  );

/**
 * A complete car profile: every number the flight, attitude, plan and lap models use, each within
 * the bounds of its field in car-fields.ts (messages name the field in plain words).
 */
export const carProfileSchema = z.object({
  label: z
    .string({ error: "Name must be text" })
    .trim()
    .min(1, "Name must not be empty")
    .max(CAR_LABEL_MAX, `Name must be at most ${CAR_LABEL_MAX} characters`),
  massKg: bounded("massKg"),
  inertia: z.tuple([bounded("inertia.0"), bounded("inertia.1"), bounded("inertia.2")], {
    error: "inertia must be [roll, pitch, yaw] in kg m²",
  }),
  wheelbase: bounded("wheelbase"),
  track: bounded("track"),
  frontWheel: profileWheel("front"),
  rearWheel: profileWheel("rear"),
  casterDeg: bounded("casterDeg"),
  steeringLockDeg: bounded("steeringLockDeg"),
  servoSecondsPer60: bounded("servoSecondsPer60"),
  drive: z.enum(["2wd", "4wd"], { error: 'Drive must be "2wd" or "4wd"' }),
  topSpeed: bounded("topSpeed"),
  accel0: bounded("accel0"),
  brakeDecel: bounded("brakeDecel"),
  mu: bounded("mu"),
  cdA: bounded("cdA"),
  maxWheelAccel: bounded("maxWheelAccel"),
  maxWheelBrake: bounded("maxWheelBrake"),
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

/** Marks a car profile file (the profile page's download, the command line's `--car FILE`). */
export const CAR_FILE_FORMAT = "loftline-car";

/** A profile as a file: the format marker, then the profile's fields. */
export function carProfileFile(p: CarProfile) {
  return { format: CAR_FILE_FORMAT, formatVersion: 1, ...p };
}

export type ParseCarResult =
  { ok: true; profile: CarProfile } | { ok: false; issues: { path: string; message: string }[] };

/**
 * Reads a car profile from parsed JSON (a file or a request body). A `format` marker, when
 * present, must be "loftline-car".
 * @returns the profile, or every issue with the path of its field ("frontWheel.radius").
 */
export function parseCarProfile(json: unknown): ParseCarResult {
  if (typeof json !== "object" || json === null || Array.isArray(json))
    return { ok: false, issues: [{ path: "(car)", message: "must be a JSON object" }] };
  const format = (json as { format?: unknown }).format;
  if (format !== undefined && format !== CAR_FILE_FORMAT)
    return { ok: false, issues: [{ path: "format", message: `must be "${CAR_FILE_FORMAT}"` }] };
  const result = carProfileSchema.safeParse(json);
  if (result.success) return { ok: true, profile: result.data };
  return {
    ok: false,
    issues: result.error.issues.map((i) => ({
      path:
        i.path
          .map((p) => (typeof p === "number" ? `[${p}]` : `.${String(p)}`))
          .join("")
          .replace(/^\./, "") || "(car)",
      message: i.message,
    })),
  };
}
