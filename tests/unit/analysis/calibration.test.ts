/**
 * Calibration from measured laps: laps generated from known car values with noise, then fitted.
 * The laps are made by the lap model itself (no outside reference): what is checked is that the
 * fit recovers what it can tell apart, and says when it cannot.
 */
import { describe, expect, it } from "vitest";
import {
  calibrationTrack,
  carPreset,
  dropSlowLaps,
  fitPace,
  fitSpeedGrip,
  lapSpeed,
  modelTimes,
  scaleCar,
  type LayoutDocument,
} from "~/analysis";
import { seededNormal } from "~/analysis/math/vec";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import { starterDocument } from "~/analysis/format/starter-layout";

const car = carPreset("buggy-2wd-10")!;
const summer = calibrationTrack(SUMMER_LAYOUT);

/** An oval of two straights and two 180-degree turns. */
function oval(straight: number, radius: number): LayoutDocument {
  const doc = starterDocument("Oval", 3);
  return {
    ...doc,
    sections: [
      { id: "s1", kind: "straight", length: straight },
      { id: "t1", kind: "turn", radius, angleDeg: 180, direction: "left" },
      { id: "s2", kind: "straight", length: straight },
      { id: "t2", kind: "turn", radius, angleDeg: 180, direction: "left" },
    ],
  };
}

/** n laps of the given times, each time with relative noise of sd `noise` (seeded). */
function laps(times: number[], n: number, noise: number, seed: number): number[][] {
  const z = seededNormal(seed);
  return Array.from({ length: n }, () => times.map((t) => t * (1 + noise * z())));
}
const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
const columnMeans = (rows: number[][]) => rows[0].map((_, j) => mean(rows.map((r) => r[j])));

describe("model times", () => {
  it("sector times add up to the lap speed model's lap time", () => {
    const m = modelTimes(summer, car, 3);
    expect(m.sectorTimes).toHaveLength(3);
    expect(m.sectorTimes.reduce((a, b) => a + b, 0)).toBeCloseTo(m.lapTime, 9);
    expect(m.lapTime).toBeCloseTo(lapSpeed(summer.geometry, car).lapTime, 6);
  });
});

describe("slow laps", () => {
  it("leaves out laps slower than 1.3 × the median and lists them", () => {
    const r = dropSlowLaps([20, 21, 20.5, 35, 20.2].map((time, i) => ({ lap: i + 1, time })));
    expect(r.dropped.map((l) => l.lap)).toEqual([4]);
    expect(r.kept).toHaveLength(4);
    expect(r.limit).toBeCloseTo(20.5 * 1.3, 9);
  });
});

describe("pace factor from lap times on one layout", () => {
  it("recovers the pace of laps from known values, with 1.5 % noise and two crashed laps, within 3 %", () => {
    const truth = { ...car, topSpeed: 13, mu: 0.8, accel0: 7 };
    const truthLap = modelTimes(summer, truth).lapTime;
    const times = laps([truthLap], 25, 0.015, 7).map((r) => r[0]);
    times[5] *= 1.8;
    times[17] *= 1.5;
    const { kept, dropped } = dropSlowLaps(times.map((time, i) => ({ lap: i + 1, time })));
    expect(dropped.map((l) => l.lap)).toEqual([6, 18]);
    const fit = fitPace(summer, car, mean(kept.map((l) => l.time)));
    const truePace = truthLap / modelTimes(summer, car).lapTime;
    expect(Math.abs(fit.paceFactor / truePace - 1)).toBeLessThan(0.03);
    // The saved values (speeds scaled evenly) give the measured lap back.
    expect(Math.abs(modelTimes(summer, { ...car, ...fit.fitted }).lapTime / truthLap - 1)).toBeLessThan(0.03);
    expect(fit.fitted.topSpeed).toBeCloseTo(car.topSpeed * fit.scale, 9);
    expect(fit.fitted.mu).toBeCloseTo(car.mu * fit.scale ** 2, 9);
  });

  it("holds the factor to its bounds and says so", () => {
    const fit = fitPace(summer, car, modelTimes(summer, car).lapTime * 3);
    expect(fit.paceFactor).toBe(1.5);
    expect(fit.atBound).toBe(true);
    expect(() => fitPace(summer, car, 0)).toThrow(/measuredMean/);
  });

  it("scales a car's speeds evenly", () => {
    const s = scaleCar(car, 0.5);
    expect([s.topSpeed, s.accel0, s.brakeDecel, s.mu]).toEqual([
      car.topSpeed * 0.5,
      car.accel0 * 0.25,
      car.brakeDecel * 0.25,
      car.mu * 0.25,
    ]);
  });
});

describe("top speed and grip", () => {
  const truth = { ...car, topSpeed: 13.5, mu: 1.25 };

  it("are recovered from three sector times per lap (1 % noise, 20 laps) within 4 %", () => {
    const sectors = modelTimes(summer, truth, 3).sectorTimes;
    const measured = columnMeans(laps(sectors, 20, 0.01, 11));
    const fit = fitSpeedGrip([{ track: summer, measured }], car);
    expect(fit.separable).toBe(true);
    expect(Math.abs(fit.topSpeed / truth.topSpeed - 1)).toBeLessThan(0.04);
    expect(Math.abs(fit.mu / truth.mu - 1)).toBeLessThan(0.04);
    expect(fit.after[0]).toHaveLength(3);
  });

  it("are recovered from lap times on two layouts of different character within 4 %", () => {
    const fast = calibrationTrack(oval(60, 14));
    const tight = calibrationTrack(oval(6, 2.5));
    const measured = [fast, tight].map((t) => [
      mean(laps([modelTimes(t, truth).lapTime], 20, 0.01, 3).map((r) => r[0])),
    ]);
    const fit = fitSpeedGrip(
      [
        { track: fast, measured: measured[0] },
        { track: tight, measured: measured[1] },
      ],
      car,
    );
    expect(fit.separable).toBe(true);
    expect(Math.abs(fit.topSpeed / truth.topSpeed - 1)).toBeLessThan(0.04);
    expect(Math.abs(fit.mu / truth.mu - 1)).toBeLessThan(0.04);
  });

  it("are not separated from two layouts of the same character, nor from lap times alone", () => {
    const wet = calibrationTrack(WET_WEATHER_LAYOUT);
    const fit = fitSpeedGrip(
      [
        { track: summer, measured: [modelTimes(summer, truth).lapTime] },
        { track: wet, measured: [modelTimes(wet, truth).lapTime] },
      ],
      car,
    );
    expect(fit.separable).toBe(false);
    expect(fit.fitted.topSpeed).toBe(car.topSpeed);
    expect(() => fitSpeedGrip([{ track: summer, measured: [40] }], car)).toThrow(/at least two/);
  });

  it("keeps the values inside their bounds", () => {
    const sectors = modelTimes(summer, car, 3).sectorTimes.map((t, i) => t * (i === 0 ? 3 : 0.4));
    const fit = fitSpeedGrip([{ track: summer, measured: sectors }], car);
    expect(fit.topSpeed).toBeGreaterThanOrEqual(car.topSpeed * 0.5 - 1e-9);
    expect(fit.topSpeed).toBeLessThanOrEqual(car.topSpeed * 2 + 1e-9);
    expect(fit.mu).toBeGreaterThanOrEqual(car.mu * 0.5 - 1e-9);
    expect(fit.mu).toBeLessThanOrEqual(car.mu * 2 + 1e-9);
    expect(fit.atBound.topSpeed || fit.atBound.mu).toBe(true);
  });
});

describe("pace factor at the edges of the profile's bounds", () => {
  it("keeps the scaled values inside the profile form's bounds", () => {
    const fast = { ...car, topSpeed: 39, mu: 2.9 };
    const fit = fitPace(summer, fast, modelTimes(summer, fast).lapTime * 0.7);
    expect(fit.fitted.topSpeed).toBeLessThanOrEqual(40);
    expect(fit.fitted.mu).toBeLessThanOrEqual(3 + 1e-9);
    expect(fit.scale).toBeGreaterThanOrEqual(1);
  });
});
