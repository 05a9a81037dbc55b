/**
 * The club's marshal settings form (a third form on the club settings page, told apart by its
 * intent): how far from the track edge a marshal may stand and the club's largest heat. Both are
 * required, checked against the engine's ranges (`MARSHAL_SETTINGS` from `~/analysis`), and each
 * problem names its field. `clubMarshalSettings` turns a stored club row into the engine's
 * settings (decision 0710).
 */
import { z } from "zod";
import { MARSHAL_SETTINGS, type MarshalSettingInfo, type MarshalSettings } from "~/analysis";
import { parseNumberText } from "~/lib/number-text";

/** The marshal settings a club sets, in the order the form shows them. */
export const CLUB_MARSHAL_FIELDS = ["reach", "heatSize"] as const;
export type ClubMarshalFieldId = (typeof CLUB_MARSHAL_FIELDS)[number];

/** The engine's description of a club setting: label, unit, default, range and source. */
export function marshalFieldInfo(id: ClubMarshalFieldId): MarshalSettingInfo {
  const info = MARSHAL_SETTINGS.find((s) => s.id === id);
  if (!info) throw new Error(`No marshal setting ${id}`);
  return info;
}

/** The club's marshal settings as stored (clubs.marshal_reach, clubs.heat_size). */
export interface ClubMarshalValues {
  reach: number;
  heatSize: number;
}

/** The defaults (the engine's, the same as the columns' defaults). */
export const DEFAULT_CLUB_MARSHAL: Readonly<ClubMarshalValues> = Object.freeze({
  reach: marshalFieldInfo("reach").default,
  heatSize: marshalFieldInfo("heatSize").default,
});

function numberField(info: MarshalSettingInfo) {
  const unit = info.unit === "m" ? " m" : "";
  const what = info.integer ? "a whole number" : `a number${unit ? " of metres" : ""}`;
  return z.string({ error: `${info.label}: enter ${what}.` }).transform((raw, ctx) => {
    const n = parseNumberText(raw, info.unit === "m" ? "m" : undefined);
    if (n === null) {
      ctx.addIssue({ code: "custom", message: `${info.label} must be ${what}, like ${info.default}.` });
      return z.NEVER;
    }
    if (info.integer && !Number.isInteger(n)) {
      ctx.addIssue({
        code: "custom",
        message: `${info.label} must be a whole number, like ${info.default}.`,
      });
      return z.NEVER;
    }
    if (n < info.min || n > info.max) {
      ctx.addIssue({
        code: "custom",
        message: `${info.label} must be between ${info.min} and ${info.max}${unit}.`,
      });
      return z.NEVER;
    }
    return n;
  });
}

/** The marshal settings form. */
export const clubMarshalSchema = z.object({
  intent: z.literal("marshal-settings"),
  reach: numberField(marshalFieldInfo("reach")),
  heatSize: numberField(marshalFieldInfo("heatSize")),
});

/**
 * A club's stored values as the engine's settings override (`marshalPlan(..., { settings })`);
 * a stored value outside the engine's range (an older row, a hand edit) falls back to the default.
 */
export function clubMarshalSettings(
  row: Partial<ClubMarshalValues>,
): Pick<MarshalSettings, "reach" | "heatSize"> {
  const pick = (id: ClubMarshalFieldId) => {
    const info = marshalFieldInfo(id);
    const v = row[id];
    const ok =
      typeof v === "number" &&
      Number.isFinite(v) &&
      v >= info.min &&
      v <= info.max &&
      (!info.integer || Number.isInteger(v));
    return ok ? v : info.default;
  };
  return { reach: pick("reach"), heatSize: pick("heatSize") };
}
