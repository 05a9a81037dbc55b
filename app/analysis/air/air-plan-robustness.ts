/**
 * How forgiving a set-up plan is of the driver's timing (engine.md section 5): the timing window
 * of each switch and the success rate per skill level.
 *
 * Method (docs/decisions/0103-plan-robustness.md): the landing roll is simulated with each switch
 * alone moved to a set of shifts (8 runs a switch, up to 150 ms either way); between them the roll
 * is interpolated linearly. The window of a switch is where that curve stays within the roll
 * tolerance. The success rate is a seeded Monte Carlo of independent normal timing errors on
 * every switch, each adding its own curve's change of roll (an additive model: the cross effects
 * of two switches both being off are left out).
 */
import { seededNormal } from "../math/vec";
import { SKILL_LEVELS, skillPhrase, type SkillLevel } from "../words";

/** Timing error (standard deviation) of a driver's steering switch, s, by skill level. */
export type SkillSigmas = Record<SkillLevel, number>;

/** Defaults: estimates from timing research (engine.md): 60 ms, 35 ms, 15 ms. */
export const DEFAULT_SKILL_SIGMAS: Readonly<SkillSigmas> = Object.freeze({
  novice: 0.06,
  club: 0.035,
  expert: 0.015,
});

/**
 * The timing errors in words, for pages that state their assumptions: "about 60 ms for a novice,
 * 35 ms for a club racer, 15 ms for an expert".
 * @param sigmas s by skill level (default: the engine's)
 */
export function timingErrorsPhrase(sigmas: Readonly<SkillSigmas> = DEFAULT_SKILL_SIGMAS): string {
  const parts = SKILL_LEVELS.map((s) => `${Math.round(sigmas[s] * 1000)} ms for ${skillPhrase(s)}`);
  return `about ${parts.slice(0, -1).join(", ")}, ${parts.at(-1)}`;
}

export interface SwitchWindow {
  /** Planned switch time, s after takeoff. */
  t: number;
  /** How early (ms) and how late (ms) the switch may come with the landing still within tolerance. */
  earlyMs: number;
  lateMs: number;
}

/** Landing roll against each switch's timing error. */
export interface RollModel {
  /** Landing roll of the plan as planned, rad. */
  roll0: number;
  /** Shifts probed, s (sorted, including 0). */
  shifts: readonly number[];
  /** Change of landing roll at each shift, per switch: change[switch][shift], rad. */
  change: number[][];
}

/** Shifts probed for every switch, s. */
export const PROBE_SHIFTS: readonly number[] = [-0.15, -0.09, -0.045, -0.02, 0, 0.02, 0.045, 0.09, 0.15];

/**
 * Builds the roll model from `rollWithShift(index, shift)`, the simulated landing roll (rad) when
 * switch `index` alone moves by `shift` s (the caller keeps it after takeoff). Costs eight
 * simulations per switch.
 */
export function rollModel(
  roll0: number,
  switches: number,
  rollWithShift: (index: number, shift: number) => number,
): RollModel {
  const change: number[][] = [];
  for (let i = 0; i < switches; i++) {
    change.push(PROBE_SHIFTS.map((s) => (s === 0 ? 0 : rollWithShift(i, s) - roll0)));
  }
  return { roll0, shifts: PROBE_SHIFTS, change };
}

/** Change of roll of switch i at shift e (rad), interpolated; flat beyond the probed shifts. */
function changeAt(model: RollModel, i: number, e: number): number {
  const s = model.shifts;
  const c = model.change[i];
  const last = s.length - 1;
  if (e <= s[0]) return c[0];
  if (e >= s[last]) return c[last];
  let k = 0;
  while (s[k + 1] < e) k++;
  const f = (e - s[k]) / (s[k + 1] - s[k]);
  return c[k] + f * (c[k + 1] - c[k]);
}

/** Distance (s) from 0 in direction `sign` to the first shift where |roll| leaves the tolerance. */
function edge(model: RollModel, i: number, sign: number, tolerance: number): number {
  const s = model.shifts;
  const zero = s.indexOf(0);
  const roll = (k: number) => model.roll0 + model.change[i][k];
  if (Math.abs(model.roll0) > tolerance) return 0;
  for (let k = zero + sign; k >= 0 && k < s.length; k += sign) {
    const r1 = roll(k);
    if (Math.abs(r1) > tolerance) {
      const r0 = roll(k - sign);
      const bound = r1 > 0 ? tolerance : -tolerance;
      const f = (bound - r0) / (r1 - r0);
      return Math.abs(s[k - sign] + f * (s[k] - s[k - sign]));
    }
  }
  return Math.abs(s[sign > 0 ? s.length - 1 : 0]);
}

/** Timing window of each switch, ms, up to the probed 150 ms and never before takeoff. */
export function timingWindows(model: RollModel, switchTimes: number[], tolerance: number): SwitchWindow[] {
  return switchTimes.map((t, i) => ({
    t,
    earlyMs: Math.min(edge(model, i, -1, tolerance), t) * 1000,
    lateMs: edge(model, i, 1, tolerance) * 1000,
  }));
}

/** Standard normal samples per seed, generated once and reused (the sampling is deterministic). */
const normalCache = new Map<string, Float64Array>();

function normals(seed: number, count: number): Float64Array {
  const key = `${seed}:${count}`;
  let table = normalCache.get(key);
  if (!table) {
    table = new Float64Array(count);
    const next = seededNormal(seed);
    for (let i = 0; i < count; i++) table[i] = next();
    if (normalCache.size > 16) normalCache.clear();
    normalCache.set(key, table);
  }
  return table;
}

/**
 * Share of landings within the roll tolerance when every switch comes with an independent normal
 * timing error of the skill level's sigma. Seeded: the same inputs give the same rates. Each
 * level uses its own stream (seed, seed + 1, seed + 2).
 */
export function successRates(
  model: RollModel,
  tolerance: number,
  sigmas: SkillSigmas,
  seed: number,
  samples = 4000,
): SkillSigmas {
  const n = model.change.length;
  // Each switch's curve resampled every millisecond, so a sample costs one lookup.
  const first = model.shifts[0];
  const span = model.shifts[model.shifts.length - 1] - first;
  const cells = Math.round(span * 1000);
  const table = new Float64Array(n * (cells + 1));
  for (let i = 0; i < n; i++)
    for (let c = 0; c <= cells; c++)
      table[i * (cells + 1) + c] = changeAt(model, i, first + (c * span) / cells);
  const rate = (sigma: number, levelSeed: number) => {
    const z = normals(levelSeed, samples * n);
    const scale = (sigma * cells) / span;
    const offset = -first * (cells / span);
    let ok = 0;
    for (let s = 0, j = 0; s < samples; s++) {
      let roll = model.roll0;
      for (let i = 0; i < n; i++, j++) {
        const x = Math.min(cells, Math.max(0, z[j] * scale + offset));
        const c = Math.min(cells - 1, Math.floor(x));
        const base = i * (cells + 1) + c;
        roll += table[base] + (x - c) * (table[base + 1] - table[base]);
      }
      if (Math.abs(roll) <= tolerance) ok++;
    }
    return ok / samples;
  };
  return {
    novice: rate(sigmas.novice, seed),
    club: rate(sigmas.club, seed + 1),
    expert: rate(sigmas.expert, seed + 2),
  };
}
