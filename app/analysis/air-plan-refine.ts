/**
 * Corrects a block plan found on the linear guide with the full attitude model. For a given
 * scale of the steering amounts, one switch time is moved until the landing roll is zero
 * (bracketing secant), trying the switches in order of how strongly they steer the roll; the
 * scale is then set by a secant on the yaw so the nose comes round by the target, never past it
 * and never beyond the steering lock.
 */
import type { BlockPlan } from "./air-plan-search";
import type { AttitudeResult } from "./attitude";

/** Runs the full model for a steering timeline and wheel-acceleration timeline. */
export type PlanSim = (steering: Array<[number, number]>, accel: Array<[number, number]>, dt?: number) => AttitudeResult;

export interface RefineOptions {
  dir: number;
  lock: number;
  /** Servo rate, rad/s. */
  rate: number;
  /** Earliest switch, s. */
  t0: number;
  /** The wheels must be straight again by this time, s. */
  tLast: number;
  yawCap: number;
  /** Shortest steering phase, s. */
  minPhase: number;
  /** Secant rounds on the amounts' scale (default 4; 0 only flattens the roll). */
  scaleRounds?: number;
}

export interface Refined {
  plan: BlockPlan;
  /** Yaw aimed for, rad (toward the turn, > 0). */
  targetYaw: number;
  /** Landing pitch of the refined plan (search step), rad. */
  pitch: number;
}

const ROLL_DONE = (0.02 * Math.PI) / 180;
const YAW_DONE = (0.25 * Math.PI) / 180;

/** Steering timeline of a block plan: [t s, target rad] entries. */
export function timeline(p: BlockPlan): Array<[number, number]> {
  return p.single ? [[p.a, p.u1], [p.m, 0]] : [[p.a, p.u1], [p.m, p.u2], [p.b, 0]];
}

function fromTimes(start: BlockPlan, scale: number, t: readonly number[]): BlockPlan {
  const m = t[1];
  return { ...start, a: t[0], m, b: start.single ? m : t[2], u1: start.u1 * scale, u2: start.u2 * scale };
}

interface Outcome {
  plan: BlockPlan;
  roll: number;
  yaw: number;
  pitch: number;
}

/**
 * Refines a guide plan in the full model. Returns null when the full model gives no yaw toward
 * the turn.
 */
export function refineAmounts(sim: PlanSim, start: BlockPlan, accel: Array<[number, number]>, o: RefineOptions): Refined | null {
  const target = Math.min(start.yaw, o.yawCap);
  const biggest = Math.max(Math.abs(start.u1), Math.abs(start.u2));
  const sMax = biggest > 0 ? o.lock / biggest : 1;
  const run = (scale: number, t: readonly number[]): Outcome => {
    const plan = fromTimes(start, scale, t);
    const r = sim(timeline(plan), accel);
    return { plan, roll: r.rollRad, yaw: o.dir * r.yawRad, pitch: r.pitchRad };
  };
  const ok = (g: Outcome) => Math.abs(g.roll) < 5 * ROLL_DONE && g.yaw <= target + YAW_DONE;
  const better = (f: Outcome, best: Outcome) => {
    if (ok(f) !== ok(best)) return ok(f);
    if (ok(f)) return f.yaw > best.yaw;
    return Math.abs(f.roll) < Math.abs(best.roll);
  };
  // Secant on the amounts' scale for yaw = target, each point flattened in roll first.
  let s0 = Math.min(1, sMax);
  const memo: Memo = {};
  let f0 = flatten(run, start, s0, o, memo);
  let best = f0;
  let sPrev = 0;
  let yPrev = 0;
  for (let round = 0; round < (o.scaleRounds ?? 4); round++) {
    if (Math.abs(f0.yaw - target) < YAW_DONE || !(f0.yaw > 0)) break;
    const slope = (f0.yaw - yPrev) / (s0 - sPrev);
    let s1 = slope > 0 ? s0 + (target - f0.yaw) / slope : (s0 * target) / f0.yaw;
    s1 = Math.min(sMax, Math.max(0.05 * s0, s1));
    if (Math.abs(s1 - s0) < 1e-3) break;
    sPrev = s0;
    yPrev = f0.yaw;
    s0 = s1;
    f0 = flatten(run, f0.plan, s0, o, memo);
    if (better(f0, best)) best = f0;
  }
  if (!(best.yaw > 0)) return null;
  return { plan: { ...best.plan, yaw: best.yaw }, targetYaw: Math.min(target, best.yaw), pitch: best.pitch };
}

/** Allowed range of switch k's time, s, given the others and the amounts. */
function range(t: readonly number[], k: number, plan: BlockPlan, o: RefineOptions): [number, number] {
  const n = t.length;
  const lo = k === 0 ? o.t0 : t[k - 1] + o.minPhase;
  // The last switch must leave time to centre the wheels; the others must leave a phase after.
  const lastAmount = plan.single ? plan.u1 : plan.u2;
  const hi = k === n - 1 ? o.tLast - Math.abs(lastAmount) / o.rate : t[k + 1] - o.minPhase;
  return [lo, Math.max(lo, hi)];
}

/**
 * At amount scale `scale`, moves one switch of `from` (its times; `run` sets the amounts) until the
 * landing roll is zero, trying the switches in order of roll sensitivity.
 */
/** Switch order and roll slopes found by the first flattening, reused by later ones. */
interface Memo {
  sens?: Array<{ k: number; slope: number }>;
}

function flatten(run: (s: number, t: readonly number[]) => Outcome, from: BlockPlan, scale: number, o: RefineOptions, memo: Memo): Outcome {
  const times = from.single ? [from.a, from.m] : [from.a, from.m, from.b];
  const base = run(scale, times);
  if (Math.abs(base.roll) < ROLL_DONE) return base;
  const probe = 0.004;
  const sens = memo.sens ?? times.map((_, k) => {
    const t = times.slice();
    const [lo, hi] = range(t, k, base.plan, o);
    const step = t[k] + probe <= hi ? probe : -probe;
    if (t[k] + step < lo) return { k, slope: 0 };
    t[k] += step;
    return { k, slope: (run(scale, t).roll - base.roll) / step };
  });
  sens.sort((x, y) => Math.abs(y.slope) - Math.abs(x.slope));
  memo.sens = sens;
  let best = base;
  for (const { k, slope } of sens) {
    if (slope === 0) continue;
    const found = zeroOnSwitch(run, scale, times, k, slope, base, o);
    if (Math.abs(found.roll) < Math.abs(best.roll)) best = found;
    if (Math.abs(best.roll) < 5 * ROLL_DONE) break;
  }
  return best;
}

function zeroOnSwitch(
  run: (s: number, t: readonly number[]) => Outcome,
  scale: number,
  times: readonly number[],
  k: number,
  slope: number,
  base: Outcome,
  o: RefineOptions,
): Outcome {
  const [lo, hi] = range(times, k, base.plan, o);
  const at = (x: number) => {
    const t = times.slice();
    t[k] = x;
    return run(scale, t);
  };
  const dirn = -Math.sign(base.roll * slope);
  let step = Math.min(0.05, Math.max(0.004, Math.abs(base.roll / slope)));
  let x1 = times[k];
  let f1 = base;
  let best = base;
  for (let i = 0; i < 10; i++) {
    const x = Math.min(hi, Math.max(lo, x1 + dirn * step));
    if (x === x1) break;
    const f = at(x);
    if (Math.abs(f.roll) < Math.abs(best.roll)) best = f;
    if (Math.sign(f.roll) !== Math.sign(f1.roll)) return illinois(at, x1, f1, x, f, best);
    // Secant toward the root when the roll shrinks, otherwise grow the step.
    const s = (f.roll - f1.roll) / (x - x1);
    step = s * f.roll < 0 || s === 0 ? step * 1.6 : Math.min(0.1, Math.max(0.002, 1.2 * Math.abs(f.roll / s)));
    x1 = x;
    f1 = f;
  }
  return best;
}

/** Illinois (modified regula falsi) between two times whose rolls differ in sign. */
function illinois(at: (x: number) => Outcome, xa: number, fa: Outcome, xb: number, fb: Outcome, best: Outcome): Outcome {
  let side = 0;
  let ra = fa.roll;
  let rb = fb.roll;
  for (let k = 0; k < 20; k++) {
    const x = xb - (rb * (xb - xa)) / (rb - ra);
    const f = at(x);
    if (Math.abs(f.roll) < Math.abs(best.roll)) best = f;
    if (Math.abs(f.roll) < ROLL_DONE || Math.abs(xb - xa) < 1e-5) return best;
    if (Math.sign(f.roll) === Math.sign(rb)) {
      xb = x;
      rb = f.roll;
      if (side === -1) ra /= 2;
      side = -1;
    } else {
      xa = x;
      ra = f.roll;
      if (side === 1) rb /= 2;
      side = 1;
    }
  }
  return best;
}
