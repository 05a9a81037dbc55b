/**
 * The mid-air set-up plan (engine.md section 5): the steering timeline that turns the nose toward
 * the coming turn as far as is useful while the car still lands flat, together with the brake or
 * throttle pulse that brings the pitch round to the landing (searched jointly: air-plan-joint.ts),
 * the plan's timing windows and its success rate per skill level with the driver's steering,
 * pulse and takeoff-speed errors (air-plan-errors.ts). A linear guide finds the plan's shape; the
 * full attitude model then corrects its amounts, and every number reported comes from a full
 * simulation. When levelling the car and turning it cannot both be had, the plan says what
 * turning alone would give and what it gives up.
 */
import { refineSearch, searchJoint, type JointCandidate } from "./air-plan-joint";
import { bestScale, scaled } from "./air-plan-value";
import { pitchPulse, pulseSupplied, pulseTimeline, type PitchPulse } from "./air-plan-pulse";
import { DEFAULT_SKILL_SIGMAS, DEFAULT_SPEED_SIGMAS } from "./air-plan-robustness";
import { planErrors } from "./air-plan-errors";
import { refineAmounts, timeline, type PlanSim, type RefineOptions } from "./air-plan-refine";
import type { BlockPlan } from "./air-plan-search";
import type { AirPlan, AirPlanInput, PlanInfeasibleReason, UnlevelledPlan } from "./air-plan-types";
import { checkCar, simulateAttitude } from "./attitude";

export type * from "./air-plan-types";

const DEG = Math.PI / 180;
/** Wheels must be straight this long before touchdown, s. */
export const STRAIGHT_BEFORE_TOUCHDOWN = 0.02;
const SEARCH_DT = 0.008;
/** Search rounds that re-size the pitch pulse for the pitch the steering adds. */
const PULSE_ROUNDS = 3;
/** Shortest steering phase a driver can hold, s (an estimate). */
export const MIN_PHASE = 0.1;
/** Default roll and pitch tolerances of a clean landing, rad (estimates: 5 deg and 10 deg). */
export const DEFAULT_ROLL_TOLERANCE = 5 * DEG;
export const DEFAULT_PITCH_TOLERANCE = 10 * DEG;

function validate(input: AirPlanInput): void {
  checkCar(input.car);
  const pos = (v: number | undefined, name: string, optional = false) => {
    if (optional && v === undefined) return;
    if (typeof v !== "number" || !Number.isFinite(v) || !(v > 0))
      throw new RangeError(`${name} must be a positive finite number`);
  };
  const finite = (v: number | undefined, name: string) => {
    if (v !== undefined && !Number.isFinite(v)) throw new RangeError(`${name} must be a finite number`);
  };
  pos(input.speed, "speed");
  pos(input.airtime, "airtime");
  if (input.turn !== "left" && input.turn !== "right") throw new RangeError('turn must be "left" or "right"');
  pos(input.rollToleranceRad, "rollToleranceRad", true);
  pos(input.pitchToleranceRad, "pitchToleranceRad", true);
  pos(input.maxYawRad, "maxYawRad", true);
  pos(input.turnAngleRad, "turnAngleRad", true);
  finite(input.pitchChangeRad, "pitchChangeRad");
  finite(input.takeoffPitchRad, "takeoffPitchRad");
  if (
    input.airtimePerSpeed !== undefined &&
    !(input.airtimePerSpeed >= 0 && Number.isFinite(input.airtimePerSpeed))
  )
    throw new RangeError("airtimePerSpeed must be 0 or a positive finite number");
}

/**
 * Plans the mid-air set-up for a jump that lands into a turn.
 * @param input car (SI), takeoff speed (m/s), airtime (s), side of the turn, tolerances (rad),
 *   yaw limits (rad), pitch change wanted and takeoff pitch (rad), airtime per speed (s per m/s),
 *   Monte Carlo seed, timing sigmas (s) and takeoff speed spreads (m/s).
 * @returns the steering and pulse timelines, the landing attitude (rad), timing windows (ms),
 *   success rates (0..1) per skill level, the error that matters most, and what turning without
 *   the pitch change would give when levelling and turning cannot both be had.
 */
export function planAirSetup(input: AirPlanInput): AirPlan {
  validate(input);
  const { car, speed, airtime: T } = input;
  const tol = input.rollToleranceRad ?? DEFAULT_ROLL_TOLERANCE;
  const dir = input.turn === "left" ? 1 : -1;
  const yawCap = Math.min(45 * DEG, input.maxYawRad ?? Infinity, input.turnAngleRad ?? Infinity);
  const sigmas = input.skillSigmas ?? DEFAULT_SKILL_SIGMAS;
  const pitchSet = input.pitchChangeRad !== undefined;
  const wanted = input.pitchChangeRad ?? 0;
  const pitchTol = input.pitchToleranceRad ?? DEFAULT_PITCH_TOLERANCE;
  const takeoffPitch = input.takeoffPitchRad ?? 0;
  const rate = Math.PI / 3 / car.servoSecondsPer60;
  const lock = car.steeringLockRad;
  // The rear wheels leave the lip a wheelbase after the front ones.
  const t0 = Math.max(0.02, (car.wheelbase ?? 0.3) / speed);
  const tLast = T - STRAIGHT_BEFORE_TOUCHDOWN - lock / rate;
  const sim: PlanSim = (steering, accel, dt = SEARCH_DT) =>
    simulateAttitude(car, {
      speed,
      duration: T,
      steering,
      rearWheelAccel: accel,
      dt,
      initialPitchRad: takeoffPitch,
    });

  let pulse = pitchPulse(car, speed, T, wanted, t0);
  let aim = wanted;
  const empty: AirPlan = {
    feasible: false,
    reason: null,
    steering: [],
    rearWheelAccel: pulseTimeline(pulse),
    yawRad: 0,
    pitchRad: 0,
    rollRad: 0,
    targetYawRad: 0,
    pitchChangeRad: wanted,
    pitchAimRad: wanted,
    takeoffPitchRad: takeoffPitch,
    pitchPulse: pulse,
    switches: [],
    pulseSwitches: [],
    timingWindowMs: 0,
    successRate: { novice: 0, club: 0, expert: 0 },
    successAlone: {
      steering: { novice: 0, club: 0, expert: 0 },
      pulse: { novice: 0, club: 0, expert: 0 },
      speed: { novice: 0, club: 0, expert: 0 },
    },
    mainError: { novice: null, club: null, expert: null },
    rollToleranceRad: tol,
    pitchToleranceRad: pitchSet ? pitchTol : null,
    withoutLevelling: null,
    tradeOff: [],
  };
  const straight = (reason: PlanInfeasibleReason, extra: Partial<AirPlan> = {}): AirPlan => {
    const accel = pulseTimeline(pulse);
    const r = sim([], accel, 0.001);
    const flat = Math.abs(r.rollRad) <= tol ? 1 : 0;
    const rates = { novice: flat, club: flat, expert: flat };
    return {
      ...empty,
      ...extra,
      reason,
      rearWheelAccel: accel,
      pitchPulse: pulse,
      pitchAimRad: aim,
      yawRad: r.yawRad,
      pitchRad: r.pitchRad,
      rollRad: r.rollRad,
      successRate: rates,
      successAlone: { steering: rates, pulse: rates, speed: rates },
    };
  };
  if (!(car.frontWheel.spinInertia > 0) || !(car.rearWheel.spinInertia >= 0))
    return straight("no-wheel-spin");
  if (tLast - t0 < MIN_PHASE) return straight("not-enough-airtime");

  const search = { t0, tLast, lock, dir, yawCap, rollTol: tol, sigma: sigmas.club, minPhase: MIN_PHASE };
  const jointInput = {
    car,
    speed,
    airtime: T,
    takeoffPitchRad: takeoffPitch,
    pitchChangeRad: pitchSet ? wanted : 0,
    pitchTolRad: pitchTol,
    search,
  };
  const joint = searchJoint(jointInput);
  aim = pitchSet ? joint.aimRad || wanted : 0;
  const refineOptions: RefineOptions = {
    dir,
    lock,
    rate,
    t0,
    tLast: T - STRAIGHT_BEFORE_TOUCHDOWN,
    yawCap,
    minPhase: MIN_PHASE,
  };
  const speedSigmas = input.speedSigmas ?? DEFAULT_SPEED_SIGMAS;
  const perSpeed = input.airtimePerSpeed ?? T / speed;
  const fit = (screened: JointCandidate, useValue: boolean) => {
    const c = refineSearch(jointInput, screened);
    if (!c.plan) return null;
    let plan = c.plan;
    if (useValue && input.value) {
      const level = input.rankFor ?? "expert";
      const s = bestScale(c.guide, plan, {
        value: input.value,
        sigma: sigmas[level],
        speedSigma: speedSigmas[level],
        airtimePerSpeed: perSpeed + T / speed,
        rollTol: tol,
        pitchOk: 1,
        yawCap,
      });
      plan = scaled(plan, s, yawCap);
    }
    return refineWithPulse({ ...c, plan }, { sim, refineOptions, pitchSet, aim, takeoffPitch, input });
  };
  let chosen: Fitted | null = null;
  for (const c of joint.ranked.slice(0, 3)) {
    chosen = fit(c, true);
    if (chosen) break;
  }
  if (joint.ranked[0]) pulse = chosen?.pulse ?? joint.ranked[0].pulse;
  // Turning alone, when it clearly turns further than the level plan (or the level plan has none).
  let unlevelled: UnlevelledPlan | null = null;
  const freeNeeded = pitchSet && joint.free.plan && (joint.tradeOff.length > 0 || !chosen);
  if (freeNeeded) {
    const free = fit(joint.free, false);
    const levelYaw = chosen ? chosen.yaw : 0;
    if (free && free.yaw > levelYaw + Math.max(2 * DEG, 0.25 * levelYaw)) {
      const steering = timeline(free.plan);
      const r = sim(steering, [], 0.001);
      unlevelled = { steering, yawRad: r.yawRad, pitchRad: r.pitchRad, rollRad: r.rollRad };
    }
  }
  const extra = { withoutLevelling: unlevelled, tradeOff: unlevelled ? joint.tradeOff : [] };
  if (!chosen) return straight(unlevelled ? "levelling-costs-turn" : "no-useful-yaw", extra);

  const accel = pulseTimeline(chosen.pulse);
  const steering = timeline(chosen.plan);
  const final = sim(steering, accel, 0.001);
  if (Math.abs(final.rollRad) > tol) return straight("cannot-land-flat", extra);
  const errors = planErrors({
    sim,
    car,
    speed,
    airtime: T,
    takeoffPitch,
    steering,
    pulse: chosen.pulse,
    airtimePerSpeed: perSpeed,
    clean: { rollTol: tol, pitchTol: pitchSet ? pitchTol : null, pitchAim: takeoffPitch + aim },
    sigmas,
    speedSigmas,
    seed: input.seed ?? 1,
  });
  return {
    ...empty,
    ...extra,
    ...errors,
    feasible: true,
    steering,
    rearWheelAccel: accel,
    yawRad: final.yawRad,
    pitchRad: final.pitchRad,
    rollRad: final.rollRad,
    targetYawRad: dir * chosen.targetYaw,
    pitchAimRad: aim,
    pitchPulse: chosen.pulse,
  };
}

interface Fitted {
  plan: BlockPlan;
  pulse: PitchPulse;
  /** Yaw toward the turn in the search model, rad. */
  yaw: number;
  targetYaw: number;
}

/**
 * Corrects a candidate's steering in the full model, re-sizing its pulse (same start and
 * strength) for the pitch the steering adds, within 0.5 deg of the aim.
 */
function refineWithPulse(
  c: JointCandidate,
  k: {
    sim: PlanSim;
    refineOptions: RefineOptions;
    pitchSet: boolean;
    aim: number;
    takeoffPitch: number;
    input: AirPlanInput;
  },
): Fitted | null {
  const { car, speed, airtime: T } = k.input;
  let pulse = c.pulse;
  let plan = c.plan!;
  let found: Fitted | null = null;
  for (let round = 0; round < PULSE_ROUNDS; round++) {
    const next = refineAmounts(k.sim, plan, pulseTimeline(pulse), {
      ...k.refineOptions,
      scaleRounds: round === 0 ? 4 : 0,
    });
    if (!next) {
      if (round === 0) return null;
      break;
    }
    plan = next.plan;
    found = { plan, pulse, yaw: next.plan.yaw, targetYaw: next.targetYaw };
    if (!k.pitchSet || c.pulse.kind === "none") break;
    const pitchError = next.pitch - k.takeoffPitch - k.aim;
    if (Math.abs(pitchError) < 0.5 * DEG || pulse.limited || round === PULSE_ROUNDS - 1) break;
    const resized = pitchPulse(
      car,
      speed,
      T,
      pulseSupplied(car, T, pulse) - pitchError,
      pulse.start,
      pulse.strength,
    );
    if (resized.kind !== pulse.kind || resized.start + resized.duration >= T) break;
    pulse = resized;
  }
  return found;
}
