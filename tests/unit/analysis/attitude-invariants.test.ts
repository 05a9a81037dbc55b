import { describe, expect, it } from "vitest";
import { simulateAttitude } from "~/analysis/air/attitude";
import { CAR_PRESETS, CAR_PRESET_IDS } from "~/analysis/format/cars";

const rad = (d: number) => (d * Math.PI) / 180;
const deg = (r: number) => (r * 180) / Math.PI;

const aggressive = {
  speed: 14,
  duration: 1,
  steering: [
    [0, rad(32)],
    [0.15, rad(-32)],
    [0.3, rad(32)],
    [0.45, rad(-32)],
    [0.6, rad(10)],
    [0.8, 0],
  ] as [number, number][],
  rearWheelAccel: [
    [0.1, -3000],
    [0.2, 2500],
    [0.5, 0],
    [0.7, -1000],
    [0.75, 0],
  ] as [number, number][],
  initialRates: [1.5, -2, 1] as [number, number, number],
};

describe("invariants of the gyrostat model", () => {
  it.each(CAR_PRESET_IDS)(
    "%s: world angular momentum drifts less than 1e-6 over 1 s of aggressive inputs",
    (id) => {
      // Conservation of angular momentum with no external torque (engine.md section 4)
      const r = simulateAttitude(CAR_PRESETS[id], aggressive);
      expect(r.angularMomentumDrift).toBeLessThan(1e-6);
      expect(Math.abs(deg(r.rollRad)) + Math.abs(deg(r.yawRad))).toBeGreaterThan(5);
    },
  );

  it("with no input the gyrostat energy 1/2 w.I.w is conserved", () => {
    // Euler's equations with constant rotor momentum conserve 1/2 w.I.w (gyrostat energy integral)
    const car = CAR_PRESETS["buggy-2wd-10"];
    const w0 = [2, -1.5, 3];
    const energy = (w: readonly number[]) => 0.5 * w.reduce((s, wi, i) => s + car.inertia[i] * wi * wi, 0);
    const r = simulateAttitude(car, { speed: 12, duration: 1, initialRates: w0 as [number, number, number] });
    expect(Math.abs(energy(r.finalRates) / energy(w0) - 1)).toBeLessThan(1e-8);
    expect(Math.hypot(r.finalRates[0] - w0[0], r.finalRates[2] - w0[2])).toBeGreaterThan(0.1);
  });

  it("with no input and no initial rates nothing moves", () => {
    for (const id of CAR_PRESET_IDS) {
      const r = simulateAttitude(CAR_PRESETS[id], { speed: 15, duration: 1 });
      expect(r.yawRad).toBe(0);
      expect(r.pitchRad).toBe(0);
      expect(r.rollRad).toBe(0);
      expect(r.finalRates).toEqual([0, 0, 0]);
    }
  });

  it("steering right gives the mirror image of steering left", () => {
    const car = CAR_PRESETS["buggy-4wd-10"];
    const left = { ...aggressive, initialRates: undefined };
    const right = { ...left, steering: left.steering.map(([t, a]) => [t, -a] as [number, number]) };
    const a = simulateAttitude(car, left);
    const b = simulateAttitude(car, right);
    expect(b.yawRad).toBeCloseTo(-a.yawRad, 12);
    expect(b.rollRad).toBeCloseTo(-a.rollRad, 12);
    expect(b.pitchRad).toBeCloseTo(a.pitchRad, 12);
    expect(Math.abs(deg(a.yawRad))).toBeGreaterThan(1);
  });

  it.each(CAR_PRESET_IDS)("%s: halving the step changes the landing attitude by less than 0.01 deg", (id) => {
    const car = CAR_PRESETS[id];
    const a = simulateAttitude(car, { ...aggressive, dt: 0.001 });
    const b = simulateAttitude(car, { ...aggressive, dt: 0.0005 });
    expect(Math.abs(deg(a.yawRad - b.yawRad))).toBeLessThan(0.01);
    expect(Math.abs(deg(a.pitchRad - b.pitchRad))).toBeLessThan(0.01);
    expect(Math.abs(deg(a.rollRad - b.rollRad))).toBeLessThan(0.01);
  });

  it("records a time series that ends at the reported landing", () => {
    const car = CAR_PRESETS["buggy-2wd-10"];
    const r = simulateAttitude(car, { ...aggressive, duration: 0.8 }, { seriesEvery: 10 });
    const s = r.series!;
    const last = s.t.length - 1;
    expect(s.t[0]).toBe(0);
    expect(s.t[last]).toBeCloseTo(0.8, 12);
    expect(s.yawRad[last]).toBeCloseTo(r.yawRad, 12);
    expect(s.steerRad[1]).toBeGreaterThan(0);
    expect(s.t.length).toBeGreaterThan(70);
  });

  it("refuses bad input, naming the field", () => {
    const car = CAR_PRESETS["buggy-2wd-10"];
    expect(() => simulateAttitude(car, { speed: -1, duration: 1 })).toThrow(/speed/);
    expect(() =>
      simulateAttitude(car, {
        speed: 5,
        duration: 1,
        steering: [
          [0.5, 0],
          [0.2, 0],
        ],
      }),
    ).toThrow(/steering\[1\]/);
    expect(() => simulateAttitude({ ...car, inertia: [0, 1, 1] }, { speed: 5, duration: 1 })).toThrow(
      /inertia\[0\]/,
    );
  });
});

describe("behaviours drivers report (common practice, no source)", () => {
  it.each(CAR_PRESET_IDS)("%s: throttle in the air raises the nose, brake drops it", (id) => {
    const car = CAR_PRESETS[id];
    const throttle = simulateAttitude(car, {
      speed: 8,
      duration: 0.6,
      rearWheelAccel: [
        [0.05, car.maxWheelAccel],
        [0.1, 0],
      ],
    });
    const brake = simulateAttitude(car, {
      speed: 8,
      duration: 0.6,
      rearWheelAccel: [
        [0.05, -car.maxWheelBrake],
        [0.1, 0],
      ],
    });
    expect(deg(throttle.pitchRad)).toBeGreaterThan(5);
    expect(deg(brake.pitchRad)).toBeLessThan(-5);
  });

  it.each(CAR_PRESET_IDS)(
    "%s: steering in the air rolls the car (left steer: right side down first)",
    (id) => {
      const car = CAR_PRESETS[id];
      const r = simulateAttitude(car, { speed: 10, duration: 0.1, steering: [[0, car.steeringLockRad]] });
      expect(deg(r.rollRad)).toBeGreaterThan(2);
    },
  );

  it.each(CAR_PRESET_IDS)("%s: held steering turns the nose toward the other side", (id) => {
    const car = CAR_PRESETS[id];
    const left = simulateAttitude(car, { speed: 10, duration: 0.4, steering: [[0, car.steeringLockRad]] });
    const right = simulateAttitude(car, { speed: 10, duration: 0.4, steering: [[0, -car.steeringLockRad]] });
    expect(deg(left.yawRad)).toBeLessThan(-3);
    expect(deg(right.yawRad)).toBeGreaterThan(3);
  });
});
