/**
 * Takeoff speeds of a jump found by root finding on the flight model (engine.md section 3):
 * the speed window (lowest speed that reaches the landing ramp, highest that still lands on it)
 * and the speed that lands on a chosen point, by default the sweet spot one third of the way down
 * the landing ramp.
 */
import { flyJump, type FlightInput, type LandingRamp } from "./flight";

/** A jump without its takeoff speed, plus the landing ramp (x positions, m). */
export interface JumpSpeedInput extends Omit<FlightInput, "speed" | "landingRamp"> {
  landingRamp: LandingRamp;
  /** Highest takeoff speed searched, m/s (default 40). */
  maxSpeed?: number;
  /** Lowest takeoff speed searched, m/s (default 0.5). */
  minSpeed?: number;
}

export interface SpeedWindow {
  /** Lowest takeoff speed that lands on the ramp (x >= ramp start), m/s. */
  min: number;
  /** Highest takeoff speed that still lands on the ramp (x <= ramp end), m/s. */
  max: number;
  /** True when even `maxSpeed` still lands on the ramp, so `max` is only the search limit. */
  maxIsSearchLimit: boolean;
}

const SCAN_STEP = 0.5;
const TOLERANCE = 1e-9;

function landingX(input: JumpSpeedInput, speed: number): number {
  return flyJump({ ...input, speed }).landing.x;
}

/**
 * Lowest speed in [lo, hi] at which the touchdown reaches `target` (x >= target, or x > target
 * when `strict`), scanning upward in 0.5 m/s steps and then closing in with the Illinois method
 * (regula falsi that halves a stale end) to 1e-9 m/s. Null when no scanned speed qualifies.
 */
function firstSpeedReaching(
  input: JumpSpeedInput,
  target: number,
  lo: number,
  hi: number,
  strict: boolean,
): number | null {
  const gap = (v: number) => landingX(input, v) - target;
  const reaches = (g: number) => (strict ? g > 0 : g >= 0);
  let g0 = gap(lo);
  if (reaches(g0)) return lo;
  let prev = lo;
  for (let v = lo + SCAN_STEP; prev < hi; v += SCAN_STEP) {
    const cur = Math.min(v, hi);
    const g1 = gap(cur);
    if (reaches(g1)) return closeIn(gap, reaches, prev, g0, cur, g1);
    prev = cur;
    g0 = g1;
  }
  return null;
}

/** Illinois iterations on a bracket [a, b] with `reaches` false at a and true at b; returns b. */
function closeIn(
  gap: (v: number) => number,
  reaches: (g: number) => boolean,
  a: number,
  ga: number,
  b: number,
  gb: number,
): number {
  let side = 0;
  for (let k = 0; k < 200 && b - a > TOLERANCE; k++) {
    let m = b - (gb * (b - a)) / (gb - ga);
    // Keep the trial strictly inside and never too close to one end (falls back to bisection).
    const w = b - a;
    if (!(m > a + 0.01 * w && m < b - 0.01 * w)) m = 0.5 * (a + b);
    const gm = gap(m);
    if (reaches(gm)) {
      b = m;
      gb = gm;
      if (side === 1) ga /= 2;
      side = 1;
    } else {
      a = m;
      ga = gm;
      if (side === -1) gb /= 2;
      side = -1;
    }
  }
  return b;
}

function checkRamp(input: JumpSpeedInput): void {
  const { start, end } = input.landingRamp;
  if (!Number.isFinite(start) || !Number.isFinite(end) || !(end > start)) {
    throw new RangeError("landingRamp.end must be a finite number greater than landingRamp.start");
  }
}

/**
 * Speed window of a jump: the lowest takeoff speed whose touchdown reaches the landing ramp
 * (below it the car lands short and cases the jump) and the highest whose touchdown is still on
 * the ramp (above it the car overshoots onto the flat). Speeds in m/s.
 * @returns the window, or null when no speed up to `maxSpeed` reaches the ramp.
 */
export function speedWindow(input: JumpSpeedInput): SpeedWindow | null {
  checkRamp(input);
  const lo = input.minSpeed ?? 0.5;
  const hi = input.maxSpeed ?? 40;
  const min = firstSpeedReaching(input, input.landingRamp.start, lo, hi, false);
  if (min === null) return null;
  const over = firstSpeedReaching(input, input.landingRamp.end, min, hi, true);
  if (over === null) return { min, max: hi, maxIsSearchLimit: true };
  return { min, max: over, maxIsSearchLimit: false };
}

/**
 * Takeoff speed (m/s) that touches down at `targetX` (m): the lowest speed whose touchdown
 * reaches it, found by scanning and bisection on the flight model. Null when none up to
 * `maxSpeed` does.
 */
export function speedToLandAt(input: Omit<JumpSpeedInput, "landingRamp">, targetX: number): number | null {
  const ramp = { start: targetX, end: targetX + 1 };
  const full: JumpSpeedInput = { ...input, landingRamp: ramp };
  return firstSpeedReaching(full, targetX, input.minSpeed ?? 0.5, input.maxSpeed ?? 40, false);
}

/**
 * Speed (m/s) that lands the car on the sweet spot: `fraction` of the way down the landing ramp
 * (default one third, engine.md section 2). Null when no speed up to `maxSpeed` reaches it.
 */
export function sweetSpotSpeed(input: JumpSpeedInput, fraction = 1 / 3): number | null {
  checkRamp(input);
  const { start, end } = input.landingRamp;
  return speedToLandAt(input, start + fraction * (end - start));
}
