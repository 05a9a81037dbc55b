/**
 * Rule checks against a set of track guidance ("club" or "national"), each with its value, the
 * measured value, pass or fail and where the value comes from. A club may override any value.
 *
 * These checks are estimates from a drawing. The sanctioning body's current rulebook decides.
 */

import { GUIDANCE_SET_LABELS, type GuidanceSetId } from "../words";

/** The values a guidance set checks against. */
export interface GuidanceValues {
  /** Narrowest allowed track, m. */
  minTrackWidth: number;
  /** Shortest allowed lap, m. */
  minLapLength: number;
  /** Farthest a track point may be from the driver stand, m. */
  maxStandDistance: number;
  /** Shortest start straight (no jumps, no turns), m. */
  minStartStraight: number;
  /** Most track that may be hidden from the driver stand, m. */
  maxHiddenLength: number;
  /** Largest stretch between neighbouring marshal points, as a multiple of an even share of the lap. */
  maxMarshalGapRatio: number;
}

export type GuidanceOverrides = Partial<GuidanceValues>;
export type RuleId = keyof GuidanceValues;

/** What the rules are checked against; null where it cannot be measured (no driver stand). */
export interface RuleMeasurements {
  trackWidth: number;
  lapLength: number;
  standDistance: number | null;
  startStraight: number;
  hiddenLength: number | null;
  /** Null when no marshal points are placed. */
  marshalGapRatio: number | null;
}

export type RuleStatus = "pass" | "fail" | "not checked";

export interface RuleCheck {
  id: RuleId;
  label: string;
  /** The rule's value and how the measurement must compare with it. */
  value: number;
  comparison: "at least" | "at most";
  unit: "m" | "x even share";
  measured: number | null;
  status: RuleStatus;
  /** Plain-words explanation of the result. */
  detail: string;
  /** Where the value comes from. */
  source: string;
}

export interface RuleReport {
  guidance: GuidanceSetId;
  label: string;
  checks: RuleCheck[];
  passed: number;
  failed: number;
  notChecked: number;
  /** Always shown with the checks. */
  note: string;
}

export const RULEBOOK_SOURCE =
  "Sanctioning bodies' track guidance as quoted in their public rulebooks; verify against the current edition";
const MARSHAL_SOURCE =
  'Loftline default, an estimate (not from a rulebook): "spread evenly" read as no stretch longer than 1.5 times an even share of the lap';

export const RULES_NOTE =
  "These checks are estimates from the drawing, not a safety certification. The sanctioning body's current rulebook decides, together with local regulations and the site's own risk assessment.";

export const GUIDANCE_SETS: Record<
  GuidanceSetId,
  { id: GuidanceSetId; label: string; values: GuidanceValues }
> = {
  club: {
    id: "club",
    label: GUIDANCE_SET_LABELS.club,
    values: {
      minTrackWidth: 2.4,
      minLapLength: 120,
      maxStandDistance: 50,
      minStartStraight: 20,
      maxHiddenLength: 0,
      maxMarshalGapRatio: 1.5,
    },
  },
  national: {
    id: "national",
    label: GUIDANCE_SET_LABELS.national,
    values: {
      minTrackWidth: 3,
      minLapLength: 120,
      maxStandDistance: 50,
      minStartStraight: 20,
      maxHiddenLength: 0,
      maxMarshalGapRatio: 1.5,
    },
  },
};

const RULES: {
  id: RuleId;
  label: string;
  comparison: "at least" | "at most";
  unit: RuleCheck["unit"];
  measure: (m: RuleMeasurements) => number | null;
  missing: string;
}[] = [
  {
    id: "minTrackWidth",
    label: "Track width",
    comparison: "at least",
    unit: "m",
    measure: (m) => m.trackWidth,
    missing: "",
  },
  {
    id: "minLapLength",
    label: "Lap length",
    comparison: "at least",
    unit: "m",
    measure: (m) => m.lapLength,
    missing: "",
  },
  {
    id: "maxStandDistance",
    label: "Farthest point from the driver stand",
    comparison: "at most",
    unit: "m",
    measure: (m) => m.standDistance,
    missing: "no driver stand placed",
  },
  {
    id: "minStartStraight",
    label: "Start straight without jumps",
    comparison: "at least",
    unit: "m",
    measure: (m) => m.startStraight,
    missing: "",
  },
  {
    id: "maxHiddenLength",
    label: "Track hidden from the driver stand",
    comparison: "at most",
    unit: "m",
    measure: (m) => m.hiddenLength,
    missing: "no driver stand placed",
  },
  {
    id: "maxMarshalGapRatio",
    label: "Marshal points spread evenly",
    comparison: "at most",
    unit: "x even share",
    measure: (m) => m.marshalGapRatio,
    missing: "no marshal points placed",
  },
];

/**
 * The values of a guidance set with a club's overrides applied.
 * @throws RangeError naming the override that is not a finite number >= 0.
 */
export function guidanceValues(guidance: GuidanceSetId, overrides: GuidanceOverrides = {}): GuidanceValues {
  const values = { ...GUIDANCE_SETS[guidance].values };
  for (const [key, value] of Object.entries(overrides) as [RuleId, number | undefined][]) {
    if (value === undefined) continue;
    if (!(key in values)) throw new RangeError(`overrides.${key}: is not a rule`);
    if (!Number.isFinite(value) || value < 0)
      throw new RangeError(`overrides.${key}: must be a number of at least 0`);
    values[key] = value;
  }
  return values;
}

const fmt = (x: number) => (Math.abs(x) >= 10 ? x.toFixed(0) : x.toFixed(2).replace(/\.?0+$/, ""));

/** Checks measured values against a guidance set (with a club's overrides). */
export function checkRules(
  m: RuleMeasurements,
  guidance: GuidanceSetId,
  overrides: GuidanceOverrides = {},
): RuleReport {
  const values = guidanceValues(guidance, overrides);
  const checks = RULES.map((rule): RuleCheck => {
    const value = values[rule.id];
    const overridden = overrides[rule.id] !== undefined;
    const base = GUIDANCE_SETS[guidance].values[rule.id];
    const source = overridden
      ? `Club setting (the ${guidance} set says ${fmt(base)} ${rule.unit})`
      : rule.id === "maxMarshalGapRatio"
        ? MARSHAL_SOURCE
        : RULEBOOK_SOURCE;
    let measured = rule.measure(m);
    // No marshal points at all cannot be "spread evenly".
    if (measured === null && rule.id === "maxMarshalGapRatio")
      return {
        id: rule.id,
        label: rule.label,
        value,
        comparison: rule.comparison,
        unit: rule.unit,
        measured: null,
        status: "fail",
        detail: rule.missing,
        source,
      };
    if (measured === null)
      return {
        id: rule.id,
        label: rule.label,
        value,
        comparison: rule.comparison,
        unit: rule.unit,
        measured: null,
        status: "not checked",
        detail: rule.missing,
        source,
      };
    measured = Math.round(measured * 1000) / 1000;
    const pass = rule.comparison === "at least" ? measured >= value : measured <= value;
    const detail = `${fmt(measured)} ${rule.unit} measured; ${rule.comparison} ${fmt(value)} ${rule.unit} required`;
    return {
      id: rule.id,
      label: rule.label,
      value,
      comparison: rule.comparison,
      unit: rule.unit,
      measured,
      status: pass ? "pass" : "fail",
      detail,
      source,
    };
  });
  return {
    guidance,
    label: GUIDANCE_SETS[guidance].label,
    checks,
    passed: checks.filter((c) => c.status === "pass").length,
    failed: checks.filter((c) => c.status === "fail").length,
    notChecked: checks.filter((c) => c.status === "not checked").length,
    note: RULES_NOTE,
  };
}
