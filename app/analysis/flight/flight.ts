/**
 * Flight of a jump (engine.md section 3): a point mass at the centre of mass leaves the lip at the
 * takeoff speed along the face angle and flies under gravity (and optional quadratic drag) until
 * its path meets the ground profile. SI units and radians throughout.
 */
import { assertFinite } from "../math/vec";

/** A point of a side elevation: x along the jump (m), z up (m). */
export interface ProfilePoint {
  x: number;
  z: number;
}

/** Quadratic air drag, F = 0.5 * airDensity * cdA * v^2. */
export interface DragParams {
  /** Car mass, kg. */
  massKg: number;
  /** Drag coefficient times frontal area, m^2. */
  cdA: number;
  /** Air density, kg/m^3 (default 1.225). */
  airDensity?: number;
}

/** Where the landing ramp lies along the profile, as x positions (m). */
export interface LandingRamp {
  start: number;
  end: number;
}

export interface FlightInput {
  /** Takeoff speed along the face, m/s (> 0). */
  speed: number;
  /** Face angle at the lip, radians above horizontal. */
  faceAngleRad: number;
  /** Takeoff point (centre of mass path starts here), m. */
  lip: ProfilePoint;
  /**
   * Ground profile, x strictly increasing (m). Beyond the last point the ground continues flat at
   * the last height; before the first point, flat at the first height.
   */
  surface: ProfilePoint[];
  /** Gravity, m/s^2 (default 9.81). */
  g?: number;
  /** Optional quadratic air drag. */
  drag?: DragParams;
  /** Optional landing ramp, used only to classify where the car lands. */
  landingRamp?: LandingRamp;
}

/** Where the car touches down relative to the landing ramp (null when no ramp was given). */
export type LandedOn = "short" | "ramp" | "overshoot" | null;

export interface Touchdown {
  /** Touchdown point, m. */
  x: number;
  z: number;
  /** Time from takeoff, s. */
  t: number;
  /** Speed at touchdown, m/s. */
  speed: number;
  /** Angle of the velocity, radians above horizontal (negative when descending). */
  flightPathRad: number;
  /** Slope of the ground at touchdown, radians (negative for a down-slope). */
  surfaceSlopeRad: number;
  /** Speed component normal to the ground, m/s. */
  normalSpeed: number;
  /** Equivalent fall height v^2 sin^2(flightPath - slope) / (2 g), m. */
  equivalentFallHeight: number;
}

export interface FlightResult {
  /** Time in the air, s. */
  airtime: number;
  /** Highest point of the flown path (the lip if the car never climbs), m and s. */
  apex: { x: number; z: number; t: number };
  landing: Touchdown;
  /** Index of the profile segment hit; -1 before the first point, n-1 beyond the last point. */
  segmentIndex: number;
  /** True when the car flew past the end of the given profile (landed on the flat beyond it). */
  beyondProfile: boolean;
  landedOn: LandedOn;
}

const DEFAULT_G = 9.81;

/**
 * Equivalent fall height (m): the drop onto flat ground giving the same normal speed,
 * v^2 sin^2(flightPath - slope) / (2 g) (Levy, Hubbard, McNeil & Swedberg 2015).
 * @param speed touchdown speed, m/s
 * @param flightPathRad velocity angle above horizontal, rad
 * @param surfaceSlopeRad ground slope, rad
 * @param g gravity, m/s^2
 */
export function equivalentFallHeight(
  speed: number,
  flightPathRad: number,
  surfaceSlopeRad: number,
  g = DEFAULT_G,
): number {
  const vn = speed * Math.sin(flightPathRad - surfaceSlopeRad);
  return (vn * vn) / (2 * g);
}
const DEFAULT_AIR_DENSITY = 1.225;

/** Ground height (m) and slope (m/m) at x, with the flat extensions at both ends. */
export function groundAt(surface: ProfilePoint[], x: number): { z: number; slope: number; segment: number } {
  const n = surface.length;
  if (x <= surface[0].x) return { z: surface[0].z, slope: 0, segment: -1 };
  for (let i = 0; i < n - 1; i++) {
    const a = surface[i];
    const b = surface[i + 1];
    if (x <= b.x) {
      const slope = (b.z - a.z) / (b.x - a.x);
      return { z: a.z + slope * (x - a.x), slope, segment: i };
    }
  }
  return { z: surface[n - 1].z, slope: 0, segment: n - 1 };
}

function checkInput(input: FlightInput): number {
  const g = input.g ?? DEFAULT_G;
  assertFinite(input.speed, "speed");
  assertFinite(input.faceAngleRad, "faceAngleRad");
  assertFinite(input.lip.x, "lip.x");
  assertFinite(input.lip.z, "lip.z");
  assertFinite(g, "g");
  if (!(input.speed > 0)) throw new RangeError("speed must be above 0");
  if (!(g > 0)) throw new RangeError("g must be above 0");
  if (Math.abs(input.faceAngleRad) >= Math.PI / 2)
    throw new RangeError("faceAngleRad must be within (-90, 90) deg");
  const s = input.surface;
  if (s.length < 2) throw new RangeError("surface needs at least 2 points");
  for (let i = 0; i < s.length; i++) {
    assertFinite(s[i].x, `surface[${i}].x`);
    assertFinite(s[i].z, `surface[${i}].z`);
    if (i > 0 && !(s[i].x > s[i - 1].x))
      throw new RangeError(`surface[${i}].x must be greater than the point before`);
  }
  const at = groundAt(s, input.lip.x);
  if (input.lip.z < at.z - 1e-6) throw new RangeError("lip lies below the surface");
  const after = groundAt(s, input.lip.x + 1e-6);
  if (input.lip.z - at.z < 1e-6 && Math.tan(input.faceAngleRad) < after.slope - 1e-9) {
    throw new RangeError("surface rises above the takeoff path just after the lip");
  }
  return g;
}

/**
 * Flies a jump: launches from `lip` at `speed` along `faceAngleRad` and finds the first touchdown
 * on `surface`. Without drag the path is solved exactly (a parabola against each straight
 * segment); with drag it is integrated with RK4 (5 ms steps) and the touchdown refined by
 * bisection to below 1e-9 s.
 * @returns airtime (s), apex (m), touchdown state (m, m/s, rad), equivalent fall height (m).
 */
export function flyJump(input: FlightInput): FlightResult {
  const g = checkInput(input);
  const raw = input.drag && input.drag.cdA > 0 ? flyWithDrag(input, g) : flyExact(input, g);
  return finish(input, g, raw);
}

interface RawFlight {
  t: number;
  x: number;
  z: number;
  vx: number;
  vz: number;
  apex: { x: number; z: number; t: number };
}

function flyExact(input: FlightInput, g: number): RawFlight {
  const { speed, faceAngleRad, lip, surface } = input;
  const vx = speed * Math.cos(faceAngleRad);
  const vz0 = speed * Math.sin(faceAngleRad);
  const n = surface.length;
  let tHit = Infinity;
  // Segments in x order, with flat extensions: index -1 before the first point, n-1 after the last.
  for (let i = -1; i < n && tHit === Infinity; i++) {
    const xa = i < 0 ? -Infinity : surface[i].x;
    const xb = i >= n - 1 ? Infinity : surface[i + 1].x;
    if (xb < lip.x) continue;
    const ref = i < 0 ? surface[0] : surface[i];
    const m = i < 0 || i >= n - 1 ? 0 : (surface[i + 1].z - ref.z) / (xb - xa);
    // z(t) - ground(x(t)) = -g/2 t^2 + b t + c
    const b = vz0 - m * vx;
    const c = lip.z - ref.z - m * (lip.x - ref.x);
    let disc = b * b + 2 * g * c;
    if (disc < 0 && disc > -1e-12 * (b * b + Math.abs(2 * g * c))) disc = 0;
    if (disc < 0) continue;
    const sq = Math.sqrt(disc);
    for (const t of [(b - sq) / g, (b + sq) / g]) {
      if (!(t > 1e-9)) continue;
      const x = lip.x + vx * t;
      if (x < xa - 1e-9 || x > xb + 1e-9) continue;
      if (t < tHit) tHit = t;
    }
  }
  const x = lip.x + vx * tHit;
  const z = lip.z + vz0 * tHit - 0.5 * g * tHit * tHit;
  const vz = vz0 - g * tHit;
  const tApex = vz0 > 0 ? Math.min(vz0 / g, tHit) : 0;
  const apex = {
    x: lip.x + vx * tApex,
    z: lip.z + vz0 * tApex - 0.5 * g * tApex * tApex,
    t: tApex,
  };
  return { t: tHit, x, z, vx, vz, apex };
}

const DRAG_DT = 0.005;
const MAX_FLIGHT_S = 60;

function flyWithDrag(input: FlightInput, g: number): RawFlight {
  const drag = input.drag!;
  const k = (0.5 * (drag.airDensity ?? DEFAULT_AIR_DENSITY) * drag.cdA) / drag.massKg;
  const { surface } = input;
  const y = new Float64Array(4);
  const prev = new Float64Array(4);
  const tmp = new Float64Array(4);
  y[0] = input.lip.x;
  y[1] = input.lip.z;
  y[2] = input.speed * Math.cos(input.faceAngleRad);
  y[3] = input.speed * Math.sin(input.faceAngleRad);
  const apex = { x: y[0], z: y[1], t: 0 };
  let t = 0;
  const above = (s: Float64Array) => s[1] - groundAt(surface, s[0]).z;
  while (t < MAX_FLIGHT_S) {
    prev.set(y);
    rk4Drag(prev, y, DRAG_DT, g, k);
    if (prev[3] > 0 && y[3] <= 0) {
      // Apex inside this step: bisect on vertical speed.
      const tau = bisectStep(prev, tmp, DRAG_DT, g, k, (s) => s[3]);
      rk4Drag(prev, tmp, tau, g, k);
      apex.x = tmp[0];
      apex.z = tmp[1];
      apex.t = t + tau;
    }
    if (above(y) <= 0 && t + DRAG_DT > 1e-6) {
      const tau = bisectStep(prev, tmp, DRAG_DT, g, k, above);
      rk4Drag(prev, tmp, tau, g, k);
      if (apex.t > t + tau) {
        apex.x = tmp[0];
        apex.z = tmp[1];
        apex.t = t + tau;
      }
      return { t: t + tau, x: tmp[0], z: tmp[1], vx: tmp[2], vz: tmp[3], apex };
    }
    t += DRAG_DT;
  }
  throw new RangeError("flight did not land within 60 s");
}

/** Smallest tau in (0, h] where f(state after tau) <= 0, to about 1e-12 s, given f(start) > 0. */
function bisectStep(
  start: Float64Array,
  tmp: Float64Array,
  h: number,
  g: number,
  k: number,
  f: (s: Float64Array) => number,
): number {
  let lo = 0;
  let hi = h;
  for (let i = 0; i < 32; i++) {
    const mid = 0.5 * (lo + hi);
    rk4Drag(start, tmp, mid, g, k);
    if (f(tmp) > 0) lo = mid;
    else hi = mid;
  }
  return hi;
}

function rk4Drag(s: Float64Array, out: Float64Array, h: number, g: number, k: number): void {
  const vx = s[2];
  const vz = s[3];
  let v = Math.sqrt(vx * vx + vz * vz);
  const a1x = -k * v * vx;
  const a1z = -g - k * v * vz;
  const v2x = vx + 0.5 * h * a1x;
  const v2z = vz + 0.5 * h * a1z;
  v = Math.sqrt(v2x * v2x + v2z * v2z);
  const a2x = -k * v * v2x;
  const a2z = -g - k * v * v2z;
  const v3x = vx + 0.5 * h * a2x;
  const v3z = vz + 0.5 * h * a2z;
  v = Math.sqrt(v3x * v3x + v3z * v3z);
  const a3x = -k * v * v3x;
  const a3z = -g - k * v * v3z;
  const v4x = vx + h * a3x;
  const v4z = vz + h * a3z;
  v = Math.sqrt(v4x * v4x + v4z * v4z);
  const a4x = -k * v * v4x;
  const a4z = -g - k * v * v4z;
  out[0] = s[0] + (h / 6) * (vx + 2 * v2x + 2 * v3x + v4x);
  out[1] = s[1] + (h / 6) * (vz + 2 * v2z + 2 * v3z + v4z);
  out[2] = vx + (h / 6) * (a1x + 2 * a2x + 2 * a3x + a4x);
  out[3] = vz + (h / 6) * (a1z + 2 * a2z + 2 * a3z + a4z);
}

function finish(input: FlightInput, g: number, raw: RawFlight): FlightResult {
  const ground = groundAt(input.surface, raw.x);
  const speed = Math.hypot(raw.vx, raw.vz);
  const flightPathRad = Math.atan2(raw.vz, raw.vx);
  const surfaceSlopeRad = Math.atan(ground.slope);
  const normalSpeed = speed * Math.abs(Math.sin(flightPathRad - surfaceSlopeRad));
  const ramp = input.landingRamp;
  let landedOn: LandedOn = null;
  if (ramp) landedOn = raw.x < ramp.start ? "short" : raw.x > ramp.end ? "overshoot" : "ramp";
  return {
    airtime: raw.t,
    apex: raw.apex,
    landing: {
      x: raw.x,
      z: raw.z,
      t: raw.t,
      speed,
      flightPathRad,
      surfaceSlopeRad,
      normalSpeed,
      equivalentFallHeight: (normalSpeed * normalSpeed) / (2 * g),
    },
    segmentIndex: ground.segment,
    beyondProfile: ground.segment === input.surface.length - 1,
    landedOn,
  };
}
