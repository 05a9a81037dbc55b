/**
 * Polygon union and difference through polygon-clipping (a well-known package; docs/decisions/0700):
 * the merged keep-out area of the zones and the part of a zone outside the site. Plan metres.
 */
import * as clipping from "polygon-clipping";
import type { PlanPoint } from "./marshal-types";

// The package's ES build exports one default object while its type declarations name the
// functions; take whichever this bundler or runtime gives.
const pc = ((clipping as unknown as { default?: typeof clipping }).default ?? clipping) as typeof clipping;

type Ring = PlanPoint[];

/** Every polygon merged into one area: polygons of rings (the first ring outside, then holes), m. */
export function unionOf(polygons: readonly Ring[]): Ring[][] {
  if (polygons.length === 0) return [];
  const [first, ...rest] = polygons.map((p) => [p.map(([x, y]) => [x, y] as PlanPoint)]);
  return pc.union(first, ...rest);
}

/** The parts of `polygon` outside `boundary`, m. */
export function outside(polygon: Ring, boundary: readonly (readonly [number, number])[]): Ring[][] {
  return pc.difference([polygon], [boundary.map(([x, y]) => [x, y] as PlanPoint)]);
}

/** Area of a ring by the shoelace formula, m^2 (positive when anticlockwise). */
export function ringArea(ring: Ring): number {
  let a = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++)
    a += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return a / 2;
}
