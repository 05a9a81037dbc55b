/**
 * The flight side of a jump's analysis (jump-analysis.ts): the flight model's input for a jump
 * profile and car, the speed window and sweet-spot speed with air drag, how the airtime changes
 * with the takeoff speed, and the set-up plan in the result's units.
 */
import type { AirPlan } from "../air/air-plan";
import type { SkillSigmas } from "../air/air-plan-robustness";
import type { CarParams } from "../format/cars";
import { flyJump, type FlightInput } from "../flight/flight";
import { speedToLandAt, speedWindow, type SpeedWindow } from "../flight/flight-window";
import type { JumpProfile } from "../track/jump-profile";
import { ballisticJumpWindow } from "../track/lap-jumps";
import type { JumpPlan } from "./layout-analysis-types";

const DEG = 180 / Math.PI;

export function flightBase(profile: JumpProfile, car: CarParams, g: number): Omit<FlightInput, "speed"> {
  return {
    faceAngleRad: profile.faceAngle,
    lip: { x: profile.d[profile.lipIndex], z: profile.h[profile.lipIndex] },
    surface: profile.d.map((x, i) => ({ x, z: profile.h[i] })),
    g,
    drag: car.cdA > 0 ? { massKg: car.massKg, cdA: car.cdA } : undefined,
    landingRamp: { start: profile.d[profile.landingStartIndex], end: profile.d[profile.landingEndIndex] },
  };
}

/**
 * Speed window and sweet-spot speed with drag. Drag only shortens a flight, so the drag-free
 * speeds (lap-jumps.ts) are lower bounds and the search starts there.
 */
export function dragWindow(
  profile: JumpProfile,
  car: CarParams,
  g: number,
): { window: SpeedWindow | null; sweetSpot: number | null } {
  const free = ballisticJumpWindow(profile, g);
  if (free.windowMin === null) return { window: null, sweetSpot: null };
  const base = flightBase(profile, car, g);
  const ramp = base.landingRamp!;
  const window = speedWindow({ ...base, landingRamp: ramp, minSpeed: free.windowMin });
  const sweetSpot = speedToLandAt(
    { ...base, minSpeed: free.sweetSpotSpeed ?? free.windowMin },
    profile.sweetSpot,
  );
  return { window, sweetSpot };
}

/** Speed step either side of the takeoff speed for the airtime's slope, m/s. */
const SLOPE_STEP = 0.2;

/**
 * Change of airtime per m/s of takeoff speed around `speed` (s per m/s), from two flights of the
 * flight model; what a driver's spread of takeoff speed does to the airtime.
 */
export function airtimePerSpeed(profile: JumpProfile, car: CarParams, g: number, speed: number): number {
  const base = flightBase(profile, car, g);
  const lo = flyJump({ ...base, speed: Math.max(0.1, speed - SLOPE_STEP) }).airtime;
  const hi = flyJump({ ...base, speed: speed + SLOPE_STEP }).airtime;
  return Math.max(0, (hi - lo) / (2 * SLOPE_STEP));
}

const perLevel = (x: SkillSigmas) => ({ novice: x.novice, club: x.club, expert: x.expert });

/** The plan in the result's units (degrees, plain arrays). */
export function planSummary(p: AirPlan, speedSigmas: SkillSigmas): JumpPlan {
  return {
    feasible: p.feasible,
    reason: p.reason,
    steering: p.steering.map(([t, a]) => [t, a * DEG]),
    rearWheelAccel: p.rearWheelAccel.map(([t, a]) => [t, a]),
    yawDeg: p.yawRad * DEG,
    pitchDeg: p.pitchRad * DEG,
    rollDeg: p.rollRad * DEG,
    targetYawDeg: p.targetYawRad * DEG,
    takeoffPitchDeg: p.takeoffPitchRad * DEG,
    pitchChangeDeg: p.pitchChangeRad * DEG,
    pitchAimDeg: p.pitchAimRad * DEG,
    pitchPulse: { ...p.pitchPulse },
    switches: p.switches.map((s) => ({ ...s })),
    pulseSwitches: p.pulseSwitches.map((s) => ({ ...s })),
    timingWindowMs: p.timingWindowMs,
    successRate: perLevel(p.successRate),
    successAlone: {
      steering: perLevel(p.successAlone.steering),
      pulse: perLevel(p.successAlone.pulse),
      speed: perLevel(p.successAlone.speed),
    },
    mainError: { ...p.mainError },
    rollToleranceDeg: p.rollToleranceRad * DEG,
    pitchToleranceDeg: p.pitchToleranceRad === null ? null : p.pitchToleranceRad * DEG,
    speedSigmas: perLevel(speedSigmas),
    withoutLevelling: p.withoutLevelling
      ? {
          steering: p.withoutLevelling.steering.map(([t, a]) => [t, a * DEG]),
          yawDeg: p.withoutLevelling.yawRad * DEG,
          pitchDeg: p.withoutLevelling.pitchRad * DEG,
          rollDeg: p.withoutLevelling.rollRad * DEG,
        }
      : null,
    tradeOff: p.tradeOff.map((x) => ({ pitchChangeDeg: x.pitchChangeRad * DEG, yawDeg: x.yawRad * DEG })),
  };
}
