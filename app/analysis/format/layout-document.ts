/**
 * The Loftline layout document: the product's own JSON file format for a track layout.
 *
 * This zod schema is the single source of truth for the format (docs/layout-format.md describes
 * it for users). It is usable in the browser and on the server. Lengths are metres and angles
 * degrees in the file; the engine converts to radians at its edge.
 */
import { z } from "zod";
import { crossFieldIssues } from "./layout-document-checks";
import { GUIDANCE_SET_IDS, JUMP_PRESETS, quotedList, SURFACES } from "../words";

export { MOUND_BACK_SLOPE_DEG, minimumGap } from "./layout-document-checks";

/** A number in a range with messages that name the unit ("must be at least 1 m"). */
function measure(min: number, max: number, unit: string) {
  const u = unit === "" ? "" : ` ${unit}`;
  return z
    .number({
      error: (iss) => (iss.input === undefined ? "is required" : `must be a number${u ? ` (${unit})` : ""}`),
    })
    .min(min, { error: `must be at least ${min}${u}` })
    .max(max, { error: `must be at most ${max}${u}` });
}

function count(min: number, max: number) {
  return measure(min, max, "").int({ error: "must be a whole number" });
}

const idSchema = z
  .string({ error: "must be a text id" })
  .min(1, { error: "must not be empty" })
  .max(40, { error: "must be at most 40 characters" })
  .regex(/^[A-Za-z0-9][A-Za-z0-9_-]*$/, { error: "may use only letters, digits, '-' and '_'" });

const sectionBase = {
  id: idSchema,
  /** Optional display name, e.g. "Back tabletop". */
  name: z.string({ error: "must be text" }).max(60, { error: "must be at most 60 characters" }).optional(),
};

export const straightSectionSchema = z.object({
  ...sectionBase,
  kind: z.literal("straight"),
  /** Length along the centre line, m. */
  length: measure(0.5, 300, "m"),
});

export const turnSectionSchema = z.object({
  ...sectionBase,
  kind: z.literal("turn"),
  /** Centre-line radius, m. */
  radius: measure(1, 300, "m"),
  /** Angle turned, degrees (positive; the direction says which way). */
  angleDeg: measure(1, 360, "deg"),
  direction: z.enum(["left", "right"], { error: 'must be "left" or "right"' }),
});

const jumpBase = { ...sectionBase, kind: z.literal("jump") };
const faceHeight = measure(0.05, 2, "m");
const faceAngleDeg = measure(5, 60, "deg");
const landingAngleDeg = measure(5, 60, "deg");

export const tabletopJumpSchema = z.object({
  ...jumpBase,
  preset: z.literal("tabletop"),
  faceHeight,
  faceAngleDeg,
  /** Flat top between the lip and the top of the landing, m. */
  tableLength: measure(0.5, 15, "m"),
  landingAngleDeg,
});

/** Double and step-down share their shape: a takeoff mound, a gap and a landing mound. */
const gapJumpFields = {
  faceHeight,
  faceAngleDeg,
  /** Horizontal distance from the lip to the crest of the landing, m. */
  gap: measure(1, 15, "m"),
  /** Height of the landing crest, m. */
  landingHeight: measure(0.05, 2, "m"),
  landingAngleDeg,
};

export const doubleJumpSchema = z.object({ ...jumpBase, preset: z.literal("double"), ...gapJumpFields });
export const tripleJumpSchema = z.object({ ...jumpBase, preset: z.literal("triple"), ...gapJumpFields });
export const stepDownJumpSchema = z.object({ ...jumpBase, preset: z.literal("step-down"), ...gapJumpFields });

export const stepUpJumpSchema = z.object({
  ...jumpBase,
  preset: z.literal("step-up"),
  faceHeight,
  faceAngleDeg,
  gap: measure(1, 15, "m"),
  /** Height of the upper deck the car lands on, m. */
  landingHeight: measure(0.05, 2, "m"),
  /** Length of the upper deck, m. */
  deckLength: measure(0.5, 10, "m"),
  /** Angle of the ramp down from the deck, degrees. */
  landingAngleDeg,
});

export const whoopsJumpSchema = z.object({
  ...jumpBase,
  preset: z.literal("whoops"),
  count: count(2, 30),
  bumpHeight: measure(0.03, 0.5, "m"),
  /** Crest-to-crest distance, m. */
  spacing: measure(0.4, 3, "m"),
});

const profilePoint = z.tuple([measure(0, 100, "m"), measure(-2, 3, "m")], {
  error: "must be a pair [distance m, height m]",
});

export const customJumpSchema = z.object({
  ...jumpBase,
  preset: z.literal("custom"),
  /** Ground profile: [distance along the section m, height m], distances increasing from 0. */
  profile: z
    .array(profilePoint, { error: "must be a list of [distance, height] pairs" })
    .min(3, {
      error: "must have at least 3 points",
    })
    .max(500, { error: "must have at most 500 points" }),
  /** Index of the takeoff lip in the profile. */
  lipIndex: count(1, 498),
  /** Indices of the first and last points of the landing ramp. */
  landingStartIndex: count(2, 498),
  landingEndIndex: count(2, 499),
});

export const jumpSectionSchema = z.discriminatedUnion(
  "preset",
  [
    tabletopJumpSchema,
    doubleJumpSchema,
    tripleJumpSchema,
    stepUpJumpSchema,
    stepDownJumpSchema,
    whoopsJumpSchema,
    customJumpSchema,
  ],
  { error: `must be one of ${JUMP_PRESETS.map((p) => `"${p}"`).join(", ")}` },
);

export const sectionSchema = z.discriminatedUnion(
  "kind",
  [straightSectionSchema, turnSectionSchema, jumpSectionSchema],
  {
    error: (iss) =>
      (iss.code as string) === "invalid_type" ? "must be an object" : 'must be "straight", "turn" or "jump"',
  },
);

const pointSchema = z.tuple([measure(-10000, 10000, "m"), measure(-10000, 10000, "m")], {
  error: "must be a pair [x m, y m]",
});

const layoutDocumentShape = z.object({
  format: z.literal("loftline-layout", { error: 'must be "loftline-layout"' }),
  formatVersion: z.literal(1, { error: "must be 1 (the only version so far)" }),
  /** Reminder of the file's units; always metres and degrees. */
  units: z.literal("metres-degrees", { error: 'must be "metres-degrees"' }).default("metres-degrees"),
  name: z
    .string({ error: "must be text" })
    .trim()
    .min(1, { error: "must not be empty" })
    .max(100, { error: "must be at most 100 characters" }),
  description: z
    .string({ error: "must be text" })
    .max(2000, { error: "must be at most 2000 characters" })
    .optional(),
  surface: z.enum(SURFACES, { error: `must be ${quotedList(SURFACES)}` }),
  /** Track width between the edges, m. */
  trackWidth: measure(1, 10, "m"),
  /** Start pose: position of the start line on the centre line, m, and heading, degrees anticlockwise from +X. */
  start: z.object(
    { x: measure(-10000, 10000, "m"), y: measure(-10000, 10000, "m"), headingDeg: measure(-360, 360, "deg") },
    { error: "must be an object {x, y, headingDeg}" },
  ),
  sections: z
    .array(sectionSchema, { error: "must be a list of sections" })
    .min(2, { error: "must have at least 2 sections" })
    .max(500, { error: "must have at most 500 sections" }),
  /** Site boundary polygon in plan, [[x, y], ...] m. */
  siteBoundary: z
    .array(pointSchema, { error: "must be a list of [x, y] points" })
    .min(3, { error: "must have at least 3 points" })
    .max(200, { error: "must have at most 200 points" })
    .optional(),
  /** Driver stand: position m and the drivers' eye height above the ground m. */
  driverStand: z
    .object(
      { x: measure(-10000, 10000, "m"), y: measure(-10000, 10000, "m"), eyeHeight: measure(0.5, 15, "m") },
      { error: "must be an object {x, y, eyeHeight}" },
    )
    .optional(),
  marshalPoints: z
    .array(
      z.object(
        { x: measure(-10000, 10000, "m"), y: measure(-10000, 10000, "m") },
        { error: "must be an object {x, y}" },
      ),
      { error: "must be a list of {x, y}" },
    )
    .max(50, { error: "must have at most 50 points" })
    .default([]),
  /** Car class ids (class presets or a club's own classes). */
  carClasses: z
    .array(idSchema, { error: "must be a list of class ids" })
    .min(1, { error: "must name at least one car class" })
    .max(10, { error: "must have at most 10 classes" }),
  /** Track guidance set the rule checks use. */
  guidance: z.enum(GUIDANCE_SET_IDS, { error: `must be ${quotedList(GUIDANCE_SET_IDS)}` }).default("club"),
  /**
   * Background photo of the site (an uploaded file of the club): plan position of the photo's
   * top-left corner m, scale m per pixel, rotation deg anticlockwise, opacity 0..1, hidden or shown.
   */
  background: z
    .object(
      {
        fileId: idSchema,
        x: measure(-10000, 10000, "m"),
        y: measure(-10000, 10000, "m"),
        metresPerPixel: measure(0.0001, 10, "m per pixel"),
        rotationDeg: measure(-360, 360, "deg"),
        opacity: measure(0, 1, ""),
        hidden: z.boolean({ error: "must be true or false" }).default(false),
      },
      { error: "must be an object {fileId, x, y, metresPerPixel, rotationDeg, opacity, hidden}" },
    )
    .optional(),
});

/** The full schema: field checks plus the checks that span fields (ids unique, profiles well formed). */
export const layoutDocumentSchema = layoutDocumentShape.superRefine((doc, ctx) => {
  for (const issue of crossFieldIssues(doc))
    ctx.addIssue({ code: "custom", path: issue.path, message: issue.message });
});

export type LayoutDocument = z.infer<typeof layoutDocumentSchema>;
/** The document's fields before the checks that span several of them. */
export type LayoutDocumentFields = z.infer<typeof layoutDocumentShape>;
/** The document as written in a file, before defaults are filled in. */
export type LayoutDocumentInput = z.input<typeof layoutDocumentSchema>;
export type LayoutSection = z.infer<typeof sectionSchema>;
export type StraightSection = z.infer<typeof straightSectionSchema>;
export type TurnSection = z.infer<typeof turnSectionSchema>;
export type JumpSection = z.infer<typeof jumpSectionSchema>;
export type CustomJumpSection = z.infer<typeof customJumpSchema>;

/** One problem found in a layout file: the field's path ("sections[3].radius") and what is wrong. */
export interface LayoutIssue {
  path: string;
  message: string;
}

export type ParseLayoutResult = { ok: true; document: LayoutDocument } | { ok: false; issues: LayoutIssue[] };

/** Formats a zod path as "sections[3].radius". */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  let out = "";
  for (const part of path) {
    if (typeof part === "number") out += `[${part}]`;
    else out += out === "" ? String(part) : `.${String(part)}`;
  }
  return out === "" ? "(document)" : out;
}

/**
 * Reads a layout document from parsed JSON (or a JSON string).
 * @returns the document with defaults filled in, or every issue found, each naming its field.
 */
export function parseLayoutDocument(json: unknown): ParseLayoutResult {
  let value = json;
  if (typeof json === "string") {
    try {
      value = JSON.parse(json);
    } catch (err) {
      return {
        ok: false,
        issues: [{ path: "(document)", message: `is not valid JSON: ${(err as Error).message}` }],
      };
    }
  }
  if (typeof value !== "object" || value === null || Array.isArray(value))
    return { ok: false, issues: [{ path: "(document)", message: "must be a JSON object" }] };
  const result = layoutDocumentSchema.safeParse(value, {
    error: (iss) => {
      if (iss.code === "invalid_type")
        return iss.input === undefined ? "is required" : `must be ${article(iss.expected)}`;
      return undefined;
    },
  });
  if (result.success) return { ok: true, document: result.data };
  const issues = result.error.issues.map((iss) => ({
    path: formatIssuePath(iss.path),
    message: iss.message,
  }));
  return { ok: false, issues };
}

function article(expected: string): string {
  return /^[aeiou]/.test(expected) ? `an ${expected}` : `a ${expected}`;
}

/** One line per issue: "sections[3].radius: must be at least 1 m". */
export function describeLayoutIssues(issues: readonly LayoutIssue[]): string {
  return issues.map((i) => `${i.path}: ${i.message}`).join("\n");
}

export { EXAMPLE_LAYOUT } from "./layout-document-example";
