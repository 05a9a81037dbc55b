/**
 * One pace factor from lap times on one layout (docs/decisions/0122): measured / modelled lap
 * time. Top speed and grip both shorten a lap, so lap times alone cannot separate them; the values
 * saved scale the car's speeds evenly (top speed × q; acceleration, braking and grip × q²), q
 * chosen so the model's lap matches the measured mean.
 */
import type { LapCar } from "../track/speed";
import { bound, pick, type FittedValues } from "./values";
import { modelTimes, type CalibrationTrack } from "./model-times";

/** Bounds of the pace factor (measured / modelled lap time). */
export const PACE_BOUNDS = { min: 0.5, max: 1.5 } as const;

/** The car with its speeds scaled evenly by q (top speed × q; acceleration, braking, grip × q²). */
export function scaleCar<C extends LapCar>(car: C, q: number): C {
  return {
    ...car,
    topSpeed: car.topSpeed * q,
    accel0: car.accel0 * q * q,
    brakeDecel: car.brakeDecel * q * q,
    mu: car.mu * q * q,
  };
}

/** The range of q keeping every scaled value inside the profile form's bounds. */
function scaleRange(car: LapCar): { min: number; max: number } {
  let min = 1 / PACE_BOUNDS.max;
  let max = 1 / PACE_BOUNDS.min;
  for (const [key, power] of [
    ["topSpeed", 1],
    ["accel0", 2],
    ["brakeDecel", 2],
    ["mu", 2],
  ] as const) {
    const b = bound(key);
    min = Math.max(min, (b.min / car[key]) ** (1 / power));
    max = Math.min(max, (b.max / car[key]) ** (1 / power));
  }
  return { min, max };
}

export interface PaceFit {
  /** Measured mean lap / modelled lap, clamped to PACE_BOUNDS. */
  paceFactor: number;
  /** True when the unclamped factor was outside PACE_BOUNDS (the model or the file is off). */
  atBound: boolean;
  /** Modelled lap time with the car as given, s. */
  modelled: number;
  /** Modelled lap time with the fitted values, s. */
  fittedLap: number;
  /** Speed scale q of the fitted values. */
  scale: number;
  fitted: FittedValues;
}

/**
 * One pace factor from lap times on one layout.
 * @param measuredMean mean measured lap time (crashed laps left out), s.
 */
export function fitPace(track: CalibrationTrack, car: LapCar, measuredMean: number): PaceFit {
  if (!(measuredMean > 0)) throw new RangeError("measuredMean: must be a positive time in seconds");
  const modelled = modelTimes(track, car).lapTime;
  const raw = measuredMean / modelled;
  const paceFactor = Math.min(PACE_BOUNDS.max, Math.max(PACE_BOUNDS.min, raw));
  // The lap time falls as q grows: bisection for T(q) = measured mean within the bounds.
  const range = scaleRange(car);
  // A car already at a bound on both sides (no room to scale) keeps its values.
  let lo = range.min <= range.max ? range.min : 1;
  let hi = range.min <= range.max ? range.max : 1;
  const lapAt = (q: number) => modelTimes(track, scaleCar(car, q)).lapTime;
  for (let k = 0; k < 40 && hi - lo > 1e-6; k++) {
    const mid = 0.5 * (lo + hi);
    if (lapAt(mid) > measuredMean) lo = mid;
    else hi = mid;
  }
  const scale = 0.5 * (lo + hi);
  const fittedCar = scaleCar(car, scale);
  return {
    paceFactor,
    atBound: raw !== paceFactor,
    modelled,
    fittedLap: lapAt(scale),
    scale,
    fitted: pick(fittedCar),
  };
}
