/**
 * Form schemas of the publishing page: publish the draft for race day, withdraw a published
 * version, create and revoke share links. Told apart by their `intent` button.
 */
import { z } from "zod";

export const NOTE_MAX = 1000;
export const REASON_MAX = 500;
/** How far ahead a race date may be, days (about two seasons). */
export const RACE_DATE_MAX_DAYS_AHEAD = 730;

const DAY_MS = 24 * 60 * 60 * 1000;

/** "YYYY-MM-DD" of a time, in UTC. */
export function isoDay(ms: number): string {
  return new Date(ms).toISOString().slice(0, 10);
}

/**
 * A race date as an HTML date field sends it ("2026-07-12"): a real calendar day, from yesterday
 * (time zones) to two years ahead.
 */
export function raceDateField(now = () => Date.now()) {
  return z
    .string({ error: "Enter the race date." })
    .trim()
    .min(1, { error: "Enter the race date." })
    .regex(/^\d{4}-\d{2}-\d{2}$/, { error: "Enter the race date as a date, like 2026-07-12." })
    .refine((s) => isoDay(Date.parse(`${s}T00:00:00Z`) || 0) === s, {
      error: "That race date is not a day of the calendar.",
    })
    .refine((s) => s >= isoDay(now() - DAY_MS), { error: "The race date has passed: pick a coming day." })
    .refine((s) => s <= isoDay(now() + RACE_DATE_MAX_DAYS_AHEAD * DAY_MS), {
      error: "The race date is more than two years ahead.",
    });
}

const versionField = z
  .string({ error: "The form is missing the layout's version; reload the page." })
  .regex(/^\d{1,9}$/, { error: "The form's layout version is not valid; reload the page." })
  .transform(Number);

const idField = (what: string) =>
  z
    .string({ error: `Say which ${what} this is about.` })
    .trim()
    .min(1, { error: `Say which ${what} this is about.` })
    .max(64, { error: `That ${what} id is not valid.` });

export const publishSchema = z.object({
  intent: z.literal("publish"),
  version: versionField,
  raceDate: raceDateField(),
  note: z
    .string({ error: "The note must be text." })
    .trim()
    .max(NOTE_MAX, { error: `Keep the note to ${NOTE_MAX} characters or fewer.` })
    .default(""),
});

export const withdrawSchema = z.object({
  intent: z.literal("withdraw"),
  publication: idField("published version"),
  reason: z
    .string({ error: "Say why the version is withdrawn." })
    .trim()
    .min(3, { error: "Say why the version is withdrawn (at least 3 characters)." })
    .max(REASON_MAX, { error: `Keep the reason to ${REASON_MAX} characters or fewer.` }),
});

export const shareSchema = z.object({
  intent: z.literal("share"),
  publication: idField("published version"),
});
export const revokeShareSchema = z.object({ intent: z.literal("revoke-share"), link: idField("share link") });

export const publishingActionSchema = z.discriminatedUnion(
  "intent",
  [publishSchema, withdrawSchema, shareSchema, revokeShareSchema],
  { error: "This form does not say what to do (intent): publish, withdraw, share or revoke-share." },
);
export type PublishingAction = z.infer<typeof publishingActionSchema>;
