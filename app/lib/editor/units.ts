/**
 * Display units. The document and the engine are always metric; the plan view shows feet on request.
 */

export type LengthUnit = "m" | "ft";

/** International foot, m. */
export const METRES_PER_FOOT = 0.3048;

/** A length given in metres, expressed in the display unit. */
export function toDisplay(metres: number, unit: LengthUnit): number {
  return unit === "ft" ? metres / METRES_PER_FOOT : metres;
}

/** A length in the display unit converted back to metres. */
export function fromDisplay(value: number, unit: LengthUnit): number {
  return unit === "ft" ? value * METRES_PER_FOOT : value;
}

/** "12.3 m" or "40.4 ft". */
export function formatLength(metres: number, unit: LengthUnit, decimals = 1): string {
  return `${toDisplay(metres, unit).toFixed(decimals)} ${unit}`;
}

/** The other unit in brackets, for hints beside metric fields: "(32.8 ft)". */
export function feetHint(metres: number): string {
  return `(${(metres / METRES_PER_FOOT).toFixed(1)} ft)`;
}

/**
 * The smallest "nice" step (1, 2 or 5 times a power of ten) in display units whose size on screen
 * is at least `minPixels`.
 * @param pixelsPerMetre current zoom, px/m.
 * @returns the step in display units and in metres.
 */
export function niceStep(
  pixelsPerMetre: number,
  unit: LengthUnit,
  minPixels: number,
): { step: number; metres: number } {
  const pixelsPerUnit = pixelsPerMetre * fromDisplay(1, unit);
  const raw = minPixels / pixelsPerUnit;
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw - 1e-12) ?? 10 * power;
  return { step: Number(step.toPrecision(6)), metres: fromDisplay(step, unit) };
}
