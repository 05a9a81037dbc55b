/**
 * Small numeric helpers shared by the flight, attitude and set-up plan models.
 * Pure functions over numbers and typed arrays; nothing here allocates per call except where the
 * result is a new object by design.
 */

/** Radians per degree. */
export const RAD_PER_DEG = Math.PI / 180;
/** Degrees per radian. */
export const DEG_PER_RAD = 180 / Math.PI;

/** Degrees to radians. */
export function rad(deg: number): number {
  return deg * RAD_PER_DEG;
}

/** Radians to degrees. */
export function deg(radians: number): number {
  return radians * DEG_PER_RAD;
}

/** `x` limited to the closed interval [lo, hi]. */
export function clamp(x: number, lo: number, hi: number): number {
  return x < lo ? lo : x > hi ? hi : x;
}

/**
 * Euler angles of a unit world-from-body quaternion (w, x, y, z) read as
 * R = Rz(yaw) * Ry(theta) * Rx(roll). Writes [yaw, theta, roll] (radians) into `out` at `offset`.
 * Note: engine.md reports pitch as -theta (nose up positive).
 */
export function quatToYawThetaRoll(
  qw: number,
  qx: number,
  qy: number,
  qz: number,
  out: Float64Array | number[],
  offset = 0,
): void {
  const r00 = 1 - 2 * (qy * qy + qz * qz);
  const r10 = 2 * (qx * qy + qw * qz);
  const r20 = 2 * (qx * qz - qw * qy);
  const r21 = 2 * (qy * qz + qw * qx);
  const r22 = 1 - 2 * (qx * qx + qy * qy);
  out[offset] = Math.atan2(r10, r00);
  out[offset + 1] = Math.asin(clamp(-r20, -1, 1));
  out[offset + 2] = Math.atan2(r21, r22);
}

/**
 * Standard normal cumulative distribution function, Phi(x).
 * Abramowitz & Stegun 26.2.17 polynomial; absolute error below 7.5e-8.
 */
export function normalCdf(x: number): number {
  const z = Math.abs(x);
  const t = 1 / (1 + 0.2316419 * z);
  const poly =
    t * (0.31938153 + t * (-0.356563782 + t * (1.781477937 + t * (-1.821255978 + t * 1.330274429))));
  const tail = 0.3989422804014327 * Math.exp(-0.5 * z * z) * poly;
  return x >= 0 ? 1 - tail : tail;
}

/**
 * A seeded pseudo-random generator (mulberry32): returns a function giving uniform numbers in
 * [0, 1). Deterministic for a given 32-bit seed, so Monte Carlo results are reproducible.
 */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A seeded standard normal generator (Box-Muller over `seededUniform`).
 * Returns a function giving independent N(0, 1) samples.
 */
export function seededNormal(seed: number): () => number {
  const u = seededUniform(seed);
  let spare = 0;
  let hasSpare = false;
  return () => {
    if (hasSpare) {
      hasSpare = false;
      return spare;
    }
    let u1 = u();
    while (u1 <= 1e-300) u1 = u();
    const u2 = u();
    const r = Math.sqrt(-2 * Math.log(u1));
    spare = r * Math.sin(2 * Math.PI * u2);
    hasSpare = true;
    return r * Math.cos(2 * Math.PI * u2);
  };
}

/** Throws when a boundary value is not a finite number; `name` says which. */
export function assertFinite(value: number, name: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be a finite number (got ${value})`);
}
