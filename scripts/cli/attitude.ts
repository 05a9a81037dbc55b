/**
 * `loftline attitude FILE`: the car's attitude through the air (engine.md, command-line contract).
 * Input: { car: preset id | { inertia, frontWheel: { spinInertia, radius }, rearWheel, casterDeg,
 * steeringLockDeg, servoSecondsPer60, drive?, topSpeed? }, speed, duration, steering: [[t, targetDeg]],
 * rearWheelAccel?: [[t, rad/s^2]], initialRates?: [wx, wy, wz], initialPitchDeg?, dt? }.
 * Output: { yawDeg, pitchDeg, rollDeg, angularMomentumDrift }.
 */
import { z } from "zod";
import { simulateAttitude, carRefSchema, resolveCar } from "~/analysis";
import { parseWith, toDeg, toRad, type CliCommand } from "./io";

const num = (what: string) => z.number({ error: `${what} must be a number` });
const timeline = (what: string) =>
  z.array(
    z.tuple([num("t").min(0, "t must be 0 or later"), num(what)], {
      error: `each entry must be [t, ${what}]`,
    }),
    {
      error: `must be a list of [t, ${what}] entries`,
    },
  );

export const attitudeInputSchema = z.object({
  car: carRefSchema,
  speed: num("speed").min(0, "speed must be 0 or more"),
  duration: num("duration").positive("duration must be above 0").max(10, "duration must be at most 10 s"),
  steering: timeline("targetDeg"),
  rearWheelAccel: timeline("rad/s^2").optional(),
  initialRates: z
    .tuple([num("wx"), num("wy"), num("wz")], { error: "initialRates must be [wx, wy, wz] in rad/s" })
    .optional(),
  initialPitchDeg: num("initialPitchDeg").optional(),
  dt: num("dt").positive("dt must be above 0").max(0.01, "dt must be at most 0.01 s").optional(),
});

export const attitudeCommand: CliCommand = {
  summary: "attitude FILE  simulate yaw, pitch and roll through the air for a steering timeline",
  run(input) {
    const v = parseWith(attitudeInputSchema, input);
    const r = simulateAttitude(resolveCar(v.car), {
      speed: v.speed,
      duration: v.duration,
      steering: v.steering.map(([t, d]) => [t, toRad(d)] as [number, number]),
      rearWheelAccel: v.rearWheelAccel,
      initialRates: v.initialRates,
      initialPitchRad: v.initialPitchDeg === undefined ? undefined : toRad(v.initialPitchDeg),
      dt: v.dt,
    });
    return {
      yawDeg: toDeg(r.yawRad),
      pitchDeg: toDeg(r.pitchRad),
      rollDeg: toDeg(r.rollRad),
      angularMomentumDrift: r.angularMomentumDrift,
    };
  },
};
