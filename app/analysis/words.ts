/**
 * The product's words for what the engine works with, each defined once: driver skill levels,
 * jump presets, surfaces, track guidance sets, the verdict kinds with their reasons, the driver's
 * errors and the ways through a whoops row. The editor, the pages, the command line and the
 * e-mails import them through `~/analysis`; the layout file format, the rule checks and the
 * verdicts are built on the same lists, so an id and its word cannot drift apart (docs/decisions/0020-product-words-once.md).
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
 * Why a jump is best taken straight (or cannot be cleared), as data; the first that applies, in
 * this order (verdict/verdict.ts decides the first ten, the analysis the last three):
 * - "no-turn": no turn starts close enough to the landing;
 * - "turn-too-gentle": the turn is gentler than the smallest worth a set-up;
 * - "not-enough-airtime": the flight is too short to steer in;
 * - "no-wheel-spin", "no-useful-yaw", "cannot-land-flat", "levelling-costs-turn": the plan's own
 *   outcome (no spin to steer with; no steering turns the nose toward the turn; none lands it flat;
 *   the pulse that levels the car leaves too little turn, though turning alone would give enough);
 * - "nose-turn-too-small": the plan turns the nose less than the smallest worth a set-up;
 * - "too-risky": the failed landings cost more than the clean ones save (expected gain <= 0);
 * - "gain-too-small": the expected gain is positive but under the smallest worth a set-up;
 * - "cannot-clear": the approach is too short to reach the landing;
 * - "flown-over": another jump's flight passes over this jump's lip (the car never touches it);
 * - "whoops": a whoops row, skimmed, jumped through or rolled (the way through: WHOOPS_WORDS).
 */
export type JumpReason =
  | "no-turn"
  | "turn-too-gentle"
  | "not-enough-airtime"
  | "no-wheel-spin"
  | "no-useful-yaw"
  | "cannot-land-flat"
  | "levelling-costs-turn"
  | "nose-turn-too-small"
  | "too-risky"
  | "gain-too-small"
  | "cannot-clear"
  | "flown-over"
  | "whoops";

/**
 * Each reason in a few plain words, shown after the verdict's word ("flown-over" also names the
 * other jump, "whoops" the way through).
 */
export const REASON_TEXT: Record<JumpReason, string> = {
  "no-turn": "no turn at the landing",
  "turn-too-gentle": "turn too gentle",
  "not-enough-airtime": "not enough airtime",
  "no-wheel-spin": "no wheel spin to steer with",
  "no-useful-yaw": "no steering turns the nose",
  "cannot-land-flat": "no steering lands it flat",
  "levelling-costs-turn": "levelling the car costs the turn",
  "nose-turn-too-small": "the nose turns too little",
  "too-risky": "the gain is smaller than the risk",
  "gain-too-small": "the gain is too small",
  "cannot-clear": "the approach is too short",
  "flown-over": "flown over",
  whoops: "whoops row",
};

/** The kind of a verdict: its own, except that a jump the approach cannot clear stands apart. */
export function verdictKind(v: { verdict: "set-up" | "straight"; reason: JumpReason | null }): VerdictKind {
  return v.reason === "cannot-clear" ? "cannot-clear" : v.verdict;
}

// The driver's errors ---------------------------------------------------------------------------

/**
 * The driver's errors a set-up's success rate samples: the timing of the steering switches, the
 * timing of the brake or throttle pulse, and the takeoff speed (docs/decisions/0111).
 */
export const ERROR_SOURCES = ["steering", "pulse", "speed"] as const;
export type ErrorSource = (typeof ERROR_SOURCES)[number];

/** The driver's errors as the pages name them. */
export const ERROR_WORDS: Record<ErrorSource, string> = {
  steering: "the timing of the steering",
  pulse: "the timing of the brake or throttle",
  speed: "the takeoff speed (it sets the airtime)",
};

// Whoops ---------------------------------------------------------------------------------------

/** Ways through a whoops row, fastest first (docs/decisions/0112). */
export const WHOOPS_TECHNIQUES = ["skim", "triples", "doubles", "roll"] as const;
export type WhoopsTechnique = (typeof WHOOPS_TECHNIQUES)[number];

/** Ways through a whoops row in words. */
export const WHOOPS_WORDS: Record<WhoopsTechnique, string> = {
  skim: "skim over the tops",
  triples: "jump through in triples",
  doubles: "jump through in doubles",
  roll: "roll through bump by bump",
};
