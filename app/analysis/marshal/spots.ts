/**
 * Where a marshal may stand: spots beside the track every metre of the lap, on both sides, from
 * the setback to the reach distance off the edge, that lie outside every zone, clear of every
 * lane, inside the site boundary and nearest to their own stretch of track. The suggested plan
 * picks from them; a warning's "move to" is the nearest of them (docs/decisions/0702).
 */
import { insidePolygon } from "../track/geometry-checks";
import type { MarshalZone } from "./marshal-types";
import type { MarshalSettings } from "./settings";
import { nearestTrack, type TrackIndex } from "./track-index";
import { lapAhead, type TrackMarks } from "./track-marks";
import { insideWedge, zoneWedge, type WedgeTest } from "./zones";

/** Spacing of the spots along the lap, m. */
export const SPOT_STRIDE = 1;

export interface Spot {
  /** Lap distance of the track point it stands beside, m. */
  s: number;
  x: number;
  y: number;
  side: "left" | "right";
  /** Distance from the track edge, m. */
  edgeDistance: number;
}

/** Whether a plan point (m) lies in any zone. */
export function inAnyZone(wedges: readonly WedgeTest[], x: number, y: number): boolean {
  for (const w of wedges) if (insideWedge(w, x, y)) return true;
  return false;
}

/** What decides whether a spot is good: the track, its zones, the settings and the site. */
export interface SpotRules {
  marks: TrackMarks;
  index: TrackIndex;
  zones: readonly MarshalZone[];
  settings: MarshalSettings;
  boundary: readonly (readonly [number, number])[] | undefined;
}

/**
 * Places beside the track a spot may be, every SPOT_STRIDE m, both sides, setback to reach off
 * the edge; with `around`, only beside track points within `around.radius` m of (x, y).
 */
function* places(rules: SpotRules, around?: { x: number; y: number; radius: number }): Generator<Spot> {
  const { line, trackWidth, lapLength } = rules.marks;
  const { setback, reach } = rules.settings;
  const half = trackWidth / 2;
  const nearest = Math.min(setback, reach);
  const offsets = [...new Set([nearest, (nearest + reach) / 2, reach])];
  const step = Math.max(1, Math.round(SPOT_STRIDE / (lapLength / (line.count - 1))));
  const r2 = around ? (around.radius + half + reach) ** 2 : Infinity;
  for (let i = 0; i < line.count - 1; i += step) {
    if (around && (line.x[i] - around.x) ** 2 + (line.y[i] - around.y) ** 2 > r2) continue;
    const nx = -Math.sin(line.heading[i]);
    const ny = Math.cos(line.heading[i]);
    for (const sign of [1, -1])
      for (const off of offsets)
        yield {
          s: line.s[i],
          x: line.x[i] + sign * nx * (half + off),
          y: line.y[i] + sign * ny * (half + off),
          side: sign > 0 ? "left" : "right",
          edgeDistance: off,
        };
  }
}

/** Whether a place is a good spot: outside every zone, on site, clear of every lane, its own lane nearest. */
function good(rules: SpotRules, wedges: readonly WedgeTest[], spot: Spot): boolean {
  // The cheap tests first: zones and the site, then the nearest lane.
  if (inAnyZone(wedges, spot.x, spot.y)) return false;
  if (rules.boundary && !insidePolygon(rules.boundary, spot.x, spot.y)) return false;
  const { lapLength, trackWidth } = rules.marks;
  const near = nearestTrack(rules.index, spot.x, spot.y);
  const edge = near.distance - trackWidth / 2;
  const ownLane = Math.min(lapAhead(spot.s, near.s, lapLength), lapAhead(near.s, spot.s, lapLength));
  const nearest = Math.min(rules.settings.setback, rules.settings.reach);
  return edge >= nearest - 1e-6 && edge <= rules.settings.reach + 1e-6 && ownLane <= 2;
}

/** Every spot a marshal may stand on, in lap order. */
export function marshalSpots(rules: SpotRules): Spot[] {
  const wedges = rules.zones.map(zoneWedge);
  const out: Spot[] = [];
  for (const spot of places(rules)) if (good(rules, wedges, spot)) out.push(spot);
  return out;
}

/**
 * The good spot nearest a plan point (m): the places within `radius` m are tried nearest first;
 * beyond that, every spot of the lap. Null when there is none.
 */
export function nearestGoodSpot(rules: SpotRules, x: number, y: number, radius: number): Spot | null {
  const wedges = rules.zones.map(zoneWedge);
  const near: { spot: Spot; d2: number }[] = [];
  for (const spot of places(rules, { x, y, radius })) {
    const d2 = (spot.x - x) ** 2 + (spot.y - y) ** 2;
    if (d2 <= radius * radius) near.push({ spot, d2 });
  }
  near.sort((a, b) => a.d2 - b.d2);
  for (const { spot } of near) if (good(rules, wedges, spot)) return spot;
  return nearestSpot(marshalSpots(rules), x, y);
}

/** The spot nearest a plan point (m), or null when there is none. */
export function nearestSpot(spots: readonly Spot[], x: number, y: number): Spot | null {
  let best: Spot | null = null;
  let d2 = Infinity;
  for (const s of spots) {
    const e = (s.x - x) ** 2 + (s.y - y) ** 2;
    if (e < d2) {
      d2 = e;
      best = s;
    }
  }
  return best;
}
