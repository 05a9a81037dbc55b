/**
 * Drag-free jump ballistics for the lap model: the takeoff speeds that reach points of a jump's
 * landing, and where a flight at a given speed first meets the ground profile.
 *
 * Closed forms of the point-mass parabola (no air drag), so the lap model stays a few
 * microseconds per jump. The per-jump analysis uses the flight engine (flight.ts), which adds drag.
 */
import type { JumpProfile } from "./jump-profile";

export const STANDARD_GRAVITY = 9.81;

/**
 * Takeoff speed, m/s, that carries a drag-free point mass launched at `angle` (rad above
 * horizontal) to a point dx metres ahead and dz metres above the launch point; null if no speed
 * reaches it (the point lies above the launch direction, or not ahead).
 */
export function speedToReach(dx: number, dz: number, angle: number, g = STANDARD_GRAVITY): number | null {
  const c = Math.cos(angle);
  const denom = 2 * c * c * (dx * Math.tan(angle) - dz);
  if (dx <= 0 || denom <= 0) return null;
  return Math.sqrt((g * dx * dx) / denom);
}

export interface JumpWindow {
  /** Lowest takeoff speed that reaches the landing ramp, m/s (all three null: no speed lands on it). */
  windowMin: number | null;
  /** Takeoff speed that lands on the sweet spot, m/s. */
  sweetSpotSpeed: number | null;
  /** Highest takeoff speed that still lands on the landing ramp, m/s. */
  windowMax: number | null;
}

/** Slowest and fastest takeoff speeds searched, m/s. */
const SEARCH_MIN = 0.2;
const SEARCH_MAX = 40;
const SCAN_STEP = 0.25;

/**
 * Lowest takeoff speed (m/s) whose first touchdown lies at or beyond `target` (m along the
 * section); `beyond` false: the highest speed whose touchdown lies at or before it. Null when no
 * speed in the search range qualifies. Scans upward in 0.25 m/s steps, then bisects to 1e-6 m/s.
 */
function speedForTouchdown(profile: JumpProfile, target: number, beyond: boolean, g: number): number | null {
  const reaches = (v: number) => ballisticTouchdown(profile, v, g).d >= target - 1e-9;
  if (beyond) {
    let prev = SEARCH_MIN;
    if (reaches(prev)) return prev;
    for (let v = SEARCH_MIN + SCAN_STEP; v <= SEARCH_MAX + 1e-9; v += SCAN_STEP) {
      if (reaches(v)) return bisect(prev, v, reaches);
      prev = v;
    }
    return null;
  }
  const past = (v: number) => ballisticTouchdown(profile, v, g).d > target + 1e-9;
  let prev = SEARCH_MAX;
  if (!past(prev)) return prev;
  for (let v = SEARCH_MAX - SCAN_STEP; v >= SEARCH_MIN - 1e-9; v -= SCAN_STEP) {
    if (!past(v)) return bisect(v, prev, past);
    prev = v;
  }
  return null;
}

/** Smallest v in (lo, hi] with test(v) true, given test(lo) false and test(hi) true. */
function bisect(lo: number, hi: number, test: (v: number) => boolean): number {
  while (hi - lo > 1e-6) {
    const mid = 0.5 * (lo + hi);
    if (test(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * Drag-free speed window and sweet-spot speed of a jump profile, from where the flight first
 * meets the ground (so a flight that clips a crest on the way does not count as reaching the ramp).
 */
export function ballisticJumpWindow(profile: JumpProfile, g = STANDARD_GRAVITY): JumpWindow {
  const windowMin = speedForTouchdown(profile, profile.d[profile.landingStartIndex], true, g);
  const windowMax = speedForTouchdown(profile, profile.d[profile.landingEndIndex], false, g);
  const sweet = speedForTouchdown(profile, profile.sweetSpot, true, g);
  const ok = windowMin !== null && windowMax !== null && windowMin <= windowMax;
  return { windowMin: ok ? windowMin : null, sweetSpotSpeed: ok ? sweet : null, windowMax: ok ? windowMax : null };
}

export interface BallisticTouchdown {
  /** Distance along the section where the flight meets the ground, m (may pass the profile's end). */
  d: number;
  /** Ground height there, m. */
  h: number;
  /** Time in the air, s. */
  airtime: number;
  /** Horizontal speed in the air, m/s. */
  horizontalSpeed: number;
  /** Speed along the ground just after touchdown (the part normal to the ground is lost), m/s. */
  rollOutSpeed: number;
}

/**
 * Where a drag-free flight from the lip at `speed` (m/s along the face) first meets the ground:
 * the profile, then flat ground at height 0 beyond it.
 */
export function ballisticTouchdown(profile: JumpProfile, speed: number, g = STANDARD_GRAVITY): BallisticTouchdown {
  const a = profile.faceAngle;
  const lx = profile.d[profile.lipIndex];
  const lz = profile.h[profile.lipIndex];
  const vx = speed * Math.cos(a);
  const vz = speed * Math.sin(a);
  if (vx < 1e-6) return { d: lx, h: lz, airtime: 0, horizontalSpeed: 0, rollOutSpeed: 0 };
  // Path height above the lip: z(X) = X tan(a) - A X^2 with X measured from the lip.
  const A = g / (2 * vx * vx);
  const n = profile.d.length;
  for (let k = profile.lipIndex; k < n; k++) {
    const x0 = profile.d[k] - lx;
    const x1 = k + 1 < n ? profile.d[k + 1] - lx : Infinity;
    const h0 = profile.h[k];
    const m = k + 1 < n ? (profile.h[k + 1] - h0) / (profile.d[k + 1] - profile.d[k]) : 0;
    // Path minus ground: -A X^2 + (tan a - m) X + (lz - h0 + m x0) = 0.
    const B = Math.tan(a) - m;
    const C = lz - h0 + m * x0;
    const disc = B * B + 4 * A * C;
    if (disc < 0) continue;
    const r = Math.sqrt(disc);
    const roots = [(B - r) / (2 * A), (B + r) / (2 * A)].sort((p, q) => p - q);
    for (const X of roots) {
      if (X > 1e-9 && X >= x0 - 1e-12 && X <= x1) {
        const h = h0 + m * (X - x0);
        const slope = Math.atan(m);
        const vzTd = vz - (g * X) / vx;
        const path = Math.atan2(vzTd, vx);
        const rollOutSpeed = Math.hypot(vx, vzTd) * Math.max(0, Math.cos(path - slope));
        return { d: lx + X, h, airtime: X / vx, horizontalSpeed: vx, rollOutSpeed };
      }
    }
  }
  // Unreachable for a profile that ends at height 0 with the flat beyond it; kept for safety.
  return { d: lx, h: lz, airtime: 0, horizontalSpeed: vx, rollOutSpeed: speed };
}
