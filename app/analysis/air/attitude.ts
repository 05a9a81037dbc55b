/**
 * Attitude in the air (engine.md section 4): the car as a gyrostat, a rigid chassis carrying four
 * spinning wheels. No external torque acts about the centre of mass, so the world-frame angular
 * momentum H = R (I w + h) is constant; the chassis turns when the driver changes h by steering
 * the spinning front wheels (about the caster-tilted steering axis) or by changing the driven
 * wheels' speed (throttle, brake).
 *
 * Body frame: x forward, y left, z up. State: world-from-body quaternion q and body rates w.
 * Equations: I dw/dt = -w x (I w + h) - dh/dt; dq/dt = q (0, w) / 2.
 * Integrator: fixed-step RK4 (1 ms default) with steps ending exactly on every kink of the
 * inputs, and the quaternion renormalised after each step. The inner loop allocates nothing.
 */
import {
  compileServo,
  compileWheel,
  checkTimeline,
  kinkTimes,
  type PiecewiseLinear,
  type TimedValue,
} from "./attitude-inputs";
import { makeSeries, record, trimSeries, type AttitudeSeries } from "./attitude-series";
import { quatToYawThetaRoll } from "../math/vec";

export type { AttitudeSeries };

/** What the attitude model needs to know about a car (SI units, radians). */
export interface AttitudeCar {
  /** Principal moments of inertia of the whole car, wheels included as if locked: [Ixx, Iyy, Izz], kg m^2. */
  inertia: readonly [number, number, number];
  /** One front wheel: rolling radius (m) and spin inertia about its axle (kg m^2). */
  frontWheel: { radius: number; spinInertia: number };
  /** One rear wheel: rolling radius (m) and spin inertia about its axle (kg m^2). */
  rearWheel: { radius: number; spinInertia: number };
  /** Caster: the steering axis leans back by this angle from vertical, rad. */
  casterRad: number;
  /** Largest front-wheel steering angle, rad. */
  steeringLockRad: number;
  /** Servo speed at the wheels: seconds per 60 deg of steering. */
  servoSecondsPer60: number;
  /** Driven wheels: "2wd" drives the rear pair, "4wd" all four (default "2wd"). */
  drive?: "2wd" | "4wd";
  /** Top speed, m/s: caps the driven wheels' spin under throttle (default: no cap). */
  topSpeed?: number;
}

export interface AttitudeInput {
  /** Ground speed at takeoff, m/s: every wheel starts spinning at speed / radius. */
  speed: number;
  /** Time simulated, s (the airtime). */
  duration: number;
  /** Steering targets [t s, angle rad], positive = wheels point left. */
  steering?: readonly TimedValue[];
  /** Driven-wheel angular acceleration [t s, rad/s^2] (throttle > 0, brake < 0), rear-wheel terms. */
  rearWheelAccel?: readonly TimedValue[];
  /** Body rates at takeoff [wx, wy, wz], rad/s. */
  initialRates?: readonly [number, number, number];
  /** Pitch at takeoff, rad, nose up positive (default 0: angles relative to the takeoff attitude). */
  initialPitchRad?: number;
  /** Step, s (default 0.001). */
  dt?: number;
  /**
   * A constant external torque fixed in the body frame [tx, ty, tz], N m (default none). The car
   * in the air has none; this exists to check the integrator against driven-gyroscope examples.
   */
  bodyTorque?: readonly [number, number, number];
}

export interface AttitudeResult {
  /** Nose turned left of the start heading, rad. */
  yawRad: number;
  /** Nose up, rad. */
  pitchRad: number;
  /** Right side down, rad. */
  rollRad: number;
  /** |H(end) - H(0)| / |H(0)| in the world frame (0 when H(0) = 0). */
  angularMomentumDrift: number;
  /** Body rates at the end [wx, wy, wz], rad/s. */
  finalRates: [number, number, number];
  /** World-from-body quaternion at the end [w, x, y, z]. */
  finalQuaternion: [number, number, number, number];
  series?: AttitudeSeries;
}

export interface AttitudeOptions {
  /** Record a time series, one sample every `seriesEvery` steps (default: none). */
  seriesEvery?: number;
}

// Scratch: state Y (q0..q3, wx, wy, wz) and input terms
// (h and dh/dt at the start, middle and end of a step).
const Y = new Float64Array(7);
const EX = new Float64Array(18);
const EUL = new Float64Array(3);

// Car constants for the input terms: kf, kr, cos(caster), sin(caster), front/rear spin ratio
// (4wd; 0 for 2wd), front spin at takeoff, body torque (3), Ixx, Iyy, Izz. Trig of a held steering angle is cached per piece.
const C = new Float64Array(12);
// Doubles handed to the step functions go through this array, not as arguments, so that calls
// that are not inlined box nothing: [step length h, input time tt].
const ARG = new Float64Array(2);
let heldServo: PiecewiseLinear | null = null;
let heldPiece = -1;
let heldCos = 1;
let heldSin = 0;

/** Writes h and dh/dt at time ARG[1] (inside pieces js, jr) to EX[o..o+5]. */
function fillInputs(servo: PiecewiseLinear, rear: PiecewiseLinear, js: number, jr: number, o: number): void {
  const tt = ARG[1];
  const kf = C[0],
    kr = C[1],
    cc = C[2],
    sc = C[3],
    frontRatio = C[4];
  const sdot = servo.s[js];
  const delta = servo.v[js] + sdot * (tt - servo.t[js]);
  let cd: number, sd: number;
  if (sdot === 0) {
    if (heldPiece !== js || heldServo !== servo) {
      heldServo = servo;
      heldPiece = js;
      heldCos = Math.cos(delta);
      heldSin = Math.sin(delta);
    }
    cd = heldCos;
    sd = heldSin;
  } else {
    cd = Math.cos(delta);
    sd = Math.sin(delta);
  }
  const wdot = rear.s[jr];
  const w = rear.v[jr] + wdot * (tt - rear.t[jr]);
  const wf = frontRatio > 0 ? w * frontRatio : C[5];
  const wfdot = frontRatio > 0 ? wdot * frontRatio : 0;
  const ax = -cc * sd,
    ay = cd,
    az = -sc * sd;
  EX[o] = kf * wf * ax;
  EX[o + 1] = kr * w + kf * wf * ay;
  EX[o + 2] = kf * wf * az;
  // dh/dt less any external torque: the equations use I dw/dt = -w x L - (dh/dt - torque).
  EX[o + 3] = kf * (wfdot * ax - wf * cc * cd * sdot) - C[6];
  EX[o + 4] = kr * wdot + kf * (wfdot * ay - wf * sd * sdot) - C[7];
  EX[o + 5] = kf * (wfdot * az - wf * sc * cd * sdot) - C[8];
}

/**
 * One RK4 step of length ARG[0] on the state Y, with input terms EX at offsets 0 (start), oMid and
 * oEnd. Scalar code: no arrays are created.
 */
function rk4Step(oMid: number, oEnd: number): void {
  const h = ARG[0];
  const ixx = C[9],
    iyy = C[10],
    izz = C[11];
  const q0 = Y[0],
    q1 = Y[1],
    q2 = Y[2],
    q3 = Y[3],
    wx = Y[4],
    wy = Y[5],
    wz = Y[6];
  const hh = 0.5 * h;
  // Stage 1
  let lx = ixx * wx + EX[0],
    ly = iyy * wy + EX[1],
    lz = izz * wz + EX[2];
  const a0 = 0.5 * (-q1 * wx - q2 * wy - q3 * wz);
  const a1 = 0.5 * (q0 * wx + q2 * wz - q3 * wy);
  const a2 = 0.5 * (q0 * wy - q1 * wz + q3 * wx);
  const a3 = 0.5 * (q0 * wz + q1 * wy - q2 * wx);
  const a4 = (-(wy * lz - wz * ly) - EX[3]) / ixx;
  const a5 = (-(wz * lx - wx * lz) - EX[4]) / iyy;
  const a6 = (-(wx * ly - wy * lx) - EX[5]) / izz;
  // Stage 2
  let p0 = q0 + hh * a0,
    p1 = q1 + hh * a1,
    p2 = q2 + hh * a2,
    p3 = q3 + hh * a3;
  let ux = wx + hh * a4,
    uy = wy + hh * a5,
    uz = wz + hh * a6;
  lx = ixx * ux + EX[oMid];
  ly = iyy * uy + EX[oMid + 1];
  lz = izz * uz + EX[oMid + 2];
  const b0 = 0.5 * (-p1 * ux - p2 * uy - p3 * uz);
  const b1 = 0.5 * (p0 * ux + p2 * uz - p3 * uy);
  const b2 = 0.5 * (p0 * uy - p1 * uz + p3 * ux);
  const b3 = 0.5 * (p0 * uz + p1 * uy - p2 * ux);
  const b4 = (-(uy * lz - uz * ly) - EX[oMid + 3]) / ixx;
  const b5 = (-(uz * lx - ux * lz) - EX[oMid + 4]) / iyy;
  const b6 = (-(ux * ly - uy * lx) - EX[oMid + 5]) / izz;
  // Stage 3
  p0 = q0 + hh * b0;
  p1 = q1 + hh * b1;
  p2 = q2 + hh * b2;
  p3 = q3 + hh * b3;
  ux = wx + hh * b4;
  uy = wy + hh * b5;
  uz = wz + hh * b6;
  lx = ixx * ux + EX[oMid];
  ly = iyy * uy + EX[oMid + 1];
  lz = izz * uz + EX[oMid + 2];
  const c0 = 0.5 * (-p1 * ux - p2 * uy - p3 * uz);
  const c1 = 0.5 * (p0 * ux + p2 * uz - p3 * uy);
  const c2 = 0.5 * (p0 * uy - p1 * uz + p3 * ux);
  const c3 = 0.5 * (p0 * uz + p1 * uy - p2 * ux);
  const c4 = (-(uy * lz - uz * ly) - EX[oMid + 3]) / ixx;
  const c5 = (-(uz * lx - ux * lz) - EX[oMid + 4]) / iyy;
  const c6 = (-(ux * ly - uy * lx) - EX[oMid + 5]) / izz;
  // Stage 4
  p0 = q0 + h * c0;
  p1 = q1 + h * c1;
  p2 = q2 + h * c2;
  p3 = q3 + h * c3;
  ux = wx + h * c4;
  uy = wy + h * c5;
  uz = wz + h * c6;
  lx = ixx * ux + EX[oEnd];
  ly = iyy * uy + EX[oEnd + 1];
  lz = izz * uz + EX[oEnd + 2];
  const d0 = 0.5 * (-p1 * ux - p2 * uy - p3 * uz);
  const d1 = 0.5 * (p0 * ux + p2 * uz - p3 * uy);
  const d2 = 0.5 * (p0 * uy - p1 * uz + p3 * ux);
  const d3 = 0.5 * (p0 * uz + p1 * uy - p2 * ux);
  const d4 = (-(uy * lz - uz * ly) - EX[oEnd + 3]) / ixx;
  const d5 = (-(uz * lx - ux * lz) - EX[oEnd + 4]) / iyy;
  const d6 = (-(ux * ly - uy * lx) - EX[oEnd + 5]) / izz;
  const h6 = h / 6;
  const n0 = q0 + h6 * (a0 + 2 * b0 + 2 * c0 + d0);
  const n1 = q1 + h6 * (a1 + 2 * b1 + 2 * c1 + d1);
  const n2 = q2 + h6 * (a2 + 2 * b2 + 2 * c2 + d2);
  const n3 = q3 + h6 * (a3 + 2 * b3 + 2 * c3 + d3);
  const qn = 1 / Math.sqrt(n0 * n0 + n1 * n1 + n2 * n2 + n3 * n3);
  Y[0] = n0 * qn;
  Y[1] = n1 * qn;
  Y[2] = n2 * qn;
  Y[3] = n3 * qn;
  Y[4] = wx + h6 * (a4 + 2 * b4 + 2 * c4 + d4);
  Y[5] = wy + h6 * (a5 + 2 * b5 + 2 * c5 + d5);
  Y[6] = wz + h6 * (a6 + 2 * b6 + 2 * c6 + d6);
}

/**
 * Simulates the car's attitude through the air.
 * @param car inertias (kg m^2), wheels (m, kg m^2), caster and lock (rad), servo speed (s/60 deg).
 * @param input takeoff speed (m/s), duration (s), steering (rad), wheel acceleration (rad/s^2),
 *   initial rates (rad/s), initial pitch (rad), step (s).
 * @returns yaw, pitch, roll at the end (rad, engine.md sign conventions) and the world-frame
 *   angular momentum drift; with `seriesEvery`, a time series for plotting.
 */
export function simulateAttitude(
  car: AttitudeCar,
  input: AttitudeInput,
  options: AttitudeOptions = {},
): AttitudeResult {
  const setup = prepare(car, input);
  const { servo, rear, frontRatio, frontW0 } = setup;
  const [ixx, iyy, izz] = car.inertia;
  const kf = 2 * car.frontWheel.spinInertia;
  const kr = 2 * car.rearWheel.spinInertia;
  const cc = Math.cos(car.casterRad);
  const sc = Math.sin(car.casterRad);
  const T = input.duration;
  const dt = input.dt ?? 0.001;
  const kinks = kinkTimes(T, servo, rear);

  const th = -(input.initialPitchRad ?? 0) / 2;
  Y[0] = Math.cos(th);
  Y[1] = 0;
  Y[2] = Math.sin(th);
  Y[3] = 0;
  const r0 = input.initialRates ?? [0, 0, 0];
  Y[4] = r0[0];
  Y[5] = r0[1];
  Y[6] = r0[2];

  const every = options.seriesEvery ?? 0;
  const nSamples = every > 0 ? Math.floor(Math.ceil(T / dt + kinks.length) / every) + 2 : 0;
  const series = every > 0 ? makeSeries(nSamples) : undefined;
  let sample = 0;

  // Input cursors; car constants for the input terms.
  let js = 0;
  let jr = 0;
  let kc = 0;
  let t = 0;
  let step = 0;
  heldPiece = -1;
  heldServo = servo;
  C[0] = kf;
  C[1] = kr;
  C[2] = cc;
  C[3] = sc;
  C[4] = frontRatio;
  C[5] = frontW0;
  const torque = input.bodyTorque ?? [0, 0, 0];
  C[6] = torque[0];
  C[7] = torque[1];
  C[8] = torque[2];
  C[9] = ixx;
  C[10] = iyy;
  C[11] = izz;
  ARG[1] = 0;
  fillInputs(servo, rear, 0, 0, 0);
  let constJs = -1;
  let constJr = -1;
  let lastEnd = 0;
  const h0 = worldMomentum(Y, EX, ixx, iyy, izz);
  const hx0 = h0[0],
    hy0 = h0[1],
    hz0 = h0[2];
  if (series) sample = record(series, sample, 0, Y, servo, rear, js, jr);

  while (t < T - 1e-12) {
    // Math.min keeps tEnd an unboxed double (a plain "if" would merge it with the tagged T and
    // allocate a heap number every step).
    let tEnd = Math.min(t + dt, T);
    while (kc < kinks.length && kinks[kc] <= t + 1e-12) kc++;
    if (kc < kinks.length && kinks[kc] < tEnd + 1e-9) tEnd = kinks[kc];
    const h = tEnd - t;
    const tm = t + 0.5 * h;
    while (js + 1 < servo.n && servo.t[js + 1] <= tm) js++;
    while (jr + 1 < rear.n && rear.t[jr + 1] <= tm) jr++;
    // Inputs held constant on this piece (steering still, no throttle or brake): one set of
    // terms serves every stage and is filled once per piece.
    let oMid = 6;
    let oEnd = 12;
    if (servo.s[js] === 0 && rear.s[jr] === 0) {
      oMid = 0;
      oEnd = 0;
      if (constJs !== js || constJr !== jr) {
        ARG[1] = t;
        fillInputs(servo, rear, js, jr, 0);
        constJs = js;
        constJr = jr;
      }
    } else {
      constJs = -1;
      ARG[1] = t;
      fillInputs(servo, rear, js, jr, 0);
      ARG[1] = tm;
      fillInputs(servo, rear, js, jr, 6);
      ARG[1] = tEnd;
      fillInputs(servo, rear, js, jr, 12);
    }

    ARG[0] = h;
    rk4Step(oMid, oEnd);
    lastEnd = oEnd;
    t = tEnd;
    step++;
    if (series && step % every === 0) sample = record(series, sample, t, Y, servo, rear, js, jr);
  }

  // EX[lastEnd..] holds the inputs at the end of the last step.
  const h1 = worldMomentum(Y, lastEnd === 0 ? EX : EX.subarray(lastEnd), ixx, iyy, izz);
  const norm0 = Math.hypot(hx0, hy0, hz0);
  const drift = norm0 > 0 ? Math.hypot(h1[0] - hx0, h1[1] - hy0, h1[2] - hz0) / norm0 : 0;
  quatToYawThetaRoll(Y[0], Y[1], Y[2], Y[3], EUL);
  const result: AttitudeResult = {
    yawRad: EUL[0],
    pitchRad: -EUL[1],
    rollRad: EUL[2],
    angularMomentumDrift: drift,
    finalRates: [Y[4], Y[5], Y[6]],
    finalQuaternion: [Y[0], Y[1], Y[2], Y[3]],
  };
  if (series) {
    if (step % every !== 0) sample = record(series, sample, t, Y, servo, rear, js, jr);
    result.series = trimSeries(series, sample);
  }
  return result;
}

function prepare(car: AttitudeCar, input: AttitudeInput) {
  checkCar(car);
  const num = (v: number, name: string, positive = false) => {
    if (!Number.isFinite(v) || (positive && !(v > 0)) || v < 0)
      throw new RangeError(`${name} must be a ${positive ? "positive" : "non-negative"} finite number`);
  };
  num(input.speed, "speed");
  num(input.duration, "duration");
  if (input.dt !== undefined) num(input.dt, "dt", true);
  const steering = input.steering ?? [];
  const accel = input.rearWheelAccel ?? [];
  checkTimeline(steering, "steering");
  checkTimeline(accel, "rearWheelAccel");
  if (input.initialRates && (input.initialRates.length !== 3 || !input.initialRates.every(Number.isFinite))) {
    throw new RangeError("initialRates must hold three finite numbers");
  }
  if (input.bodyTorque && (input.bodyTorque.length !== 3 || !input.bodyTorque.every(Number.isFinite))) {
    throw new RangeError("bodyTorque must hold three finite numbers");
  }
  const rate = Math.PI / 3 / car.servoSecondsPer60;
  const servo = compileServo(steering, rate, car.steeringLockRad);
  const wRear0 = input.speed / car.rearWheel.radius;
  const wMax = car.topSpeed ? Math.max(wRear0, car.topSpeed / car.rearWheel.radius) : Infinity;
  const rear = compileWheel(accel, wRear0, wMax);
  const fourWd = car.drive === "4wd";
  return {
    servo,
    rear,
    frontRatio: fourWd ? car.rearWheel.radius / car.frontWheel.radius : 0,
    frontW0: input.speed / car.frontWheel.radius,
  };
}

/** Throws a RangeError naming the first car field that is missing or out of range. */
export function checkCar(car: AttitudeCar): void {
  const pos = (v: number, name: string) => {
    if (!Number.isFinite(v) || !(v > 0)) throw new RangeError(`car.${name} must be a positive finite number`);
  };
  if (!car.inertia || car.inertia.length !== 3) throw new RangeError("car.inertia must hold [Ixx, Iyy, Izz]");
  car.inertia.forEach((v, i) => pos(v, `inertia[${i}]`));
  pos(car.frontWheel?.radius, "frontWheel.radius");
  pos(car.rearWheel?.radius, "rearWheel.radius");
  if (!(car.frontWheel.spinInertia >= 0))
    throw new RangeError("car.frontWheel.spinInertia must be 0 or more");
  if (!(car.rearWheel.spinInertia >= 0)) throw new RangeError("car.rearWheel.spinInertia must be 0 or more");
  if (!Number.isFinite(car.casterRad) || Math.abs(car.casterRad) >= Math.PI / 2)
    throw new RangeError("car.caster must be within (-90, 90) deg");
  pos(car.steeringLockRad, "steeringLock");
  pos(car.servoSecondsPer60, "servoSecondsPer60");
}

/** World-frame angular momentum R (I w + h) from state y and input terms ex[0..2]. */
function worldMomentum(
  y: Float64Array,
  ex: Float64Array,
  ixx: number,
  iyy: number,
  izz: number,
): [number, number, number] {
  const lx = ixx * y[4] + ex[0];
  const ly = iyy * y[5] + ex[1];
  const lz = izz * y[6] + ex[2];
  const w = y[0],
    x = y[1],
    yy = y[2],
    z = y[3];
  return [
    (1 - 2 * (yy * yy + z * z)) * lx + 2 * (x * yy - w * z) * ly + 2 * (x * z + w * yy) * lz,
    2 * (x * yy + w * z) * lx + (1 - 2 * (x * x + z * z)) * ly + 2 * (yy * z - w * x) * lz,
    2 * (x * z - w * yy) * lx + 2 * (yy * z + w * x) * ly + (1 - 2 * (x * x + yy * yy)) * lz,
  ];
}
