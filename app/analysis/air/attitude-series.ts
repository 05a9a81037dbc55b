/**
 * Time series of a simulated flight's attitude, for plotting. Samples are written into
 * preallocated typed arrays and trimmed once at the end.
 */
import type { PiecewiseLinear } from "./attitude-inputs";
import { quatToYawThetaRoll } from "../math/vec";

/** Samples in time order: t (s), attitude (rad), steering angle (rad), driven-wheel spin (rad/s). */
export interface AttitudeSeries {
  t: Float64Array;
  yawRad: Float64Array;
  pitchRad: Float64Array;
  rollRad: Float64Array;
  steerRad: Float64Array;
  rearWheelSpeed: Float64Array;
}

const EUL = new Float64Array(3);

/** Preallocated series of n samples. */
export function makeSeries(n: number): AttitudeSeries {
  const f = () => new Float64Array(n);
  return { t: f(), yawRad: f(), pitchRad: f(), rollRad: f(), steerRad: f(), rearWheelSpeed: f() };
}

/** Writes sample i (time t s, state y, inputs at pieces js, jr); returns the next index. */
export function record(
  s: AttitudeSeries,
  i: number,
  t: number,
  y: Float64Array,
  servo: PiecewiseLinear,
  rear: PiecewiseLinear,
  js: number,
  jr: number,
): number {
  if (i >= s.t.length) return i;
  quatToYawThetaRoll(y[0], y[1], y[2], y[3], EUL);
  s.t[i] = t;
  s.yawRad[i] = EUL[0];
  s.pitchRad[i] = -EUL[1];
  s.rollRad[i] = EUL[2];
  s.steerRad[i] = servo.v[js] + servo.s[js] * (t - servo.t[js]);
  s.rearWheelSpeed[i] = rear.v[jr] + rear.s[jr] * (t - rear.t[jr]);
  return i + 1;
}

/** The first n samples of each array. */
export function trimSeries(s: AttitudeSeries, n: number): AttitudeSeries {
  return {
    t: s.t.slice(0, n),
    yawRad: s.yawRad.slice(0, n),
    pitchRad: s.pitchRad.slice(0, n),
    rollRad: s.rollRad.slice(0, n),
    steerRad: s.steerRad.slice(0, n),
    rearWheelSpeed: s.rearWheelSpeed.slice(0, n),
  };
}
