/** Crashed and stopped laps: which measured laps a calibration leaves out (docs/decisions/0121). */

/** A lap slower than the median lap by more than this factor is left out (a crash, a stop). */
export const SLOW_LAP_RATIO = 1.3;

/** Median of a non-empty list. */
export function median(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError("values: must not be empty");
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
}

/**
 * Splits laps into those kept and those left out as slower than SLOW_LAP_RATIO × the median lap.
 * @param laps each with its lap time, s.
 */
export function dropSlowLaps<T extends { time: number }>(
  laps: readonly T[],
  ratio = SLOW_LAP_RATIO,
): { kept: T[]; dropped: T[]; limit: number } {
  const limit = median(laps.map((l) => l.time)) * ratio;
  return { kept: laps.filter((l) => l.time <= limit), dropped: laps.filter((l) => l.time > limit), limit };
}
