/**
 * The text a person typed, sent back with field errors so a page that works without JavaScript
 * can show the form again as it was. Passwords and other secrets are never echoed.
 */
export function formValues(
  formData: FormData,
  omit: readonly string[] = ["password", "confirm"],
): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of formData) {
    if (typeof value === "string" && !omit.includes(key)) values[key] = value;
  }
  return values;
}
