/**
 * The club settings form: which track guidance set the rule checks use, the club's own value for
 * any rule and for the set-up verdicts' thresholds (an empty field keeps the default). Both sides
 * import it; the server also reads stored values back through `storedOverridesSchema` and
 * `storedVerdictSchema`.
 */
import { z } from "zod";
import { parseNumberText } from "~/lib/number-text";
import { carClassesField } from "./layouts";
import {
  DEFAULT_MIN_GAIN_PER_PASS_S,
  DEFAULT_MIN_NOSE_TURN,
  FIELD_LIMITS,
  GUIDANCE_SET_IDS,
  GUIDANCE_SET_LABELS,
  wordList,
  type GuidanceOverrides,
  type GuidanceSetId,
  type RuleId,
} from "~/analysis";

/** What each rule's field asks for, and the range a club may set (units as in the rule checks). */
export const RULE_FIELDS: readonly {
  id: RuleId;
  label: string;
  unit: string;
  min: number;
  max: number;
  hint: string;
}[] = [
  {
    id: "minTrackWidth",
    label: "Narrowest track width",
    unit: "m",
    min: FIELD_LIMITS.trackWidth.min,
    max: FIELD_LIMITS.trackWidth.max,
    hint: "Width between the track edges.",
  },
  {
    id: "minLapLength",
    label: "Shortest lap",
    unit: "m",
    min: 20,
    max: 2000,
    hint: "Length of the centre line for one lap.",
  },
  {
    id: "maxStandDistance",
    label: "Farthest point from the driver stand",
    unit: "m",
    min: 5,
    max: 500,
    hint: "Straight-line distance from the stand.",
  },
  {
    id: "minStartStraight",
    label: "Shortest start straight",
    unit: "m",
    min: 0,
    max: 300,
    hint: "Straight track from the start line with no jump or turn.",
  },
  {
    id: "maxHiddenLength",
    label: "Most track hidden from the driver stand",
    unit: "m",
    min: 0,
    max: 500,
    hint: "0 means every part of the track must be in view.",
  },
  {
    id: "maxMarshalGapRatio",
    label: "Longest stretch between marshal points",
    unit: "x even share",
    min: 1,
    max: 10,
    hint: "As a multiple of the lap divided by the number of marshal points; 1 is perfectly even.",
  },
  {
    id: "minLandingRunOut",
    label: "Shortest run-out after a landing",
    unit: "m",
    min: 0,
    max: 50,
    hint: "From where a car touches down to the start of the next turn.",
  },
  {
    id: "maxLandingFallHeight",
    label: "Hardest landing allowed",
    unit: "m",
    min: 0.05,
    max: 5,
    hint: "Equivalent fall height: the drop onto flat ground that lands as hard.",
  },
  {
    id: "minSpeedWindow",
    label: "Narrowest speed window",
    unit: "m/s",
    min: 0,
    max: 5,
    hint: "How much the takeoff speed may vary and still land on the landing ramp.",
  },
];

/** The club's own values for the set-up verdicts, in the form's units (s, deg). */
export interface VerdictSettings {
  minGainPerPass?: number;
  minNoseTurnDeg?: number;
}
export type VerdictFieldId = keyof VerdictSettings;

/** The set-up verdicts' values a club may set: what each asks for, its range and default (an estimate). */
export const VERDICT_FIELDS: readonly {
  id: VerdictFieldId;
  label: string;
  unit: string;
  min: number;
  max: number;
  default: number;
  hint: string;
}[] = [
  {
    id: "minGainPerPass",
    label: "Smallest worthwhile gain per pass",
    unit: "s",
    min: 0,
    max: 2,
    default: DEFAULT_MIN_GAIN_PER_PASS_S,
    hint: "A set-up is recommended only when its expected gain a pass reaches this.",
  },
  {
    id: "minNoseTurnDeg",
    label: "Smallest turn of the nose worth a set-up",
    unit: "deg",
    min: 0,
    max: 45,
    default: Math.round((DEFAULT_MIN_NOSE_TURN * 180) / Math.PI),
    hint: "Less turn than this is taken straight, however safe.",
  },
];

function overrideField(f: { label: string; unit: string; min: number; max: number }) {
  const unit = f.unit === "m" ? " m" : "";
  return z
    .string({ error: `${f.label}: enter a number or leave it empty.` })
    .trim()
    .transform((s, ctx) => {
      if (s === "") return undefined;
      const n = parseNumberText(s, f.unit === "m" ? "m" : undefined);
      if (n === null) {
        ctx.addIssue({
          code: "custom",
          message: `${f.label} must be a number${unit ? " of metres" : ""}, like ${f.min + 1}.`,
        });
        return z.NEVER;
      }
      if (n < f.min || n > f.max) {
        ctx.addIssue({ code: "custom", message: `${f.label} must be between ${f.min} and ${f.max}${unit}.` });
        return z.NEVER;
      }
      return n;
    })
    .optional();
}

const overrideShape = Object.fromEntries(RULE_FIELDS.map((f) => [f.id, overrideField(f)])) as Record<
  RuleId,
  ReturnType<typeof overrideField>
>;

/** The club's default car classes (a second form on the settings page, told apart by its intent). */
export const clubCarClassesSchema = z.object({
  intent: z.literal("default-classes"),
  carClasses: carClassesField,
});

const verdictShape = Object.fromEntries(VERDICT_FIELDS.map((f) => [f.id, overrideField(f)])) as Record<
  VerdictFieldId,
  ReturnType<typeof overrideField>
>;

/** The settings form: guidance set plus one optional text field per rule and per verdict value. */
export const clubSettingsSchema = z.object({
  guidanceSet: z.enum(GUIDANCE_SET_IDS, {
    error: `Choose a guidance set: ${wordList(GUIDANCE_SET_IDS.map((id) => GUIDANCE_SET_LABELS[id]))}.`,
  }),
  ...overrideShape,
  ...verdictShape,
});

export type ClubSettingsInput = z.infer<typeof clubSettingsSchema>;

/** The parsed form as a guidance set, the overrides and the verdict values that were filled in. */
export function settingsFromForm(input: ClubSettingsInput): {
  guidanceSet: GuidanceSetId;
  overrides: GuidanceOverrides;
  verdict?: VerdictSettings;
} {
  const overrides: GuidanceOverrides = {};
  for (const f of RULE_FIELDS) {
    const value = input[f.id];
    if (typeof value === "number") overrides[f.id] = value;
  }
  const verdict: VerdictSettings = {};
  for (const f of VERDICT_FIELDS) {
    const value = input[f.id];
    if (typeof value === "number") verdict[f.id] = value;
  }
  return { guidanceSet: input.guidanceSet, overrides, ...(Object.keys(verdict).length ? { verdict } : {}) };
}

/** Verdict values as stored (under "verdict" in clubs.guidance_overrides), with the form's ranges. */
export const storedVerdictSchema = z.object(
  Object.fromEntries(
    VERDICT_FIELDS.map((f) => [f.id, z.number().min(f.min).max(f.max).optional()]),
  ) as Record<VerdictFieldId, z.ZodOptional<z.ZodNumber>>,
);

/**
 * Overrides as stored in clubs.guidance_overrides, checked with the same ranges as the form, so a
 * hand-edited or older row cannot feed the rule checks a nonsense value.
 */
export const storedOverridesSchema = z.object(
  Object.fromEntries(RULE_FIELDS.map((f) => [f.id, z.number().min(f.min).max(f.max).optional()])) as Record<
    RuleId,
    z.ZodOptional<z.ZodNumber>
  >,
);
