import { describe, expect, it } from "vitest";
import { simulateAttitude, type AttitudeCar } from "~/analysis/air/attitude";
import { compileServo, compileWheel, evaluate, kinkTimes } from "~/analysis/air/attitude-inputs";
import { CAR_PRESETS } from "~/analysis/format/cars";
import { odexSolve } from "./odex-reference";

const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;

/** A body with no wheel spin: a plain rigid body with the given principal inertias. */
const rigidBody = (inertia: [number, number, number]): AttitudeCar => ({
  inertia,
  frontWheel: { radius: 0.05, spinInertia: 0 },
  rearWheel: { radius: 0.05, spinInertia: 0 },
  casterRad: 0,
  steeringLockRad: rad(30),
  servoSecondsPer60: 0.1,
});

describe("torque-free symmetric top", () => {
  it("the transverse rate turns in the body frame at (I3 - I1) / I1 * w3 = 5 rad/s", () => {
    // Goldstein, Classical Mechanics, Euler's equations for the torque-free symmetric top:
    // I1 = I2 = 2, I3 = 3, w3 = 10 rad/s gives a body-frame precession rate of 5 rad/s.
    const a = 0.3;
    for (const T of [0.2, 0.5, 1.1]) {
      const r = simulateAttitude(rigidBody([2, 2, 3]), { speed: 1, duration: T, initialRates: [a, 0, 10] });
      expect(r.finalRates[0]).toBeCloseTo(a * Math.cos(5 * T), 8);
      expect(r.finalRates[1]).toBeCloseTo(a * Math.sin(5 * T), 8);
      expect(r.finalRates[2]).toBeCloseTo(10, 10);
    }
  });
});

describe("gyroscope precession", () => {
  it("a 0.3 kg, 5.0 cm disk at 20 rev/s with its centre 5.0 cm from the pivot precesses at 3.12 rad/s", () => {
    // OpenStax University Physics Vol. 1 (2016), section 11.4, Example 11.10 (g = 9.8).
    // The disk is the spinning wheel pair of a gyrostat; gravity's torque about the pivot,
    // m g r, acts about the body x axis, perpendicular to the spin axis y.
    const m = 0.3,
      R = 0.05,
      r = 0.05,
      spin = 20 * 2 * Math.PI;
    const spinInertia = 0.5 * m * R * R;
    const torque = m * 9.8 * r;
    const car: AttitudeCar = {
      ...rigidBody([1e-3, 1e-3, 1e-3]),
      rearWheel: { radius: R, spinInertia: spinInertia / 2 }, // two "wheels" of half the disk each
    };
    const precession = torque / (spinInertia * spin);
    expect(precession).toBeCloseTo(3.12, 2);
    // Started in steady precession, the body keeps turning about z at -torque / L.
    const res = simulateAttitude(car, {
      speed: spin * R,
      duration: 0.5,
      initialRates: [0, 0, -precession],
      bodyTorque: [torque, 0, 0],
    });
    expect(res.finalRates[2]).toBeCloseTo(-3.12, 2);
    expect(Math.abs(res.finalRates[0])).toBeLessThan(1e-9);
    expect(deg(res.yawRad)).toBeCloseTo(deg(-precession * 0.5), 6);
    // Started from rest, it nutates (at L / I = 47 rad/s) about the same mean precession rate;
    // the nutation shifts the yaw by at most precession / 47 rad.
    const fromRest = simulateAttitude(car, { speed: spin * R, duration: 0.9, bodyTorque: [torque, 0, 0] });
    expect(Math.abs(fromRest.yawRad / 0.9 + precession)).toBeLessThan(precession / 47 / 0.9 + 1e-3);
  });
});

describe("steering geometry about the caster-tilted axis", () => {
  it("caster 25 deg, steer 30 deg: projected steer 27.62 deg, camber 12.20 deg", () => {
    // Derived from the steering-axis rotation in engine.md: projected steer atan(tan d cos c),
    // camber asin(sin c sin d). Read back from the simulated front wheels' angular momentum:
    // with only the front wheels spinning, h = R^T H(0) - I w at the end of the run.
    const car: AttitudeCar = {
      inertia: [0.005, 0.017, 0.02],
      frontWheel: { radius: 0.04, spinInertia: 5e-5 },
      rearWheel: { radius: 0.04, spinInertia: 0 },
      casterRad: rad(25),
      steeringLockRad: rad(40),
      servoSecondsPer60: 0.1,
    };
    const res = simulateAttitude(car, { speed: 10, duration: 0.3, steering: [[0, rad(30)]] });
    const [w, x, y, z] = res.finalQuaternion;
    const H0 = [0, 2 * 5e-5 * (10 / 0.04), 0]; // world = body at t = 0, wheels straight
    // Body-from-world rotation R^T applied to H0 (only the y column of R is needed).
    const Hb = [2 * (x * y + w * z) * H0[1], (1 - 2 * (x * x + z * z)) * H0[1], 2 * (y * z - w * x) * H0[1]];
    const h = Hb.map((v, i) => v - car.inertia[i] * res.finalRates[i]);
    expect(deg(Math.atan2(-h[0], h[1]))).toBeCloseTo(27.62, 2);
    expect(deg(Math.asin(-h[2] / Math.hypot(h[0], h[1], h[2])))).toBeCloseTo(12.2, 2);
    expect(deg(Math.atan(Math.tan(rad(30)) * Math.cos(rad(25))))).toBeCloseTo(27.62, 2);
    expect(deg(Math.asin(Math.sin(rad(25)) * Math.sin(rad(30))))).toBeCloseTo(12.2, 2);
  });
});

describe("agreement with an adaptive reference solver", () => {
  it("an aggressive case matches odex to 0.01 deg", () => {
    // Reference: odex (npm), Hairer & Wanner's ODEX extrapolation solver, tolerance 1e-12, run
    // piecewise between input kinks on an independently written right-hand side of engine.md's
    // equations (Euler angles from a ZYX rotation built from the quaternion).
    const car = CAR_PRESETS["sct-10"];
    const steering = [
      [0.02, rad(30)],
      [0.25, rad(-30)],
      [0.5, rad(15)],
      [0.7, 0],
    ] as const;
    const accel = [
      [0.05, -2000],
      [0.12, 0],
      [0.4, 1500],
      [0.5, 0],
    ] as const;
    const input = {
      speed: 12,
      duration: 0.9,
      steering,
      rearWheelAccel: accel,
      initialRates: [0.5, -1, 0.8] as const,
    };
    const ours = simulateAttitude(car, input);

    const rate = Math.PI / 3 / car.servoSecondsPer60;
    const servo = compileServo(steering, rate, car.steeringLockRad);
    const wheel = compileWheel(accel, 12 / car.rearWheel.radius, car.topSpeed / car.rearWheel.radius);
    const [I1, I2, I3] = car.inertia;
    const kf = 2 * car.frontWheel.spinInertia,
      kr = 2 * car.rearWheel.spinInertia;
    const c = car.casterRad;
    const slopeAt = (f: typeof servo, t: number) => {
      let k = 0;
      while (k + 1 < f.n && f.t[k + 1] <= t) k++;
      return f.s[k];
    };
    const rhs = (t: number, y: number[]) => {
      const [q0, q1, q2, q3, wx, wy, wz] = y;
      const d = evaluate(servo, t),
        dd = slopeAt(servo, t);
      const W = evaluate(wheel, t),
        Wd = slopeAt(wheel, t);
      const Wf = 12 / car.frontWheel.radius; // 2wd: the front wheels keep their takeoff spin
      const a = [-Math.cos(c) * Math.sin(d), Math.cos(d), -Math.sin(c) * Math.sin(d)];
      const da = [-Math.cos(c) * Math.cos(d) * dd, -Math.sin(d) * dd, -Math.sin(c) * Math.cos(d) * dd];
      const h = [kf * Wf * a[0], kr * W + kf * Wf * a[1], kf * Wf * a[2]];
      const hd = [kf * Wf * da[0], kr * Wd + kf * Wf * da[1], kf * Wf * da[2]];
      const L = [I1 * wx + h[0], I2 * wy + h[1], I3 * wz + h[2]];
      const wxL = [wy * L[2] - wz * L[1], wz * L[0] - wx * L[2], wx * L[1] - wy * L[0]];
      return [
        0.5 * (-q1 * wx - q2 * wy - q3 * wz),
        0.5 * (q0 * wx + q2 * wz - q3 * wy),
        0.5 * (q0 * wy - q1 * wz + q3 * wx),
        0.5 * (q0 * wz + q1 * wy - q2 * wx),
        (-wxL[0] - hd[0]) / I1,
        (-wxL[1] - hd[1]) / I2,
        (-wxL[2] - hd[2]) / I3,
      ];
    };
    let y = [1, 0, 0, 0, 0.5, -1, 0.8];
    let t0 = 0;
    const stops = [...kinkTimes(0.9, servo, wheel), 0.9];
    for (const t1 of stops) {
      // Evaluate each piece at its midpoint's slope: shift the stop a hair so pieces are clean.
      y = odexSolve((t, yy) => rhs(Math.min(Math.max(t, t0 + 1e-12), t1 - 1e-12), yy), t0, y, t1, 1e-12);
      t0 = t1;
    }
    const n = Math.hypot(y[0], y[1], y[2], y[3]);
    const [w, x, yy, z] = y.map((v) => v / n);
    const yaw = Math.atan2(2 * (x * yy + w * z), 1 - 2 * (yy * yy + z * z));
    const theta = Math.asin(-2 * (x * z - w * yy));
    const roll = Math.atan2(2 * (yy * z + w * x), 1 - 2 * (x * x + yy * yy));
    expect(Math.abs(deg(ours.yawRad - yaw))).toBeLessThan(0.01);
    expect(Math.abs(deg(ours.pitchRad + theta))).toBeLessThan(0.01);
    expect(Math.abs(deg(ours.rollRad - roll))).toBeLessThan(0.01);
    // the case is aggressive: the car turns well away from where it started
    expect(
      Math.abs(deg(ours.yawRad)) + Math.abs(deg(ours.rollRad)) + Math.abs(deg(ours.pitchRad)),
    ).toBeGreaterThan(30);
  });
});
