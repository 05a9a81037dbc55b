/**
 * A whoops row analysed for what drivers do with it (docs/decisions/0112): skim over the tops,
 * jump through in doubles (from one bump onto the back of the next) or triples (clearing one
 * bump), or roll through bump by bump. Each way gets the takeoff speed it needs; the car's
 * approach decides which it can use. A whoops row is not one landing: the hardness reported is
 * that of one hop of the chosen way.
 *
 * Model (estimates, SI units): the bumps are the preset's cosine bumps of height h every s metres.
 * - Doubles and triples: the body leaves a crest along the face angle and comes back down to
 *   crest height past the crest of the landing bump, on its back side (the wheels meet the back
 *   of that bump); the window runs from just reaching that crest to the trough after it, the
 *   planned speed lands a third of the way down its back. Hardness: equivalent fall height with
 *   the back side's slope where the body comes down.
 * - Skimming: the car touches every crest, its body falling at most half a bump height from one
 *   crest to the next: speed s sqrt(g / h); one hop's hardness is the fall between two crests.
 */
import type { JumpSection } from "../format/layout-document";
import {
  equivalentFallHeight,
  flyJump,
  type DragParams,
  type FlightInput,
  type FlightResult,
} from "./flight";
import type { WhoopsTechnique } from "../words";

type WhoopsSection = Extract<JumpSection, { preset: "whoops" }>;

/** Jumping through the row n bumps at a time (2: doubles, 3: triples). */
export interface WhoopsHops {
  /** Bumps covered by one jump, takeoff bump and landing bump included. */
  bumps: 2 | 3;
  /** Jumps in one pass through the row (bumps left over are rolled). */
  jumps: number;
  /** Takeoff speeds that come down on the back of the landing bump, m/s (null when none up to 40 m/s). */
  window: { min: number; max: number } | null;
  /** Takeoff speed that comes down a third of the way down its back, m/s. */
  sweetSpotSpeed: number | null;
}

export interface WhoopsAnalysis {
  count: number;
  /** Crest to crest, m. */
  spacing: number;
  bumpHeight: number;
  /** Lowest speed that skims over the tops, m/s. */
  skimSpeed: number;
  doubles: WhoopsHops;
  /** Null for a row of fewer than three bumps. */
  triples: WhoopsHops | null;
  /** Most the approach allows, m/s. */
  approachSpeed: number;
  /** The fastest way the approach allows. */
  technique: WhoopsTechnique;
  /** Speed for that way, m/s. */
  speed: number;
  /** One hop of that way: time in the air, s, and equivalent fall height, m (0 when rolling). */
  airtime: number;
  equivalentFallHeight: number;
  /** One hop's flight from the first crest (null when skimming or rolling). */
  flight: FlightResult | null;
}

/** Share of a bump's height the body may fall between two crests when skimming (an estimate). */
export const SKIM_FALL_SHARE = 0.5;

/** Slope of the cosine bumps at `xi` m past a crest, rad. */
function bumpSlope(section: WhoopsSection, xi: number): number {
  const { spacing: s, bumpHeight: h } = section;
  return Math.atan(-((Math.PI * h) / s) * Math.sin((2 * Math.PI * xi) / s));
}

/**
 * Analyses a whoops row for one car.
 * @param faceAngleRad launch angle off a bump's face, rad (the profile's face angle)
 * @param approachSpeed the most the approach allows, m/s
 * @param drag the car's air drag, or undefined
 */
export function analyseWhoops(
  section: WhoopsSection,
  faceAngleRad: number,
  approachSpeed: number,
  drag: DragParams | undefined,
  g = 9.81,
): WhoopsAnalysis {
  const { count, spacing: s, bumpHeight: h } = section;
  // Flights from the first crest down to crest height, over the crest line.
  const base: Omit<FlightInput, "speed"> = {
    faceAngleRad,
    lip: { x: 0, z: h },
    surface: [
      { x: 0, z: h },
      { x: 1, z: h },
    ],
    g,
    drag,
  };
  // Drag-free range v^2 sin(2a) / g, then a few corrections with drag: the range grows about as
  // v^2, so v is scaled by sqrt(wanted / flown) until it lands within a millimetre.
  const sin2a = Math.sin(2 * faceAngleRad);
  const at = (d: number): number | null => {
    if (!(sin2a > 1e-6)) return null;
    let v = Math.sqrt((d * g) / sin2a);
    for (let k = 0; k < 6; k++) {
      const flown = flyJump({ ...base, speed: v }).landing.x;
      if (!(flown > 0) || v > 40) return null;
      if (Math.abs(flown - d) < 1e-3) break;
      v *= Math.sqrt(d / flown);
    }
    return v;
  };
  const hops = (bumps: 2 | 3): WhoopsHops => {
    const crest = (bumps - 1) * s;
    const min = at(crest);
    const max = at(crest + s / 2);
    return {
      bumps,
      jumps: Math.floor(count / bumps),
      window: min !== null && max !== null ? { min, max } : null,
      sweetSpotSpeed: at(crest + s / 6),
    };
  };
  const doubles = hops(2);
  const triples = count >= 3 ? hops(3) : null;
  const skimSpeed = s * Math.sqrt(g / (2 * SKIM_FALL_SHARE * h));
  const result: WhoopsAnalysis = {
    count,
    spacing: s,
    bumpHeight: h,
    skimSpeed,
    doubles,
    triples,
    approachSpeed,
    technique: "roll",
    speed: approachSpeed,
    airtime: 0,
    equivalentFallHeight: 0,
    flight: null,
  };
  if (approachSpeed >= skimSpeed) {
    const fall = (g * s * s) / (2 * approachSpeed * approachSpeed);
    return { ...result, technique: "skim", airtime: s / approachSpeed, equivalentFallHeight: fall };
  }
  const way = [triples, doubles].find((w) => w?.window && approachSpeed >= w.window.min);
  if (!way) return result;
  const speed = Math.min(way.sweetSpotSpeed ?? approachSpeed, approachSpeed);
  const flight = flyJump({ ...base, speed });
  const td = flight.landing;
  const slope = bumpSlope(section, td.x);
  return {
    ...result,
    technique: way.bumps === 3 ? "triples" : "doubles",
    speed,
    airtime: flight.airtime,
    equivalentFallHeight: equivalentFallHeight(td.speed, td.flightPathRad, slope, g),
    flight: {
      ...flight,
      landing: {
        ...td,
        surfaceSlopeRad: slope,
        normalSpeed: td.speed * Math.abs(Math.sin(td.flightPathRad - slope)),
        equivalentFallHeight: equivalentFallHeight(td.speed, td.flightPathRad, slope, g),
      },
    },
  };
}
