/**
 * Number formats of the analysis pages: SI units with a km/h reading for speeds. Pure; used on
 * both sides. The product's words (skills, presets, verdicts) come from `~/analysis`.
 */
import { JUMP_PRESET_LABELS, type JumpAnalysis } from "~/analysis";

/** Metres with a sensible precision: "301 m", "4.4 m", "0.11 m". */
export function metres(x: number): string {
  const a = Math.abs(x);
  return `${a >= 100 ? x.toFixed(0) : a >= 1 ? x.toFixed(1) : x.toFixed(2)} m`;
}

/** Seconds: "40.44 s" for lap times, "0.69 s" in the air. */
export function seconds(x: number, digits = 2): string {
  return `${x.toFixed(digits)} s`;
}

/** A speed in m/s with km/h beside it: "6.5 m/s (23 km/h)". */
export function speed(x: number): string {
  return `${x.toFixed(1)} m/s (${Math.round(x * 3.6)} km/h)`;
}

/** A speed in m/s only, for tight cells: "6.5". */
export function speedShort(x: number): string {
  return x.toFixed(1);
}

export function degrees(x: number, digits = 0): string {
  return `${x.toFixed(digits)}\u00b0`;
}

export function percent(x: number): string {
  return `${Math.round(x * 100)}%`;
}

/** Signed seconds: "+0.12 s" or "−0.40 s". */
export function signedSeconds(x: number): string {
  return `${x >= 0 ? "+" : "\u2212"}${Math.abs(x).toFixed(2)} s`;
}

/** The jump's display name: its own name, else its kind and number. */
export function jumpName(j: Pick<JumpAnalysis, "name" | "preset" | "sectionId">): string {
  return j.name ?? `${JUMP_PRESET_LABELS[j.preset]} (${j.sectionId})`;
}
