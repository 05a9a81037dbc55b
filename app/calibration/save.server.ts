/**
 * Saving the fitted values: into the member's own profile (only the owner; anyone else's is 404,
 * as everywhere for profiles), or, for a class, as a new profile of the member's. The values come
 * back from the result page's form and are checked against the profile's bounds again; the
 * profile is written in one statement, so nothing is stored half-way.
 */
import { CAR_NUMBER_FIELDS, carProfileSchema, type CarProfile, type FittedValues } from "~/analysis";
import { createProfile, getOwnProfile, presetProfile, updateProfile } from "~/cars/profiles.server";
import { RuleError } from "~/clubs/rule-error.server";

/** The profile fields a calibration may write. */
export const FITTED_FIELDS = [
  "topSpeed",
  "accel0",
  "brakeDecel",
  "mu",
] as const satisfies readonly (keyof FittedValues)[];

/** The fitted values from a form, each within the profile's bounds; a RuleError (400) names the field. */
export function fittedFromForm(form: FormData): FittedValues {
  const out = {} as FittedValues;
  for (const name of FITTED_FIELDS) {
    const field = CAR_NUMBER_FIELDS.find((f) => f.name === name)!;
    const raw = form.get(name);
    const value = typeof raw === "string" && raw.trim() !== "" ? Number(raw) : NaN;
    if (!Number.isFinite(value) || value < field.min || value > field.max)
      throw new RuleError(
        400,
        `${field.label} must be a number from ${field.min} to ${field.max} ${field.unit}.`.trim(),
        name,
      );
    out[name] = value;
  }
  return out;
}

function checked(profile: CarProfile): CarProfile {
  const parsed = carProfileSchema.safeParse(profile);
  if (!parsed.success)
    throw new RuleError(400, parsed.error.issues[0]?.message ?? "The values are not a valid profile.");
  return parsed.data;
}

/** Writes the values into the member's own profile; 404 when it is not theirs. */
export async function saveToProfile(
  userId: string,
  profileId: string,
  values: FittedValues,
): Promise<string> {
  const stored = await getOwnProfile(userId, profileId);
  if (!stored) throw new RuleError(404, "No such car profile of yours.", "profileId");
  const profile = checked({ ...stored.profile, ...values });
  await updateProfile(userId, profileId, profile);
  return profile.label;
}

/** A new profile of the member's from a class with the values; returns its id. */
export async function saveAsNewProfile(
  userId: string,
  presetId: string,
  label: string,
  values: FittedValues,
): Promise<string> {
  const preset = presetProfile(presetId);
  if (!preset) throw new RuleError(400, "Choose a car class to start from.", "presetId");
  const profile = checked({ ...preset, label, ...values });
  const row = await createProfile(userId, presetId, profile);
  return row.id;
}
