/**
 * Result types of the whole-layout analysis (`analyseLayout`, layout-analysis.ts) and of the
 * per-jump analysis (jump-analysis.ts).
 *
 * The result is a report for people (API responses, pages, the command line): plain
 * JSON-serialisable data, no typed arrays. Units: SI (m, s, m/s, kg) everywhere; angles are in
 * degrees and every angle field ends in `Deg` (docs/decisions/0400). Every number is a model
 * estimate, not a safety certification.
 */
import type { ErrorSource, JumpPreset, JumpReason, SkillLevel, WhoopsTechnique } from "../words";
import type { PlanInfeasibleReason } from "../air/air-plan";
import type { PitchPulse } from "../air/air-plan-pulse";
import type { SwitchWindow } from "../air/air-plan-robustness";
import type { RuleReport } from "../track/rules";
import type { MarshalPlan } from "../marshal/marshal-types";

/** The verdict for one jump, one car class and one skill level. */
export interface SkillVerdict {
  skill: SkillLevel;
  verdict: "set-up" | "straight";
  /** Null for "set-up". */
  reason: JumpReason | null;
  /** Short reason in plain words, e.g. "no turn at the landing"; for a set-up, what to do ("land with the nose 25° left"). */
  reasonText: string;
  /** One plain sentence for drivers. */
  text: string;
  /** Share of clean landings when trying the set-up at this skill's timing error, 0..1 (0 without a plan). */
  successRate: number;
  /** Track length saved by a clean set-up, m (0 without a plan). */
  trackLengthSaved: number;
  /** Time saved by a clean set-up, s. */
  timeSaved: number;
  /** successRate x timeSaved - (1 - successRate) x time lost to a failed landing, s per pass. */
  expectedGain: number;
  /** Turn of the nose at touchdown the plan gives, deg (0 without a plan). */
  noseTurnDeg: number;
  /** The values that decided it: time lost to a failed landing (s), smallest worthwhile gain (s per pass) and turn of the nose (deg). */
  failCost: number;
  minGainPerPass: number;
  minNoseTurnDeg: number;
  /** The driver's error that spoils most landings at this level (null without a plan or when none does). */
  mainError: ErrorSource | null;
}

/** The turn a jump lands into: the next turn after touchdown, within the look-ahead distance. */
export interface LandingTurn {
  /** Id and index of the turn's first section. */
  sectionId: string;
  sectionIndex: number;
  /** Along the lap from touchdown to the turn's start, m (0 when the car touches down in the turn). */
  distance: number;
  /** Look-ahead distance used: landing speed x look-ahead time, m. */
  lookahead: number;
  side: "left" | "right";
  /** Angle of the corner, deg (consecutive turn sections to the same side count as one corner). */
  angleDeg: number;
  /** Centre-line radius of the turn's first section, m. */
  radius: number;
  /** Lap-model speed at the turn's entry, m/s. */
  entrySpeed: number;
}

/** Turning without the pitch change: what it would give and what it gives up. */
export interface JumpUnlevelledPlan {
  steering: [number, number][];
  yawDeg: number;
  /** Landing pitch, deg (same frame as `JumpPlan.pitchDeg`). */
  pitchDeg: number;
  rollDeg: number;
}

/**
 * The mid-air set-up plan for a jump that lands into a turn: one plan per jump and class, shared
 * by the skill levels (each has its own success rate and verdict).
 */
export interface JumpPlan {
  feasible: boolean;
  reason: PlanInfeasibleReason | null;
  /** Steering targets [t s, angle deg], positive = wheels left. */
  steering: [number, number][];
  /** Driven-wheel angular acceleration [t s, rad/s^2] (the pitch pulse). */
  rearWheelAccel: [number, number][];
  /**
   * Landing attitude the plan gives, deg, in the world (yaw about the vertical, positive = nose
   * left; pitch above the horizontal, positive = nose up; roll positive = right side down).
   */
  yawDeg: number;
  pitchDeg: number;
  rollDeg: number;
  targetYawDeg: number;
  /** Pitch at takeoff (the face angle), deg. */
  takeoffPitchDeg: number;
  /** Pitch change the flight should supply (landing slope minus face angle), deg. */
  pitchChangeDeg: number;
  /** Pitch change the plan aims for: the one wanted, or the most the car can give, deg. */
  pitchAimDeg: number;
  pitchPulse: PitchPulse;
  switches: SwitchWindow[];
  /** The pulse's press and release with their timing windows (empty without a pulse). */
  pulseSwitches: SwitchWindow[];
  /** Tightest switch's whole timing window (steering and pulse), ms. */
  timingWindowMs: number;
  /** Share of clean landings with all of the driver's errors (steering and pulse timing, takeoff speed). */
  successRate: Record<SkillLevel, number>;
  /** The same with one source of error alone. */
  successAlone: Record<ErrorSource, Record<SkillLevel, number>>;
  /** The error that spoils most landings at each level. */
  mainError: Record<SkillLevel, ErrorSource | null>;
  rollToleranceDeg: number;
  /** Pitch tolerance of a clean landing, deg. */
  pitchToleranceDeg: number | null;
  /** Takeoff speed spread per skill level used for the success rate, m/s. */
  speedSigmas: Record<SkillLevel, number>;
  /** Turning without the pitch change, when it turns the nose clearly further (else null). */
  withoutLevelling: JumpUnlevelledPlan | null;
  /** Turn against pitch change supplied, deg (linear-guide estimates; empty when both can be had). */
  tradeOff: { pitchChangeDeg: number; yawDeg: number }[];
}

/** What a whoops row asks of a car (flight/whoops.ts): speeds in m/s, times s, heights m. */
export interface JumpWhoops {
  count: number;
  spacing: number;
  bumpHeight: number;
  skimSpeed: number;
  doubles: { jumps: number; window: { min: number; max: number } | null; sweetSpotSpeed: number | null };
  triples: {
    jumps: number;
    window: { min: number; max: number } | null;
    sweetSpotSpeed: number | null;
  } | null;
  /** The fastest way the approach allows, its speed, and one hop's airtime and equivalent fall height. */
  technique: WhoopsTechnique;
  speed: number;
  airtime: number;
  equivalentFallHeight: number;
}

/** Touchdown of the flight at the planned takeoff speed. */
export interface JumpLanding {
  /** Along the jump section, m (may pass the section's end), and along the lap, m. */
  d: number;
  s: number;
  /** Plan position, m. */
  x: number;
  y: number;
  /** Height of the ground there, m. */
  z: number;
  /** Speed at touchdown, m/s. */
  speed: number;
  /** Speed along the ground just after touchdown (the lap model's), m/s. */
  rollOutSpeed: number;
  flightPathDeg: number;
  surfaceSlopeDeg: number;
  /** Speed normal to the ground, m/s. */
  normalSpeed: number;
  /** Where it lands relative to the landing ramp. */
  landedOn: "short" | "ramp" | "overshoot";
}

/** One jump analysed for one car class. */
export interface JumpAnalysis {
  sectionId: string;
  sectionIndex: number;
  name: string | null;
  preset: JumpPreset;
  /** The lip: along the section (d) and the lap (s), plan position and height, m. */
  lip: { d: number; s: number; x: number; y: number; z: number };
  /** Face angle at the lip, deg. */
  faceAngleDeg: number;
  /**
   * Planned takeoff speed: the speed that lands on the sweet spot with air drag, or the most the
   * approach allows if that is lower (rounded to 0.01 m/s; 0 when flown over), m/s. The lap time uses the lap
   * model's drag-free speeds, a few percent lower (docs/decisions/0401).
   */
  takeoffSpeed: number;
  /** Highest takeoff speed the approach allows, m/s. */
  approachMaxSpeed: number;
  /** Speed window with air drag: lowest speed that reaches the landing ramp, highest that stays on it, m/s. */
  window: { min: number; max: number; maxIsSearchLimit: boolean } | null;
  /** Takeoff speed that lands on the sweet spot (a third of the way down the ramp), with drag, m/s. */
  sweetSpotSpeed: number | null;
  /** True when the approach is too short to reach the landing ramp (with drag). */
  cannotClear: boolean;
  /** Id of the jump whose flight passes over this one's lip, else null. */
  flownOverBy: string | null;
  /** Time in the air at the planned speed, s (0 when flown over). */
  airtime: number;
  /** Highest point of the flight: along the section and height, m; time s. */
  apex: { d: number; z: number; t: number } | null;
  landing: JumpLanding | null;
  /** Equivalent fall height of the landing, m (Levy et al. 2015 measure; for a whoops row, one hop of the chosen way). */
  equivalentFallHeight: number;
  /** The turn it lands into, or null. */
  turn: LandingTurn | null;
  /** Along the lap from touchdown to the next turn's start, m, whether or not it lands into it; null on a lap without turns. */
  nextTurnDistance: number | null;
  /** The set-up plan (only for a jump that lands into a turn sharp enough, with airtime to spare). */
  plan: JumpPlan | null;
  /** For a whoops row: the ways through it and the one this car's approach allows (else null). */
  whoops: JumpWhoops | null;
  /** Verdict per skill level. */
  verdicts: Record<SkillLevel, SkillVerdict>;
  /** Verdict at the analysis's chosen skill level. */
  verdict: SkillVerdict;
}

/** The lap for one car class. */
export interface ClassAnalysis {
  classId: string;
  label: string;
  /** Lap time, s. */
  lapTime: number;
  speed: { min: number; max: number; mean: number };
  /** Speed at each point of `LayoutAnalysis.line`, m/s. */
  lineSpeed: number[];
  /** Turns tighter than the car can steer: radius and the car's minimum radius, m. */
  tightTurns: { sectionId: string; radius: number; minRadius: number }[];
  jumps: JumpAnalysis[];
  /** Jumps whose approach is too short to clear them. */
  cannotClear: string[];
}

export interface LayoutAnalysis {
  name: string;
  /** Lap length along the centre line in plan, m. */
  lapLength: number;
  /** How far the last section misses the start: gap m, heading deg. */
  closure: { gap: number; headingDeg: number };
  trackWidth: number;
  /** Chosen skill level for `JumpAnalysis.verdict`. */
  skill: SkillLevel;
  /** The centre line downsampled to about every 0.5 m (flat arrays of equal length). */
  line: { x: number[]; y: number[]; s: number[]; sectionIndex: number[] };
  /** Lanes closer than the track width plus the margin: this lane's closest point a, the other lane's b, m. */
  laneConflicts: { fromS: number; toS: number; a: [number, number]; b: [number, number]; distance: number }[];
  /** Stretches with an edge outside the site boundary (null without a boundary). */
  outsideBoundary: { fromS: number; toS: number; worstDistance: number }[] | null;
  /** Farthest track edge point from the driver stand (null without a stand). */
  farthestFromStand: { distance: number; s: number; x: number; y: number } | null;
  /** Stretches hidden from the driver stand (null without a stand). */
  hiddenFromStand: { fromS: number; toS: number; length: number; blockedBy: string }[] | null;
  startStraight: { length: number; sectionIds: string[] };
  rules: RuleReport;
  classes: ClassAnalysis[];
  /**
   * The marshal risk over every class (marshal/marshal-plan.ts), when asked for with
   * `options.marshal`: zones, hotspots and the layout's own marshal points with warnings; no
   * suggested points (ask `marshalPlan` for those). Null otherwise.
   */
  risk: MarshalPlan | null;
  /** Plain-words caveat shown with every analysis. */
  note: string;
}
