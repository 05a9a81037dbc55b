/**
 * Track length saved by a mid-air set-up, the time it saves, the expected gain at a skill level,
 * and the verdict for a jump (engine.md section 6). SI units and radians.
 */
import type { JumpReason } from "../words";

/** Default time lost to a failed landing: a roll-over that needs a marshal, s (an estimate). */
export const DEFAULT_FAIL_COST_S = 3;
/** Default look-ahead for "lands into a turn": distance covered in this time at landing speed, s. */
export const DEFAULT_TURN_LOOKAHEAD_S = 0.5;
/** Turns gentler than this gain too little from a set-up to be worth one, rad (20 deg, an estimate). */
export const DEFAULT_MIN_TURN_ANGLE = (20 * Math.PI) / 180;
/** Flights shorter than this leave no time for a counter-steer and a return, s (an estimate). */
export const DEFAULT_MIN_AIRTIME_S = 0.3;
/**
 * Smallest expected gain per pass worth trying a set-up for, s (an estimate: about what a driver
 * can feel on the lap timer; a club may set its own).
 */
export const DEFAULT_MIN_GAIN_PER_PASS_S = 0.05;
/**
 * Smallest turn of the nose worth setting up for, rad (10 deg, an estimate: less is within what a
 * driver corrects on landing anyway; a club may set its own).
 */
export const DEFAULT_MIN_NOSE_TURN = (10 * Math.PI) / 180;

/** The values that decide a verdict. SI units and radians. */
export interface VerdictThresholds {
  /** Turns gentler than this get no set-up, rad. */
  minTurnAngle: number;
  /** Flights shorter than this get no set-up, s. */
  minAirtime: number;
  /** Smallest expected gain worth a set-up, s per pass. */
  minGainPerPass: number;
  /** Smallest turn of the nose worth a set-up, rad. */
  minNoseTurn: number;
  /** Time lost to a failed landing, s. */
  failCost: number;
}

/** The defaults, each an estimate (docs/decisions/0108). */
export const DEFAULT_VERDICT_THRESHOLDS: Readonly<VerdictThresholds> = Object.freeze({
  minTurnAngle: DEFAULT_MIN_TURN_ANGLE,
  minAirtime: DEFAULT_MIN_AIRTIME_S,
  minGainPerPass: DEFAULT_MIN_GAIN_PER_PASS_S,
  minNoseTurn: DEFAULT_MIN_NOSE_TURN,
  failCost: DEFAULT_FAIL_COST_S,
});

/**
 * Whether a jump lands into a turn: the next turn begins within the distance covered in
 * `lookaheadS` (default 0.5 s) at landing speed.
 * @param distanceToTurn from touchdown to the start of the next turn, m (Infinity for none)
 * @param landingSpeed m/s
 */
export function landsIntoTurn(
  distanceToTurn: number,
  landingSpeed: number,
  lookaheadS = DEFAULT_TURN_LOOKAHEAD_S,
): boolean {
  return distanceToTurn >= 0 && distanceToTurn <= landingSpeed * lookaheadS;
}

/**
 * Track length saved by landing with the nose already turned by `psi` toward the turn: the arc
 * the car would otherwise spend turning through psi, R * psi, with psi capped at the turn's angle.
 * @param radius turn radius, m
 * @param psi nose turned at touchdown, rad (its sign is ignored)
 * @param turnAngle the turn's angle, rad
 * @returns metres
 */
export function trackLengthSaved(radius: number, psi: number, turnAngle: number): number {
  return radius * Math.min(Math.abs(psi), Math.abs(turnAngle));
}

/**
 * Time saved (s): the track length saved covered at the turn-entry speed.
 * @param radius m; @param psi rad; @param turnAngle rad; @param entrySpeed m/s (> 0)
 */
export function timeSaved(radius: number, psi: number, turnAngle: number, entrySpeed: number): number {
  if (!(entrySpeed > 0)) return 0;
  return trackLengthSaved(radius, psi, turnAngle) / entrySpeed;
}

/**
 * Expected gain per pass, s: success rate x time saved - (1 - success rate) x time lost to a
 * failed landing (default 3 s).
 * @param successRate 0..1
 * @param saved time saved by a clean set-up, s
 * @param failCost time lost to a failed landing, s
 */
export function expectedGain(successRate: number, saved: number, failCost = DEFAULT_FAIL_COST_S): number {
  const p = Math.min(1, Math.max(0, successRate));
  return p * saved - (1 - p) * failCost;
}

export type JumpVerdictKind = "set-up" | "straight";

/**
 * Why a jump that might be set up for is taken straight (the reasons and their words:
 * ../words.ts; the sentences: verdict-text.ts): the first that applies, in this order: no turn,
 * turn too gentle, not enough airtime, the plan's own outcome (no wheel spin, no useful yaw,
 * cannot land flat, levelling costs the turn), nose turn too small, too risky (expected gain
 * <= 0), gain too small (under the smallest worthwhile gain). The analysis adds "cannot-clear",
 * "flown-over" and "whoops".
 */
export type StraightReason = Exclude<JumpReason, "cannot-clear" | "flown-over" | "whoops">;

export interface JumpVerdictInput {
  landsIntoTurn: boolean;
  /** The turn's angle, rad (ignored when there is no turn). */
  turnAngle: number;
  /** Time in the air, s. */
  airtime: number;
  /** Expected gain at this skill level, s per pass. */
  expectedGain: number;
  /** The plan's reason when it offers no plan (null or undefined when it does). */
  planReason?: StraightReason | null;
  /** Turn of the nose the plan gives at touchdown, rad (its sign is ignored; default: enough). */
  noseTurn?: number;
  /** Turn of the nose turning alone would give (without the pitch change), rad, when known. */
  noseTurnUnlevelled?: number | null;
  thresholds?: Partial<VerdictThresholds>;
}

export interface JumpVerdict {
  verdict: JumpVerdictKind;
  reason: StraightReason | null;
}

/**
 * The verdict for one jump at one skill level: "set-up" when it lands into a sharp enough turn,
 * the plan turns the nose far enough and the expected gain reaches the smallest worthwhile gain;
 * otherwise "straight" with the first reason that applies (see StraightReason).
 */
export function jumpVerdict(input: JumpVerdictInput): JumpVerdict {
  const t = { ...DEFAULT_VERDICT_THRESHOLDS, ...input.thresholds };
  const straight = (reason: StraightReason): JumpVerdict => ({ verdict: "straight", reason });
  if (!input.landsIntoTurn) return straight("no-turn");
  if (Math.abs(input.turnAngle) < t.minTurnAngle) return straight("turn-too-gentle");
  if (input.airtime < t.minAirtime) return straight("not-enough-airtime");
  if (input.planReason) return straight(input.planReason);
  const nose = Math.abs(input.noseTurn ?? Infinity);
  if (nose < t.minNoseTurn) {
    const alone = Math.abs(input.noseTurnUnlevelled ?? 0);
    return straight(alone >= t.minNoseTurn ? "levelling-costs-turn" : "nose-turn-too-small");
  }
  if (!(input.expectedGain > 0)) return straight("too-risky");
  if (input.expectedGain < t.minGainPerPass) return straight("gain-too-small");
  return { verdict: "set-up", reason: null };
}
