/**
 * Fitting top speed and grip to measured laps (docs/decisions/0122): from sector times, or laps on
 * two layouts of different character, by bounded least squares (Levenberg–Marquardt,
 * ml-levenberg-marquardt) on relative times. Lap times on one layout give only a pace factor
 * (pace.ts): top speed and grip both shorten a lap.
 */
import { levenbergMarquardt } from "ml-levenberg-marquardt";
import type { LapCar } from "../track/speed";
import { modelTimes, type CalibrationTrack } from "./model-times";
import { bound, pick, type FittedValues } from "./values";

export type { FittedValues } from "./values";

/**
 * Two directions of the fit whose |cos| is above this cannot be told apart by the data: the
 * sectors or layouts respond to top speed and grip in (nearly) the same proportions.
 */
export const SEPARABLE_COS = 0.995;

/** Measured times on one layout: the mean lap (sectors = 1) or the mean of each sector, s. */
export interface TimedTrack {
  track: CalibrationTrack;
  /** Mean measured time of each sector (one entry: the whole lap), s. */
  measured: readonly number[];
}

export interface SpeedGripFit {
  /** False when the data cannot tell top speed from grip (see SEPARABLE_COS); values unchanged then. */
  separable: boolean;
  /** |cos| of the angle between the two directions of the fit at the start values. */
  cos: number;
  topSpeed: number;
  mu: number;
  /** True when a value ended at its bound. */
  atBound: { topSpeed: boolean; mu: boolean };
  /** Root mean square of the relative residuals after the fit (0.01 = 1 %). */
  rms: number;
  fitted: FittedValues;
  /** Modelled times with the car as given and with the fitted values, per timed track, s. */
  before: number[][];
  after: number[][];
}

/** Relative model times (model / measured) for every observation, flattened. */
function ratios(timed: readonly TimedTrack[], car: LapCar): number[] {
  return timed.flatMap(({ track, measured }) => {
    const m = modelTimes(track, car, measured.length);
    const times = measured.length === 1 ? [m.lapTime] : m.sectorTimes;
    return times.map((t, i) => t / measured[i]);
  });
}

const times = (timed: readonly TimedTrack[], car: LapCar) =>
  timed.map(({ track, measured }) => {
    const m = modelTimes(track, car, measured.length);
    return measured.length === 1 ? [m.lapTime] : m.sectorTimes;
  });

/**
 * Top speed and grip from sector times or from laps on two layouts, by bounded least squares on
 * relative times (each observation weighs the same whatever its length). Bounds: half to twice
 * the given value, inside the profile form's bounds. Acceleration and braking stay as given.
 */
export function fitSpeedGrip(timed: readonly TimedTrack[], car: LapCar): SpeedGripFit {
  const count = timed.reduce((n, t) => n + t.measured.length, 0);
  if (count < 2)
    throw new RangeError("timed: top speed and grip need at least two times (sectors or layouts)");
  const withValues = (u: readonly number[]): LapCar => ({
    ...car,
    topSpeed: car.topSpeed * u[0],
    mu: car.mu * u[1],
  });
  // Sensitivity of each relative time to each value (log–log), for the separability check.
  const h = 0.02;
  const base = ratios(timed, car);
  const dv = ratios(timed, withValues([1 + h, 1])).map((r, i) => (r - base[i]) / h);
  const dm = ratios(timed, withValues([1, 1 + h])).map((r, i) => (r - base[i]) / h);
  const dot = (a: number[], b: number[]) => a.reduce((s, x, i) => s + x * b[i], 0);
  const cos = Math.abs(dot(dv, dm)) / Math.sqrt(dot(dv, dv) * dot(dm, dm) || 1);
  const before = times(timed, car);
  const vb = bound("topSpeed");
  const mb = bound("mu");
  const min = [Math.max(0.5, vb.min / car.topSpeed), Math.max(0.5, mb.min / car.mu)];
  const max = [Math.min(2, vb.max / car.topSpeed), Math.min(2, mb.max / car.mu)];
  if (!(cos < SEPARABLE_COS)) {
    return {
      separable: false,
      cos,
      topSpeed: car.topSpeed,
      mu: car.mu,
      atBound: { topSpeed: false, mu: false },
      rms: rms(base),
      fitted: pick(car),
      before,
      after: before,
    };
  }
  // Each parameter vector is evaluated once for all observations; the closure keeps its own array.
  const model = (u: number[]) => {
    const r = ratios(timed, withValues(u));
    return (x: number) => r[x];
  };
  const result = levenbergMarquardt({ x: base.map((_, i) => i), y: base.map(() => 1) }, model, {
    initialValues: [1, 1],
    minValues: min,
    maxValues: max,
    damping: 1e-2,
    gradientDifference: 1e-3,
    centralDifference: true,
    maxIterations: 60,
    errorTolerance: 1e-12,
    improvementThreshold: 1e-4,
  });
  const [u0, u1] = result.parameterValues;
  const fittedCar = withValues([u0, u1]);
  const eps = 1e-6;
  return {
    separable: true,
    cos,
    topSpeed: fittedCar.topSpeed,
    mu: fittedCar.mu,
    atBound: {
      topSpeed: u0 <= min[0] + eps || u0 >= max[0] - eps,
      mu: u1 <= min[1] + eps || u1 >= max[1] - eps,
    },
    rms: rms(ratios(timed, fittedCar)),
    fitted: pick(fittedCar),
    before,
    after: times(timed, fittedCar),
  };
}

const rms = (r: readonly number[]) => Math.sqrt(r.reduce((s, x) => s + (x - 1) ** 2, 0) / r.length);
