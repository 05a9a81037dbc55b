/**
 * A club's settings for the marshal risk: the zone model (speed margin, spread angle, roll-out
 * braking) and the marshal plan (reach, heat size, setback, cover distance). Each setting carries
 * its default, its range and where the default comes from, so that a settings form and the
 * corner-risk sheet can show them (docs/decisions/0700 to 0702).
 */

export interface MarshalSettings {
  /** How much faster than the most the approach allows a car may take off or enter a turn, as a fraction (0.1 = 10 %). */
  speedMargin: number;
  /** Spread either side of the track direction of an overshoot or run-off zone, deg. */
  spreadDeg: number;
  /** Braking while a car rolls out after an overshoot or a missed turn, as a fraction of the class's braking. */
  rollOutBraking: number;
  /** Farthest a marshal point may stand from the nearest track edge, m. */
  reach: number;
  /** Points in a suggested plan: the club's largest heat (one marshal per car). */
  heatSize: number;
  /** Nearest a suggested point comes to a track edge, m. */
  setback: number;
  /** Farthest a marshal point covers a hotspot from, m (plan distance). */
  coverDistance: number;
}

export type MarshalSettingId = keyof MarshalSettings;

export interface MarshalSettingInfo {
  id: MarshalSettingId;
  label: string;
  unit: "" | "m" | "deg" | "x class braking" | "points";
  default: number;
  min: number;
  max: number;
  /** True for a whole number (the heat size). */
  integer: boolean;
  /** Where the default comes from: "common practice" or "an estimate", and why. */
  source: string;
}

/** Every setting with its default, range and source, in the order a form shows them. */
export const MARSHAL_SETTINGS: readonly MarshalSettingInfo[] = [
  {
    id: "speedMargin",
    label: "Speed margin above the approach",
    unit: "",
    default: 0.1,
    min: 0,
    max: 1,
    integer: false,
    source:
      "Loftline default, an estimate: drivers can beat the lap model's approach speed by a few percent (a better line, a quicker car of the class); flight and stopping distances grow with the square of the speed",
  },
  {
    id: "spreadDeg",
    label: "Spread either side of the track direction",
    unit: "deg",
    default: 15,
    min: 0,
    max: 45,
    integer: false,
    source:
      "Loftline default, an estimate from memory of how far off line cars leave a lip or a turn they cannot make",
  },
  {
    id: "rollOutBraking",
    label: "Braking while rolling out",
    unit: "x class braking",
    default: 1,
    min: 0.1,
    max: 1.5,
    integer: false,
    source:
      "The class's own braking (the issue's model); lower it for loose or wet ground beside the track, where cars slide further",
  },
  {
    id: "reach",
    label: "Farthest a marshal stands from the track edge",
    unit: "m",
    default: 3,
    min: 0.5,
    max: 20,
    integer: false,
    source: "Common practice (an estimate): a marshal reaches a rolled car in two or three steps",
  },
  {
    id: "heatSize",
    label: "Largest heat (marshal points to suggest)",
    unit: "points",
    default: 10,
    min: 1,
    max: 50,
    integer: true,
    source: "Common practice: heats of up to ten cars, and one marshal for each car in the heat",
  },
  {
    id: "setback",
    label: "Nearest a suggested point comes to the track edge",
    unit: "m",
    default: 1,
    min: 0,
    max: 10,
    integer: false,
    source: "Loftline default, an estimate: out of the way of a car running along the edge",
  },
  {
    id: "coverDistance",
    label: "Farthest a marshal covers a hotspot from",
    unit: "m",
    default: 10,
    min: 1,
    max: 50,
    integer: false,
    source: "Loftline default, an estimate: a few seconds' walk with the spot in view",
  },
];

/** The default settings. */
export const DEFAULT_MARSHAL_SETTINGS: Readonly<MarshalSettings> = Object.freeze(
  Object.fromEntries(MARSHAL_SETTINGS.map((s) => [s.id, s.default])) as unknown as MarshalSettings,
);

/**
 * The defaults with a club's own values applied.
 * @throws RangeError naming the setting (`settings.reach: ...`) that is unknown, not a number, out of range or not whole.
 */
export function marshalSettings(overrides: Partial<MarshalSettings> = {}): MarshalSettings {
  const out: MarshalSettings = { ...DEFAULT_MARSHAL_SETTINGS };
  for (const [key, value] of Object.entries(overrides)) {
    if (value === undefined) continue;
    const info = MARSHAL_SETTINGS.find((s) => s.id === key);
    if (!info) throw new RangeError(`settings.${key}: is not a marshal setting`);
    if (typeof value !== "number" || !Number.isFinite(value))
      throw new RangeError(`settings.${key}: must be a number`);
    if (value < info.min || value > info.max)
      throw new RangeError(`settings.${key}: must be between ${info.min} and ${info.max}`);
    if (info.integer && !Number.isInteger(value))
      throw new RangeError(`settings.${key}: must be a whole number`);
    out[info.id] = value;
  }
  return out;
}
