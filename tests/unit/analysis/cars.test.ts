import { describe, expect, it } from "vitest";
import {
  CAR_PRESETS,
  CAR_PRESET_IDS,
  carPreset,
  estimateInertia,
  wheelSpinInertia,
} from "~/analysis/format/cars";

describe("car class presets", () => {
  it("has the four classes, each marked as an estimate with its reasoning", () => {
    expect(Object.keys(CAR_PRESETS).sort()).toEqual([...CAR_PRESET_IDS].sort());
    for (const id of CAR_PRESET_IDS) {
      const car = CAR_PRESETS[id];
      expect(car.id).toBe(id);
      expect(car.estimate).toBe(true);
      expect(car.notes).toMatch(/estimate/i);
      expect(car.notes).toMatch(/0\.7 m r\^2/);
      expect(car.label.length).toBeGreaterThan(5);
    }
    expect(carPreset("buggy-8")?.drive).toBe("4wd");
    expect(carPreset("toString")).toBeUndefined();
  });

  it("wheel spin inertia is 0.7 m r^2 and the inertias follow the mass model", () => {
    for (const id of CAR_PRESET_IDS) {
      const car = CAR_PRESETS[id];
      for (const w of [car.frontWheel, car.rearWheel])
        expect(w.spinInertia).toBeCloseTo(wheelSpinInertia(w.massKg, w.radius), 15);
      const [ixx, iyy, izz] = car.inertia;
      // A flat, long car: roll < pitch < yaw, and the perpendicular-axis bound Izz <= Ixx + Iyy
      // holds for a body thinner in z than in x and y.
      expect(ixx).toBeLessThan(iyy);
      expect(iyy).toBeLessThan(izz);
      expect(izz).toBeLessThan(ixx + iyy);
      // Radii of gyration stay within the car's size.
      expect(Math.sqrt(izz / car.massKg)).toBeLessThan(car.wheelbase / 2);
    }
  });

  it("a uniform box with weightless wheels gives the textbook box inertias", () => {
    // Box about its centre: I = m (b^2 + c^2) / 12 (standard rigid-body table, e.g. OpenStax
    // University Physics Vol. 1, section 10.5 for the thin-rod and slab cases)
    const none = { radius: 0.05, massKg: 0 };
    const [ixx, iyy, izz] = estimateInertia({
      massKg: 1.2,
      wheelbase: 0.3,
      track: 0.2,
      frontWheel: none,
      rearWheel: none,
      core: { length: 0.4, width: 0.2, height: 0.1 },
    });
    expect(ixx).toBeCloseTo((1.2 * (0.04 + 0.01)) / 12, 12);
    expect(iyy).toBeCloseTo((1.2 * (0.16 + 0.01)) / 12, 12);
    expect(izz).toBeCloseTo((1.2 * (0.16 + 0.04)) / 12, 12);
  });
});
