/**
 * Reading a number a person typed into a text field: one reading for every form and the editor's
 * number fields. Accepted: spaces around it, a decimal point or a decimal comma ("3,5"), and the
 * field's own unit after it ("3.5 m", "30 deg", "30°"). Anything else (letters, two separators,
 * thousands separators, another unit, hexadecimal, "Infinity") is not a number.
 */

/** Other spellings people type for a unit. */
const UNIT_SPELLINGS: Record<string, readonly string[]> = {
  deg: ["deg", "°", "degrees"],
  m: ["m", "metres", "meters"],
};

const PLAIN_NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i;

/**
 * The number in `text`, or null when it is empty or not a number.
 * @param unit the field's unit ("m", "deg", ...): written after the number, it is allowed
 */
export function parseNumberText(text: string, unit?: string): number | null {
  let s = text.trim();
  if (unit) {
    const lower = s.toLowerCase();
    const spelling = (UNIT_SPELLINGS[unit] ?? [unit])
      .map((u) => u.toLowerCase())
      .sort((a, b) => b.length - a.length)
      .find((u) => lower.endsWith(u) && /[\d.,\s]$/.test(s.slice(0, s.length - u.length)));
    if (spelling) s = s.slice(0, s.length - spelling.length).trimEnd();
  }
  // A single comma with no point is a decimal comma; "1,000.5" or "1.000,5" are refused.
  if (/^[^,.]*,[^,.]*$/.test(s)) s = s.replace(",", ".");
  if (!PLAIN_NUMBER.test(s)) return null;
  const n = Number(s);
  return Number.isFinite(n) ? n : null;
}
