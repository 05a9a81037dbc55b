/**
 * A layout's car classes and a club's default classes: the class presets a director picks from
 * (members' own car profiles are previewed per member and are never layout classes), how they are
 * stored (a JSON list in a text column) and read back defensively.
 */
import { CAR_CLASS_COUNT, CAR_PRESET_IDS, CAR_PRESETS, carPreset, DEFAULT_CAR_CLASS } from "~/analysis";

/** The classes a new layout gets when the club has not chosen its own default. */
export const DEFAULT_CAR_CLASSES: readonly string[] = [DEFAULT_CAR_CLASS];

/** What the pickers offer: every class preset, with its label. */
export const CAR_CLASS_OPTIONS: readonly { id: string; label: string }[] = CAR_PRESET_IDS.map((id) => ({
  id,
  label: CAR_PRESETS[id].label,
}));

/** A class's label ("1/10 2WD buggy"), or its id when it is not a preset. */
export function carClassLabel(id: string): string {
  return carPreset(id)?.label ?? id;
}

/**
 * A stored list read back: null when the column is empty or the value is not a list of 1 to 10
 * distinct ids (a hand-edited row never feeds the analysis nonsense).
 */
export function readCarClasses(json: string | null | undefined): string[] | null {
  if (!json) return null;
  try {
    const value: unknown = JSON.parse(json);
    if (!Array.isArray(value) || !value.every((v) => typeof v === "string" && /^[A-Za-z0-9][\w-]*$/.test(v)))
      return null;
    const list = [...new Set(value as string[])];
    return list.length >= CAR_CLASS_COUNT.min && list.length <= CAR_CLASS_COUNT.max ? list : null;
  } catch {
    return null;
  }
}
