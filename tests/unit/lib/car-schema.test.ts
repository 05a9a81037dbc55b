import { describe, expect, it } from "vitest";
import {
  CAR_PRESETS,
  CAR_PRESET_IDS,
  carFromProfile,
  carProfileSchema,
  carRefSchema,
  profileFromCar,
  resolveCar,
} from "~/analysis";

describe("car profile schema", () => {
  it("every preset round-trips through a profile", () => {
    for (const id of CAR_PRESET_IDS) {
      const profile = profileFromCar(CAR_PRESETS[id]);
      const parsed = carProfileSchema.parse(profile);
      const back = carFromProfile(parsed, id);
      expect(back.casterRad).toBeCloseTo(CAR_PRESETS[id].casterRad, 12);
      expect(back.inertia).toEqual(CAR_PRESETS[id].inertia);
      expect(back.estimate).toBe(false);
    }
  });

  it("names the field that is wrong", () => {
    const profile = profileFromCar(CAR_PRESETS["sct-10"]);
    const bad = carProfileSchema.safeParse({ ...profile, rearWheel: { ...profile.rearWheel, radius: -1 } });
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0].path).toEqual(["rearWheel", "radius"]);
    expect(bad.error!.issues[0].message).toMatch(/radius/);
    const missing = carProfileSchema.safeParse({ ...profile, casterDeg: undefined });
    expect(missing.error!.issues[0].path).toEqual(["casterDeg"]);
  });

  it("a car reference is a known preset id or a car object", () => {
    expect(resolveCar(carRefSchema.parse("buggy-8"))).toBe(CAR_PRESETS["buggy-8"]);
    expect(carRefSchema.safeParse("hovercraft").success).toBe(false);
    const car = resolveCar(
      carRefSchema.parse({
        inertia: [0.005, 0.017, 0.02],
        frontWheel: { spinInertia: 5e-5, radius: 0.041 },
        rearWheel: { spinInertia: 7e-5, radius: 0.043 },
        casterDeg: 30,
        steeringLockDeg: 30,
        servoSecondsPer60: 0.1,
      }),
    );
    expect(car.casterRad).toBeCloseTo(Math.PI / 6, 12);
  });
});
