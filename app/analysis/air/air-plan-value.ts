/**
 * How far to turn the nose (docs/decisions/0110): a set-up that lands yawed rolls at touchdown
 * (air-plan-linear.ts `rollRatePerYaw`), so a spread of airtime turns into a spread of landing
 * roll, and the steering's timing errors grow with its amounts. Turning less saves less but lands
 * clean more often. When the caller says what a turn of the nose is worth, the plan's amounts are
 * scaled to the best expected gain at the level it is ranked for, on the linear guide's estimates.
 */
import { tableAt, type LinearGuide } from "./air-plan-linear";
import { guideLanding, type BlockPlan } from "./air-plan-search";
import { normalCdf } from "../math/vec";

export interface PlanValue {
  /** Time saved per rad of yaw at touchdown: the turn's radius over its entry speed, s/rad. */
  secondsPerRad: number;
  /** Time lost to a failed landing, s. */
  failCost: number;
  /** Smallest yaw worth a set-up, rad: the plan does not scale below it. */
  minYawRad?: number;
}

export interface ScaleInputs {
  value: PlanValue;
  /** Timing error and takeoff-speed spread of the level the plan is ranked for, s and m/s. */
  sigma: number;
  speedSigma: number;
  /**
   * Shift of the landing's timing per m/s of takeoff speed, s per m/s: the airtime's change plus
   * the wheels' faster spin, which runs the car's nutation ahead as a longer flight would
   * (airtime / speed).
   */
  airtimePerSpeed: number;
  rollTol: number;
  /** Share of landings the pulse's timing leaves within the pitch tolerance. */
  pitchOk: number;
  yawCap: number;
}

/** Scales tried, largest first. */
const SCALES = [1, 0.85, 0.7, 0.55, 0.45, 0.35, 0.25];

/** Estimated expected gain (s per pass) of the plan scaled by `s`. */
function gainAt(g: LinearGuide, p: BlockPlan, k: ScaleInputs, s: number): number {
  const yaw = Math.min(p.yaw, k.yawCap);
  const edges = p.single ? [p.a, p.m] : [p.a, p.m, p.b];
  const jumps = p.single ? [-p.u1, p.u1] : [-p.u1, p.u1 - p.u2, p.u2];
  let varT = 0;
  for (let i = 0; i < edges.length; i++) {
    const e = jumps[i] * tableAt(g, g.kerRoll, edges[i]) * k.sigma;
    varT += e * e;
  }
  const sdV = Math.abs(g.rollRatePerYaw * yaw) * k.airtimePerSpeed * k.speedSigma;
  const out = [0, 0];
  guideLanding(g, p, out);
  const mean = s * out[0];
  const sd = s * Math.sqrt(varT + sdV * sdV);
  const roll =
    sd < 1e-12
      ? Math.abs(mean) <= k.rollTol
        ? 1
        : 0
      : normalCdf((k.rollTol - mean) / sd) - normalCdf((-k.rollTol - mean) / sd);
  const ok = roll * k.pitchOk;
  return ok * s * yaw * k.value.secondsPerRad - (1 - ok) * k.value.failCost;
}

/**
 * The scale (0..1] of the plan's steering amounts with the best estimated expected gain, never
 * turning the nose less than the smallest worthwhile yaw (1 when even the full plan turns less).
 */
export function bestScale(g: LinearGuide, p: BlockPlan, k: ScaleInputs): number {
  const yaw = Math.min(p.yaw, k.yawCap);
  const floor = k.value.minYawRad ?? 0;
  let best = 1;
  let bestGain = gainAt(g, p, k, 1);
  for (const s of SCALES) {
    if (s === 1 || s * yaw < floor) continue;
    const gain = gainAt(g, p, k, s);
    if (gain > bestGain + 1e-9) {
      best = s;
      bestGain = gain;
    }
  }
  return best;
}

/** The plan with its amounts (and the yaw it aims for) scaled by `s`. */
export function scaled(p: BlockPlan, s: number, yawCap: number): BlockPlan {
  return s === 1 ? p : { ...p, u1: p.u1 * s, u2: p.u2 * s, yaw: s * Math.min(p.yaw, yawCap) };
}
