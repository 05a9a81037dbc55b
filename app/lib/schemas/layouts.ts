/** Form schemas for a layout's metadata (name, surface, track width, car classes) and its status changes. */
import { z } from "zod";
import {
  CAR_CLASS_COUNT,
  CAR_PRESET_IDS,
  FIELD_LIMITS,
  SURFACE_LABELS,
  SURFACES,
  wordList,
  type Surface,
} from "~/analysis";
import { parseNumberText } from "~/lib/number-text";

export type { Surface };

/** Track width limits, m: the layout file's, the same in every form and the editor (FIELD_LIMITS). */
export const TRACK_WIDTH_MIN_M = FIELD_LIMITS.trackWidth.min;
export const TRACK_WIDTH_MAX_M = FIELD_LIMITS.trackWidth.max;

export const layoutNameField = z
  .string({ error: "Enter a name for the layout." })
  .trim()
  .min(1, { error: "Enter a name for the layout." })
  .max(100, { error: "Keep the layout's name to 100 characters or fewer." });

export const surfaceField = z.enum(SURFACES, {
  error: `Choose a surface: ${wordList(SURFACES.map((s) => SURFACE_LABELS[s].toLowerCase()))}.`,
});

/** Track width in metres from a text field; accepts a decimal comma ("3,5") and the unit ("3.5 m"). */
export const trackWidthField = z
  .string({ error: "Enter the track width in metres." })
  .trim()
  .min(1, { error: "Enter the track width in metres." })
  .transform((s) => parseNumberText(s, "m") ?? Number.NaN)
  .pipe(
    z
      .number({ error: "Enter the track width as a number of metres, like 3.5." })
      .min(TRACK_WIDTH_MIN_M, { error: `Track width must be at least ${TRACK_WIDTH_MIN_M} m.` })
      .max(TRACK_WIDTH_MAX_M, { error: `Track width must be at most ${TRACK_WIDTH_MAX_M} m.` }),
  );

/** Form fields read as lists (checkboxes): pass to parseForm. */
export const LIST_FIELDS = ["carClasses"] as const;

/** Car classes from checkboxes: 1 to 10 class presets (repeats count once). */
export const carClassesField = z
  .array(z.string({ error: "Choose the car classes from the list." }), {
    error: "Choose at least one car class.",
  })
  .transform((list) => [...new Set(list.map((s) => s.trim()))])
  .superRefine((list, ctx) => {
    if (list.length < CAR_CLASS_COUNT.min)
      ctx.addIssue({ code: "custom", message: "Choose at least one car class." });
    if (list.length > CAR_CLASS_COUNT.max)
      ctx.addIssue({ code: "custom", message: `Choose at most ${CAR_CLASS_COUNT.max} car classes.` });
    const unknown = list.filter((id) => !(CAR_PRESET_IDS as readonly string[]).includes(id));
    if (unknown.length)
      ctx.addIssue({
        code: "custom",
        message: `Choose the car classes from the list (${unknown.map((u) => `"${u.slice(0, 40)}"`).join(", ")} is not one).`,
      });
  });

const versionField = z
  .string({ error: "The form is missing the layout's version; reload the page." })
  .regex(/^\d{1,9}$/, { error: "The form's layout version is not valid; reload the page." })
  .transform(Number);

/** New layout: metadata and car classes only; the drawing comes from the editor. */
export const createLayoutSchema = z.object({
  name: layoutNameField,
  surface: surfaceField,
  trackWidth: trackWidthField,
  carClasses: carClassesField,
});

/** The layout page's forms, told apart by their `intent` button. */
export const updateLayoutSchema = createLayoutSchema.extend({
  intent: z.literal("update"),
  version: versionField,
});
export const statusChangeSchema = z.object({
  intent: z.enum(["archive", "unarchive"]),
  version: versionField,
});
export const deleteLayoutSchema = z.object({
  intent: z.literal("delete"),
  confirm: z.literal("yes", {
    error: "Tick the box to confirm that the layout and all its versions go for good.",
  }),
});

export const layoutActionSchema = z.discriminatedUnion(
  "intent",
  [updateLayoutSchema, statusChangeSchema, deleteLayoutSchema],
  {
    error:
      "This form does not say what to do (intent): update, archive, unarchive or delete. Publishing has its own page.",
  },
);
export type LayoutAction = z.infer<typeof layoutActionSchema>;
