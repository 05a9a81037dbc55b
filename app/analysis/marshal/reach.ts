/**
 * How far a car gets when it is faster than the track allows (issue 11, part 1): off a jump, a
 * drag-free ballistic flight from the lip to its first contact with the ground, then a roll-out
 * along the ground until braking stops it; past a turn, straight on from the entry until braking
 * stops it. Drag only shortens a flight, so leaving it out errs on the side of a larger zone.
 *
 * Hand formulas these follow (tests/unit/analysis/marshal/reach.test.ts names the sources):
 * range of a projectile landing h below its launch, x = v cos a (v sin a + sqrt(v^2 sin^2 a + 2 g h)) / g;
 * stopping distance under constant deceleration, d = v^2 / (2 a).
 */
import type { JumpProfile } from "../track/jump-profile";
import { ballisticTouchdown, STANDARD_GRAVITY } from "../track/lap-jumps";

/**
 * Distance to stop from `speed` under constant `decel`, v^2 / (2 a), m.
 * @param speed m/s; @param decel m/s^2 (greater than 0).
 */
export function stoppingDistance(speed: number, decel: number): number {
  if (!(decel > 0)) throw new RangeError(`decel must be greater than 0 (got ${decel})`);
  return (speed * speed) / (2 * decel);
}

export interface OvershootReach {
  /** Takeoff speed along the face, m/s. */
  takeoffSpeed: number;
  /** Plan distance from the lip to first contact with the ground, m. */
  flightDistance: number;
  /** Time in the air, s. */
  airtime: number;
  /** Speed along the ground just after touchdown (the part normal to the ground is lost), m/s. */
  rollOutSpeed: number;
  /** Distance from touchdown until braking stops the car, m. */
  stoppingDistance: number;
  /** Plan distance from the lip to where the car stops, m. */
  reach: number;
  /** Equivalent fall height of that touchdown (drop onto flat ground as hard), m. */
  equivalentFallHeight: number;
}

/**
 * Where a car that leaves a jump's lip at `takeoffSpeed` first touches the ground and stops.
 * @param takeoffSpeed m/s along the face; @param decel roll-out braking, m/s^2; @param g m/s^2.
 */
export function overshootReach(
  profile: JumpProfile,
  takeoffSpeed: number,
  decel: number,
  g = STANDARD_GRAVITY,
): OvershootReach {
  const td = ballisticTouchdown(profile, takeoffSpeed, g);
  const lipD = profile.d[profile.lipIndex];
  const lipZ = profile.h[profile.lipIndex];
  // Drag-free, so the speed at touchdown follows from energy: v^2 = v0^2 + 2 g (lip height - touchdown height).
  const speed2 = takeoffSpeed * takeoffSpeed + 2 * g * (lipZ - td.h);
  const normal2 = Math.max(0, speed2 - td.rollOutSpeed * td.rollOutSpeed);
  const stop = stoppingDistance(td.rollOutSpeed, decel);
  const flightDistance = td.d - lipD;
  return {
    takeoffSpeed,
    flightDistance,
    airtime: td.airtime,
    rollOutSpeed: td.rollOutSpeed,
    stoppingDistance: stop,
    reach: flightDistance + stop,
    equivalentFallHeight: normal2 / (2 * g),
  };
}

export interface EscapeReach {
  /** Speed at the turn's entry, m/s. */
  speed: number;
  /** Distance straight on from the entry until braking stops the car, m. */
  reach: number;
}

/**
 * How far a car entering a turn at `speed` runs straight on before braking stops it.
 * @param speed m/s; @param decel m/s^2.
 */
export function escapeReach(speed: number, decel: number): EscapeReach {
  return { speed, reach: stoppingDistance(speed, decel) };
}
