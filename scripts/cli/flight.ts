/**
 * `loftline flight FILE`: flies one jump (engine.md, command-line contract).
 * Input: { speed m/s, faceAngleDeg, lip: [x, z], surface: [[x, z], ...], g?, drag?: { massKg,
 * cdA, airDensity? } }. Output: { airtime, apex: [x, z], landing: { x, z, speed, flightPathDeg,
 * surfaceSlopeDeg, normalSpeed, equivalentFallHeight } }.
 */
import { z } from "zod";
import { flyJump } from "~/analysis";
import { parseWith, toDeg, toRad, type CliCommand } from "./io";

const num = (what: string) => z.number({ error: `${what} must be a number` });
const point = z.tuple([num("x"), num("z")], { error: "must be [x, z] in metres" });

export const flightInputSchema = z.object({
  speed: num("speed").positive("speed must be above 0"),
  faceAngleDeg: num("faceAngleDeg")
    .gt(-90, "faceAngleDeg must be above -90")
    .lt(90, "faceAngleDeg must be below 90"),
  lip: point,
  surface: z
    .array(point, { error: "surface must be a list of [x, z] points" })
    .min(2, "surface needs at least 2 points"),
  g: num("g").positive("g must be above 0").optional(),
  drag: z
    .object({
      massKg: num("massKg").positive("massKg must be above 0"),
      cdA: num("cdA").min(0, "cdA must be 0 or more"),
      airDensity: num("airDensity").positive("airDensity must be above 0").optional(),
    })
    .optional(),
});

export const flightCommand: CliCommand = {
  summary: "flight FILE    fly a jump: airtime, apex, touchdown and equivalent fall height",
  run(input) {
    const v = parseWith(flightInputSchema, input);
    const r = flyJump({
      speed: v.speed,
      faceAngleRad: toRad(v.faceAngleDeg),
      lip: { x: v.lip[0], z: v.lip[1] },
      surface: v.surface.map(([x, zz]) => ({ x, z: zz })),
      g: v.g,
      drag: v.drag,
    });
    return {
      airtime: r.airtime,
      apex: [r.apex.x, r.apex.z],
      landing: {
        x: r.landing.x,
        z: r.landing.z,
        speed: r.landing.speed,
        flightPathDeg: toDeg(r.landing.flightPathRad),
        surfaceSlopeDeg: toDeg(r.landing.surfaceSlopeRad),
        normalSpeed: r.landing.normalSpeed,
        equivalentFallHeight: r.landing.equivalentFallHeight,
      },
    };
  },
};
