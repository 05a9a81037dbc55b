/**
 * One jump analysed for one car class (engine.md sections 3, 5 and 6): the flight at the lap's
 * planned takeoff speed with air drag, the speed window, the equivalent fall height, where the
 * car touches down in plan and along the lap, the turn it lands into (or none), the mid-air
 * set-up plan (once per jump and class; the skill levels share it) and the verdict per skill
 * level. The costly parts (window, flight, plan) go through the analysis cache when one is given.
 * Results are estimates from a model, not a safety certification.
 */
import type { JumpSection } from "../format/layout-document";
import { planAirSetup } from "../air/air-plan";
import { DEFAULT_SKILL_SIGMAS, DEFAULT_SPEED_SIGMAS, type SkillSigmas } from "../air/air-plan-robustness";
import { cacheKeyOf, hashOnce, type AnalysisCache } from "./analysis-cache";
import type { CarParams } from "../format/cars";
import { flyJump, type FlightResult } from "../flight/flight";
import { analyseWhoops } from "../flight/whoops";
import type { CentreLine, ResolvedSection } from "../track/geometry";
import { STANDARD_GRAVITY } from "../track/lap-jumps";
import { findLandingTurn, lineIndexAt, pointAt } from "../verdict/jump-turn";
import { describeVerdicts, type VerdictInputs } from "../verdict/jump-verdicts";
import type { JumpAnalysis } from "./layout-analysis-types";
import type { SkillLevel } from "../words";
import type { JumpLap } from "../track/speed";
import {
  DEFAULT_TURN_LOOKAHEAD_S,
  DEFAULT_VERDICT_THRESHOLDS,
  type VerdictThresholds,
} from "../verdict/verdict";
import { airtimePerSpeed, dragWindow, flightBase, planSummary } from "./jump-flight";

/** The jump and its surroundings, as the lap model left them for one car class. */
export interface JumpContext {
  /** The jump's section in the layout document (name and preset). */
  doc: JumpSection;
  sections: readonly ResolvedSection[];
  line: CentreLine;
  /** Lap-model speed at each centre-line sample for this car, m/s. */
  speed: ArrayLike<number>;
  /** The lap model's record of this jump. */
  lap: JumpLap;
  car: CarParams;
}

export interface JumpAnalysisOptions {
  /** Skill level for `verdict` (default "club"). */
  skill?: SkillLevel;
  /** Timing error per skill level, s (default 60 / 35 / 15 ms). */
  skillSigmas?: SkillSigmas;
  /** "Lands into a turn": the turn starts within the distance covered in this time at landing speed, s. */
  lookaheadS?: number;
  /** Time lost to a failed landing, s (default 3). */
  failCost?: number;
  /** The values that decide the verdicts (defaults: DEFAULT_VERDICT_THRESHOLDS; `failCost` above wins). */
  thresholds?: Partial<VerdictThresholds>;
  /** Takeoff speed spread per skill level, m/s (default 0.3 / 0.15 / 0.05). */
  speedSigmas?: SkillSigmas;
  /** Gravity, m/s^2. */
  g?: number;
  /** Monte Carlo seed of the plan's success rates. */
  seed?: number;
  cache?: AnalysisCache;
}

const DEG = 180 / Math.PI;
/** Takeoff speeds are rounded to this before flying, m/s, so near-equal inputs share a cache entry. */
export const TAKEOFF_SPEED_STEP = 0.01;

/** Runs `compute` through the cache when there is one. */
function memo<T>(
  cache: AnalysisCache | undefined,
  kind: string,
  parts: () => (string | number)[],
  compute: () => T,
): T {
  return cache ? cache.memo(cacheKeyOf(kind, ...parts()), compute) : compute();
}

/**
 * Analyses one jump for one car class.
 * @returns speeds m/s, distances m, times s, angles deg, the plan and a verdict per skill level.
 */
export function analyseJump(ctx: JumpContext, options: JumpAnalysisOptions = {}): JumpAnalysis {
  const { doc, sections, line, lap, car } = ctx;
  const section = sections[lap.sectionIndex];
  const profile = section.profile;
  if (!profile) throw new RangeError(`sections[${lap.sectionIndex}]: is not a jump`);
  const g = options.g ?? STANDARD_GRAVITY;
  const cache = options.cache;
  const sigmas = options.skillSigmas ?? DEFAULT_SKILL_SIGMAS;
  const speedSigmas = options.speedSigmas ?? DEFAULT_SPEED_SIGMAS;
  const thresholds: VerdictThresholds = {
    ...DEFAULT_VERDICT_THRESHOLDS,
    ...options.thresholds,
    ...(options.failCost === undefined ? {} : { failCost: options.failCost }),
  };
  const lookaheadS = options.lookaheadS ?? DEFAULT_TURN_LOOKAHEAD_S;
  const lipD = profile.d[profile.lipIndex];
  const lipPoint = pointAt(line, lap.lipS);
  const profileKey = hashOnce(profile);
  const result: JumpAnalysis = {
    sectionId: section.id,
    sectionIndex: section.index,
    name: doc.name ?? null,
    preset: doc.preset,
    lip: { d: lipD, s: lap.lipS, x: lipPoint.x, y: lipPoint.y, z: profile.h[profile.lipIndex] },
    faceAngleDeg: profile.faceAngle * DEG,
    takeoffSpeed: 0,
    approachMaxSpeed: lap.approachMaxSpeed,
    window: null,
    sweetSpotSpeed: null,
    cannotClear: false,
    flownOverBy: lap.flownOverBy,
    airtime: 0,
    apex: null,
    landing: null,
    equivalentFallHeight: 0,
    turn: null,
    nextTurnDistance: null,
    plan: null,
    whoops: null,
    verdicts: null!,
    verdict: null!,
  };
  const whoopsRow = doc.preset === "whoops";
  // A whoops row gets its own speeds (flight/whoops.ts), not one landing's window.
  const w = whoopsRow
    ? { window: null, sweetSpot: null }
    : memo(
        cache,
        "window",
        () => [profileKey, car.massKg, car.cdA, g],
        () => dragWindow(profile, car, g),
      );
  result.window = w.window ? { ...w.window } : null;
  result.sweetSpotSpeed = w.sweetSpot;
  // engine.md section 2 with the flight model's drag: the sweet-spot speed, or the most the approach allows.
  const approach = lap.approachMaxSpeed;
  const planned = w.sweetSpot === null ? approach : Math.min(w.sweetSpot, approach);
  const takeoffSpeed = Math.round(planned / TAKEOFF_SPEED_STEP) * TAKEOFF_SPEED_STEP;
  result.takeoffSpeed = lap.flownOverBy === null ? takeoffSpeed : 0;
  result.cannotClear =
    !whoopsRow && lap.flownOverBy === null && (w.window === null || approach < w.window.min);

  const inputs: VerdictInputs = {
    skill: options.skill ?? "club",
    thresholds,
    fourWd: car.drive === "4wd",
    result,
  };
  if (lap.flownOverBy !== null || !(takeoffSpeed > 0)) return describeVerdicts(inputs);
  if (doc.preset === "whoops") {
    // Rolling through is always possible: a whoops row is never "cannot clear".
    const drag = car.cdA > 0 ? { massKg: car.massKg, cdA: car.cdA } : undefined;
    const w = memo(
      cache,
      "whoops",
      () => [profileKey, doc.count, doc.spacing, doc.bumpHeight, car.massKg, car.cdA, g, approach],
      () => analyseWhoops(doc, profile.faceAngle, approach, drag, g),
    );
    whoopsResult(result, w, lipD, section.startS, line);
    return describeVerdicts(inputs);
  }

  const flight: FlightResult = memo(
    cache,
    "flight",
    () => [profileKey, car.massKg, car.cdA, g, takeoffSpeed],
    () => flyJump({ ...flightBase(profile, car, g), speed: takeoffSpeed }),
  );
  const td = flight.landing;
  const tdS = (section.startS + td.x) % line.length;
  const tdPoint = pointAt(line, tdS);
  const rollOutSpeed = td.speed * Math.max(0, Math.cos(td.flightPathRad - td.surfaceSlopeRad));
  result.airtime = flight.airtime;
  result.apex = { d: flight.apex.x, z: flight.apex.z, t: flight.apex.t };
  result.landing = {
    d: td.x,
    s: tdS,
    x: tdPoint.x,
    y: tdPoint.y,
    z: td.z,
    speed: td.speed,
    rollOutSpeed,
    flightPathDeg: td.flightPathRad * DEG,
    surfaceSlopeDeg: td.surfaceSlopeRad * DEG,
    normalSpeed: td.normalSpeed,
    landedOn: flight.landedOn ?? "ramp",
  };
  result.equivalentFallHeight = td.equivalentFallHeight;
  const found = findLandingTurn(sections, line.length, tdS, rollOutSpeed, lookaheadS);
  result.nextTurnDistance = found ? found.distance : null;
  if (found?.landsInto) {
    const entryS = (line.s[line.sectionStart[found.sectionIndex]] + found.passed) % line.length;
    result.turn = {
      sectionId: sections[found.sectionIndex].id,
      sectionIndex: found.sectionIndex,
      distance: found.distance,
      lookahead: rollOutSpeed * lookaheadS,
      side: found.side,
      angleDeg: found.angle * DEG,
      radius: found.radius,
      entrySpeed: ctx.speed[lineIndexAt(line, entryS)],
    };
  }
  const turn = result.turn;
  const wantsPlan =
    !result.cannotClear &&
    turn !== null &&
    turn.angleDeg / DEG >= thresholds.minTurnAngle &&
    flight.airtime >= thresholds.minAirtime;
  if (wantsPlan) {
    const turnAngleRad = Math.min(turn.angleDeg / DEG, Math.PI / 4);
    const pitchChangeRad = td.surfaceSlopeRad - profile.faceAngle;
    const seed = options.seed ?? 1;
    const plan = memo(
      cache,
      "plan",
      () => [
        hashOnce(car),
        takeoffSpeed,
        flight.airtime,
        turn.side,
        turnAngleRad,
        pitchChangeRad,
        profile.faceAngle,
        sigmas.novice,
        sigmas.club,
        sigmas.expert,
        speedSigmas.novice,
        speedSigmas.club,
        speedSigmas.expert,
        turn.radius / turn.entrySpeed,
        thresholds.failCost,
        thresholds.minNoseTurn,
        seed,
      ],
      () =>
        planSummary(
          planAirSetup({
            car,
            speed: takeoffSpeed,
            airtime: flight.airtime,
            turn: turn.side,
            turnAngleRad,
            pitchChangeRad,
            takeoffPitchRad: profile.faceAngle,
            airtimePerSpeed: airtimePerSpeed(profile, car, g, takeoffSpeed),
            skillSigmas: sigmas,
            speedSigmas,
            value: {
              secondsPerRad: turn.radius / turn.entrySpeed,
              failCost: thresholds.failCost,
              minYawRad: thresholds.minNoseTurn,
            },
            seed,
          }),
          speedSigmas,
        ),
    );
    result.plan = plan;
  }
  return describeVerdicts(inputs);
}

/** Fills a whoops row's flight fields from the way through it this car's approach allows. */
function whoopsResult(
  r: JumpAnalysis,
  w: ReturnType<typeof analyseWhoops>,
  lipD: number,
  startS: number,
  line: CentreLine,
): void {
  r.cannotClear = false;
  r.takeoffSpeed = Math.round(w.speed / TAKEOFF_SPEED_STEP) * TAKEOFF_SPEED_STEP;
  r.airtime = w.airtime;
  r.equivalentFallHeight = w.equivalentFallHeight;
  const hop = w.technique === "triples" ? w.triples : w.doubles;
  if (w.technique === "doubles" || w.technique === "triples")
    r.window = hop?.window ? { ...hop.window, maxIsSearchLimit: false } : null;
  if (w.flight) {
    const f = w.flight;
    const td = f.landing;
    const d = lipD + td.x;
    const s = (startS + d) % line.length;
    const p = pointAt(line, s);
    r.apex = { d: lipD + f.apex.x, z: f.apex.z, t: f.apex.t };
    r.landing = {
      d,
      s,
      x: p.x,
      y: p.y,
      z: td.z,
      speed: td.speed,
      rollOutSpeed: td.speed * Math.max(0, Math.cos(td.flightPathRad - td.surfaceSlopeRad)),
      flightPathDeg: td.flightPathRad * DEG,
      surfaceSlopeDeg: td.surfaceSlopeRad * DEG,
      normalSpeed: td.normalSpeed,
      landedOn: "ramp",
    };
  } else {
    r.apex = null;
    r.landing = null;
  }
  r.whoops = {
    count: w.count,
    spacing: w.spacing,
    bumpHeight: w.bumpHeight,
    skimSpeed: w.skimSpeed,
    doubles: { jumps: w.doubles.jumps, window: w.doubles.window, sweetSpotSpeed: w.doubles.sweetSpotSpeed },
    triples: w.triples
      ? { jumps: w.triples.jumps, window: w.triples.window, sweetSpotSpeed: w.triples.sweetSpotSpeed }
      : null,
    technique: w.technique,
    speed: w.speed,
    airtime: w.airtime,
    equivalentFallHeight: w.equivalentFallHeight,
  };
}
