/**
 * Pure helpers of the plan drawing: the drawing's extent in metres and the places along the lap
 * where the speed is printed (the slowest point of each corner and the fastest of each straight).
 */

export interface Extent {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** The box around every point, grown by `margin` m. */
export function extent(points: Iterable<readonly [number, number]>, margin: number): Extent {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  if (!Number.isFinite(minX)) return { minX: -10, minY: -10, maxX: 10, maxY: 10 };
  return { minX: minX - margin, minY: minY - margin, maxX: maxX + margin, maxY: maxY + margin };
}

export interface SpeedLabel {
  index: number;
  kind: "min" | "max";
  speed: number;
}

/**
 * Local speed minima and maxima along a closed lap that stand out by at least `prominence` m/s
 * from the neighbouring opposite extremes, at least `minGap` samples apart; the lap's overall
 * slowest and fastest points are always included.
 */
export function speedLabels(speed: readonly number[], prominence = 1, minGap = 20): SpeedLabel[] {
  const n = speed.length;
  if (n < 3) return [];
  // Turning points of the (closed) speed profile.
  const turns: SpeedLabel[] = [];
  for (let i = 0; i < n; i++) {
    const prev = speed[(i - 1 + n) % n];
    const next = speed[(i + 1) % n];
    const v = speed[i];
    if (v <= prev && v < next) turns.push({ index: i, kind: "min", speed: v });
    else if (v >= prev && v > next) turns.push({ index: i, kind: "max", speed: v });
  }
  // Keep extremes that differ enough from both neighbouring kept extremes of the other kind.
  const kept: SpeedLabel[] = [];
  for (const t of turns) {
    const last = kept[kept.length - 1];
    if (last && last.kind === t.kind) {
      if ((t.kind === "min" && t.speed < last.speed) || (t.kind === "max" && t.speed > last.speed))
        kept[kept.length - 1] = t;
    } else if (!last || Math.abs(t.speed - last.speed) >= prominence) {
      kept.push(t);
    }
  }
  let slow = 0;
  let fast = 0;
  for (let i = 1; i < n; i++) {
    if (speed[i] < speed[slow]) slow = i;
    if (speed[i] > speed[fast]) fast = i;
  }
  const must: SpeedLabel[] = [
    { index: slow, kind: "min", speed: speed[slow] },
    { index: fast, kind: "max", speed: speed[fast] },
  ];
  const out: SpeedLabel[] = [...must];
  for (const k of kept) {
    const cyclicGap = (a: number, b: number) => Math.min(Math.abs(a - b), n - Math.abs(a - b));
    if (out.every((o) => cyclicGap(o.index, k.index) >= minGap)) out.push(k);
  }
  return out.sort((a, b) => a.index - b.index);
}
