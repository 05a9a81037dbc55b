/**
 * Corrects a block plan found on the linear guide with the full attitude model. The landing roll
 * is brought to zero by moving one "lever" at a time (a switch time, or one phase's amount),
 * trying the levers in order of how strongly they move the roll (bracketing secant); then a
 * secant on a common scale of the amounts brings the yaw to the target, never past it and never
 * beyond the steering lock, flattening the roll again at each step.
 */
import type { BlockPlan } from "./air-plan-search";
import type { AttitudeResult } from "./attitude";

/** Runs the full model for a steering timeline and wheel-acceleration timeline. */
export type PlanSim = (
  steering: Array<[number, number]>,
  accel: Array<[number, number]>,
  dt?: number,
) => AttitudeResult;

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
/** How far inside the yaw cap the plan aims, rad. */
const YAW_MARGIN = (0.1 * Math.PI) / 180;
/** Two phases the same way whose amounts differ by less than this are one phase, rad. */
const SAME_AMOUNT = (5 * Math.PI) / 180;

/** Steering timeline of a block plan: [t s, target rad] entries. */
export function timeline(p: BlockPlan): Array<[number, number]> {
  return p.single
    ? [
        [p.a, p.u1],
        [p.m, 0],
      ]
    : [
        [p.a, p.u1],
        [p.m, p.u2],
        [p.b, 0],
      ];
}

interface Outcome {
  plan: BlockPlan;
  roll: number;
  yaw: number;
  pitch: number;
}

type Run = (plan: BlockPlan) => Outcome;

/** One number of a plan that may be moved, with its allowed range given the rest of the plan. */
interface Lever {
  name: string;
  get(p: BlockPlan): number;
  set(p: BlockPlan, x: number): BlockPlan;
  range(p: BlockPlan): [number, number];
  probe: number;
}

/** Time to centre the wheels from amount u, s. */
const centring = (u: number, o: RefineOptions) => Math.abs(u) / o.rate;

function levers(single: boolean, o: RefineOptions): Lever[] {
  const keepSign = (u: number): [number, number] => (u >= 0 ? [0, o.lock] : [-o.lock, 0]);
  const span = (lo: number, hi: number): [number, number] => [lo, Math.max(lo, hi)];
  const a: Lever = {
    name: "a",
    get: (p) => p.a,
    set: (p, x) => ({ ...p, a: x }),
    range: (p) => span(o.t0, p.m - o.minPhase),
    probe: 0.004,
  };
  const m: Lever = {
    name: "m",
    get: (p) => p.m,
    set: (p, x) => (single ? { ...p, m: x, b: x } : { ...p, m: x }),
    range: (p) => span(p.a + o.minPhase, single ? o.tLast - centring(p.u1, o) : p.b - o.minPhase),
    probe: 0.004,
  };
  const u1: Lever = {
    name: "u1",
    get: (p) => p.u1,
    set: (p, x) => ({ ...p, u1: x }),
    range: (p) => {
      const [lo, hi] = keepSign(p.u1);
      if (!single) return [lo, hi];
      const room = Math.max(0, (o.tLast - p.m) * o.rate);
      return [Math.max(lo, -room), Math.min(hi, room)];
    },
    probe: 0.004,
  };
  if (single) return [a, m, u1];
  const b: Lever = {
    name: "b",
    get: (p) => p.b,
    set: (p, x) => ({ ...p, b: x }),
    range: (p) => span(p.m + o.minPhase, o.tLast - centring(p.u2, o)),
    probe: 0.004,
  };
  const u2: Lever = {
    name: "u2",
    get: (p) => p.u2,
    set: (p, x) => ({ ...p, u2: x }),
    range: (p) => {
      const room = Math.max(0, (o.tLast - p.b) * o.rate);
      const [lo, hi] = keepSign(p.u2);
      return [Math.max(lo, -room), Math.min(hi, room)];
    },
    probe: 0.004,
  };
  return [a, m, b, u1, u2];
}

/** Two phases the same way with nearly the same amount become one phase. */
function simplify(p: BlockPlan): BlockPlan {
  if (p.single || Math.sign(p.u1) !== Math.sign(p.u2) || Math.abs(p.u1 - p.u2) >= SAME_AMOUNT) return p;
  const u = (p.u1 * (p.m - p.a) + p.u2 * (p.b - p.m)) / (p.b - p.a);
  return { ...p, u1: u, u2: 0, m: p.b, single: true };
}

/**
 * Refines a guide plan in the full model. Returns null when the full model gives no yaw toward
 * the turn.
 */
export function refineAmounts(
  sim: PlanSim,
  guide: BlockPlan,
  accel: Array<[number, number]>,
  o: RefineOptions,
): Refined | null {
  const start = simplify(guide);
  // Aim a little inside the cap: the search steps (8 ms) and the final 1 ms run differ slightly.
  const target = Math.min(start.yaw, o.yawCap - YAW_MARGIN);
  const run: Run = (plan) => {
    const r = sim(timeline(plan), accel);
    return { plan, roll: r.rollRad, yaw: o.dir * r.yawRad, pitch: r.pitchRad };
  };
  const ok = (g: Outcome) => Math.abs(g.roll) < 5 * ROLL_DONE && g.yaw <= target + YAW_DONE;
  const better = (f: Outcome, best: Outcome) => {
    if (ok(f) !== ok(best)) return ok(f);
    if (ok(f)) return f.yaw > best.yaw;
    return Math.abs(f.roll) < Math.abs(best.roll);
  };
  const all = levers(start.single, o);
  const memo: Memo = {};
  let f0 = flatten(run, start, all, memo);
  let best = f0;
  // Secant on a common scale of the amounts for yaw = target.
  let s0 = 1;
  let sPrev = 0;
  let yPrev = 0;
  for (let round = 0; round < (o.scaleRounds ?? 4); round++) {
    if (Math.abs(f0.yaw - target) < YAW_DONE || !(f0.yaw > 0)) break;
    const slope = (f0.yaw - yPrev) / (s0 - sPrev);
    const wanted = slope > 0 ? s0 + (target - f0.yaw) / slope : (s0 * target) / f0.yaw;
    const p = f0.plan;
    const biggest = Math.max(Math.abs(p.u1), Math.abs(p.u2));
    const endRoom = p.single ? (o.tLast - p.m) * o.rate : (o.tLast - p.b) * o.rate;
    const lastAmount = Math.abs(p.single ? p.u1 : p.u2);
    let factor = wanted / s0;
    factor = Math.min(factor, o.lock / biggest, lastAmount > 0 ? endRoom / lastAmount : Infinity);
    factor = Math.max(0.05, factor);
    if (Math.abs(factor - 1) < 1e-3) break;
    sPrev = s0;
    yPrev = f0.yaw;
    s0 *= factor;
    f0 = flatten(run, { ...p, u1: p.u1 * factor, u2: p.u2 * factor }, all, memo);
    if (better(f0, best)) best = f0;
  }
  if (!(best.yaw > 0)) return null;
  return { plan: { ...best.plan, yaw: best.yaw }, targetYaw: Math.min(target, best.yaw), pitch: best.pitch };
}

/** Lever order and roll slopes found by the first flattening, reused by later ones. */
interface Memo {
  sens?: Array<{ lever: Lever; slope: number }>;
}

/** Brings the landing roll of `from` to zero, moving one lever at a time. */
function flatten(run: Run, from: BlockPlan, all: Lever[], memo: Memo): Outcome {
  const base = run(from);
  if (Math.abs(base.roll) < ROLL_DONE) return base;
  const sens =
    memo.sens ??
    all.map((lever) => {
      const x = lever.get(from);
      const [lo, hi] = lever.range(from);
      const step = x + lever.probe <= hi ? lever.probe : -lever.probe;
      if (x + step < lo) return { lever, slope: 0 };
      return { lever, slope: (run(lever.set(from, x + step)).roll - base.roll) / step };
    });
  if (!memo.sens) {
    // Strongest first, in roll per unit of the lever's own range.
    const reach = (s: { lever: Lever; slope: number }) => {
      const [lo, hi] = s.lever.range(from);
      return Math.abs(s.slope) * (hi - lo);
    };
    sens.sort((x, y) => reach(y) - reach(x));
    memo.sens = sens;
  }
  let best = base;
  for (const { lever, slope } of sens) {
    if (slope === 0) continue;
    const found = zeroOnLever(run, best, lever, slope);
    if (Math.abs(found.roll) < Math.abs(best.roll)) best = found;
    if (Math.abs(best.roll) < 5 * ROLL_DONE) break;
  }
  return best;
}

function zeroOnLever(run: Run, base: Outcome, lever: Lever, slope: number): Outcome {
  const [lo, hi] = lever.range(base.plan);
  const at = (x: number) => run(lever.set(base.plan, x));
  const dirn = -Math.sign(base.roll * slope);
  const size = hi - lo;
  let step = Math.min(0.5 * size, Math.max(lever.probe, Math.abs(base.roll / slope)));
  let x1 = lever.get(base.plan);
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
    step =
      s * f.roll * dirn > 0 || s === 0
        ? step * 1.6
        : Math.min(size, Math.max(lever.probe / 2, 1.2 * Math.abs(f.roll / s)));
    x1 = x;
    f1 = f;
  }
  return best;
}

/** Illinois (modified regula falsi) between two lever values whose rolls differ in sign. */
function illinois(
  at: (x: number) => Outcome,
  xa: number,
  fa: Outcome,
  xb: number,
  fb: Outcome,
  best: Outcome,
): Outcome {
  let side = 0;
  let ra = fa.roll;
  let rb = fb.roll;
  for (let k = 0; k < 20; k++) {
    const x = xb - (rb * (xb - xa)) / (rb - ra);
    const f = at(x);
    if (Math.abs(f.roll) < Math.abs(best.roll)) best = f;
    if (Math.abs(f.roll) < ROLL_DONE || Math.abs(xb - xa) < 1e-6) return best;
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
