/**
 * Marshal point reports (issue 11, part 3): for each point its stretch of the lap (half way to
 * each neighbour), the hotspots to watch there, the jumps and corners in it, and warnings with
 * what to do: inside a zone, on the track, or farther from the track edge than the club's reach.
 */
import type { Hotspot, MarshalPointReport, MarshalWarning, MarshalZone } from "./marshal-types";
import type { MarshalSettings } from "./settings";
import { nearestGoodSpot, type SpotRules } from "./spots";
import { nearestTrack, type TrackIndex } from "./track-index";
import { lapAhead, placeOnLap, type TrackMarks } from "./track-marks";
import { insideWedge, zoneWedge } from "./zones";
import { num, ZONE_KIND_WORDS } from "./words";

/** Radius searched first for a warning's "move to" spot, m. */
const MOVE_RADIUS = 10;

export interface Stretch {
  fromS: number;
  toS: number;
  length: number;
}

/**
 * The stretch of each lap position: from half way to the previous position to half way to the
 * next (in the positions' own order). A single position watches the whole lap.
 * @param positions lap distances, m; @param lapLength m.
 */
export function stretches(positions: readonly number[], lapLength: number): Stretch[] {
  const n = positions.length;
  if (n === 1) {
    const from = (positions[0] + lapLength / 2) % lapLength;
    return [{ fromS: from, toS: from, length: lapLength }];
  }
  const order = positions.map((s, i) => ({ s, i })).sort((a, b) => a.s - b.s);
  const out: Stretch[] = new Array(n);
  order.forEach((p, k) => {
    const prev = order[(k - 1 + n) % n].s;
    const next = order[(k + 1) % n].s;
    const fromS = (p.s - lapAhead(prev, p.s, lapLength) / 2 + lapLength) % lapLength;
    const toS = (p.s + lapAhead(p.s, next, lapLength) / 2) % lapLength;
    out[p.i] = { fromS, toS, length: lapAhead(fromS, toS, lapLength) };
  });
  return out;
}

/** Whether lap distance `s` (m) belongs to a stretch: start included, end excluded. */
export function inStretchOf(st: Stretch, s: number, lapLength: number): boolean {
  return st.length >= lapLength - 1e-9 || lapAhead(st.fromS, s, lapLength) < st.length;
}

/** Ids of the marks in a stretch, in driving order from its start. */
function inLapOrder(marks: { id: string; s: number }[], st: Stretch, L: number): string[] {
  return marks
    .filter((m) => inStretchOf(st, m.s, L))
    .sort((a, b) => lapAhead(st.fromS, a.s, L) - lapAhead(st.fromS, b.s, L))
    .map((m) => m.id);
}

export interface PointContext {
  marks: TrackMarks;
  index: TrackIndex;
  zones: readonly MarshalZone[];
  hotspots: readonly Hotspot[];
  settings: MarshalSettings;
  /** What decides where a marshal may stand (spots.ts). */
  spotRules: SpotRules;
  /** Lap distance of each jump's landing (J1 first), m. */
  jumpS: readonly number[];
}

function warningsFor(
  id: string,
  p: { x: number; y: number },
  edge: number,
  s: number,
  ctx: PointContext,
): MarshalWarning[] {
  const out: MarshalWarning[] = [];
  let move: [number, number] | null | undefined;
  const moveTo = () => {
    // Nearby spots first (cheap); the whole lap only when none is near. Worked out once per point.
    if (move === undefined) {
      const spot = nearestGoodSpot(ctx.spotRules, p.x, p.y, MOVE_RADIUS);
      move = spot ? [spot.x, spot.y] : null;
    }
    return move;
  };
  for (const zone of ctx.zones) {
    if (!insideWedge(zoneWedge(zone), p.x, p.y)) continue;
    const overshoot = zone.kind === "overshoot";
    out.push({
      kind: "in-zone",
      zoneId: zone.id,
      text:
        `${id} stands in the ${ZONE_KIND_WORDS[zone.kind]} of ${zone.title}: ` +
        (overshoot
          ? `cars that overshoot it can land or roll here (up to ${num(zone.wedge.far)} m past the lip).`
          : `cars that miss their braking run straight on through here (up to ${num(zone.wedge.far)} m past the entry).`),
      action: overshoot
        ? "Move it out of the zone: beside the landing ramp rather than beyond it."
        : "Move it out of the zone: to the inside of the turn or well before its entry.",
      moveTo: moveTo(),
    });
  }
  if (edge < 0)
    out.push({
      kind: "on-track",
      zoneId: null,
      text: `${id} stands on the track ${placeOnLap(ctx.marks, s)}, ${num(-edge)} m inside the edge.`,
      action: `Move it off the track, ${num(ctx.settings.setback)} to ${num(ctx.settings.reach)} m beyond the edge.`,
      moveTo: moveTo(),
    });
  else if (edge > ctx.settings.reach + 1e-6)
    out.push({
      kind: "too-far",
      zoneId: null,
      text: `${id} stands ${num(edge)} m from the nearest track edge, farther than the club's reach of ${num(ctx.settings.reach)} m.`,
      action: "Move it closer to the track, so the marshal gets to a rolled car in a few steps.",
      moveTo: moveTo(),
    });
  return out;
}

/**
 * Reports for marshal points: ids M1, M2, ... in the given order.
 * @param points plan positions, m.
 */
export function pointReports(
  points: readonly { x: number; y: number }[],
  ctx: PointContext,
): MarshalPointReport[] {
  const { marks } = ctx;
  const L = marks.lapLength;
  const near = points.map((p) => nearestTrack(ctx.index, p.x, p.y));
  const st = stretches(
    near.map((n) => n.s),
    L,
  );
  return points.map((p, k) => {
    const id = `M${k + 1}`;
    const edge = near[k].distance - marks.trackWidth / 2;
    const has = (s: number) => inStretchOf(st[k], s, L);
    const watch = ctx.hotspots
      .filter((h) => has(h.s))
      .map((h) => {
        const distance = Math.hypot(h.x - p.x, h.y - p.y);
        return {
          hotspotId: h.id,
          score: h.score,
          distance,
          covered: distance <= ctx.settings.coverDistance,
        };
      })
      .sort((a, b) => b.score - a.score);
    return {
      id,
      x: p.x,
      y: p.y,
      s: near[k].s,
      side: near[k].side,
      edgeDistance: edge,
      stretch: { ...st[k] },
      watch,
      jumps: inLapOrder(
        marks.jumps.map((j, i) => ({ id: j.id, s: ctx.jumpS[i] })),
        st[k],
        L,
      ),
      turns: inLapOrder(
        marks.corners.map((c) => ({ id: c.id, s: c.entryS })),
        st[k],
        L,
      ),
      warnings: warningsFor(id, p, edge, near[k].s, ctx),
    };
  });
}
