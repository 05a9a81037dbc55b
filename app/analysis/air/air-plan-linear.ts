/**
 * A linear guide for the set-up plan search: the landing roll and yaw of any steering plan,
 * to first order in the steering, read from two tables.
 *
 * The reference motion is the flight without steering: the brake or throttle pulse only
 * changes the wheels' spin about the body y axis, so the car only pitches, at
 * q(t) = (H0 - h_y(t)) / Iyy (H0: the wheels' spin momentum at takeoff, h_y(t) after the pulse).
 * A small body-frame rotation e = (ex, ey, ez) away from it (R = R_ref (1 + [e])) obeys
 *   ex' =  (H0 / Ixx - q) ez + K cos(caster) / Ixx * delta
 *   ez' = -(H0 / Izz - q) ex + K sin(caster) / Izz * delta
 * (K: the front pair's spin momentum, which a 4wd brake takes away), and at touchdown, pitched
 * at theta (nose down positive, from the takeoff pitch given), the landing angles are
 *   roll = ex + ez tan(theta),   yaw = ez / cos(theta).
 * So landing roll and yaw are integrals of a kernel times the steering; the kernels come from
 * the adjoint equations integrated back from touchdown. A block of constant steering adds the
 * difference of two cumulative sums. The full model then corrects the guide (air-plan-refine.ts).
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
  /** Grid step of the tables, s. */
  step: number;
  /** Table length. */
  n: number;
  /** Landing roll and yaw (rad) per rad of steering held from takeoff to each grid time. */
  cumRoll: Float64Array;
  cumYaw: Float64Array;
  /** Their rates: landing roll and yaw per rad of steering per second at each grid time. */
  kerRoll: Float64Array;
  kerYaw: Float64Array;
  /** Pitch change of the reference flight (the pulse alone) at touchdown, rad, nose up positive. */
  pitchChange: number;
  /**
   * Roll rate at touchdown per rad of yaw for a plan that lands flat with straight wheels, rad/s
   * per rad: the spin's angular momentum, fixed in space, no longer lies along the yawed axle,
   * so a yawed car rolls. With the airtime's spread it sets how much the takeoff speed matters.
   */
  rollRatePerYaw: number;
}

/** Reused coefficient tables (the guide is built many times per plan). */
let scratch = {
  alpha: new Float64Array(0),
  gamma: new Float64Array(0),
  bx: new Float64Array(0),
  bz: new Float64Array(0),
  times: new Float64Array(0),
};

/**
 * Builds the guide for a flight of `airtime` s at takeoff `speed` m/s, with the driven wheels'
 * spin given by `rearSpin` (rad/s over time; the front spin follows it on a 4wd car).
 * @param takeoffPitchRad the car's pitch at takeoff, rad (nose up positive): with it the guide's
 *   roll and yaw are the world-frame landing angles; 0 gives angles relative to the takeoff attitude.
 */
export function buildLinearGuide(
  car: AttitudeCar,
  speed: number,
  airtime: number,
  rearSpin: PiecewiseLinear,
  takeoffPitchRad = 0,
): LinearGuide {
  const step = 0.002;
  const n = Math.max(2, Math.ceil(airtime / step) + 1);
  const [ixx, iyy, izz] = car.inertia;
  const kf = 2 * car.frontWheel.spinInertia;
  const kr = 2 * car.rearWheel.spinInertia;
  const fourWd = car.drive === "4wd";
  const ratio = car.rearWheel.radius / car.frontWheel.radius;
  const wf0 = speed / car.frontWheel.radius;
  const h0 = kr * (speed / car.rearWheel.radius) + kf * wf0;
  const cc = Math.cos(car.casterRad);
  const sc = Math.sin(car.casterRad);
  // Coefficients at each grid time: alpha, gamma (rad/s) and the steering gains bx, bz (1/s).
  if (scratch.times.length < n) {
    const size = 2 * n;
    scratch = {
      alpha: new Float64Array(size),
      gamma: new Float64Array(size),
      bx: new Float64Array(size),
      bz: new Float64Array(size),
      times: new Float64Array(size),
    };
  }
  const { alpha, gamma, bx, bz, times } = scratch;
  for (let i = 0; i < n; i++) times[i] = Math.min(i * step, airtime);
  let k = 0;
  let theta = -takeoffPitchRad;
  let prevQ = 0;
  for (let i = 0; i < n; i++) {
    const t = times[i];
    while (k + 1 < rearSpin.n && rearSpin.t[k + 1] <= t) k++;
    const wr = t <= rearSpin.t[k] ? rearSpin.v[k] : rearSpin.v[k] + rearSpin.s[k] * (t - rearSpin.t[k]);
    const wf = fourWd ? wr * ratio : wf0;
    const q = (h0 - kr * wr - kf * wf) / iyy;
    if (i > 0) theta += 0.5 * (q + prevQ) * (t - times[i - 1]);
    prevQ = q;
    alpha[i] = h0 / ixx - q;
    gamma[i] = h0 / izz - q;
    bx[i] = (kf * wf * cc) / ixx;
    bz[i] = (kf * wf * sc) / izz;
  }
  const cosT = Math.cos(theta);
  const sinT = Math.sin(theta);
  const last = n - 1;
  const safeCos = Math.abs(cosT) < 1e-6 ? (cosT < 0 ? -1e-6 : 1e-6) : cosT;
  const kerRoll = new Float64Array(n);
  const kerYaw = new Float64Array(n);
  // Adjoint lambda' = -A^T lambda, backward from touchdown: lx' = gamma lz, lz' = -alpha lx.
  adjoint(1, Math.tan(theta), n, kerRoll);
  adjoint(0, 1 / safeCos, n, kerYaw);
  const cumRoll = new Float64Array(n);
  const cumYaw = new Float64Array(n);
  for (let i = 1; i < n; i++) {
    const h = times[i] - times[i - 1];
    cumRoll[i] = cumRoll[i - 1] + 0.5 * h * (kerRoll[i] + kerRoll[i - 1]);
    cumYaw[i] = cumYaw[i - 1] + 0.5 * h * (kerYaw[i] + kerYaw[i - 1]);
  }
  // Flat landing (roll 0) with yaw psi: ex = -psi sin(theta), ez = psi cos(theta); the roll rate
  // ex' + ez' tan(theta) + ez theta' / cos^2(theta) with ex' = alpha ez, ez' = -gamma ex.
  const q = prevQ;
  const rollRatePerYaw = alpha[last] * cosT + (gamma[last] * sinT * sinT + q) / safeCos;
  return {
    step,
    n,
    cumRoll,
    cumYaw,
    kerRoll,
    kerYaw,
    pitchChange: -theta - takeoffPitchRad,
    rollRatePerYaw,
  };
}

/** Integrates one adjoint backward (RK2 on the grid) and writes its kernel lambda . b to `out`. */
function adjoint(lx0: number, lz0: number, n: number, out: Float64Array): void {
  const { alpha, gamma, bx, bz, times } = scratch;
  let lx = lx0;
  let lz = lz0;
  out[n - 1] = lx * bx[n - 1] + lz * bz[n - 1];
  for (let i = n - 1; i > 0; i--) {
    const h = times[i] - times[i - 1];
    // Backward step from t_i to t_{i-1} (Heun): the forward rates are lx' = gamma lz, lz' = -alpha lx.
    const dx1 = gamma[i] * lz;
    const dz1 = -alpha[i] * lx;
    const mx = lx - h * dx1;
    const mz = lz - h * dz1;
    const dx2 = gamma[i - 1] * mz;
    const dz2 = -alpha[i - 1] * mx;
    lx -= 0.5 * h * (dx1 + dx2);
    lz -= 0.5 * h * (dz1 + dz2);
    out[i - 1] = lx * bx[i - 1] + lz * bz[i - 1];
  }
}

/** Linear interpolation of a table at time t (s). */
export function tableAt(g: LinearGuide, table: Float64Array, t: number): number {
  const x = t / g.step;
  const i = Math.min(g.n - 2, Math.max(0, Math.floor(x)));
  const f = Math.min(1, Math.max(0, x - i));
  return table[i] + f * (table[i + 1] - table[i]);
}
