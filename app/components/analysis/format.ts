/**
 * Number and word formats of the analysis pages: SI units with a km/h reading for speeds, and the
 * trade's words for jump kinds and verdicts. Pure; used on both sides.
 */
import type { JumpAnalysis, SkillLevel } from "~/analysis";
import type { JumpPreset } from "~/analysis";

export const SKILL_LABELS: Record<SkillLevel, string> = {
  novice: "Novice",
  club: "Club racer",
  expert: "Expert",
};

/** "a novice", "a club racer", "an expert". */
export function skillPhrase(skill: SkillLevel): string {
  const word = SKILL_LABELS[skill].toLowerCase();
  return `${/^[aeiou]/.test(word) ? "an" : "a"} ${word}`;
}

export const PRESET_LABELS: Record<JumpPreset, string> = {
  tabletop: "Tabletop",
  double: "Double",
  triple: "Triple",
  "step-up": "Step-up",
  "step-down": "Step-down",
  whoops: "Whoops",
  custom: "Own profile",
};

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
  return j.name ?? `${PRESET_LABELS[j.preset]} (${j.sectionId})`;
}

export type VerdictKind = "set-up" | "straight" | "cannot-clear";

/** The verdict kind at a skill level (cannot-clear stands apart: nobody should try it). */
export function verdictKind(j: JumpAnalysis, skill: SkillLevel): VerdictKind {
  const v = j.verdicts[skill];
  return v.reason === "cannot-clear" ? "cannot-clear" : v.verdict;
}

export const VERDICT_WORDS: Record<VerdictKind, string> = {
  "set-up": "Set up in the air",
  straight: "Take it straight",
  "cannot-clear": "Cannot clear",
};
