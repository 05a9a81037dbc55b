/**
 * Snapping of edited values: lengths to 0.1 m and angles to 5 degrees by default, each switchable.
 */

/** Default snapping steps: lengths in metres, angles in degrees. */
export const SNAP_STEPS = { length: 0.1, angle: 5, height: 0.05 } as const;

export interface SnapSettings {
  /** Snap lengths, radii and positions to SNAP_STEPS.length (m). */
  lengths: boolean;
  /** Snap angles to SNAP_STEPS.angle (deg). */
  angles: boolean;
}

export const DEFAULT_SNAP: SnapSettings = { lengths: true, angles: true };

/**
 * Rounds a value to the nearest multiple of a step; returns the value unchanged when step <= 0.
 * The result is cleaned of binary noise (0.30000000000000004 becomes 0.3).
 */
export function snapTo(value: number, step: number): number {
  if (!(step > 0)) return value;
  const snapped = Math.round(value / step) * step;
  const decimals = Math.max(0, Math.ceil(-Math.log10(step)) + 1);
  return Number(snapped.toFixed(decimals));
}

/** A length (m) snapped to 0.1 m when length snapping is on. */
export function snapLength(metres: number, settings: SnapSettings): number {
  return settings.lengths ? snapTo(metres, SNAP_STEPS.length) : metres;
}

/** An angle (deg) snapped to 5 deg when angle snapping is on. */
export function snapAngle(degrees: number, settings: SnapSettings): number {
  return settings.angles ? snapTo(degrees, SNAP_STEPS.angle) : degrees;
}

/** A height (m) on a jump profile, snapped to 0.05 m when length snapping is on. */
export function snapHeight(metres: number, settings: SnapSettings): number {
  return settings.lengths ? snapTo(metres, SNAP_STEPS.height) : metres;
}

/** Keeps a value inside [min, max]. */
export function clamp(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
}
