/**
 * Pitch and yaw planned together (engine.md section 5, docs/decisions/0110): the brake or
 * throttle pulse (start, strength, length) is searched together with the steering. Each pulse
 * the car can give is tried on the linear guide (air-plan-linear.ts), which knows how the pulse
 * changes the wheels' spin and the pitching that follows; the steering search on that guide
 * gives the turn that pulse leaves. The plan that levels the car (lands at the wanted pitch, or
 * as near as the car allows) and turns the nose furthest wins, the one least sensitive to the
 * driver's timing breaking near-ties. The same search without the pulse gives what turning
 * alone would give, and a few pulses sized for part of the pitch change give the trade-off
 * between landing attitude and turn.
 */
import type { AttitudeCar } from "./attitude";
import { compileWheel } from "./attitude-inputs";
import { buildLinearGuide, type LinearGuide } from "./air-plan-linear";
import {
  drivenSpinInertia,
  noPulse,
  pitchPulse,
  pulseCandidates,
  pulseTimeline,
  type PitchPulse,
  type PulseLimits,
} from "./air-plan-pulse";
import { searchBlocks, type BlockPlan, type SearchOptions } from "./air-plan-search";
import { normalCdf } from "../math/vec";

export interface JointInput {
  car: AttitudeCar & PulseLimits;
  speed: number;
  airtime: number;
  /** Car's pitch at takeoff, rad (nose up positive). */
  takeoffPitchRad: number;
  /** Pitch change wanted, rad (0: no pulse). */
  pitchChangeRad: number;
  /** Pitch error still counted as level, rad. */
  pitchTolRad: number;
  /** The steering search's options (switch window, lock, side, yaw cap, roll tolerance, sigma). */
  search: SearchOptions;
}

/** One pulse with the best steering the guide finds for it. */
export interface JointCandidate {
  pulse: PitchPulse;
  guide: LinearGuide;
  /** Best steering plan on the guide (full grid for the chosen one), or null. */
  plan: BlockPlan | null;
  /** Guide's yaw toward the turn, rad (0 without a plan). */
  yaw: number;
  /** Pitch change of the flight with this pulse and no steering, rad. */
  pitchChange: number;
  /** Estimated share of clean landings at the ranking sigma: steering and pulse timing. */
  robustness: number;
}

/** A point of the trade-off: part of the pitch change supplied and the turn that leaves. */
export interface TradeOffPoint {
  /** Pitch change supplied, rad (nose up positive). */
  pitchChangeRad: number;
  /** Yaw toward the turn the guide finds with it, rad (>= 0). */
  yawRad: number;
}

export interface JointResult {
  /** Pitch change the plan aims for, rad: the wanted one, or the nearest the car can give. */
  aimRad: number;
  /** The level plans, most robust first (coarse search: see `refineSearch`). */
  ranked: JointCandidate[];
  /** The same search without any pulse. */
  free: JointCandidate;
  /** Turn against pitch supplied (guide estimates: none, half, the aim); empty when both can be had. */
  tradeOff: TradeOffPoint[];
}

const DEG = Math.PI / 180;
/** Starts tried, as shares of the time from the first switch to touchdown. */
const START_SHARES = [0, 0.25, 0.5, 0.7];
/** Grid of the quick steering search per pulse. */
const SCREEN_GRID = 12;

function guideFor(input: JointInput, pulse: PitchPulse): LinearGuide {
  const { car, speed, airtime } = input;
  const wheel = compileWheel(
    pulseTimeline(pulse),
    speed / car.rearWheel.radius,
    car.topSpeed ? Math.max(speed, car.topSpeed) / car.rearWheel.radius : Infinity,
  );
  return buildLinearGuide(car, speed, airtime, wheel, input.takeoffPitchRad);
}

/** Share of landings within the pitch tolerance when each pulse edge moves by N(0, sigma). */
export function pulseRobustness(input: JointInput, p: PitchPulse, sigma = input.search.sigma): number {
  if (p.kind === "none") return 1;
  const { car, airtime: T } = input;
  const k = Math.abs((drivenSpinInertia(car) * p.wheelAccel) / car.inertia[1]);
  const onEdge = k * (T - p.start);
  // A brake that stops the wheels is not affected by a late release.
  const offEdge = k * (T - p.start - p.duration) * (p.stopsWheels ? Math.SQRT1_2 : 1);
  const sd = sigma * Math.hypot(onEdge, offEdge);
  if (sd < 1e-12) return 1;
  return 2 * normalCdf(input.pitchTolRad / sd) - 1;
}

function candidate(input: JointInput, pulse: PitchPulse, maxGrid: number): JointCandidate {
  const guide = guideFor(input, pulse);
  const plan = searchBlocks(guide, { ...input.search, maxGrid });
  const yaw = plan ? Math.min(plan.yaw, input.search.yawCap) : 0;
  const robustness = (plan?.success ?? 0) * pulseRobustness(input, pulse);
  return { pulse, guide, plan, yaw, pitchChange: guide.pitchChange, robustness };
}

function starts(input: JointInput): number[] {
  const t0 = input.search.t0;
  return START_SHARES.map((f) => t0 + f * (input.airtime - t0));
}

/**
 * The candidate re-searched on the full grid of switch times (the screening uses a coarse one).
 */
export function refineSearch(input: JointInput, c: JointCandidate): JointCandidate {
  const plan = searchBlocks(c.guide, input.search);
  const yaw = plan ? Math.min(plan.yaw, input.search.yawCap) : 0;
  return { ...c, plan, yaw, robustness: (plan?.success ?? 0) * pulseRobustness(input, c.pulse) };
}

/**
 * Searches pulse and steering together on a coarse grid of switch times.
 * @returns the level plans ranked (re-search each with `refineSearch` before use), the free plan
 *   and, when levelling costs turn, the trade-off between them.
 */
export function searchJoint(input: JointInput): JointResult {
  const t0 = input.search.t0;
  const free = candidate(input, noPulse(t0), SCREEN_GRID);
  const wanted = input.pitchChangeRad;
  const pulses = pulseCandidates(input.car, input.speed, input.airtime, wanted, starts(input));
  if (pulses.length === 0) return { aimRad: 0, ranked: [free], free, tradeOff: [] };
  const screened = pulses.map((p) => candidate(input, p, SCREEN_GRID));
  // Aim: the wanted change when some pulse gives it all, else the most any pulse gives.
  const reach = (c: JointCandidate) => c.pitchChange * Math.sign(wanted);
  const most = Math.max(...screened.map(reach));
  const aim = screened.some((c) => !c.pulse.limited) ? wanted : Math.sign(wanted) * most;
  const level = screened.filter((c) => Math.abs(c.pitchChange - aim) <= 0.5 * DEG);
  const bestYaw = Math.max(0, ...level.map((c) => c.yaw));
  const goal = bestYaw - Math.max(1 * DEG, 0.1 * bestYaw);
  const ranked = level.filter((c) => c.plan && c.yaw >= goal).sort((a, b) => b.robustness - a.robustness);
  if (ranked.length === 0 && level.length) ranked.push(level[0]);
  const tradeOff: TradeOffPoint[] = [];
  const levelYaw = ranked[0]?.yaw ?? 0;
  if (free.yaw > levelYaw + Math.max(2 * DEG, 0.25 * levelYaw)) {
    // Half the pitch change with the chosen strength at each start: the middle of the trade-off.
    const strength = ranked[0]?.pulse.strength ?? 1;
    let half = 0;
    for (const start of starts(input)) {
      const p = pitchPulse(input.car, input.speed, input.airtime, 0.5 * aim, start, strength);
      if (p.kind === "none" || p.limited || p.start + p.duration >= input.airtime) continue;
      half = Math.max(half, candidate(input, p, SCREEN_GRID).yaw);
    }
    tradeOff.push(
      { pitchChangeRad: 0, yawRad: free.yaw },
      { pitchChangeRad: 0.5 * aim, yawRad: half },
      { pitchChangeRad: aim, yawRad: levelYaw },
    );
  }
  return { aimRad: aim, ranked, free, tradeOff };
}
