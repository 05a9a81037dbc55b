/**
 * Track length saved by a mid-air set-up, the time it saves, the expected gain at a skill level,
 * and the verdict for a jump (engine.md section 6). SI units and radians.
 */

/** Default time lost to a failed landing: a roll-over that needs a marshal, s (an estimate). */
export const DEFAULT_FAIL_COST_S = 3;
/** Default look-ahead for "lands into a turn": distance covered in this time at landing speed, s. */
export const DEFAULT_TURN_LOOKAHEAD_S = 0.5;
/** Turns gentler than this gain too little from a set-up to be worth one, rad (20 deg, an estimate). */
export const DEFAULT_MIN_TURN_ANGLE = (20 * Math.PI) / 180;
/** Flights shorter than this leave no time for a counter-steer and a return, s (an estimate). */
export const DEFAULT_MIN_AIRTIME_S = 0.3;
/** Smallest expected gain worth the effort, s per pass (an estimate). */
export const DEFAULT_GAIN_FLOOR_S = 0.02;

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

import type { JumpReason } from "../words";

export type JumpVerdictKind = "set-up" | "straight";
/** The reasons this function decides; the analysis adds "cannot-clear" and "flown-over". */
export type StraightReason = Extract<
  JumpReason,
  "no-turn" | "turn-too-gentle" | "not-enough-airtime" | "too-risky"
>;

export interface JumpVerdictInput {
  landsIntoTurn: boolean;
  /** The turn's angle, rad (ignored when there is no turn). */
  turnAngle: number;
  /** Time in the air, s. */
  airtime: number;
  /** Expected gain at this skill level, s per pass. */
  expectedGain: number;
  /** False when no set-up plan fits the flight (treated as not enough airtime). */
  planFeasible?: boolean;
  minTurnAngle?: number;
  minAirtime?: number;
  gainFloor?: number;
}

export interface JumpVerdict {
  verdict: JumpVerdictKind;
  reason: StraightReason | null;
}

/**
 * The verdict for one jump at one skill level: "set-up" when it lands into a turn and the
 * expected gain is above a small floor, otherwise "straight" with the first reason that applies
 * (no turn, turn too gentle, not enough airtime, too risky). The sentences drivers read, with
 * the numbers, are written from it by `describeVerdicts` (jump-verdicts.ts).
 */
export function jumpVerdict(input: JumpVerdictInput): JumpVerdict {
  const minTurn = input.minTurnAngle ?? DEFAULT_MIN_TURN_ANGLE;
  const minAir = input.minAirtime ?? DEFAULT_MIN_AIRTIME_S;
  const floor = input.gainFloor ?? DEFAULT_GAIN_FLOOR_S;
  const straight = (reason: StraightReason): JumpVerdict => ({ verdict: "straight", reason });
  if (!input.landsIntoTurn) return straight("no-turn");
  if (Math.abs(input.turnAngle) < minTurn) return straight("turn-too-gentle");
  if (input.airtime < minAir || input.planFeasible === false) return straight("not-enough-airtime");
  if (!(input.expectedGain > floor)) return straight("too-risky");
  return { verdict: "set-up", reason: null };
}
