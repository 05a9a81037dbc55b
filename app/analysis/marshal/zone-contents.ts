/**
 * What a zone holds: other track (lanes a car that leaves its own lands on or crosses), the
 * layout's marshal points, and ground outside the site; and the room a car has before it meets
 * any of them. Plan metres.
 *
 * The track the car was on is not "other track": from the zone's origin the lap is followed
 * forward through the zone until it has left the zone for more than OWN_GAP or turned more than
 * 90 degrees from the zone's direction; everything of the lap met after that, or before the
 * origin, is another lane (the second half of a hairpin, the lane back from it).
 */
import { cyclicRuns, insidePolygon } from "../track/geometry-checks";
import type { PlanXY, ZoneContents } from "./marshal-types";
import { siteExit } from "./polygons";
import { placeOnLap, type TrackMarks } from "./track-marks";
import { insideWedge, wedgeAlong, zoneWedge, type ZoneGeometry } from "./zones";

/** Lap length the own track may spend outside its zone and still count as the same track, m. */
const OWN_GAP = 1;
/** A marshal point this close to a zone (m) stands beside it. */
export const BESIDE_DISTANCE = 3;

/** Index of the last sample at or before lap distance s. */
function sampleAt(s: Float64Array, count: number, at: number): number {
  let lo = 0;
  let hi = count - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (s[mid] <= at) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Distance from a plan point to a polygon's outline, m. */
function distanceToRing(ring: readonly PlanXY[], x: number, y: number): number {
  let best = Infinity;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [ax, ay] = ring[j];
    const vx = ring[i][0] - ax;
    const vy = ring[i][1] - ay;
    const t = Math.max(0, Math.min(1, ((x - ax) * vx + (y - ay) * vy) / (vx * vx + vy * vy || 1)));
    best = Math.min(best, Math.hypot(ax + t * vx - x, ay + t * vy - y));
  }
  return best;
}

/**
 * The contents of a zone.
 * @param points the layout's marshal points, m, named M1.. in their order.
 * @param boundary the site boundary polygon, m, or undefined.
 */
export function zoneContents(
  zone: ZoneGeometry,
  marks: TrackMarks,
  points: readonly { x: number; y: number }[],
  boundary: readonly (readonly [number, number])[] | undefined,
): ZoneContents {
  const w = zoneWedge(zone);
  const { line, edges, trackWidth } = marks;
  const N = line.count - 1;
  const half = trackWidth / 2;
  const inside = new Uint8Array(N);
  // Only points within the wedge's bounding box (widened by half the track) can be inside it.
  const xs = zone.polygon.map((p) => p[0]);
  const ys = zone.polygon.map((p) => p[1]);
  const x0 = Math.min(...xs) - half;
  const x1 = Math.max(...xs) + half;
  const y0 = Math.min(...ys) - half;
  const y1 = Math.max(...ys) + half;
  for (let i = 0; i < N; i++) {
    if (line.x[i] < x0 || line.x[i] > x1 || line.y[i] < y0 || line.y[i] > y1) continue;
    inside[i] =
      insideWedge(w, line.x[i], line.y[i]) ||
      insideWedge(w, edges.leftX[i], edges.leftY[i]) ||
      insideWedge(w, edges.rightX[i], edges.rightY[i])
        ? 1
        : 0;
  }
  // Follow the car's own track from the origin until it has left the zone for good.
  const other = inside.slice();
  const start = sampleAt(line.s, line.count, zone.s);
  const spacing = line.length / N;
  let entered = false;
  let away = 0;
  for (let step = 0; step < N; step++) {
    const i = (start + step) % N;
    // Track that turns back towards the origin is another lane for a car that went straight on.
    if (Math.cos(line.heading[i] - w.heading) < -1e-9) break;
    if (inside[i]) {
      entered = true;
      away = 0;
    } else away += step === 0 ? 0 : spacing;
    if (entered ? away > OWN_GAP : away > w.near + 2 * trackWidth) break;
    other[i] = 0;
  }
  const crosses = cyclicRuns(other).map(([a, b]) => {
    let nearest = a;
    let distance = Infinity;
    for (let i = a; ; i = (i + 1) % N) {
      const u = wedgeAlong(w, line.x[i], line.y[i]);
      if (u < distance) {
        distance = u;
        nearest = i;
      }
      if (i === b) break;
    }
    return {
      fromS: line.s[a],
      toS: line.s[b],
      place: placeOnLap(marks, line.s[nearest]),
      distance: Math.max(w.near, distance),
    };
  });
  const marshalPoints: string[] = [];
  const besidePoints: string[] = [];
  points.forEach((p, k) => {
    if (insideWedge(w, p.x, p.y)) marshalPoints.push(`M${k + 1}`);
    else if (distanceToRing(zone.polygon, p.x, p.y) <= BESIDE_DISTANCE) besidePoints.push(`M${k + 1}`);
  });
  let freeRunOff = Math.min(w.far, ...crosses.map((c) => c.distance));
  let leavesSite = false;
  if (boundary) {
    const exits = siteExit(zone.polygon, boundary, (x, y) => insidePolygon(boundary, x, y));
    leavesSite = exits.length > 0;
    for (const [x, y] of exits) freeRunOff = Math.min(freeRunOff, Math.max(w.near, wedgeAlong(w, x, y)));
  }
  return { crosses, marshalPoints, besidePoints, leavesSite, freeRunOff };
}
