/**
 * `loftline airplan FILE`: the mid-air set-up plan for a jump that lands into a turn.
 * Input: { car: preset id | car object (as for `attitude`, plus maxWheelAccel?, maxWheelBrake?,
 * wheelbase?), speed m/s, airtime s, turn: "left" | "right", rollToleranceDeg?, pitchToleranceDeg?,
 * turnAngleDeg?, maxYawDeg?, pitchChangeDeg?, takeoffPitchDeg? (the face angle: angles are then
 * measured in the world), airtimePerSpeed? (s per m/s), seed? }.
 * Output: the plan with `steering: [[t, targetDeg], ...]` and `rearWheelAccel: [[t, rad/s^2], ...]`
 * in the form `attitude` reads (with `initialPitchDeg` = takeoffPitchDeg), the landing yawDeg,
 * pitchDeg, rollDeg, timingWindowMs, successRate per skill level with every error of the driver
 * and `successAlone` per error, the error that matters most, what turning without the pitch
 * change would give (`withoutLevelling`) and the trade-off, and the details behind them.
 */
import { z } from "zod";
import { planAirSetup, carRefSchema, resolveCar } from "~/analysis";
import { parseWith, toDeg, toRad, type CliCommand } from "./io";

const num = (what: string) => z.number({ error: `${what} must be a number` });
const angle = (what: string, max: number) =>
  num(what).positive(`${what} must be above 0`).max(max, `${what} must be at most ${max}`);

export const airplanInputSchema = z.object({
  car: carRefSchema,
  speed: num("speed").positive("speed must be above 0"),
  airtime: num("airtime").positive("airtime must be above 0").max(5, "airtime must be at most 5 s"),
  turn: z.enum(["left", "right"], { error: 'turn must be "left" or "right"' }),
  rollToleranceDeg: angle("rollToleranceDeg", 45).optional(),
  pitchToleranceDeg: angle("pitchToleranceDeg", 90).optional(),
  turnAngleDeg: angle("turnAngleDeg", 360).optional(),
  maxYawDeg: angle("maxYawDeg", 45).optional(),
  pitchChangeDeg: num("pitchChangeDeg")
    .min(-180, "pitchChangeDeg must be at least -180")
    .max(180, "pitchChangeDeg must be at most 180")
    .optional(),
  takeoffPitchDeg: num("takeoffPitchDeg")
    .min(-80, "takeoffPitchDeg must be at least -80")
    .max(80, "takeoffPitchDeg must be at most 80")
    .optional(),
  airtimePerSpeed: num("airtimePerSpeed")
    .min(0, "airtimePerSpeed must be 0 or more")
    .max(5, "airtimePerSpeed must be at most 5 s per m/s")
    .optional(),
  seed: z.number({ error: "seed must be a whole number" }).int("seed must be a whole number").optional(),
});

const opt = (deg: number | undefined) => (deg === undefined ? undefined : toRad(deg));

export const airplanCommand: CliCommand = {
  summary: "airplan FILE   plan the mid-air set-up for the turn after a jump",
  run(input) {
    const v = parseWith(airplanInputSchema, input);
    const p = planAirSetup({
      car: resolveCar(v.car),
      speed: v.speed,
      airtime: v.airtime,
      turn: v.turn,
      rollToleranceRad: opt(v.rollToleranceDeg),
      pitchToleranceRad: opt(v.pitchToleranceDeg),
      takeoffPitchRad: opt(v.takeoffPitchDeg),
      airtimePerSpeed: v.airtimePerSpeed,
      turnAngleRad: opt(v.turnAngleDeg),
      maxYawRad: opt(v.maxYawDeg),
      pitchChangeRad: opt(v.pitchChangeDeg),
      seed: v.seed,
    });
    return {
      feasible: p.feasible,
      reason: p.reason,
      steering: p.steering.map(([t, a]) => [t, toDeg(a)]),
      rearWheelAccel: p.rearWheelAccel,
      yawDeg: toDeg(p.yawRad),
      pitchDeg: toDeg(p.pitchRad),
      rollDeg: toDeg(p.rollRad),
      timingWindowMs: p.timingWindowMs,
      successRate: p.successRate,
      successAlone: p.successAlone,
      mainError: p.mainError,
      targetYawDeg: toDeg(p.targetYawRad),
      pitchChangeDeg: toDeg(p.pitchChangeRad),
      pitchAimDeg: toDeg(p.pitchAimRad),
      initialPitchDeg: toDeg(p.takeoffPitchRad),
      pitchPulse: p.pitchPulse,
      switches: p.switches,
      pulseSwitches: p.pulseSwitches,
      rollToleranceDeg: toDeg(p.rollToleranceRad),
      pitchToleranceDeg: p.pitchToleranceRad === null ? null : toDeg(p.pitchToleranceRad),
      withoutLevelling: p.withoutLevelling
        ? {
            steering: p.withoutLevelling.steering.map(([t, a]) => [t, toDeg(a)]),
            yawDeg: toDeg(p.withoutLevelling.yawRad),
            pitchDeg: toDeg(p.withoutLevelling.pitchRad),
            rollDeg: toDeg(p.withoutLevelling.rollRad),
          }
        : null,
      tradeOff: p.tradeOff.map((x) => ({ pitchChangeDeg: toDeg(x.pitchChangeRad), yawDeg: toDeg(x.yawRad) })),
      note: "Model estimate from class or profile data, not a safety certification. The trade-off's middle points are linear-guide estimates.",
    };
  },
};
