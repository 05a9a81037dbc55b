/**
 * The driver's inputs in the air as piecewise-linear functions of time: the front-wheel steering
 * angle that a rate-limited servo gives for a timeline of target angles, and the driven wheels'
 * spin speed for a timeline of wheel angular accelerations (throttle > 0, brake < 0).
 * Compiled once per simulation into typed arrays so the integrator can evaluate them without
 * allocating.
 */

/**
 * A continuous piecewise-linear function: on [t[k], t[k+1]) the value is v[k] + s[k] (t - t[k]);
 * before t[0] it is v[0]; after the last knot it continues with the last slope.
 */
export interface PiecewiseLinear {
  t: Float64Array;
  v: Float64Array;
  s: Float64Array;
  n: number;
}

/** A timeline entry: from time t (s) on, the value applies (rad or rad/s^2). */
export type TimedValue = readonly [number, number];

function build(knots: number[][]): PiecewiseLinear {
  const n = knots.length;
  const pl = { t: new Float64Array(n), v: new Float64Array(n), s: new Float64Array(n), n };
  for (let k = 0; k < n; k++) {
    pl.t[k] = knots[k][0];
    pl.v[k] = knots[k][1];
    pl.s[k] = knots[k][2];
  }
  return pl;
}

function pushKnot(knots: number[][], t: number, v: number, s: number): void {
  const last = knots[knots.length - 1];
  if (last && Math.abs(last[0] - t) < 1e-12) {
    last[1] = v;
    last[2] = s;
  } else if (last && last[2] === s && Math.abs(last[1] + s * (t - last[0]) - v) < 1e-12) {
    return; // same line continues: no kink
  } else {
    knots.push([t, v, s]);
  }
}

/** Checks a timeline: finite numbers, times >= 0 and non-decreasing. `name` labels errors. */
export function checkTimeline(timeline: readonly TimedValue[], name: string): void {
  for (let i = 0; i < timeline.length; i++) {
    const [t, v] = timeline[i];
    if (!Number.isFinite(t) || !Number.isFinite(v))
      throw new RangeError(`${name}[${i}] must hold two finite numbers`);
    if (t < 0) throw new RangeError(`${name}[${i}] time must be 0 or later`);
    if (i > 0 && t < timeline[i - 1][0])
      throw new RangeError(`${name}[${i}] time must not be earlier than the entry before`);
  }
}

/**
 * Steering angle of a servo that starts straight (0 rad) at t = 0 and follows each target
 * (clipped to +-lock) at its full rate until the next target arrives.
 * @param targets [t s, target rad] entries; a target holds from its time until the next entry.
 * @param rate servo slew rate at the wheels, rad/s.
 * @param lock steering lock, rad.
 */
export function compileServo(targets: readonly TimedValue[], rate: number, lock: number): PiecewiseLinear {
  const knots: number[][] = [[0, 0, 0]];
  for (let i = 0; i < targets.length; i++) {
    const [time, raw] = targets[i];
    const target = Math.max(-lock, Math.min(lock, raw));
    // Where the previous segment has brought the wheels by now.
    const angle = valueAt(knots, time);
    const tNext = i + 1 < targets.length ? targets[i + 1][0] : Infinity;
    const gap = target - angle;
    if (Math.abs(gap) < 1e-15) {
      pushKnot(knots, time, target, 0);
      continue;
    }
    const slope = gap > 0 ? rate : -rate;
    pushKnot(knots, time, angle, slope);
    const arrive = time + Math.abs(gap) / rate;
    if (arrive < tNext) pushKnot(knots, arrive, target, 0);
  }
  return build(knots);
}

/**
 * Spin speed (rad/s) of the driven wheels: starts at w0, changes at the scheduled angular
 * acceleration, never below 0 (a braked wheel stops) nor above wMax (the motor's top speed).
 * @param accel [t s, rad/s^2] entries; each holds until the next entry. Before the first, 0.
 */
export function compileWheel(accel: readonly TimedValue[], w0: number, wMax: number): PiecewiseLinear {
  const knots: number[][] = [[0, w0, 0]];
  for (let i = 0; i < accel.length; i++) {
    const [t0, a] = accel[i];
    const w = valueAt(knots, t0);
    const tNext = i + 1 < accel.length ? accel[i + 1][0] : Infinity;
    const limit = a < 0 ? 0 : wMax;
    if (a === 0 || (a < 0 && w <= 0) || (a > 0 && w >= wMax)) {
      pushKnot(knots, t0, w, 0);
      continue;
    }
    pushKnot(knots, t0, w, a);
    const reach = t0 + (limit - w) / a;
    if (reach < tNext) pushKnot(knots, reach, limit, 0);
  }
  return build(knots);
}

function valueAt(knots: number[][], t: number): number {
  let k = 0;
  while (k + 1 < knots.length && knots[k + 1][0] <= t) k++;
  const [tk, vk, sk] = knots[k];
  return t <= tk ? vk : vk + sk * (t - tk);
}

/** Value of a compiled function at t (for tests and plotting; the integrator uses cursors). */
export function evaluate(pl: PiecewiseLinear, t: number): number {
  let k = 0;
  while (k + 1 < pl.n && pl.t[k + 1] <= t) k++;
  return t <= pl.t[k] ? pl.v[k] : pl.v[k] + pl.s[k] * (t - pl.t[k]);
}

/**
 * All kink times of the given functions inside (0, end), sorted and without near-duplicates.
 * The integrator ends a step exactly on each, so RK4 never straddles a kink.
 */
export function kinkTimes(end: number, ...fns: PiecewiseLinear[]): Float64Array {
  const all: number[] = [];
  for (const f of fns)
    for (let k = 0; k < f.n; k++) if (f.t[k] > 1e-12 && f.t[k] < end - 1e-12) all.push(f.t[k]);
  all.sort((a, b) => a - b);
  const out: number[] = [];
  for (const t of all) if (out.length === 0 || t - out[out.length - 1] > 1e-9) out.push(t);
  return Float64Array.from(out);
}
