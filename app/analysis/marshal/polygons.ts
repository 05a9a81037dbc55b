/**
 * The zones merged into one keep-out area through polygon-clipping (a well-known package;
 * docs/decisions/0700), for drawing, and where a zone first leaves the site. Plan metres.
 */
import * as clipping from "polygon-clipping";
import type { PlanXY } from "./marshal-types";

// The package's ES build exports one default object while its type declarations name the
// functions; take whichever this bundler or runtime gives.
const pc = ((clipping as unknown as { default?: typeof clipping }).default ?? clipping) as typeof clipping;

type Ring = PlanXY[];

/**
 * Every polygon merged into one area: polygons of rings (the first ring outside, then holes), m.
 * For the marshal risk: `keepOutArea(plan.zones)`.
 */
export function unionOf(polygons: readonly Ring[]): Ring[][] {
  if (polygons.length === 0) return [];
  const [first, ...rest] = polygons.map((p) => [p.map(([x, y]) => [x, y] as PlanXY)]);
  return pc.union(first, ...rest);
}

/** Area of a ring by the shoelace formula, m^2 (positive when anticlockwise). */
export function ringArea(ring: Ring): number {
  let a = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++)
    a += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return a / 2;
}

/** The zones of a marshal plan merged into one area to keep out of, for drawing: polygons of rings, m. */
export function keepOutArea(zones: readonly { polygon: PlanXY[] }[]): Ring[][] {
  return unionOf(zones.map((z) => z.polygon));
}

/** Where segments ab and cd cross (fraction t along ab), or null. */
function crossing(
  ax: number,
  ay: number,
  bx: number,
  by: number,
  cx: number,
  cy: number,
  dx: number,
  dy: number,
): number | null {
  const rx = bx - ax;
  const ry = by - ay;
  const sx = dx - cx;
  const sy = dy - cy;
  const den = rx * sy - ry * sx;
  if (Math.abs(den) < 1e-12) return null;
  const t = ((cx - ax) * sy - (cy - ay) * sx) / den;
  const u = ((cx - ax) * ry - (cy - ay) * rx) / den;
  return t > 1e-9 && t < 1 - 1e-9 && u > 1e-9 && u < 1 - 1e-9 ? t : null;
}

/**
 * Whether a convex polygon reaches outside a site boundary (a simple polygon), and the points
 * where the part outside begins: its corners outside the site, the crossings of the two
 * outlines, and the site's corners inside it (the part outside is bounded by these), m.
 * @param inside point-in-polygon test of the site.
 */
export function siteExit(
  convex: readonly PlanXY[],
  boundary: readonly (readonly [number, number])[],
  inside: (x: number, y: number) => boolean,
): PlanXY[] {
  const out: PlanXY[] = [];
  for (const [x, y] of convex) if (!inside(x, y)) out.push([x, y]);
  for (let i = 0; i < convex.length; i++) {
    const [ax, ay] = convex[i];
    const [bx, by] = convex[(i + 1) % convex.length];
    for (let k = 0; k < boundary.length; k++) {
      const [cx, cy] = boundary[k];
      const [dx, dy] = boundary[(k + 1) % boundary.length];
      const t = crossing(ax, ay, bx, by, cx, cy, dx, dy);
      if (t !== null) out.push([ax + t * (bx - ax), ay + t * (by - ay)]);
    }
  }
  for (const [x, y] of boundary) if (insideConvex(convex, x, y)) out.push([x, y]);
  return out;
}

/** Whether a point lies strictly inside an anticlockwise convex polygon. */
function insideConvex(poly: readonly PlanXY[], x: number, y: number): boolean {
  for (let i = 0; i < poly.length; i++) {
    const [ax, ay] = poly[i];
    const [bx, by] = poly[(i + 1) % poly.length];
    if ((bx - ax) * (y - ay) - (by - ay) * (x - ax) <= 1e-9) return false;
  }
  return true;
}
