/** Form schemas for a layout's metadata (name, surface, track width) and its status changes. */
import { z } from "zod";
import { SURFACE_LABELS, SURFACES, wordList, type Surface } from "~/analysis";
import { parseNumberText } from "~/lib/number-text";

export type { Surface };

/** Track width limits, m: narrower than 1.5 m two cars cannot pass; wider than 10 m is a car park. */
export const TRACK_WIDTH_MIN_M = 1.5;
export const TRACK_WIDTH_MAX_M = 10;

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

const versionField = z
  .string({ error: "The form is missing the layout's version; reload the page." })
  .regex(/^\d{1,9}$/, { error: "The form's layout version is not valid; reload the page." })
  .transform(Number);

/** New layout: metadata only; the drawing comes from the editor. */
export const createLayoutSchema = z.object({
  name: layoutNameField,
  surface: surfaceField,
  trackWidth: trackWidthField,
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
