import type { z } from "zod";

export type FieldErrors = Partial<Record<string, string[]>>;

/**
 * Parses FormData through a zod schema. On failure returns the field errors keyed by field name
 * (nested paths joined with dots), ready to show beside each field.
 */
export function parseForm<S extends z.ZodType>(
  schema: S,
  formData: FormData,
): { ok: true; data: z.infer<S> } | { ok: false; errors: FieldErrors } {
  const raw: Record<string, FormDataEntryValue> = {};
  for (const [key, value] of formData) raw[key] = value;
  const result = schema.safeParse(raw);
  if (result.success) return { ok: true, data: result.data };
  const errors: FieldErrors = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join(".") || "form";
    (errors[key] ??= []).push(issue.message);
  }
  return { ok: false, errors };
}
