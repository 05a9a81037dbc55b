/**
 * The mid-air set-up plan (engine.md section 5): the steering timeline that turns the nose toward
 * the coming turn as far as is useful while the car still lands flat, the brake or throttle pulse
 * that brings the pitch round to the landing, the plan's timing window and its success rate per
 * skill level. A linear guide finds the plan's shape; the full attitude model then corrects its
 * amounts, and every number reported comes from a full simulation.
 */
import { buildLinearGuide } from "./air-plan-linear";
import {
  drivenSpinInertia,
  pitchPulse,
  pulseTimeline,
  type PitchPulse,
  type PulseLimits,
} from "./air-plan-pulse";
import {
  DEFAULT_SKILL_SIGMAS,
  rollModel,
  successRates,
  timingWindows,
  type SkillSigmas,
  type SwitchWindow,
} from "./air-plan-robustness";
import { searchBlocks, type BlockPlan } from "./air-plan-search";
import { checkCar, simulateAttitude, type AttitudeCar } from "./attitude";
import { compileWheel } from "./attitude-inputs";
import { refineAmounts, timeline, type PlanSim } from "./air-plan-refine";

export type TurnSide = "left" | "right";

export interface AirPlanInput {
  car: AttitudeCar & PulseLimits & { wheelbase?: number };
  /** Takeoff speed, m/s. */
  speed: number;
  /** Time in the air, s. */
  airtime: number;
  /** Side of the turn the car lands into. */
  turn: TurnSide;
  /** Largest acceptable |roll| at touchdown, rad (default 5 deg). */
  rollToleranceRad?: number;
  /** Most yaw wanted, rad (default and ceiling 45 deg). */
  maxYawRad?: number;
  /** The turn's angle, rad: the nose is never turned further (default: no limit below 45 deg). */
  turnAngleRad?: number;
  /** Pitch change the flight should supply, rad, nose up positive (landing slope minus face angle). */
  pitchChangeRad?: number;
  /** Monte Carlo seed (default 1). */
  seed?: number;
  /** Timing error per skill level, s (default 60 / 35 / 15 ms). */
  skillSigmas?: SkillSigmas;
}

export type PlanInfeasibleReason =
  "no-wheel-spin" | "not-enough-airtime" | "no-useful-yaw" | "cannot-land-flat";

export interface AirPlan {
  feasible: boolean;
  reason: PlanInfeasibleReason | null;
  /** Steering targets [t s, angle rad], positive = left; the form `simulateAttitude` reads. */
  steering: Array<[number, number]>;
  /** Driven-wheel acceleration [t s, rad/s^2] for the pitch pulse; the form `simulateAttitude` reads. */
  rearWheelAccel: Array<[number, number]>;
  /** Landing attitude the plan gives (full model, 1 ms steps), rad. */
  yawRad: number;
  pitchRad: number;
  rollRad: number;
  /** Yaw the search aimed for, rad (signed: positive = nose left). */
  targetYawRad: number;
  /** Pitch change asked for, rad (0 when none was given). */
  pitchChangeRad: number;
  pitchPulse: PitchPulse;
  /** Each steering switch with how far it may move, ms. */
  switches: SwitchWindow[];
  /** The tightest switch's whole window (early + late), ms. */
  timingWindowMs: number;
  successRate: SkillSigmas;
  rollToleranceRad: number;
}

const DEG = Math.PI / 180;
/** Wheels must be straight this long before touchdown, s. */
export const STRAIGHT_BEFORE_TOUCHDOWN = 0.02;
const SEARCH_DT = 0.004;
/** Search rounds that re-size the pitch pulse for the pitch the steering adds. */
const PULSE_ROUNDS = 3;
/** Shortest steering phase a driver can hold, s (an estimate). */
export const MIN_PHASE = 0.1;

function validate(input: AirPlanInput): void {
  checkCar(input.car);
  const pos = (v: number | undefined, name: string, optional = false) => {
    if (optional && v === undefined) return;
    if (typeof v !== "number" || !Number.isFinite(v) || !(v > 0))
      throw new RangeError(`${name} must be a positive finite number`);
  };
  pos(input.speed, "speed");
  pos(input.airtime, "airtime");
  if (input.turn !== "left" && input.turn !== "right") throw new RangeError('turn must be "left" or "right"');
  pos(input.rollToleranceRad, "rollToleranceRad", true);
  pos(input.maxYawRad, "maxYawRad", true);
  pos(input.turnAngleRad, "turnAngleRad", true);
  if (input.pitchChangeRad !== undefined && !Number.isFinite(input.pitchChangeRad))
    throw new RangeError("pitchChangeRad must be a finite number");
}

/**
 * Plans the mid-air set-up for a jump that lands into a turn.
 * @param input car (SI), takeoff speed (m/s), airtime (s), side of the turn, roll tolerance (rad),
 *   yaw limits (rad), pitch change wanted (rad), Monte Carlo seed, timing sigmas (s).
 * @returns the steering and pulse timelines, the landing attitude (rad), timing windows (ms) and
 *   success rates (0..1) per skill level.
 */
export function planAirSetup(input: AirPlanInput): AirPlan {
  validate(input);
  const { car, speed, airtime: T } = input;
  const tol = input.rollToleranceRad ?? 5 * DEG;
  const dir = input.turn === "left" ? 1 : -1;
  const yawCap = Math.min(45 * DEG, input.maxYawRad ?? Infinity, input.turnAngleRad ?? Infinity);
  const sigmas = input.skillSigmas ?? DEFAULT_SKILL_SIGMAS;
  const seed = input.seed ?? 1;
  const pitchWanted = input.pitchChangeRad ?? 0;
  const rate = Math.PI / 3 / car.servoSecondsPer60;
  const lock = car.steeringLockRad;
  // The rear wheels leave the lip a wheelbase after the front ones.
  const t0 = Math.max(0.02, (car.wheelbase ?? 0.3) / speed);
  const tLast = T - STRAIGHT_BEFORE_TOUCHDOWN - lock / rate;

  let pulse = pitchPulse(car, speed, T, pitchWanted, t0);
  const sim: PlanSim = (steering, accel, dt = SEARCH_DT) =>
    simulateAttitude(car, { speed, duration: T, steering, rearWheelAccel: accel, dt });

  const base: AirPlan = {
    feasible: false,
    reason: null,
    steering: [],
    rearWheelAccel: pulseTimeline(pulse),
    yawRad: 0,
    pitchRad: 0,
    rollRad: 0,
    targetYawRad: 0,
    pitchChangeRad: pitchWanted,
    pitchPulse: pulse,
    switches: [],
    timingWindowMs: 0,
    successRate: { novice: 0, club: 0, expert: 0 },
    rollToleranceRad: tol,
  };
  const spinMomentum = car.frontWheel.spinInertia + car.rearWheel.spinInertia;
  const straight = (reason: PlanInfeasibleReason): AirPlan => {
    const r = sim([], base.rearWheelAccel, 0.001);
    const flat = Math.abs(r.rollRad) <= tol ? 1 : 0;
    return {
      ...base,
      reason,
      yawRad: r.yawRad,
      pitchRad: r.pitchRad,
      rollRad: r.rollRad,
      successRate: { novice: flat, club: flat, expert: flat },
    };
  };
  if (!(car.frontWheel.spinInertia > 0) || !(spinMomentum > 0)) return straight("no-wheel-spin");
  if (tLast - t0 < MIN_PHASE) return straight("not-enough-airtime");

  let plan: BlockPlan | null = null;
  let refined: ReturnType<typeof refineAmounts> = null;
  for (let round = 0; round < PULSE_ROUNDS; round++) {
    const accel = pulseTimeline(pulse);
    if (round === 0) {
      const wheel = compileWheel(
        accel,
        speed / car.rearWheel.radius,
        car.topSpeed ? car.topSpeed / car.rearWheel.radius : Infinity,
      );
      const guide = buildLinearGuide(car, speed, T, wheel);
      plan = searchBlocks(guide, {
        t0,
        tLast,
        lock,
        dir,
        yawCap,
        rollTol: tol,
        sigma: sigmas.club,
        minPhase: MIN_PHASE,
      });
      if (!plan) return straight("no-useful-yaw");
    }
    // Later rounds only re-flatten the roll after the pulse changed.
    const options = {
      dir,
      lock,
      rate,
      t0,
      tLast: T - STRAIGHT_BEFORE_TOUCHDOWN,
      yawCap,
      minPhase: MIN_PHASE,
      scaleRounds: round === 0 ? 4 : 0,
    };
    const next = refineAmounts(sim, plan!, accel, options);
    if (!next) {
      if (round === 0) return straight("no-useful-yaw");
      break;
    }
    refined = next;
    plan = refined.plan;
    // Correct the pulse for the pitch the steering itself adds.
    if (input.pitchChangeRad === undefined) break;
    const pitchError = refined.pitch - pitchWanted;
    if (Math.abs(pitchError) < 0.5 * DEG || pulse.limited || round === PULSE_ROUNDS - 1) break;
    const supplied = pulse.kind === "none" ? 0 : pulseSupplied(car, T, pulse);
    pulse = pitchPulse(car, speed, T, supplied - pitchError, t0);
  }
  const accel = pulseTimeline(pulse);
  const steering = timeline(plan!);
  const final = sim(steering, accel, 0.001);
  if (Math.abs(final.rollRad) > tol) return straight("cannot-land-flat");

  const switchTimes = steering.map(([t]) => t);
  const rollWithShift = (index: number, shift: number) => {
    const moved = steering.map(
      ([t, v], i) => [Math.max(0, i === index ? t + shift : t), v] as [number, number],
    );
    moved.sort((x, y) => x[0] - y[0]);
    return sim(moved, accel).rollRad;
  };
  const model = rollModel(sim(steering, accel).rollRad, steering.length, rollWithShift);
  const switches = timingWindows(model, switchTimes, tol);
  const timingWindowMs = Math.min(...switches.map((s) => s.earlyMs + s.lateMs));
  return {
    ...base,
    feasible: true,
    steering,
    rearWheelAccel: accel,
    yawRad: final.yawRad,
    pitchRad: final.pitchRad,
    rollRad: final.rollRad,
    targetYawRad: dir * refined!.targetYaw,
    pitchPulse: pulse,
    switches,
    timingWindowMs,
    successRate: successRates(model, tol, sigmas, seed),
  };
}

/** Pitch change the pulse was sized for (rad), from its length: (J a d / Iyy)(T - start - d/2). */
function pulseSupplied(car: AttitudeCar, T: number, p: PitchPulse): number {
  return (
    ((drivenSpinInertia(car) * p.wheelAccel * p.duration) / car.inertia[1]) * (T - p.start - p.duration / 2)
  );
}
