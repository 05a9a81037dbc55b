/** The car values a calibration changes, their bounds and picking them from a car (internal). */
import { CAR_NUMBER_FIELDS } from "../format/car-fields";
import type { LapCar } from "../track/speed";

/** The car's numbers a calibration may change, with the profile form's bounds. */
export type FittedValues = Pick<LapCar, "topSpeed" | "accel0" | "brakeDecel" | "mu">;

/** The profile form's bounds of a value. */
export const bound = (name: keyof FittedValues) => {
  const f = CAR_NUMBER_FIELDS.find((x) => x.name === name)!;
  return { min: f.min, max: f.max };
};

/** The values a calibration may change, picked from a car. */
export const pick = (c: LapCar): FittedValues => ({
  topSpeed: c.topSpeed,
  accel0: c.accel0,
  brakeDecel: c.brakeDecel,
  mu: c.mu,
});
