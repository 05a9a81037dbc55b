/**
 * The overlay the plan view and the editor draw (app/lib/analysis-overlay.ts), built from a
 * layout analysis for one car class and one skill level: the centre line with speeds, the jumps
 * with short verdict labels, hidden stretches as polylines, lane conflicts and failed rules.
 */
import type { AnalysisOverlay, OverlayJump } from "./overlay-types";
import type { JumpAnalysis, LayoutAnalysis } from "./layout-analysis-types";
import { SKILL_LEVELS, VERDICT_WORDS, verdictKind, type SkillLevel } from "../words";
import type { RuleCheck } from "../track/rules";

/**
 * Short label beside a jump's marker: the verdict's word and its short reason, e.g. "Set up in
 * the air: land with the nose 25° left" or "Take it straight: no turn at the landing".
 */
export function jumpLabel(j: JumpAnalysis, skill: SkillLevel): string {
  const v = j.verdicts[skill];
  return `${VERDICT_WORDS[verdictKind(v)]}: ${v.reasonText}`;
}

function overlayJump(j: JumpAnalysis, skill: SkillLevel): OverlayJump {
  const v = j.verdicts[skill];
  return {
    sectionId: j.sectionId,
    lip: [j.lip.x, j.lip.y],
    landing: j.landing ? [j.landing.x, j.landing.y] : null,
    verdict: verdictKind(v),
    label: jumpLabel(j, skill),
    takeoffSpeed: j.takeoffSpeed,
    airtime: j.airtime,
  };
}

const fmt = (x: number) => (Math.abs(x) >= 10 ? x.toFixed(0) : x.toFixed(2).replace(/\.?0+$/, ""));

function ruleFailure(c: RuleCheck): AnalysisOverlay["ruleFailures"][number] {
  return {
    id: c.id,
    label: c.label,
    measured: c.measured === null ? c.detail : `${fmt(c.measured)} ${c.unit}`,
    required: `${c.comparison} ${fmt(c.value)} ${c.unit}`,
  };
}

/** Plan point (m) of the downsampled line at lap distance s (m), linear between its points. */
function pointOnLine(line: LayoutAnalysis["line"], s: number): [number, number] {
  const n = line.s.length;
  let lo = 0;
  let hi = n - 1;
  if (s <= line.s[0]) return [line.x[0], line.y[0]];
  if (s >= line.s[hi]) return [line.x[hi], line.y[hi]];
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (line.s[mid] <= s) lo = mid;
    else hi = mid;
  }
  const f = (s - line.s[lo]) / (line.s[hi] - line.s[lo]);
  return [line.x[lo] + f * (line.x[hi] - line.x[lo]), line.y[lo] + f * (line.y[hi] - line.y[lo])];
}

/**
 * The stretch of the downsampled line from lap distance `from` to `to` (m) as a polyline: the
 * exact end points and every line point between them, going forward and crossing the start line
 * when `to` < `from`.
 */
export function linePolyline(line: LayoutAnalysis["line"], from: number, to: number): [number, number][] {
  const n = line.s.length;
  const lap = line.s[n - 1];
  const pts: [number, number][] = [pointOnLine(line, from)];
  // The closing point repeats the first one (same place), so it is left out when wrapping.
  const add = (a: number, b: number, last: number) => {
    for (let i = 0; i < last; i++) if (line.s[i] > a && line.s[i] < b) pts.push([line.x[i], line.y[i]]);
  };
  if (from <= to) add(from, to, n);
  else {
    add(from, lap + 1, n - 1);
    pts.push([line.x[0], line.y[0]]);
    add(0, to, n - 1);
  }
  pts.push(pointOnLine(line, to));
  return pts;
}

/**
 * The overlay of an analysis for one class and skill level.
 * @throws RangeError naming `classId` or `skill` when the analysis has no such class or level.
 */
export function buildOverlay(
  analysis: LayoutAnalysis,
  classId: string,
  skill: SkillLevel = analysis.skill,
): AnalysisOverlay {
  const cls = analysis.classes.find((c) => c.classId === classId);
  if (!cls) throw new RangeError(`classId: the analysis has no class "${classId}"`);
  if (!SKILL_LEVELS.includes(skill)) throw new RangeError(`skill: must be one of ${SKILL_LEVELS.join(", ")}`);
  let min = Infinity;
  let max = -Infinity;
  for (const v of cls.lineSpeed) {
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return {
    classId,
    lapLength: analysis.lapLength,
    lapTime: cls.lapTime,
    closure: { ...analysis.closure },
    line: {
      x: analysis.line.x,
      y: analysis.line.y,
      speed: cls.lineSpeed,
      sectionIndex: analysis.line.sectionIndex,
    },
    speedRange: { min, max },
    jumps: cls.jumps.map((j) => overlayJump(j, skill)),
    hidden: (analysis.hiddenFromStand ?? []).map((h) => ({
      points: linePolyline(analysis.line, h.fromS, h.toS),
      length: h.length,
    })),
    laneConflicts: analysis.laneConflicts.map((c) => ({ a: c.a, b: c.b, distance: c.distance })),
    ruleFailures: analysis.rules.checks.filter((c) => c.status === "fail").map(ruleFailure),
  };
}
