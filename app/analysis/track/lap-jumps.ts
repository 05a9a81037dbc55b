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
 * Lowest takeoff speed (m/s) from `from` up whose first touchdown lies beyond `target` (m along
 * the section; at or beyond it unless `strict`). Scans upward in 0.25 m/s steps, then bisects to
 * 1e-6 m/s. Null when no speed up to the search limit qualifies.
 */
function firstSpeedPast(
  profile: JumpProfile,
  target: number,
  from: number,
  strict: boolean,
  g: number,
): number | null {
  const past = (v: number) => {
    const d = ballisticTouchdown(profile, v, g).d;
    return strict ? d > target + 1e-9 : d >= target - 1e-9;
  };
  if (past(from)) return from;
  let lo = from;
  for (let v = from + SCAN_STEP; lo < SEARCH_MAX; v += SCAN_STEP) {
    const hi = Math.min(v, SEARCH_MAX);
    if (past(hi)) {
      let a = lo;
      let b = hi;
      while (b - a > 1e-6) {
        const mid = 0.5 * (a + b);
        if (past(mid)) b = mid;
        else a = mid;
      }
      return b;
    }
    lo = hi;
  }
  return null;
}

const windowCache = new WeakMap<JumpProfile, { g: number; window: JumpWindow }>();

/**
 * Drag-free speed window and sweet-spot speed of a jump profile, from where the flight first
 * meets the ground (so a flight that clips a crest on the way does not count as reaching the
 * ramp). The top of the window is where the touchdown passes the ramp's end (40 m/s at most).
 * Remembered per profile object.
 */
export function ballisticJumpWindow(profile: JumpProfile, g = STANDARD_GRAVITY): JumpWindow {
  const cached = windowCache.get(profile);
  if (cached && cached.g === g) return cached.window;
  const none: JumpWindow = { windowMin: null, sweetSpotSpeed: null, windowMax: null };
  let window = none;
  const windowMin = firstSpeedPast(profile, profile.d[profile.landingStartIndex], SEARCH_MIN, false, g);
  if (windowMin !== null) {
    const sweet = firstSpeedPast(profile, profile.sweetSpot, windowMin, false, g);
    const beyond = firstSpeedPast(profile, profile.d[profile.landingEndIndex], sweet ?? windowMin, true, g);
    window = { windowMin, sweetSpotSpeed: sweet, windowMax: beyond ?? SEARCH_MAX };
  }
  windowCache.set(profile, { g, window });
  return window;
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
export function ballisticTouchdown(
  profile: JumpProfile,
  speed: number,
  g = STANDARD_GRAVITY,
): BallisticTouchdown {
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
    // A > 0, so the smaller root comes first.
    for (let root = 0; root < 2; root++) {
      const X = (B + (root === 0 ? -r : r)) / (2 * A);
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
