/**
 * The whole analysis of a layout in one call (issue 4): geometry and plan checks, the rule
 * report, and per car class the lap (speed along it, lap time) and every jump analysed with its
 * verdict per skill level. The result is plain JSON-serialisable data (layout-analysis-types.ts);
 * `buildOverlay` (overlay.ts) turns it into what the plan view and the editor draw.
 *
 * With a cache (analysis-cache.ts) each jump's costly parts are remembered, so a repeat or an
 * edited layout recomputes only the jumps whose own inputs changed. Whole analyses are memoised
 * by the server (app/layouts/analysis-memo.server.ts, with this folder's hashing), not here.
 */
import type { JumpSection, LayoutDocument } from "../format/layout-document";
import { DEFAULT_SKILL_SIGMAS, DEFAULT_SPEED_SIGMAS, type SkillSigmas } from "../air/air-plan-robustness";
import { cacheKeyOf, hashOnce, type AnalysisCache } from "./analysis-cache";
import { carPreset, type CarParams } from "../format/cars";
import type { ResolvedSection } from "../track/geometry";
import { analyseJump } from "./jump-analysis";
import type { JumpProfile } from "../track/jump-profile";
import { pointAt } from "../verdict/jump-turn";
import { ballisticJumpWindow, STANDARD_GRAVITY, type JumpWindow } from "../track/lap-jumps";
import type { ClassAnalysis, LayoutAnalysis } from "./layout-analysis-types";
import { GUIDANCE_SET_IDS, quotedList, SKILL_LEVELS, type GuidanceSetId, type SkillLevel } from "../words";
import { measureLayout, ruleMeasurements, type LayoutMeasures } from "../track/layout-measure";
import { jumpRuleMeasurements } from "./jump-rules";
import { marshalRisk } from "../marshal/marshal-plan";
import { marshalSettings, type MarshalSettings } from "../marshal/settings";
import { checkRules, GUIDANCE_SETS, guidanceValues, type GuidanceOverrides } from "../track/rules";
import { lapSpeed } from "../track/speed";
import {
  DEFAULT_FAIL_COST_S,
  DEFAULT_TURN_LOOKAHEAD_S,
  DEFAULT_VERDICT_THRESHOLDS,
  type VerdictThresholds,
} from "../verdict/verdict";

export interface AnalyseOptions {
  /** Car classes to analyse (default: the layout's own `carClasses`). */
  classIds?: readonly string[];
  /** Skill level for each jump's `verdict` (default "club"); every level is in `verdicts`. */
  skill?: SkillLevel;
  /** Guidance set for the rule checks (default: the layout's own `guidance`). */
  guidance?: GuidanceSetId;
  /** A club's own values for the rule checks. */
  overrides?: GuidanceOverrides;
  /** Memo of each jump's costly parts, for repeats and edits; without one everything is computed. */
  cache?: AnalysisCache;
  /** A club's own car classes by id (checked before the presets). Do not change one after passing it. */
  cars?: Readonly<Record<string, CarParams>>;
  /** Timing error per skill level, s. */
  skillSigmas?: SkillSigmas;
  /** Takeoff speed spread per skill level, m/s (default 0.3 / 0.15 / 0.05, estimates). */
  speedSigmas?: SkillSigmas;
  /**
   * The values that decide the verdicts, SI units and radians (defaults:
   * DEFAULT_VERDICT_THRESHOLDS); a club's smallest worthwhile gain and turn of the nose go here.
   */
  thresholds?: Partial<VerdictThresholds>;
  /** Look-ahead time for "lands into a turn", s (default 0.5). */
  lookaheadS?: number;
  /** Time lost to a failed landing, s (default 3). */
  failCost?: number;
  /** Monte Carlo seed of the plans' success rates (default 1). */
  seed?: number;
  /**
   * Adds the marshal risk as `risk` with these marshal settings (`{}` for the defaults); left out
   * (null) by default: it doubles the time of an edit's re-analysis (docs/decisions/0704).
   */
  marshal?: Partial<MarshalSettings> | false;
}

/** Shown with every analysis. */
export const ANALYSIS_NOTE =
  "Model estimates from the drawing and the car class data, not measurements and not a safety certification. " +
  "The sanctioning body's current rulebook and the club's own risk assessment decide.";

/** Spacing of the downsampled centre line in the result, m. */
export const LINE_SPACING = 0.5;

interface AnalysisSettings {
  skillSigmas: SkillSigmas;
  speedSigmas: SkillSigmas;
  lookaheadS: number;
  failCost: number;
  thresholds: VerdictThresholds;
  seed: number;
}

/** Refuses a threshold that is not a finite number of at least 0, naming it. */
function checkThresholds(t: VerdictThresholds): VerdictThresholds {
  for (const [key, value] of Object.entries(t))
    if (typeof value !== "number" || !Number.isFinite(value) || value < 0)
      throw new RangeError(`thresholds.${key}: must be a finite number of at least 0`);
  return t;
}

function resolveClasses(doc: LayoutDocument, options: AnalyseOptions): { id: string; car: CarParams }[] {
  const ids = options.classIds ?? doc.carClasses;
  const field = options.classIds ? "classIds" : "carClasses";
  if (ids.length === 0) throw new RangeError(`${field}: must name at least one car class`);
  return ids.map((id, i) => {
    const own =
      options.cars && Object.prototype.hasOwnProperty.call(options.cars, id) ? options.cars[id] : undefined;
    const car = own ?? carPreset(id);
    if (!car) throw new RangeError(`${field}[${i}]: unknown car class "${id}"`);
    return { id, car };
  });
}

/** Sample indices about LINE_SPACING apart, with the closing sample. */
function downsample(count: number, s: Float64Array): number[] {
  const out: number[] = [];
  let next = 0;
  for (let i = 0; i < count - 1; i++) {
    if (s[i] >= next - 1e-9) {
      out.push(i);
      next = s[i] + LINE_SPACING;
    }
  }
  out.push(count - 1);
  return out;
}

function planSection(
  doc: LayoutDocument,
  m: LayoutMeasures,
  skill: SkillLevel,
  keep: number[],
  rules: LayoutAnalysis["rules"],
): Omit<LayoutAnalysis, "classes" | "risk"> {
  const { line } = m.geometry;
  const base: Omit<LayoutAnalysis, "classes" | "risk"> = {
    name: doc.name,
    lapLength: m.geometry.lapLength,
    closure: { gap: m.geometry.closure.gap, headingDeg: m.geometry.closure.headingDeg },
    trackWidth: doc.trackWidth,
    skill,
    line: {
      x: keep.map((i) => line.x[i]),
      y: keep.map((i) => line.y[i]),
      s: keep.map((i) => line.s[i]),
      sectionIndex: keep.map((i) => line.section[i]),
    },
    laneConflicts: m.laneConflicts.map((c) => {
      const b = pointAt(line, c.otherS);
      return { fromS: c.fromS, toS: c.toS, a: [c.x, c.y], b: [b.x, b.y], distance: c.centreDistance };
    }),
    outsideBoundary: m.outsideBoundary ? m.outsideBoundary.map((o) => ({ ...o })) : null,
    farthestFromStand: m.farthestFromStand ? { ...m.farthestFromStand } : null,
    hiddenFromStand: m.hiddenFromStand ? m.hiddenFromStand.map((h) => ({ ...h })) : null,
    startStraight: { length: m.startStraight.length, sectionIds: [...m.startStraight.sectionIds] },
    rules,
    note: ANALYSIS_NOTE,
  };
  return base;
}

/**
 * Analyses a layout document for its car classes (or `options.classIds`).
 * @returns lengths m, speeds m/s, times s, angles deg; plain data, shared with the cache (read-only).
 * @throws RangeError naming the field for an unknown class, skill or rule override.
 */
export function analyseLayout(doc: LayoutDocument, options: AnalyseOptions = {}): LayoutAnalysis {
  const skill = options.skill ?? "club";
  if (!SKILL_LEVELS.includes(skill)) throw new RangeError(`skill: must be one of ${SKILL_LEVELS.join(", ")}`);
  const classes = resolveClasses(doc, options);
  const failCost = options.failCost ?? options.thresholds?.failCost ?? DEFAULT_FAIL_COST_S;
  const settings: AnalysisSettings = {
    skillSigmas: options.skillSigmas ?? DEFAULT_SKILL_SIGMAS,
    speedSigmas: options.speedSigmas ?? DEFAULT_SPEED_SIGMAS,
    lookaheadS: options.lookaheadS ?? DEFAULT_TURN_LOOKAHEAD_S,
    failCost,
    thresholds: checkThresholds({ ...DEFAULT_VERDICT_THRESHOLDS, ...options.thresholds, failCost }),
    seed: options.seed ?? 1,
  };
  const guidance = options.guidance ?? doc.guidance;
  if (!Object.prototype.hasOwnProperty.call(GUIDANCE_SETS, guidance))
    throw new RangeError(`guidance: must be ${quotedList(GUIDANCE_SET_IDS)}`);
  const overrides = options.overrides ?? {};
  const limits = guidanceValues(guidance, overrides);
  const rulesFor = (m: LayoutMeasures, classes: readonly ClassAnalysis[]) =>
    checkRules(
      { ...ruleMeasurements(doc, m), ...jumpRuleMeasurements(classes, limits) },
      guidance,
      overrides,
    );
  const marshal =
    options.marshal === undefined || options.marshal === false ? false : marshalSettings(options.marshal);
  const riskFor: RiskFor = (analysis, jumpWindow) =>
    marshal === false
      ? null
      : marshalRisk(
          doc,
          analysis,
          classes.map((c, i) => ({ ...c, analysis: analysis.classes[i] })),
          marshal,
          { suggest: false, jumpWindow },
        );
  return computeAnalysis(doc, classes, skill, rulesFor, riskFor, settings, options.cache);
}

/** The marshal risk of the analysis so far, with the lap model's (memoised) speed windows. */
type RiskFor = (
  analysis: Omit<LayoutAnalysis, "risk">,
  jumpWindow: (p: JumpProfile) => JumpWindow,
) => LayoutAnalysis["risk"];

function computeAnalysis(
  doc: LayoutDocument,
  classes: { id: string; car: CarParams }[],
  skill: SkillLevel,
  rulesFor: (m: LayoutMeasures, classes: readonly ClassAnalysis[]) => LayoutAnalysis["rules"],
  riskFor: RiskFor,
  settings: AnalysisSettings,
  cache: AnalysisCache | undefined,
): LayoutAnalysis {
  const m = measureLayout(doc);
  const keep = downsample(m.geometry.line.count, m.geometry.line.s);
  const { sections, line } = m.geometry;
  const g = STANDARD_GRAVITY;
  const windowOf = (p: JumpProfile) =>
    cache
      ? cache.memo(cacheKeyOf("lap-window", hashOnce(p), g), () => ballisticJumpWindow(p, g))
      : ballisticJumpWindow(p, g);
  const jumpWindow = cache ? (_s: ResolvedSection, p: JumpProfile) => windowOf(p) : undefined;
  const result: ClassAnalysis[] = classes.map(({ id, car }) => {
    const lap = lapSpeed(m.geometry, car, { g, jumpWindow });
    const jumps = lap.jumps.map((j) =>
      analyseJump(
        { doc: doc.sections[j.sectionIndex] as JumpSection, sections, line, speed: lap.speed, lap: j, car },
        { skill, cache, g, ...settings },
      ),
    );
    return {
      classId: id,
      label: car.label,
      lapTime: lap.lapTime,
      speed: { min: lap.minSpeed, max: lap.maxSpeed, mean: line.length / lap.lapTime },
      lineSpeed: keep.map((i) => lap.speed[i]),
      tightTurns: lap.tightTurns.map((t) => ({ ...t })),
      jumps,
      cannotClear: jumps.filter((j) => j.cannotClear).map((j) => j.sectionId),
    };
  });
  const analysis = { ...planSection(doc, m, skill, keep, rulesFor(m, result)), classes: result };
  return { ...analysis, risk: riskFor(analysis, windowOf) };
}
