/**
 * The club settings form: which track guidance set the rule checks use, and the club's own value
 * for any rule (an empty field keeps the set's value). Both sides import it; the server also reads
 * stored overrides back through `storedOverridesSchema`.
 */
import { z } from "zod";
import { parseNumberText } from "~/lib/number-text";
import { carClassesField } from "./layouts";
import {
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

function overrideField(f: (typeof RULE_FIELDS)[number]) {
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

/** The settings form: guidance set plus one optional text field per rule. */
export const clubSettingsSchema = z.object({
  guidanceSet: z.enum(GUIDANCE_SET_IDS, {
    error: `Choose a guidance set: ${wordList(GUIDANCE_SET_IDS.map((id) => GUIDANCE_SET_LABELS[id]))}.`,
  }),
  ...overrideShape,
});

export type ClubSettingsInput = z.infer<typeof clubSettingsSchema>;

/** The parsed form as a guidance set and the overrides that were filled in. */
export function settingsFromForm(input: ClubSettingsInput): {
  guidanceSet: GuidanceSetId;
  overrides: GuidanceOverrides;
} {
  const overrides: GuidanceOverrides = {};
  for (const f of RULE_FIELDS) {
    const value = input[f.id];
    if (typeof value === "number") overrides[f.id] = value;
  }
  return { guidanceSet: input.guidanceSet, overrides };
}

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
