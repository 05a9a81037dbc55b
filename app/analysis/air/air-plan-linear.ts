/**
 * A linear guide for the set-up plan search. For small roll and yaw, and steering angles small
 * enough that cos(delta) ~ 1, the gyrostat equations reduce to
 *   Ixx phi' =  H psi + K cos(caster) delta
 *   Izz psi' = -H phi + K sin(caster) delta
 * (H: wheels' spin momentum, K: the front pair's, both possibly changing with a brake or throttle
 * pulse). With z = phi sqrt(Ixx) + i psi sqrt(Izz) this is z' = -i w(t) z + beta(t) delta(t),
 * w = H / sqrt(Ixx Izz), beta = K (cos c / sqrt(Ixx) + i sin c / sqrt(Izz)), so
 *   z(T) = e^{-i W(T)} * integral of beta(s) e^{i W(s)} delta(s) ds,   W(t) = integral of w.
 * A block of constant steering therefore adds a fixed complex number, and the landing roll and
 * yaw of any block plan follow from a table of the cumulative integral. The full model then
 * corrects the guide (air-plan.ts).
 */
import type { AttitudeCar } from "./attitude";
import type { PiecewiseLinear } from "./attitude-inputs";

/**
 * Period of the nutation that the wheels' spin gives the chassis in roll and yaw,
 * 2 pi sqrt(Ixx Izz) / H with H the four wheels' spin momentum at takeoff speed (s). The shape of
 * the best set-up plan depends on the airtime as a fraction of it (docs/decisions/0103).
 * @param speed takeoff speed, m/s
 */
export function nutationPeriod(car: AttitudeCar, speed: number): number {
  const H =
    2 *
    speed *
    (car.rearWheel.spinInertia / car.rearWheel.radius + car.frontWheel.spinInertia / car.frontWheel.radius);
  return H > 0 ? (2 * Math.PI * Math.sqrt(car.inertia[0] * car.inertia[2])) / H : Infinity;
}

export interface LinearGuide {
  /** Grid step of the table, s. */
  step: number;
  /** Table length. */
  n: number;
  /** Cumulative integral of beta e^{iW}, rotated by e^{-iW(T)}: real and imaginary parts. */
  cumRe: Float64Array;
  cumIm: Float64Array;
  /** Kernel beta e^{iW} e^{-iW(T)} at grid points (for edge sensitivities). */
  kerRe: Float64Array;
  kerIm: Float64Array;
  sqrtIxx: number;
  sqrtIzz: number;
}

function pieceValue(f: PiecewiseLinear, t: number, cursor: { k: number }): number {
  while (cursor.k + 1 < f.n && f.t[cursor.k + 1] <= t) cursor.k++;
  const k = cursor.k;
  return t <= f.t[k] ? f.v[k] : f.v[k] + f.s[k] * (t - f.t[k]);
}

/**
 * Builds the guide's table for a flight of `airtime` s at takeoff `speed` m/s, with the driven
 * wheels' spin given by `rearSpin` (rad/s over time) and the front spin following it on a 4wd car.
 */
export function buildLinearGuide(
  car: AttitudeCar,
  speed: number,
  airtime: number,
  rearSpin: PiecewiseLinear,
): LinearGuide {
  const step = 0.002;
  const n = Math.max(2, Math.ceil(airtime / step) + 1);
  const [ixx, , izz] = car.inertia;
  const sqrtIxx = Math.sqrt(ixx);
  const sqrtIzz = Math.sqrt(izz);
  const br = Math.cos(car.casterRad) / sqrtIxx;
  const bi = Math.sin(car.casterRad) / sqrtIzz;
  const fourWd = car.drive === "4wd";
  const ratio = car.rearWheel.radius / car.frontWheel.radius;
  const wf0 = speed / car.frontWheel.radius;
  const kerRe = new Float64Array(n);
  const kerIm = new Float64Array(n);
  const cumRe = new Float64Array(n);
  const cumIm = new Float64Array(n);
  const cursor = { k: 0 };
  let phase = 0;
  let prevOmega = 0;
  for (let i = 0; i < n; i++) {
    const t = Math.min(i * step, airtime);
    const wr = pieceValue(rearSpin, t, cursor);
    const wf = fourWd ? wr * ratio : wf0;
    const K = 2 * car.frontWheel.spinInertia * wf;
    const H = 2 * car.rearWheel.spinInertia * wr + K;
    const omega = H / (sqrtIxx * sqrtIzz);
    if (i > 0) phase += 0.5 * (omega + prevOmega) * (t - Math.min((i - 1) * step, airtime));
    prevOmega = omega;
    const c = Math.cos(phase);
    const s = Math.sin(phase);
    kerRe[i] = K * (br * c - bi * s);
    kerIm[i] = K * (br * s + bi * c);
  }
  // Rotate by e^{-i W(T)} and accumulate (trapezoid).
  const c = Math.cos(phase);
  const s = Math.sin(phase);
  for (let i = 0; i < n; i++) {
    const re = kerRe[i] * c + kerIm[i] * s;
    const im = kerIm[i] * c - kerRe[i] * s;
    kerRe[i] = re;
    kerIm[i] = im;
    if (i > 0) {
      const h = Math.min(i * step, airtime) - Math.min((i - 1) * step, airtime);
      cumRe[i] = cumRe[i - 1] + 0.5 * h * (kerRe[i] + kerRe[i - 1]);
      cumIm[i] = cumIm[i - 1] + 0.5 * h * (kerIm[i] + kerIm[i - 1]);
    }
  }
  return { step, n, cumRe, cumIm, kerRe, kerIm, sqrtIxx, sqrtIzz };
}

/** Linear interpolation of a table at time t (s). */
export function tableAt(g: LinearGuide, table: Float64Array, t: number): number {
  const x = t / g.step;
  const i = Math.min(g.n - 2, Math.max(0, Math.floor(x)));
  const f = Math.min(1, Math.max(0, x - i));
  return table[i] + f * (table[i + 1] - table[i]);
}
