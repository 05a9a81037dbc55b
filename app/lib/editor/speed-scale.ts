/**
 * The racing line's speed scale: colour and line width both grow with speed, so the line reads
 * without colour (wider = faster), and the legend prints the numbers.
 */

/** Slow to fast: deep blue, pine, amber, brick red (Loftline's own scale). */
const STOPS: [number, [number, number, number]][] = [
  [0, [43, 92, 138]],
  [0.35, [42, 115, 96]],
  [0.7, [224, 165, 38]],
  [1, [163, 38, 27]],
];

export const SPEED_BINS = 12;
/** Line width of the slowest and the fastest bin, px. */
export const WIDTH_RANGE = [2, 7] as const;

/** Which of SPEED_BINS bins a speed (m/s) falls in, 0 = slowest. */
export function speedBin(speed: number, min: number, max: number, bins = SPEED_BINS): number {
  if (!(max > min)) return 0;
  const t = (speed - min) / (max - min);
  return Math.min(bins - 1, Math.max(0, Math.floor(t * bins)));
}

/** Colour of a position 0..1 along the scale, as "rgb(r, g, b)". */
export function scaleColour(t: number): string {
  const x = Math.min(1, Math.max(0, t));
  let k = 0;
  while (k < STOPS.length - 2 && x > STOPS[k + 1][0]) k++;
  const [t0, c0] = STOPS[k];
  const [t1, c1] = STOPS[k + 1];
  const f = (x - t0) / (t1 - t0);
  const c = c0.map((v, i) => Math.round(v + f * (c1[i] - v)));
  return `rgb(${c[0]}, ${c[1]}, ${c[2]})`;
}

/** Colour and width (px) of a bin's middle. */
export function binStyle(bin: number, bins = SPEED_BINS): { colour: string; width: number } {
  const t = (bin + 0.5) / bins;
  return { colour: scaleColour(t), width: WIDTH_RANGE[0] + t * (WIDTH_RANGE[1] - WIDTH_RANGE[0]) };
}

/**
 * Runs of consecutive samples in the same bin, each drawn as one polyline (overlapping by one
 * sample so the line has no gaps).
 */
export function speedRuns(
  speed: ArrayLike<number>,
  min: number,
  max: number,
  bins = SPEED_BINS,
): { bin: number; from: number; to: number }[] {
  const runs: { bin: number; from: number; to: number }[] = [];
  const n = speed.length;
  if (n < 2) return runs;
  let from = 0;
  let bin = speedBin(speed[0], min, max, bins);
  for (let i = 1; i < n; i++) {
    const b = speedBin(speed[i], min, max, bins);
    if (b !== bin || i === n - 1) {
      runs.push({ bin, from, to: i });
      from = i;
      bin = b;
    }
  }
  return runs;
}

/** Speeds to print on the legend, m/s: the ends and three steps between. */
export function legendTicks(min: number, max: number): number[] {
  return [0, 0.25, 0.5, 0.75, 1].map((f) => min + f * (max - min));
}
