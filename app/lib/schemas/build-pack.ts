/**
 * The build pack's settings, read from the address (a GET form, so a sheet can be printed again
 * and shared as it was): the layout version, datum stakes A and B, the station spacing, where
 * datum A lies on the earth and how the plan is turned, and the truck load for the earthworks.
 */
import { z } from "zod";

/** Limits (the engine checks the same ranges: STATION_SPACING_RANGE, TRUCK_LOAD_RANGE). */
export const BUILD_LIMITS = {
  spacing: { min: 0.5, max: 50, default: 5 },
  truck: { min: 0.1, max: 50, default: 6 },
  coordinate: 100_000,
} as const;

/** A datum is a site point of the layout, or "xy" for plan coordinates typed in. */
export const DATUM_CHOICE = /^(start|stand|corner-[1-9]\d{0,2}|marshal-[1-9]\d{0,2}|xy)$/;

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

/** A decimal number from a text field (a decimal comma is accepted), within limits. */
function numberField(what: string, unit: string, min: number, max: number) {
  return z.preprocess(
    blankToUndefined,
    z
      .string()
      .trim()
      .transform((s) => Number(s.replace(",", ".")))
      .pipe(
        z
          .number({ error: `Enter ${what} as a number${unit ? ` of ${unit}` : ""}.` })
          .min(min, { error: `${cap(what)} must be at least ${min}${unit ? ` ${unit}` : ""}.` })
          .max(max, { error: `${cap(what)} must be at most ${max}${unit ? ` ${unit}` : ""}.` }),
      )
      .optional(),
  );
}

function cap(s: string) {
  return s[0].toUpperCase() + s.slice(1);
}

const datumField = (name: string) =>
  z.preprocess(
    blankToUndefined,
    z
      .string()
      .regex(DATUM_CHOICE, {
        error: `Choose datum ${name} from the list: a site point of the layout or plan coordinates.`,
      })
      .optional(),
  );

const C = BUILD_LIMITS.coordinate;

export const buildPackQuerySchema = z
  .strictObject({
    version: z.preprocess(
      blankToUndefined,
      z
        .string()
        .regex(/^[1-9]\d{0,8}$/, { error: "Choose a saved version of the layout." })
        .transform(Number)
        .optional(),
    ),
    a: datumField("A"),
    ax: numberField("datum A's x", "m", -C, C),
    ay: numberField("datum A's y", "m", -C, C),
    b: datumField("B"),
    bx: numberField("datum B's x", "m", -C, C),
    by: numberField("datum B's y", "m", -C, C),
    spacing: numberField("the station spacing", "m", BUILD_LIMITS.spacing.min, BUILD_LIMITS.spacing.max),
    lat: numberField("datum A's latitude", "degrees", -85, 85),
    lon: numberField("datum A's longitude", "degrees", -180, 180),
    orient: z.preprocess(
      blankToUndefined,
      z
        .enum(["grid", "ab"], { error: "Say which line the true bearing is of: the plan's up or A to B." })
        .optional(),
    ),
    trueBearing: numberField("the true bearing", "degrees", 0, 360),
    truck: numberField("the truck load", "m³", BUILD_LIMITS.truck.min, BUILD_LIMITS.truck.max),
  })
  .superRefine((q, ctx) => {
    for (const d of ["a", "b"] as const) {
      if (q[d] !== "xy") continue;
      for (const axis of ["x", "y"] as const) {
        const key = `${d}${axis}` as const;
        if (q[key] === undefined)
          ctx.addIssue({
            code: "custom",
            path: [key],
            message: `Enter datum ${d.toUpperCase()}'s ${axis} on the plan in metres.`,
          });
      }
    }
    if ((q.lat === undefined) !== (q.lon === undefined)) {
      const missing = q.lat === undefined ? "lat" : "lon";
      ctx.addIssue({
        code: "custom",
        path: [missing],
        message: "Give both the latitude and the longitude of datum A, or neither.",
      });
    }
  });

export type BuildPackQuery = z.infer<typeof buildPackQuerySchema>;
