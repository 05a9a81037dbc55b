/**
 * An analysis's JSON text, made by the worker that computed it, so the request thread never
 * serialises a large analysis itself: answers splice these bytes in (`composeJson`). Numbers are
 * written to JSON_DIGITS significant digits, the same everywhere the API writes analyses.
 */

/** Significant digits of the numbers in JSON answers: far finer than any model estimate. */
export const JSON_DIGITS = 6;

/** Writes fractional numbers to JSON_DIGITS significant digits (whole numbers as they are). */
export function compactNumber(_key: string, value: unknown): unknown {
  return typeof value === "number" && !Number.isInteger(value) && Number.isFinite(value)
    ? Number(value.toPrecision(JSON_DIGITS))
    : value;
}

const encoder = new TextEncoder();

/** UTF-8 JSON of a value with compact numbers. */
export function compactJsonBytes(value: unknown): Uint8Array {
  return encoder.encode(JSON.stringify(value, compactNumber));
}

const made = new WeakMap<object, Uint8Array>();

/** Remembers the JSON bytes already made of this value (an analysis from a worker). */
export function rememberJson(value: object, bytes: Uint8Array): void {
  made.set(value, bytes);
}

/** The JSON bytes remembered for this value, if any. */
export function jsonBytesOf(value: object): Uint8Array | undefined {
  return made.get(value);
}

/**
 * UTF-8 JSON of an object's fields with compact numbers; a field whose value has its JSON bytes
 * remembered is spliced in as they are, the others are serialised here.
 */
export function composeJson(fields: Record<string, unknown>): Uint8Array {
  const parts: Uint8Array[] = [];
  let separator = "{";
  for (const [key, value] of Object.entries(fields)) {
    if (value === undefined) continue;
    parts.push(encoder.encode(`${separator}${JSON.stringify(key)}:`));
    const ready = value !== null && typeof value === "object" ? made.get(value) : undefined;
    parts.push(ready ?? compactJsonBytes(value));
    separator = ",";
  }
  parts.push(encoder.encode(separator === "{" ? "{}" : "}"));
  return Buffer.concat(parts);
}
