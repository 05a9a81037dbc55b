import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import {
  bifilarInertia,
  CAR_NUMBER_FIELDS,
  CAR_PRESET_IDS,
  carProfileSchema,
  parseCarProfile,
  profileFromCar,
  CAR_PRESETS,
  carProfileFile,
} from "~/analysis";
import { parseProfileForm, profileFormValues } from "~/lib/schemas/car-profiles";

const form = (fields: Record<string, string>) => {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return fd;
};

describe("car profile fields", () => {
  it("give every number of the profile a unit, bounds that hold every class preset, and help text", () => {
    for (const id of CAR_PRESET_IDS) {
      const p = profileFromCar(CAR_PRESETS[id]);
      expect(carProfileSchema.safeParse(p).success, id).toBe(true);
    }
    for (const f of CAR_NUMBER_FIELDS) {
      expect(f.min, f.name).toBeLessThan(f.max);
      expect(f.help.length, f.name).toBeGreaterThan(30);
    }
    // Every number a profile carries has exactly one field.
    const leaves = (o: unknown, at: string): string[] =>
      typeof o === "number"
        ? [at]
        : typeof o === "object" && o !== null
          ? Object.entries(o).flatMap(([k, v]) => leaves(v, at ? `${at}.${k}` : k))
          : [];
    const numbers = leaves(profileFromCar(CAR_PRESETS["buggy-2wd-10"]), "").sort();
    expect(CAR_NUMBER_FIELDS.map((f) => f.name).sort()).toEqual(numbers);
  });

  it("bifilar pendulum: I = m g D^2 T^2 / (16 pi^2 L)", () => {
    // Derived check (textbook bifilar suspension, from memory): a point mass pair m/2 at +-D/2 has
    // I = m D^2 / 4 and swings with T = 2 pi sqrt(I L / (m g (D/2)^2)) = 2 pi sqrt(L / g).
    const m = 2;
    const D = 0.3;
    const L = 1.2;
    const T = 2 * Math.PI * Math.sqrt(L / 9.81);
    expect(bifilarInertia(m, D, L, T)).toBeCloseTo((m * D * D) / 4, 12);
  });
});

describe("parseProfileForm", () => {
  const good = profileFormValues(profileFromCar(CAR_PRESETS["buggy-8"]));

  it("reads the form back into the same profile, numbers as typed with a decimal comma or the unit", () => {
    const r = parseProfileForm(form({ ...good, massKg: "3,4 kg", casterDeg: "18°" }));
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.profile.massKg).toBe(3.4);
      expect(r.profile.casterDeg).toBe(18);
      expect(r.profile.inertia[0]).toBeCloseTo(CAR_PRESETS["buggy-8"].inertia[0], 6);
    }
  });

  it("names each field that is missing, not a number or out of bounds", () => {
    const r = parseProfileForm(form({ ...good, "rearWheel.massKg": "", wheelbase: "three", mu: "9" }));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors["rearWheel.massKg"]).toEqual(["Enter the rear wheel mass in kg."]);
      expect(r.errors.wheelbase).toEqual(["Wheelbase must be a number (m)."]);
      expect(r.errors.mu?.[0]).toMatch(/^Grip \(tyre friction coefficient\) must be at most 3/);
      expect(Object.keys(r.errors).sort()).toEqual(["mu", "rearWheel.massKg", "wheelbase"]);
    }
  });
});

describe("parseCarProfile (files)", () => {
  it("reads a profile file and names the field of a bad one", () => {
    const file = carProfileFile(profileFromCar(CAR_PRESETS["sct-10"]));
    expect(parseCarProfile(JSON.parse(JSON.stringify(file))).ok).toBe(true);
    const bad = parseCarProfile({ ...file, frontWheel: { ...file.frontWheel, radius: 4.1 } });
    expect(bad).toEqual({
      ok: false,
      issues: [{ path: "frontWheel.radius", message: "Front wheel radius must be at most 0.2 m" }],
    });
    expect(parseCarProfile({ ...file, format: "other" })).toMatchObject({
      ok: false,
      issues: [{ path: "format" }],
    });
    expect(parseCarProfile([])).toMatchObject({ ok: false, issues: [{ path: "(car)" }] });
    // The example in the README.
    const example = JSON.parse(readFileSync("docs/examples/measured-buggy.loftline-car.json", "utf8"));
    expect(parseCarProfile(example)).toMatchObject({ ok: true, profile: { label: "Measured 2wd buggy" } });
  });
});
