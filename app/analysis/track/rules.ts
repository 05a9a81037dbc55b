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
  /** Shortest run-out from a landing's touchdown to the start of the next turn, m. */
  minLandingRunOut: number;
  /** Hardest landing: largest equivalent fall height at the planned takeoff speed, m. */
  maxLandingFallHeight: number;
  /** Narrowest speed window (highest minus lowest takeoff speed that lands on the ramp), m/s. */
  minSpeedWindow: number;
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
  /**
   * The jump rules, measured on the jumps of every car class (layout/jump-rules.ts): the shortest
   * run-out (m), the hardest landing (m) and the narrowest window (m/s). Null or left out: no jump
   * to measure (not checked).
   */
  landingRunOut?: number | null;
  landingFallHeight?: number | null;
  speedWindow?: number | null;
  /** Where each measured value was found, in words (e.g. "J7 Hairpin table, 1/10 short-course truck"). */
  where?: Partial<Record<RuleId, string>>;
  /** Every place that fails a rule, in words, by rule (the worst one is in `where`). */
  failing?: Partial<Record<RuleId, string[]>>;
}

export type RuleStatus = "pass" | "fail" | "not checked";

export interface RuleCheck {
  id: RuleId;
  label: string;
  /** The rule's value and how the measurement must compare with it. */
  value: number;
  comparison: "at least" | "at most";
  unit: "m" | "m/s" | "x even share";
  measured: number | null;
  status: RuleStatus;
  /** Plain-words explanation of the result. */
  detail: string;
  /** Where the value comes from. */
  source: string;
  /** Where the measured value was found, in words; null when the rule is about the whole layout. */
  where: string | null;
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

/**
 * Sources of the jump rules' default values: none comes from a rulebook (engine.md names no jump
 * values), so each says what it is (docs/decisions/0703).
 */
const JUMP_RULE_SOURCES: Partial<Record<RuleId, string>> = {
  minLandingRunOut:
    "Loftline default, an estimate (common practice: a car needs a few metres after touching down to settle on its wheels before it turns); not from a rulebook",
  maxLandingFallHeight:
    "Loftline default, an estimate from memory of the drop onto flat ground a 1/10 car's suspension takes without bottoming hard; not from a rulebook. The measure is the equivalent fall height (Levy, Hubbard, McNeil & Swedberg 2015)",
  minSpeedWindow:
    "Loftline default, an estimate from memory of how evenly club drivers hit a jump's takeoff speed; not from a rulebook",
};

/** The three jump rules' default values, the same in both guidance sets. */
export const JUMP_RULE_DEFAULTS = {
  minLandingRunOut: 3,
  maxLandingFallHeight: 0.5,
  minSpeedWindow: 0.2,
} as const;

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
      ...JUMP_RULE_DEFAULTS,
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
      ...JUMP_RULE_DEFAULTS,
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
  {
    id: "minLandingRunOut",
    label: "Run-out after a landing before the next turn",
    comparison: "at least",
    unit: "m",
    measure: (m) => m.landingRunOut ?? null,
    missing: "no jump lands before a turn",
  },
  {
    id: "maxLandingFallHeight",
    label: "Hardest landing (equivalent fall height)",
    comparison: "at most",
    unit: "m",
    measure: (m) => m.landingFallHeight ?? null,
    missing: "no jump landing to measure",
  },
  {
    id: "minSpeedWindow",
    label: "Narrowest speed window",
    comparison: "at least",
    unit: "m/s",
    measure: (m) => m.speedWindow ?? null,
    missing: "no jump landing to measure",
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

/** Where a rule's value comes from: the club's own setting, or the set's value and its source. */
function ruleSource(id: RuleId, unit: string, guidance: GuidanceSetId, overrides: GuidanceOverrides): string {
  if (overrides[id] !== undefined)
    return `Club setting (the ${guidance} set says ${fmt(GUIDANCE_SETS[guidance].values[id])} ${unit})`;
  if (id === "maxMarshalGapRatio") return MARSHAL_SOURCE;
  return JUMP_RULE_SOURCES[id] ?? RULEBOOK_SOURCE;
}

/** Checks measured values against a guidance set (with a club's overrides). */
export function checkRules(
  m: RuleMeasurements,
  guidance: GuidanceSetId,
  overrides: GuidanceOverrides = {},
): RuleReport {
  const values = guidanceValues(guidance, overrides);
  const checks = RULES.map((rule): RuleCheck => {
    const value = values[rule.id];
    const base = {
      id: rule.id,
      label: rule.label,
      value,
      comparison: rule.comparison,
      unit: rule.unit,
      source: ruleSource(rule.id, rule.unit, guidance, overrides),
    };
    let measured = rule.measure(m);
    // No marshal points at all cannot be "spread evenly".
    if (measured === null)
      return {
        ...base,
        measured: null,
        status: rule.id === "maxMarshalGapRatio" ? "fail" : "not checked",
        detail: rule.missing,
        where: null,
      };
    measured = Math.round(measured * 1000) / 1000;
    const pass = rule.comparison === "at least" ? measured >= value : measured <= value;
    const where = m.where?.[rule.id] ?? null;
    // The worst place is named once: "J7 Hairpin table" is the same place as "J7 Hairpin table (class)".
    const others = pass
      ? []
      : (m.failing?.[rule.id] ?? []).filter(
          (w) => where === null || (w !== where && !where.startsWith(`${w} (`)),
        );
    const detail =
      `${fmt(measured)} ${rule.unit} measured${where ? ` at ${where}` : ""}; ` +
      `${rule.comparison} ${fmt(value)} ${rule.unit} required` +
      (others.length ? `; also ${others.join(", ")}` : "");
    return { ...base, measured, status: pass ? "pass" : "fail", detail, where };
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
