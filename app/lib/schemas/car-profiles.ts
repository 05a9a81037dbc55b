/**
 * The car profile form: one text field per number of the profile (names and units from
 * CAR_NUMBER_FIELDS), the name and the drive. Numbers are read as people type them (a decimal
 * comma, the unit after the number); every problem is reported beside its field, by name.
 */
import { CAR_NUMBER_FIELDS, carProfileSchema, type CarProfile } from "~/analysis";
import type { FieldErrors } from "~/lib/forms";
import { parseNumberText } from "~/lib/number-text";

/** The form's values as text, by field name (to show a form again without losing anything). */
export type ProfileFormValues = Record<string, string>;

/** The text fields of a profile, numbers to six significant digits (enough to keep estimates marked). */
export function profileFormValues(p: CarProfile): ProfileFormValues {
  const values: ProfileFormValues = { label: p.label, drive: p.drive };
  for (const f of CAR_NUMBER_FIELDS) {
    const v = f.path.reduce<unknown>((o, k) => (o as Record<string | number, unknown>)[k], p) as number;
    values[f.name] = String(Number(v.toPrecision(6)));
  }
  return values;
}

function setAt(target: Record<string, unknown>, path: readonly (string | number)[], value: unknown) {
  let o: Record<string | number, unknown> = target;
  path.slice(0, -1).forEach((k, i) => {
    o[k] ??= typeof path[i + 1] === "number" ? [] : {};
    o = o[k] as Record<string | number, unknown>;
  });
  o[path[path.length - 1]] = value;
}

/**
 * Reads the profile form.
 * @returns the profile, or the errors by field name ("frontWheel.radius", "inertia.0", "label").
 */
export function parseProfileForm(
  formData: FormData,
): { ok: true; profile: CarProfile } | { ok: false; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const raw: Record<string, unknown> = {
    label: String(formData.get("label") ?? ""),
    drive: String(formData.get("drive") ?? ""),
  };
  for (const f of CAR_NUMBER_FIELDS) {
    const text = String(formData.get(f.name) ?? "").trim();
    const n = text === "" ? null : parseNumberText(text, f.unit || undefined);
    if (text === "") errors[f.name] = [`Enter the ${f.label.toLowerCase()}${f.unit ? ` in ${f.unit}` : ""}.`];
    else if (n === null) errors[f.name] = [`${f.label} must be a number${f.unit ? ` (${f.unit})` : ""}.`];
    setAt(raw, f.path, n ?? Number.NaN);
  }
  const parsed = carProfileSchema.safeParse(raw);
  if (parsed.success && Object.keys(errors).length === 0) return { ok: true, profile: parsed.data };
  for (const issue of parsed.success ? [] : parsed.error.issues) {
    const key = issue.path.join(".") || "form";
    if (!errors[key]) errors[key] = [issue.message.endsWith(".") ? issue.message : `${issue.message}.`];
  }
  return { ok: false, errors };
}
