import type { z } from "zod";

export type FieldErrors = Partial<Record<string, string[]>>;

/**
 * Parses FormData through a zod schema. On failure returns the field errors keyed by field name
 * (nested paths joined with dots), ready to show beside each field. Fields named in `lists` (a
 * group of checkboxes) are read as lists of every value sent, even one or none.
 */
export function parseForm<S extends z.ZodType>(
  schema: S,
  formData: FormData,
  lists: readonly string[] = [],
): { ok: true; data: z.infer<S> } | { ok: false; errors: FieldErrors } {
  const raw: Record<string, FormDataEntryValue | FormDataEntryValue[]> = {};
  for (const [key, value] of formData) raw[key] = value;
  for (const key of lists) raw[key] = formData.getAll(key);
  const result = schema.safeParse(raw);
  if (result.success) return { ok: true, data: result.data };
  const errors: FieldErrors = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join(".") || "form";
    (errors[key] ??= []).push(issue.message);
  }
  return { ok: false, errors };
}
