/**
 * How forgiving a set-up plan is of the driver's errors (engine.md section 5, decisions 0104 and
 * 0111): the timing window of each switch and the success rate per skill level.
 *
 * Errors: the time of each steering switch, the press and the release of the brake or throttle
 * pulse (each a normal timing error, sigma by skill level), and the takeoff speed (normal, a
 * spread by skill level), which changes the wheels' spin and, through the flight model, the
 * airtime. For each error alone the landing roll and pitch are simulated at a set of shifts and
 * interpolated between them. A landing is clean when |roll| is within the roll tolerance and,
 * when the plan sets the pitch, the pitch is within the pitch tolerance of the plan's aim.
 * The success rate is a seeded Monte Carlo that adds every error's own change (an additive
 * model: cross effects of two errors together are left out); the same samples with one source
 * alone say which error matters most.
 */
import { seededNormal } from "../math/vec";
import { ERROR_SOURCES, SKILL_LEVELS, skillPhrase, type ErrorSource, type SkillLevel } from "../words";

/** Timing error (standard deviation) of a driver's switch, s, by skill level. */
export type SkillSigmas = Record<SkillLevel, number>;

/** Defaults: estimates from timing research (engine.md): 60 ms, 35 ms, 15 ms. */
export const DEFAULT_SKILL_SIGMAS: Readonly<SkillSigmas> = Object.freeze({
  novice: 0.06,
  club: 0.035,
  expert: 0.015,
});

/**
 * Spread (standard deviation) of the takeoff speed from one pass to the next, m/s, by skill
 * level: 0.3, 0.15 and 0.05 m/s. Estimates (no measurements), and deliberately small: they stand
 * for the error left at touchdown after the driver's own correction in the air by eye, which
 * this open-loop model does not simulate; the raw spread of the throttle on the approach is
 * larger (docs/decisions/0111).
 */
export const DEFAULT_SPEED_SIGMAS: Readonly<SkillSigmas> = Object.freeze({
  novice: 0.3,
  club: 0.15,
  expert: 0.05,
});

/**
 * The timing errors in words, for pages that state their assumptions: "about 60 ms for a novice,
 * 35 ms for a club racer, 15 ms for an expert".
 * @param sigmas s by skill level (default: the engine's)
 */
export function timingErrorsPhrase(sigmas: Readonly<SkillSigmas> = DEFAULT_SKILL_SIGMAS): string {
  return perSkill(SKILL_LEVELS.map((s) => `${Math.round(sigmas[s] * 1000)} ms`));
}

/**
 * The takeoff speed spreads in words: "about 0.30 m/s for a novice, 0.15 m/s for a club racer,
 * 0.05 m/s for an expert".
 * @param sigmas m/s by skill level (default: the engine's)
 */
export function speedSpreadPhrase(sigmas: Readonly<SkillSigmas> = DEFAULT_SPEED_SIGMAS): string {
  return perSkill(SKILL_LEVELS.map((s) => `${sigmas[s].toFixed(2)} m/s`));
}

/** "about a for a novice, b for a club racer, c for an expert" (values in SKILL_LEVELS order). */
function perSkill(values: string[]): string {
  const parts = SKILL_LEVELS.map((s, i) => `${values[i]} for ${skillPhrase(s)}`);
  return `about ${parts.slice(0, -1).join(", ")}, ${parts.at(-1)}`;
}

export interface SwitchWindow {
  /** Planned switch time, s after takeoff. */
  t: number;
  /** How early (ms) and how late (ms) the switch may come with the landing still within tolerance. */
  earlyMs: number;
  lateMs: number;
}

/** The landing's change with one error. */
export interface ErrorCurve {
  source: ErrorSource;
  /** Shifts probed, sorted, including 0: s for timing, m/s for the takeoff speed. */
  shifts: readonly number[];
  /** Change of landing roll and pitch at each shift, rad. */
  roll: number[];
  pitch: number[];
}

/** Landing roll and pitch against each error. */
export interface LandingModel {
  /** Landing roll and pitch of the plan as planned, rad. */
  roll0: number;
  pitch0: number;
  curves: ErrorCurve[];
}

/** What counts as a clean landing. */
export interface CleanLanding {
  /** Largest |roll|, rad. */
  rollTol: number;
  /** Largest |pitch - pitchAim|, rad; null when the plan does not set the pitch. */
  pitchTol: number | null;
  /** Pitch aimed for, rad. */
  pitchAim: number;
}

/** Timing shifts probed for every switch and pulse edge, s. */
export const PROBE_SHIFTS: readonly number[] = [-0.15, -0.09, -0.045, -0.02, 0, 0.02, 0.045, 0.09, 0.15];
/** Takeoff speed shifts probed, m/s. */
export const SPEED_SHIFTS: readonly number[] = [-1.2, -0.35, 0, 0.35, 1.2];
/** Shifts probed for each edge of the pulse, s. */
export const PULSE_SHIFTS: readonly number[] = [-0.15, -0.07, -0.025, 0, 0.025, 0.07, 0.15];

/**
 * Builds the landing model from `landingWith(index, shift)`, the simulated landing (rad) when
 * error `index` of `errors` alone takes the value `shift`. Costs one simulation per non-zero
 * shift of every error.
 */
export function landingModel(
  roll0: number,
  pitch0: number,
  errors: readonly { source: ErrorSource; shifts: readonly number[] }[],
  landingWith: (index: number, shift: number) => { roll: number; pitch: number },
): LandingModel {
  const curves = errors.map((e, i) => {
    const roll: number[] = [];
    const pitch: number[] = [];
    for (const s of e.shifts) {
      const r = s === 0 ? { roll: roll0, pitch: pitch0 } : landingWith(i, s);
      roll.push(r.roll - roll0);
      pitch.push(r.pitch - pitch0);
    }
    return { source: e.source, shifts: e.shifts, roll, pitch };
  });
  return { roll0, pitch0, curves };
}

/** Value of a curve's table at shift e, interpolated; flat beyond the probed shifts. */
function at(shifts: readonly number[], values: number[], e: number): number {
  const last = shifts.length - 1;
  if (e <= shifts[0]) return values[0];
  if (e >= shifts[last]) return values[last];
  let k = 0;
  while (shifts[k + 1] < e) k++;
  const f = (e - shifts[k]) / (shifts[k + 1] - shifts[k]);
  return values[k] + f * (values[k + 1] - values[k]);
}

/** How far the landing is outside the tolerances (<= 0 inside), in shares of the tolerance. */
function excess(roll: number, pitch: number, clean: CleanLanding): number {
  const r = Math.abs(roll) / clean.rollTol - 1;
  if (clean.pitchTol === null) return r;
  return Math.max(r, Math.abs(pitch - clean.pitchAim) / clean.pitchTol - 1);
}

/** Distance (s) from 0 in direction `sign` to where the landing leaves the tolerances. */
function edge(model: LandingModel, c: ErrorCurve, sign: number, clean: CleanLanding): number {
  const s = c.shifts;
  const zero = s.indexOf(0);
  const out = (k: number) => excess(model.roll0 + c.roll[k], model.pitch0 + c.pitch[k], clean);
  if (out(zero) > 0) return 0;
  for (let k = zero + sign; k >= 0 && k < s.length; k += sign) {
    const x1 = out(k);
    if (x1 > 0) {
      const x0 = out(k - sign);
      const f = x0 / (x0 - x1);
      return Math.abs(s[k - sign] + f * (s[k] - s[k - sign]));
    }
  }
  return Math.abs(s[sign > 0 ? s.length - 1 : 0]);
}

/**
 * Timing window of each timing curve (in order, one per entry of `times`), ms, up to the probed
 * 150 ms and never before takeoff.
 */
export function timingWindows(
  model: LandingModel,
  curveIndices: readonly number[],
  times: readonly number[],
  clean: CleanLanding,
): SwitchWindow[] {
  return curveIndices.map((ci, i) => ({
    t: times[i],
    earlyMs: Math.min(edge(model, model.curves[ci], -1, clean), times[i]) * 1000,
    lateMs: edge(model, model.curves[ci], 1, clean) * 1000,
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

/** Success rates with every error, and with each source of error alone. */
export interface SuccessRates {
  rate: SkillSigmas;
  alone: Record<ErrorSource, SkillSigmas>;
}

const CELLS = 300;

/**
 * Share of clean landings when every error is drawn from its normal spread (timing: `sigmas`,
 * takeoff speed: `speedSigmas`), and with each source alone. Seeded: the same inputs give the
 * same rates; each level uses its own stream (seed, seed + 1, seed + 2).
 */
export function successRates(
  model: LandingModel,
  clean: CleanLanding,
  sigmas: SkillSigmas,
  speedSigmas: SkillSigmas,
  seed: number,
  samples = 2000,
): SuccessRates {
  const n = model.curves.length;
  // Each curve resampled on CELLS cells, so a sample costs one lookup per curve.
  const first = model.curves.map((c) => c.shifts[0]);
  const span = model.curves.map((c) => c.shifts[c.shifts.length - 1] - c.shifts[0]);
  const rollT = new Float64Array(n * (CELLS + 1));
  const pitchT = new Float64Array(n * (CELLS + 1));
  model.curves.forEach((c, i) => {
    for (let k = 0; k <= CELLS; k++) {
      const e = first[i] + (k * span[i]) / CELLS;
      rollT[i * (CELLS + 1) + k] = at(c.shifts, c.roll, e);
      pitchT[i * (CELLS + 1) + k] = at(c.shifts, c.pitch, e);
    }
  });
  const kind = Int32Array.from(model.curves, (c) => ERROR_SOURCES.indexOf(c.source));
  const firstA = Float64Array.from(first);
  const cellsPer = Float64Array.from(span, (v) => CELLS / v);
  const pitchCounts = clean.pitchTol !== null;
  const rInv = 1 / clean.rollTol;
  const pInv = pitchCounts ? 1 / clean.pitchTol! : 0;
  const r0 = model.roll0;
  const p0 = model.pitch0 - clean.pitchAim;
  // Clean when both |roll| / rollTol and |pitch - aim| / pitchTol are at most 1.
  const inside = (roll: number, pitch: number) =>
    Math.abs(roll) * rInv <= 1 && (!pitchCounts || Math.abs(pitch) * pInv <= 1);
  const level = (timing: number, speed: number, levelSeed: number) => {
    const z = normals(levelSeed, samples * Math.max(1, n));
    let all = 0;
    let steer = 0;
    let pulse = 0;
    let fast = 0;
    for (let s = 0, j = 0; s < samples; s++) {
      let rs = 0,
        rp = 0,
        rv = 0,
        ps = 0,
        pp = 0,
        pv = 0;
      for (let i = 0; i < n; i++, j++) {
        const kd = kind[i];
        const sigma = kd === 2 ? speed : timing;
        let x = (z[j] * sigma - firstA[i]) * cellsPer[i];
        x = x < 0 ? 0 : x > CELLS ? CELLS : x;
        const c = x >= CELLS ? CELLS - 1 : x | 0;
        const b = i * (CELLS + 1) + c;
        const f = x - c;
        const dr = rollT[b] + f * (rollT[b + 1] - rollT[b]);
        const dp = pitchCounts ? pitchT[b] + f * (pitchT[b + 1] - pitchT[b]) : 0;
        if (kd === 0) {
          rs += dr;
          ps += dp;
        } else if (kd === 1) {
          rp += dr;
          pp += dp;
        } else {
          rv += dr;
          pv += dp;
        }
      }
      if (inside(r0 + rs + rp + rv, p0 + ps + pp + pv)) all++;
      if (inside(r0 + rs, p0 + ps)) steer++;
      if (inside(r0 + rp, p0 + pp)) pulse++;
      if (inside(r0 + rv, p0 + pv)) fast++;
    }
    return [all / samples, steer / samples, pulse / samples, fast / samples];
  };
  const levels = SKILL_LEVELS.map((l, i) => level(sigmas[l], speedSigmas[l], seed + i));
  const pick = (k: number): SkillSigmas => ({
    novice: levels[0][k],
    club: levels[1][k],
    expert: levels[2][k],
  });
  return { rate: pick(0), alone: { steering: pick(1), pulse: pick(2), speed: pick(3) } };
}

/**
 * The error that matters most at each level: the source whose error alone spoils the most
 * landings (null when none spoils any).
 */
export function mainErrors(rates: SuccessRates): Record<keyof SkillSigmas, ErrorSource | null> {
  const main = (l: keyof SkillSigmas): ErrorSource | null => {
    let best: ErrorSource | null = null;
    let worst = 1 - 1e-9;
    for (const s of ERROR_SOURCES) {
      if (rates.alone[s][l] < worst) {
        worst = rates.alone[s][l];
        best = s;
      }
    }
    return best;
  };
  return { novice: main("novice"), club: main("club"), expert: main("expert") };
}
