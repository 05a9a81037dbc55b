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

const SCAN_STEP = 0.25;
const TOLERANCE = 1e-9;

function landingX(input: JumpSpeedInput, speed: number): number {
  return flyJump({ ...input, speed }).landing.x;
}

/**
 * Lowest speed in [lo, hi] at which `landingX(speed) >= target` holds, scanning upward in
 * 0.25 m/s steps and then bisecting to 1e-9 m/s. Null when no scanned speed qualifies.
 */
function firstSpeedReaching(input: JumpSpeedInput, target: number, lo: number, hi: number, strict: boolean): number | null {
  const reaches = (v: number) => (strict ? landingX(input, v) > target : landingX(input, v) >= target);
  if (reaches(lo)) return lo;
  let prev = lo;
  for (let v = lo + SCAN_STEP; prev < hi; v += SCAN_STEP) {
    const cur = Math.min(v, hi);
    if (reaches(cur)) {
      let a = prev;
      let b = cur;
      while (b - a > TOLERANCE) {
        const m = 0.5 * (a + b);
        if (reaches(m)) b = m;
        else a = m;
      }
      return b;
    }
    prev = cur;
  }
  return null;
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
