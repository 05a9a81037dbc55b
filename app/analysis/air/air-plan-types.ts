/**
 * Input and result of the mid-air set-up plan (air-plan.ts). SI units and radians.
 */
import type { AttitudeCar } from "./attitude";
import type { TradeOffPoint } from "./air-plan-joint";
import type { PitchPulse, PulseLimits } from "./air-plan-pulse";
import type { PlanValue } from "./air-plan-value";
import type { SkillSigmas, SwitchWindow } from "./air-plan-robustness";
import type { ErrorSource } from "../words";

export type TurnSide = "left" | "right";

export interface AirPlanInput {
  car: AttitudeCar & PulseLimits & { wheelbase?: number };
  /** Takeoff speed, m/s. */
  speed: number;
  /** Time in the air, s. */
  airtime: number;
  /** Side of the turn the car lands into. */
  turn: TurnSide;
  /** Largest acceptable |roll| at touchdown, rad (default 5 deg). */
  rollToleranceRad?: number;
  /** Largest acceptable pitch error at touchdown when a pitch change is asked for, rad (default 10 deg). */
  pitchToleranceRad?: number;
  /** Most yaw wanted, rad (default and ceiling 45 deg). */
  maxYawRad?: number;
  /** The turn's angle, rad: the nose is never turned further (default: no limit below 45 deg). */
  turnAngleRad?: number;
  /** Pitch change the flight should supply, rad, nose up positive (landing slope minus face angle). */
  pitchChangeRad?: number;
  /**
   * The car's pitch at takeoff (the face angle), rad, nose up positive. With it every angle of
   * the plan is measured in the world (yaw about the vertical, pitch above the horizontal);
   * without it, relative to the takeoff attitude (default 0).
   */
  takeoffPitchRad?: number;
  /** Change of airtime per m/s of takeoff speed, s per m/s (default airtime / speed: a flight landing at lip height). */
  airtimePerSpeed?: number;
  /**
   * What a turn of the nose is worth, so the plan can turn less when that lands clean more often:
   * seconds saved per rad of yaw, time lost to a failed landing, smallest worthwhile yaw. Without
   * it the plan turns the nose as far as is useful.
   */
  value?: PlanValue;
  /** Skill level the plan's amounts are chosen for when `value` is given (default "expert"). */
  rankFor?: keyof SkillSigmas;
  /** Monte Carlo seed (default 1). */
  seed?: number;
  /** Timing error per skill level, s (default 60 / 35 / 15 ms). */
  skillSigmas?: SkillSigmas;
  /** Takeoff speed spread per skill level, m/s (default 0.3 / 0.15 / 0.05). */
  speedSigmas?: SkillSigmas;
}

/**
 * Why no plan is offered:
 * - "no-wheel-spin": the front wheels do not spin, so steering cannot turn the car;
 * - "not-enough-airtime": no room for a steering phase between the rear wheels leaving the lip
 *   and straightening the wheels before touchdown;
 * - "no-useful-yaw": no steering turns the nose toward the turn;
 * - "cannot-land-flat": no steering that turns the nose also lands the car flat;
 * - "levelling-costs-turn": the pulse that levels the car leaves no useful turn, though the car
 *   could turn without it (see `withoutLevelling`).
 */
export type PlanInfeasibleReason =
  "no-wheel-spin" | "not-enough-airtime" | "no-useful-yaw" | "cannot-land-flat" | "levelling-costs-turn";

/** What turning without the pitch change would give: a plan in its own right, and what it gives up. */
export interface UnlevelledPlan {
  /** Steering targets [t s, angle rad] (no pulse). */
  steering: Array<[number, number]>;
  /** Landing attitude, rad, in the plan's frame. */
  yawRad: number;
  pitchRad: number;
  rollRad: number;
}

export interface AirPlan {
  feasible: boolean;
  reason: PlanInfeasibleReason | null;
  /** Steering targets [t s, angle rad], positive = left; the form `simulateAttitude` reads. */
  steering: Array<[number, number]>;
  /** Driven-wheel acceleration [t s, rad/s^2] for the pitch pulse; the form `simulateAttitude` reads. */
  rearWheelAccel: Array<[number, number]>;
  /** Landing attitude the plan gives (full model, 1 ms steps), rad, in the plan's frame. */
  yawRad: number;
  pitchRad: number;
  rollRad: number;
  /** Yaw the search aimed for, rad (signed: positive = nose left). */
  targetYawRad: number;
  /** Pitch change asked for, rad (0 when none was given). */
  pitchChangeRad: number;
  /** Pitch change the plan aims for, rad: the one asked for, or the most the car can give. */
  pitchAimRad: number;
  /** Pitch at takeoff the angles are measured from, rad (0: relative to the takeoff attitude). */
  takeoffPitchRad: number;
  pitchPulse: PitchPulse;
  /** Each steering switch with how far it may move, ms. */
  switches: SwitchWindow[];
  /** The pulse's press and release with how far each may move, ms (empty without a pulse). */
  pulseSwitches: SwitchWindow[];
  /** The tightest switch's whole window (early + late), steering and pulse, ms. */
  timingWindowMs: number;
  /** Share of clean landings with every error of the driver. */
  successRate: SkillSigmas;
  /** The same with one source of error alone (steering timing, pulse timing, takeoff speed). */
  successAlone: Record<ErrorSource, SkillSigmas>;
  /** The error that spoils most landings at each level (null when none spoils any). */
  mainError: Record<keyof SkillSigmas, ErrorSource | null>;
  rollToleranceRad: number;
  /** Pitch tolerance of a clean landing, rad; null when no pitch change was asked for. */
  pitchToleranceRad: number | null;
  /** Turning without the pitch change, when that turns the nose clearly further (else null). */
  withoutLevelling: UnlevelledPlan | null;
  /** Turn against pitch change supplied, from none to the aim (linear-guide estimates); empty when both can be had. */
  tradeOff: TradeOffPoint[];
}
