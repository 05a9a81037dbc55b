/**
 * The product's words for what the engine works with, each defined once: driver skill levels,
 * jump presets, surfaces, track guidance sets and the verdict kinds with their reasons. The
 * editor, the pages, the command line and the e-mails import them through `~/analysis`; the
 * layout file format, the rule checks and the verdicts are built on the same lists, so an id and
 * its word cannot drift apart (docs/decisions/0020-product-words-once.md).
 *
 * Plain data, no imports: every part of the engine may depend on this file.
 */

/** "a, b or c": words joined for a sentence. */
export function wordList(words: readonly string[]): string {
  return words.length < 2 ? words.join("") : `${words.slice(0, -1).join(", ")} or ${words.at(-1)}`;
}

/** `"a", "b" or "c"`: the allowed values, for messages that name a field. */
export function quotedList(values: readonly string[]): string {
  return wordList(values.map((v) => `"${v}"`));
}

// Driver skill levels --------------------------------------------------------------------------

/** Driver skill levels the verdicts are given for, least skilled first. */
export const SKILL_LEVELS = ["novice", "club", "expert"] as const;
export type SkillLevel = (typeof SKILL_LEVELS)[number];

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

// Jump presets ---------------------------------------------------------------------------------

/** The jump presets of the layout file format, in menu order; "custom" is the free profile. */
export const JUMP_PRESETS = [
  "tabletop",
  "double",
  "triple",
  "step-up",
  "step-down",
  "whoops",
  "custom",
] as const;
export type JumpPreset = (typeof JUMP_PRESETS)[number];

/** The trade's names of the presets, for menus, panels, tables and pages. */
export const JUMP_PRESET_LABELS: Record<JumpPreset, string> = {
  tabletop: "Tabletop",
  double: "Double",
  triple: "Triple",
  "step-up": "Step-up",
  "step-down": "Step-down",
  whoops: "Whoops",
  custom: "Free profile",
};

// Surfaces -------------------------------------------------------------------------------------

/** The ground a layout is built on. */
export const SURFACES = ["dirt", "clay", "turf", "carpet"] as const;
export type Surface = (typeof SURFACES)[number];

export const SURFACE_LABELS: Record<Surface, string> = {
  dirt: "Dirt",
  clay: "Clay",
  turf: "Turf",
  carpet: "Carpet",
};

// Track guidance sets --------------------------------------------------------------------------

/** The sets of track guidance the rule checks can use (their values: track/rules.ts). */
export const GUIDANCE_SET_IDS = ["club", "national"] as const;
export type GuidanceSetId = (typeof GUIDANCE_SET_IDS)[number];

export const GUIDANCE_SET_LABELS: Record<GuidanceSetId, string> = {
  club: "Club track guidance",
  national: "National-level track guidance",
};

// Verdicts -------------------------------------------------------------------------------------

/**
 * What a reader is told to do at a jump: set the car up in the air for the turn, take it
 * straight, or (a kind of its own, because nobody should try it) the approach cannot clear it.
 */
export const VERDICT_KINDS = ["set-up", "straight", "cannot-clear"] as const;
export type VerdictKind = (typeof VERDICT_KINDS)[number];

export const VERDICT_WORDS: Record<VerdictKind, string> = {
  "set-up": "Set up in the air",
  straight: "Take it straight",
  "cannot-clear": "Cannot clear",
};

/**
 * Why a jump is best taken straight (or cannot be cleared):
 * - "no-turn": no turn starts close enough to the landing;
 * - "turn-too-gentle": the turn after the landing is too gentle to gain anything;
 * - "not-enough-airtime": the car is not in the air long enough to turn it;
 * - "too-risky": at this skill level a set-up costs more than it saves;
 * - "cannot-clear": the approach is too short to reach the landing;
 * - "flown-over": another jump's flight passes over this jump's lip (the car never touches it).
 */
export type JumpReason =
  "no-turn" | "turn-too-gentle" | "not-enough-airtime" | "too-risky" | "cannot-clear" | "flown-over";

/** Each reason in a few plain words, shown after the verdict's word ("flown-over" also names the other jump). */
export const REASON_TEXT: Record<JumpReason, string> = {
  "no-turn": "no turn at the landing",
  "turn-too-gentle": "turn too gentle",
  "not-enough-airtime": "not enough airtime",
  "too-risky": "too risky at this skill",
  "cannot-clear": "the approach is too short",
  "flown-over": "flown over",
};

/** The kind of a verdict: its own, except that a jump the approach cannot clear stands apart. */
export function verdictKind(v: { verdict: "set-up" | "straight"; reason: JumpReason | null }): VerdictKind {
  return v.reason === "cannot-clear" ? "cannot-clear" : v.verdict;
}
