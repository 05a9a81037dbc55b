/**
 * The jump page's data: the analysed jump for the chosen class and skill, its ground profile for
 * the side elevation, and the servo-followed steering of its set-up plan for the chart.
 */
import {
  compileServo,
  evaluate,
  carPreset,
  jumpProfile,
  type CarParams,
  type JumpAnalysis,
  type JumpPlan,
  type JumpSection,
} from "~/analysis";
import type { ElevationData } from "~/components/analysis/jump-elevation";
import type { SteeringSeries } from "~/components/analysis/steering-chart";

const RAD = Math.PI / 180;

/** The side elevation of a jump section with the analysed flight. */
export function elevationData(section: JumpSection, jump: JumpAnalysis): ElevationData {
  const p = jumpProfile(section);
  return {
    d: [...p.d],
    h: [...p.h],
    lipIndex: p.lipIndex,
    landingStartIndex: p.landingStartIndex,
    landingEndIndex: p.landingEndIndex,
    sweetSpot: p.sweetSpot,
    lip: { d: jump.lip.d, z: jump.lip.z },
    apex: jump.apex ? { d: jump.apex.d, z: jump.apex.z } : null,
    landing: jump.landing ? { d: jump.landing.d, z: jump.landing.z, speed: jump.landing.speed } : null,
  };
}

/**
 * Where the front wheels are while the servo follows the plan's targets (the engine's own servo
 * model), as the corners of a polyline in degrees; null without a plan or a known car.
 * @param ownCar the reader's own car when `classId` is not a class preset.
 */
export function steeringSeries(
  plan: JumpPlan | null,
  classId: string,
  airtime: number,
  ownCar?: CarParams,
): SteeringSeries | null {
  const car = ownCar ?? carPreset(classId);
  if (!plan || !car || plan.steering.length === 0 || !(airtime > 0)) return null;
  const rate = Math.PI / 3 / car.servoSecondsPer60;
  const servo = compileServo(
    plan.steering.map(([t, deg]) => [t, deg * RAD] as const),
    rate,
    car.steeringLockRad,
  );
  const wheels: [number, number][] = [];
  for (let k = 0; k < servo.n; k++) if (servo.t[k] <= airtime) wheels.push([servo.t[k], servo.v[k] / RAD]);
  wheels.push([airtime, evaluate(servo, airtime) / RAD]);
  return { airtime, lockDeg: car.steeringLockRad / RAD, wheels };
}
