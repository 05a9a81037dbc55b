/**
 * Every number of a car profile as data: where it sits in the profile, its label, unit, bounds and
 * a short help text on how to measure it at home. The profile schema (car-schema.ts), the profile
 * form and the command line all read these, so a bound or a unit is written once.
 * Bounds are wide on purpose: they catch typing slips (a mass in grams, a radius in millimetres),
 * not unusual cars.
 */

/** Groups the form shows as fieldsets, in order. */
export const CAR_FIELD_GROUPS = {
  body: "Weight and size",
  inertia: "Chassis inertia (how hard the car is to rotate)",
  wheels: "Wheels",
  steering: "Steering",
  drive: "Speed, grip and drive",
  air: "Wheels in the air",
} as const;
export type CarFieldGroup = keyof typeof CAR_FIELD_GROUPS;

export interface CarNumberField {
  /** Form field name: the path in the profile joined with dots ("frontWheel.radius", "inertia.0"). */
  name: string;
  path: readonly (string | number)[];
  label: string;
  /** Unit as shown beside the field (SI; degrees for angles). */
  unit: string;
  min: number;
  max: number;
  /** A sensible step for the field's number input. */
  step: number;
  help: string;
  group: CarFieldGroup;
}

const BIFILAR =
  "Hang the car from two parallel strings of equal length L, a distance D apart and the same distance either side of the centre of mass, so the axis runs vertically through the centre of mass. Twist it a little, let go and time 20 full swings (there and back); T is that time / 20. I = m g D² T² / (16 π² L), the textbook bifilar pendulum.";

const wheel = (end: "front" | "rear", End: string): CarNumberField[] => [
  {
    name: `${end}Wheel.radius`,
    path: [`${end}Wheel`, "radius"],
    label: `${End} wheel radius`,
    unit: "m",
    min: 0.015,
    max: 0.2,
    step: 0.001,
    help: "Half the tyre's outside diameter, measured across the tyre with a ruler or calipers while the car stands on it.",
    group: "wheels",
  },
  {
    name: `${end}Wheel.massKg`,
    path: [`${end}Wheel`, "massKg"],
    label: `${End} wheel mass`,
    unit: "kg",
    min: 0.005,
    max: 1,
    step: 0.001,
    help: "One wheel with its tyre and insert, on a kitchen scale.",
    group: "wheels",
  },
  {
    name: `${end}Wheel.spinInertia`,
    path: [`${end}Wheel`, "spinInertia"],
    label: `${End} wheel spin inertia`,
    unit: "kg m²",
    min: 0,
    max: 0.01,
    step: 0.000001,
    help: "About 0.7 × wheel mass × radius² (most of the mass is the tyre, near the rim). Measured: hang the wheel flat from three equal strings and time its twist (trifilar pendulum).",
    group: "wheels",
  },
];

/** The profile's number fields in form order. */
export const CAR_NUMBER_FIELDS: readonly CarNumberField[] = [
  {
    name: "massKg",
    path: ["massKg"],
    label: "Mass",
    unit: "kg",
    min: 0.3,
    max: 20,
    step: 0.01,
    help: "The car ready to run (battery in, body on) on a kitchen scale.",
    group: "body",
  },
  {
    name: "wheelbase",
    path: ["wheelbase"],
    label: "Wheelbase",
    unit: "m",
    min: 0.1,
    max: 1,
    step: 0.001,
    help: "Front axle centre to rear axle centre, with the car on a flat floor.",
    group: "body",
  },
  {
    name: "track",
    path: ["track"],
    label: "Track (width between tyre centres)",
    unit: "m",
    min: 0.1,
    max: 1,
    step: 0.001,
    help: "Centre of the left tyre to centre of the right tyre across one axle (the wider axle if they differ).",
    group: "body",
  },
  {
    name: "inertia.0",
    path: ["inertia", 0],
    label: "Roll inertia (about the long axis)",
    unit: "kg m²",
    min: 0.0005,
    max: 2,
    step: 0.0001,
    help: `Hang the car nose down. ${BIFILAR}`,
    group: "inertia",
  },
  {
    name: "inertia.1",
    path: ["inertia", 1],
    label: "Pitch inertia (nose up and down)",
    unit: "kg m²",
    min: 0.0005,
    max: 2,
    step: 0.0001,
    help: `Hang the car on its side. ${BIFILAR}`,
    group: "inertia",
  },
  {
    name: "inertia.2",
    path: ["inertia", 2],
    label: "Yaw inertia (turning flat)",
    unit: "kg m²",
    min: 0.0005,
    max: 2,
    step: 0.0001,
    help: `Hang the car level, wheels down. ${BIFILAR}`,
    group: "inertia",
  },
  ...wheel("front", "Front"),
  ...wheel("rear", "Rear"),
  {
    name: "casterDeg",
    path: ["casterDeg"],
    label: "Caster",
    unit: "deg",
    min: 0,
    max: 45,
    step: 0.5,
    help: "How far the steering axis leans back, seen from the side: the caster blocks' angle (often marked on them) plus the arms' kick-up.",
    group: "steering",
  },
  {
    name: "steeringLockDeg",
    path: ["steeringLockDeg"],
    label: "Steering lock",
    unit: "deg",
    min: 5,
    max: 60,
    step: 0.5,
    help: "Turn the wheels to full lock and measure the inner wheel's angle to the car's centre line with a protractor.",
    group: "steering",
  },
  {
    name: "servoSecondsPer60",
    path: ["servoSecondsPer60"],
    label: "Servo speed (time per 60°)",
    unit: "s",
    min: 0.02,
    max: 1,
    step: 0.005,
    help: "From the servo's data sheet at your voltage, or film the wheels going from lock to lock (at 60 frames per second) and count the frames: seconds for the whole sweep × 60 / the sweep in degrees.",
    group: "steering",
  },
  {
    name: "topSpeed",
    path: ["topSpeed"],
    label: "Top speed",
    unit: "m/s",
    min: 2,
    max: 40,
    step: 0.1,
    help: "Time the car at full speed between two marks 20 m apart on the longest straight: 20 / time. A GPS speed logger works too.",
    group: "drive",
  },
  {
    name: "accel0",
    path: ["accel0"],
    label: "Acceleration from standstill",
    unit: "m/s²",
    min: 1,
    max: 40,
    step: 0.1,
    help: "Time the car from standstill to a mark 5 m away at full throttle: 2 × 5 / time² (a little low, since the car pulls less as it gets faster).",
    group: "drive",
  },
  {
    name: "brakeDecel",
    path: ["brakeDecel"],
    label: "Braking",
    unit: "m/s²",
    min: 1,
    max: 40,
    step: 0.1,
    help: "At a known speed v, brake fully at a mark and measure the stopping distance d: v² / (2 d).",
    group: "drive",
  },
  {
    name: "mu",
    path: ["mu"],
    label: "Grip (tyre friction coefficient)",
    unit: "",
    min: 0.2,
    max: 3,
    step: 0.01,
    help: "Drive round a circle of radius R as fast as the car goes without sliding and time one lap t: v = 2 π R / t, grip = v² / (9.81 × R).",
    group: "drive",
  },
  {
    name: "cdA",
    path: ["cdA"],
    label: "Drag area (drag coefficient × frontal area)",
    unit: "m²",
    min: 0,
    max: 0.3,
    step: 0.001,
    help: "Width × height of the car seen from the front, times about 0.6 for a buggy or 0.8 for a truck's shell (rough values from memory).",
    group: "drive",
  },
  {
    name: "maxWheelAccel",
    path: ["maxWheelAccel"],
    label: "Wheel speed-up in the air (full throttle)",
    unit: "rad/s²",
    min: 10,
    max: 20000,
    step: 10,
    help: "Hold the car up and give full throttle from standstill; film the wheels and note how long they take to reach full speed (top speed / wheel radius, rad/s). Full speed / that time.",
    group: "air",
  },
  {
    name: "maxWheelBrake",
    path: ["maxWheelBrake"],
    label: "Wheel braking in the air (full brake)",
    unit: "rad/s²",
    min: 10,
    max: 20000,
    step: 10,
    help: "Hold the car up with the wheels at full speed, brake fully and time until they stop. Full speed (top speed / wheel radius, rad/s) / that time.",
    group: "air",
  },
];

/** Drive choices with their labels. */
export const DRIVE_LABELS = { "2wd": "Two-wheel drive (rear)", "4wd": "Four-wheel drive" } as const;
export const CAR_LABEL_MAX = 80;

/**
 * The bifilar pendulum's moment of inertia about the vertical axis through the centre of mass.
 * @param massKg kg; @param stringSpacing distance between the strings D, m; @param stringLength
 * L, m; @param periodS time of one swing T, s; @param g m/s^2 (default 9.81).
 * @returns kg m^2: m g D^2 T^2 / (16 pi^2 L).
 */
export function bifilarInertia(
  massKg: number,
  stringSpacing: number,
  stringLength: number,
  periodS: number,
  g = 9.81,
): number {
  return (massKg * g * stringSpacing ** 2 * periodS ** 2) / (16 * Math.PI ** 2 * stringLength);
}
