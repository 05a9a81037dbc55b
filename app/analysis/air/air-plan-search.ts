/**
 * Global search for the set-up plan's shape on the linear guide (air-plan-linear.ts). A plan is
 * one steering block [a, m] of amount u1 (the counter-steer phase) followed either by straight
 * wheels (a single block) or by a second block [m, b] of amount u2 (the return phase), then
 * straight wheels until touchdown. For each grid of switch times the amounts that land with no
 * roll and the most yaw are solved in closed form; among the plans that turn the nose as far as
 * is useful, the one least sensitive to the driver's timing wins.
 */
import { tableAt, type LinearGuide } from "./air-plan-linear";
import { normalCdf } from "../math/vec";

export interface BlockPlan {
  /** Switch times, s: steer to u1 at a, to u2 at m (or straight if single), straight at b. */
  a: number;
  m: number;
  b: number;
  /** Steering amounts, rad (positive = left). */
  u1: number;
  u2: number;
  single: boolean;
  /** Yaw the guide predicts, rad (signed toward the turn). */
  yaw: number;
  /** The guide's estimate of the share of landings within the roll tolerance at the ranking sigma. */
  success?: number;
}

export interface SearchOptions {
  /** Earliest switch, s. */
  t0: number;
  /** Latest time the last block may end so the wheels are straight by touchdown, s. */
  tLast: number;
  lock: number;
  /** +1 to turn the nose left, -1 right. */
  dir: number;
  /** Most useful yaw, rad (> 0). */
  yawCap: number;
  rollTol: number;
  /** Timing error used to rank robustness, s. */
  sigma: number;
  /** Shortest steering phase a driver can make, s. */
  minPhase: number;
  /** Most switch times tried (default 40; fewer for a quick screening). */
  maxGrid?: number;
}

const MAX_GRID = 40;

/** Linear-guide prediction of roll (out[0]) and yaw (out[1]), rad, for a block plan. */
export function guideLanding(
  g: LinearGuide,
  p: Omit<BlockPlan, "yaw" | "single"> & { single?: boolean },
  out: number[],
): void {
  const ca = [tableAt(g, g.cumRoll, p.a), tableAt(g, g.cumYaw, p.a)];
  const cm = [tableAt(g, g.cumRoll, p.m), tableAt(g, g.cumYaw, p.m)];
  const cb = [tableAt(g, g.cumRoll, p.b), tableAt(g, g.cumYaw, p.b)];
  const u2 = p.single ? 0 : p.u2;
  out[0] = p.u1 * (cm[0] - ca[0]) + u2 * (cb[0] - cm[0]);
  out[1] = p.u1 * (cm[1] - ca[1]) + u2 * (cb[1] - cm[1]);
}

function successEstimate(
  g: LinearGuide,
  edges: number[],
  jumps: number[],
  rollMean: number,
  o: SearchOptions,
): number {
  let varSum = 0;
  for (let k = 0; k < edges.length; k++) {
    const s = jumps[k] * tableAt(g, g.kerRoll, edges[k]);
    varSum += s * s;
  }
  const sd = o.sigma * Math.sqrt(varSum);
  if (sd < 1e-12) return Math.abs(rollMean) <= o.rollTol ? 1 : 0;
  return normalCdf((o.rollTol - rollMean) / sd) - normalCdf((-o.rollTol - rollMean) / sd);
}

/**
 * Searches single- and two-block plans on a grid of switch times (at most 40 points between t0
 * and tLast). Returns the best plan, or null when no plan turns the nose toward the turn.
 */
export function searchBlocks(g: LinearGuide, o: SearchOptions): BlockPlan | null {
  if (o.tLast <= o.t0) return null;
  const count = Math.min(o.maxGrid ?? MAX_GRID, Math.max(3, Math.floor((o.tLast - o.t0) / 0.02) + 1));
  const grid = new Float64Array(count);
  const re = new Float64Array(count);
  const im = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    grid[i] = o.t0 + ((o.tLast - o.t0) * i) / (count - 1);
    re[i] = tableAt(g, g.cumRoll, grid[i]);
    im[i] = tableAt(g, g.cumYaw, grid[i]);
  }
  const yz = o.dir; // yaw of 1 rad toward the turn
  let bestYaw = 0;
  const yawOf = (i: number, j: number, l: number, out: number[]): number => {
    const g1r = re[j] - re[i],
      g1i = im[j] - im[i];
    if (l < 0) {
      // Single block: amount for the capped yaw, roll must stay within half the tolerance.
      if (Math.abs(g1i) < 1e-15) return 0;
      const perRad = o.dir * g1i; // yaw toward the turn per rad of steering
      const u1Max = o.lock * Math.sign(perRad);
      let yaw = Math.min(Math.abs(u1Max * perRad), o.yawCap);
      const rollPerYaw = Math.abs(g1r / perRad);
      if (rollPerYaw * yaw > o.rollTol / 2) yaw = o.rollTol / 2 / rollPerYaw;
      out[0] = (yaw / perRad) * 1;
      out[1] = 0;
      out[2] = (yaw / perRad) * g1r;
      return yaw;
    }
    const g2r = re[l] - re[j],
      g2i = im[l] - im[j];
    const det = g1r * g2i - g2r * g1i;
    if (Math.abs(det) < 1e-18) return 0;
    const u1 = (-g2r * yz) / det;
    const u2 = (g1r * yz) / det;
    const big = Math.max(Math.abs(u1), Math.abs(u2));
    const yaw = Math.min(o.lock / big, o.yawCap);
    out[0] = u1 * yaw;
    out[1] = u2 * yaw;
    out[2] = 0;
    return yaw;
  };
  const tmp = [0, 0, 0];
  const spacing = count > 1 ? grid[1] - grid[0] : 1;
  const gap = Math.max(1, Math.ceil(o.minPhase / spacing - 1e-9));
  for (let i = 0; i < count; i++)
    for (let j = i + gap; j < count; j++) {
      bestYaw = Math.max(bestYaw, yawOf(i, j, -1, tmp));
      for (let l = j + gap; l < count; l++) bestYaw = Math.max(bestYaw, yawOf(i, j, l, tmp));
    }
  if (bestYaw <= 0) return null;
  // Among plans within 0.25 deg of the best yaw, keep the one most likely to land flat.
  const goal = bestYaw - (0.25 * Math.PI) / 180;
  let best: BlockPlan | null = null;
  let bestScore = -1;
  for (let i = 0; i < count; i++)
    for (let j = i + gap; j < count; j++)
      for (let l = j; l < count; l++) {
        if (l > j && l < j + gap) continue;
        const single = l === j;
        const yaw = yawOf(i, j, single ? -1 : l, tmp);
        if (yaw < goal) continue;
        const [u1, u2, rollMean] = tmp;
        const edges = single ? [grid[i], grid[j]] : [grid[i], grid[j], grid[l]];
        const jumps = single ? [-u1, u1] : [-u1, u1 - u2, u2];
        const success = successEstimate(g, edges, jumps, rollMean, o);
        const score = success - 1e-3 * (Math.abs(u1) + Math.abs(u2));
        if (score > bestScore) {
          bestScore = score;
          best = {
            a: grid[i],
            m: grid[j],
            b: single ? grid[j] : grid[l],
            u1,
            u2: single ? 0 : u2,
            single,
            yaw,
            success,
          };
        }
      }
  return best;
}
