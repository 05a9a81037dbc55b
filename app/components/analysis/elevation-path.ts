/**
 * Pure helpers of the jump's side elevation: the flight path drawn through the computed lip, apex
 * and touchdown (two parabolic halves meeting level at the apex), and axis ticks.
 */

/** Points [d m, z m] of the drawn flight path, or [] without a landing. */
export function flightCurve(
  lip: { d: number; z: number },
  apex: { d: number; z: number } | null,
  landing: { d: number; z: number } | null,
  steps = 40,
): [number, number][] {
  if (!landing) return [];
  // No climb (a step-down from a flat lip): the apex is the lip itself.
  const top = apex && apex.d > lip.d + 1e-6 && apex.d < landing.d ? apex : { d: lip.d, z: lip.z };
  const pts: [number, number][] = [];
  const half = (from: { d: number; z: number }, n: number, rising: boolean) => {
    const span = top.d - from.d;
    const k = span === 0 ? 0 : (top.z - from.z) / (span * span);
    for (let i = 0; i <= n; i++) {
      const d = rising ? from.d + (span * i) / n : top.d - (span * i) / n;
      pts.push([d, top.z - k * (d - top.d) ** 2]);
    }
  };
  const upSteps = Math.round((steps * (top.d - lip.d)) / Math.max(1e-6, landing.d - lip.d));
  if (upSteps > 0) half(lip, upSteps, true);
  const down: [number, number][] = [];
  const span = landing.d - top.d;
  const k = span === 0 ? 0 : (top.z - landing.z) / (span * span);
  const n = Math.max(2, steps - upSteps);
  for (let i = upSteps > 0 ? 1 : 0; i <= n; i++) {
    const d = top.d + (span * i) / n;
    down.push([d, top.z - k * (d - top.d) ** 2]);
  }
  return [...pts, ...down];
}

/** Tick positions from `min` to `max` at a round step giving about `count` ticks. */
export function ticks(min: number, max: number, count = 8): number[] {
  const raw = (max - min) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? raw;
  const out: number[] = [];
  for (let v = Math.ceil(min / step) * step; v <= max + 1e-9; v += step)
    out.push(Math.round(v * 1e6) / 1e6 || 0);
  return out;
}
