/**
 * What follows a jump's touchdown along the lap: the next turn, how far it is, which way it goes
 * and how sharp the corner is; plus lookups of the sampled centre line by lap distance.
 * Plan distances in metres, angles in radians.
 */
import type { CentreLine, ResolvedSection } from "../track/geometry";
import { landsIntoTurn } from "./verdict";

/** Index of the last centre-line sample at or before lap distance `s` (m, wrapped onto the lap). */
export function lineIndexAt(line: CentreLine, s: number): number {
  const L = line.length;
  const t = ((s % L) + L) % L;
  let lo = 0;
  let hi = line.count - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (line.s[mid] <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Plan position (m) on the centre line at lap distance `s` (m), linear between samples. */
export function pointAt(line: CentreLine, s: number): { x: number; y: number } {
  const L = line.length;
  const t = ((s % L) + L) % L;
  const i = lineIndexAt(line, t);
  const j = Math.min(i + 1, line.count - 1);
  const span = line.s[j] - line.s[i];
  const f = span > 0 ? (t - line.s[i]) / span : 0;
  return { x: line.x[i] + f * (line.x[j] - line.x[i]), y: line.y[i] + f * (line.y[j] - line.y[i]) };
}

export interface TurnAfter {
  /** First section of the corner. */
  sectionIndex: number;
  /** Along the lap from `s` to the corner's start, m (0 when `s` lies inside it). */
  distance: number;
  /** How far into the corner's first section `s` lies, m (0 when the corner is ahead). */
  passed: number;
  side: "left" | "right";
  /** Angle of the corner still to turn, rad: the turn sections to the same side that follow each other, less any part already passed. */
  angle: number;
  /** Centre-line radius of the corner's first section, m. */
  radius: number;
  /** Whether the corner starts within the look-ahead distance (verdict.ts landsIntoTurn). */
  landsInto: boolean;
}

/** Index of the section holding lap distance s (m, in [0, lapLength)). */
function sectionAt(sections: readonly ResolvedSection[], s: number): number {
  let lo = 0;
  let hi = sections.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (sections[mid].startS <= s) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/**
 * The next turn at or after lap distance `s` (m), going round the lap; null when the layout has
 * no turn.
 * @param rollOutSpeed speed along the ground after touchdown, m/s
 * @param lookaheadS look-ahead time, s
 */
export function findLandingTurn(
  sections: readonly ResolvedSection[],
  lapLength: number,
  s: number,
  rollOutSpeed: number,
  lookaheadS: number,
): TurnAfter | null {
  const n = sections.length;
  const at = ((s % lapLength) + lapLength) % lapLength;
  const first = sectionAt(sections, at);
  for (let step = 0; step < n; step++) {
    const k = (first + step) % n;
    const sec = sections[k];
    if (sec.curvature === 0) continue;
    const passed = step === 0 ? at - sec.startS : 0;
    const distance = step === 0 ? 0 : (((sec.startS - at) % lapLength) + lapLength) % lapLength;
    const sign = Math.sign(sec.curvature);
    let angle = Math.abs(sec.turnAngle) - passed * Math.abs(sec.curvature);
    for (let m = 1; m < n; m++) {
      const next = sections[(k + m) % n];
      if (Math.sign(next.curvature) !== sign) break;
      angle += Math.abs(next.turnAngle);
    }
    return {
      sectionIndex: k,
      distance,
      passed,
      side: sign > 0 ? "left" : "right",
      angle,
      radius: 1 / Math.abs(sec.curvature),
      landsInto: landsIntoTurn(distance, rollOutSpeed, lookaheadS),
    };
  }
  return null;
}
