/**
 * Datum stakes and the two ways of measuring a point from them (the marking-out sheet).
 *
 * Plan frame as everywhere in the engine: X right, Y up the page, metres. Bearings here are the
 * surveyor's kind, NOT the engine's headings: radians clockwise from the plan's +Y direction
 * ("grid north", up the page), in [0, 2π). Offsets are chainage and offset along the baseline
 * from datum A towards datum B: `along` from A towards B, `offset` positive to the RIGHT of the
 * line seen from A looking at B (surveyors' common practice), both metres.
 */

/** A point on the plan, m. */
export interface PlanPoint {
  x: number;
  y: number;
}

/** Shortest distance allowed between the two datum stakes, m (shorter lines magnify sighting errors). */
export const MIN_BASELINE = 1;

/** The line from datum A to datum B. */
export interface Baseline {
  a: PlanPoint;
  b: PlanPoint;
  /** Distance A to B, m. */
  length: number;
  /** Bearing of B from A, rad clockwise from plan +Y, [0, 2π). */
  bearing: number;
  /** Unit vector from A towards B. */
  ux: number;
  uy: number;
}

/** A point measured from the datums. */
export interface DatumMeasure {
  /** Horizontal distance from A, m. */
  distance: number;
  /** Bearing from A, rad clockwise from plan +Y, [0, 2π) (0 for a point on A). */
  bearing: number;
  /** Distance along the line A to B from A, m (negative behind A). */
  along: number;
  /** Distance square off the line A to B, m, positive to the right looking from A to B. */
  offset: number;
}

const TWO_PI = 2 * Math.PI;

/**
 * Bearing of a plan direction, rad clockwise from +Y in [0, 2π).
 * @param dx, dy components of the direction, m (any scale).
 */
export function planBearing(dx: number, dy: number): number {
  const b = Math.atan2(dx, dy);
  return b < 0 ? b + TWO_PI : b >= TWO_PI ? b - TWO_PI : b;
}

/**
 * The baseline between two datum stakes.
 * @throws RangeError when A and B are less than MIN_BASELINE apart or not finite.
 */
export function baseline(a: PlanPoint, b: PlanPoint): Baseline {
  for (const v of [a.x, a.y, b.x, b.y]) {
    if (!Number.isFinite(v)) throw new RangeError("datum coordinates must be finite numbers");
  }
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const length = Math.hypot(dx, dy);
  if (length < MIN_BASELINE) {
    throw new RangeError(`datum B must be at least ${MIN_BASELINE} m from datum A`);
  }
  return { a, b, length, bearing: planBearing(dx, dy), ux: dx / length, uy: dy / length };
}

/**
 * Distance and bearing from A, and chainage and offset along A to B, of a plan point.
 * @param x, y plan position, m.
 */
export function measureFromDatum(line: Baseline, x: number, y: number): DatumMeasure {
  const dx = x - line.a.x;
  const dy = y - line.a.y;
  const distance = Math.hypot(dx, dy);
  return {
    distance,
    bearing: distance > 0 ? planBearing(dx, dy) : 0,
    along: dx * line.ux + dy * line.uy,
    offset: dx * line.uy - dy * line.ux,
  };
}

/**
 * The plan point at a distance and bearing from A (the inverse of `measureFromDatum`).
 * @param distance m; @param bearing rad clockwise from plan +Y.
 */
export function pointFromBearing(a: PlanPoint, distance: number, bearing: number): PlanPoint {
  return { x: a.x + distance * Math.sin(bearing), y: a.y + distance * Math.cos(bearing) };
}

/**
 * The plan point at a chainage and offset along A to B (the inverse of `measureFromDatum`).
 * @param along m from A towards B; @param offset m, positive to the right of A to B.
 */
export function pointFromOffsets(line: Baseline, along: number, offset: number): PlanPoint {
  return {
    x: line.a.x + along * line.ux + offset * line.uy,
    y: line.a.y + along * line.uy - offset * line.ux,
  };
}

/**
 * Turns a plan bearing into a true bearing (clockwise from true north) given how the plan lies on
 * the ground: either the true bearing of the plan's +Y (`gridTrueBearing`) or the true bearing of
 * the line A to B as measured on site (`abTrueBearing`). All rad; result in [0, 2π).
 */
export function trueBearing(
  planBearingRad: number,
  line: Baseline,
  orientation: { gridTrueBearing: number } | { abTrueBearing: number },
): number {
  const rotation =
    "gridTrueBearing" in orientation
      ? orientation.gridTrueBearing
      : orientation.abTrueBearing - line.bearing;
  return planBearing(Math.sin(planBearingRad + rotation), Math.cos(planBearingRad + rotation));
}
