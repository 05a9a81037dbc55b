/**
 * Overshoot zones beyond jumps and run-off zones past turns, as plain data in plan metres
 * (docs/decisions/0700). Each zone is a wedge: from the lip (or the turn's entry) across the
 * track's width, widening by the spread angle either side of the track direction, from `near`
 * to `far` metres along it. One zone per jump or corner: the classes' wedges differ only in
 * length, so the zone is the longest and keeps every class's numbers.
 */
import type { CarParams } from "../format/cars";
import { ballisticJumpWindow, STANDARD_GRAVITY, type JumpWindow } from "../track/lap-jumps";
import type { JumpProfile } from "../track/jump-profile";
import { cornerSpeed } from "../track/speed";
import type { ClassAnalysis, LayoutAnalysis } from "../layout/layout-analysis-types";
import { escapeReach, overshootReach } from "./reach";
import type { MarshalSettings } from "./settings";
import { lapAhead, type TrackMarks } from "./track-marks";
import type { MarshalZone, ZoneClassReach } from "./marshal-types";

const DEG = Math.PI / 180;

/** A zone's wedge frame: origin m, heading rad, distances m, spread rad. */
export interface Wedge {
  x: number;
  y: number;
  heading: number;
  near: number;
  far: number;
  /** Half the width at the origin, m (half the track width). */
  halfWidth: number;
  spread: number;
}

/** A wedge with its trigonometry worked out once, for many point tests. */
export interface WedgeTest extends Wedge {
  cos: number;
  sin: number;
  tan: number;
}

/** The wedge ready for point tests. */
export function wedgeTest(w: Wedge): WedgeTest {
  return { ...w, cos: Math.cos(w.heading), sin: Math.sin(w.heading), tan: Math.tan(w.spread) };
}

/** The wedge as an anticlockwise polygon of plan points, m. */
export function wedgePolygon(w: Wedge): [number, number][] {
  const c = Math.cos(w.heading);
  const s = Math.sin(w.heading);
  const t = Math.tan(w.spread);
  const at = (u: number, side: number): [number, number] => {
    const v = side * (w.halfWidth + u * t);
    return [w.x + u * c - v * s, w.y + u * s + v * c];
  };
  return [at(w.near, -1), at(w.far, -1), at(w.far, 1), at(w.near, 1)];
}

/** Distance along the wedge's axis from its origin to a plan point's foot, m. */
export function wedgeAlong(w: WedgeTest, x: number, y: number): number {
  return (x - w.x) * w.cos + (y - w.y) * w.sin;
}

/** Whether a plan point (m) lies inside the wedge (edges included). */
export function insideWedge(w: WedgeTest, x: number, y: number): boolean {
  const dx = x - w.x;
  const dy = y - w.y;
  const u = dx * w.cos + dy * w.sin;
  if (u < w.near - 1e-9 || u > w.far + 1e-9) return false;
  return Math.abs(-dx * w.sin + dy * w.cos) <= w.halfWidth + u * w.tan + 1e-9;
}

export interface ZoneClass {
  id: string;
  car: CarParams;
  analysis: ClassAnalysis;
}

/** A zone before its contents are known. */
export type ZoneGeometry = Omit<MarshalZone, "contents">;

const wedgeTests = new WeakMap<MarshalZone["wedge"], WedgeTest>();

/** The wedge of a zone in engine units (radians), ready for point tests (remembered per zone). */
export function zoneWedge(zone: Pick<MarshalZone, "wedge">): WedgeTest {
  let w = wedgeTests.get(zone.wedge);
  if (!w) {
    const { x, y, headingDeg, near, far, halfWidth, spreadDeg } = zone.wedge;
    w = wedgeTest({ x, y, heading: headingDeg * DEG, near, far, halfWidth, spread: spreadDeg * DEG });
    wedgeTests.set(zone.wedge, w);
  }
  return w;
}

function zoneOf(
  base: Omit<ZoneGeometry, "polygon" | "wedge" | "classId" | "byClass">,
  wedge: Omit<Wedge, "far">,
  reaches: ZoneClassReach[],
): ZoneGeometry | null {
  if (reaches.length === 0) return null;
  const worst = reaches.reduce((a, b) => (b.reach > a.reach ? b : a));
  // Every reach is measured from the wedge's origin (the lip, or the turn's entry).
  const full: Wedge = { ...wedge, far: worst.reach };
  if (!(full.far > full.near)) return null;
  const { heading, spread, ...rest } = full;
  return {
    ...base,
    wedge: { ...rest, headingDeg: heading / DEG, spreadDeg: spread / DEG },
    polygon: wedgePolygon(full),
    classId: worst.classId,
    byClass: reaches,
  };
}

/**
 * The overshoot zone of every jump that some class can take off from faster than its window allows.
 * @param windowOf the drag-free speed window of a profile (the analysis passes its memoised one).
 */
export function jumpZones(
  marks: TrackMarks,
  classes: readonly ZoneClass[],
  settings: MarshalSettings,
  windowOf: (profile: JumpProfile) => JumpWindow = (p) => ballisticJumpWindow(p),
): ZoneGeometry[] {
  const g = STANDARD_GRAVITY;
  const out: ZoneGeometry[] = [];
  marks.jumps.forEach((jump, k) => {
    const sec = jump.section;
    const profile = sec.profile!;
    const windowMax = windowOf(profile).windowMax;
    const lipD = profile.d[profile.lipIndex];
    const reaches: ZoneClassReach[] = [];
    for (const cls of classes) {
      const j = cls.analysis.jumps[k];
      if (windowMax === null || !j || j.flownOverBy !== null) continue;
      const speed = j.approachMaxSpeed * (1 + settings.speedMargin);
      if (!(speed > windowMax)) continue;
      const r = overshootReach(profile, speed, cls.car.brakeDecel * settings.rollOutBraking, g);
      reaches.push({
        classId: cls.id,
        label: cls.car.label,
        speed,
        limitSpeed: windowMax,
        flightDistance: r.flightDistance,
        airtime: r.airtime,
        rollOutSpeed: r.rollOutSpeed,
        stoppingDistance: r.stoppingDistance,
        reach: r.reach,
        equivalentFallHeight: r.equivalentFallHeight,
      });
    }
    const h = sec.start.heading;
    const zone = zoneOf(
      { id: jump.id, kind: "overshoot", title: jump.title, sectionId: jump.sectionId, s: sec.startS + lipD },
      {
        x: sec.start.x + lipD * Math.cos(h),
        y: sec.start.y + lipD * Math.sin(h),
        heading: h,
        near: profile.d[profile.landingEndIndex] - lipD,
        halfWidth: marks.trackWidth / 2,
        spread: settings.spreadDeg * DEG,
      },
      reaches,
    );
    if (zone) out.push(zone);
  });
  return out;
}

/**
 * Highest lap-model speed on the stretch from `from` to `to` (lap distances, m) and at the last
 * point of the line before `to` (a corner straight after another has no stretch of its own), m/s.
 */
function peakSpeed(
  line: LayoutAnalysis["line"],
  speed: readonly number[],
  from: number,
  to: number,
  L: number,
) {
  const n = line.s.length - 1;
  // The last point at or before `to`, then back along the lap to `from`.
  let i = lineIndexBefore(line.s, to);
  let peak = speed[i];
  const span = lapAhead(from, to, L);
  for (let k = 0; k < n; k++) {
    i = (i - 1 + n) % n;
    if (lapAhead(from, line.s[i], L) > span + 1e-9) break;
    peak = Math.max(peak, speed[i]);
  }
  return peak;
}

/** Index of the last point of an increasing list at or before `s` (0 when none). */
function lineIndexBefore(s: readonly number[], at: number): number {
  let lo = 0;
  let hi = s.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (s[mid] <= at) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * The run-off zone of every corner some class can reach faster than the corner allows: the most
 * the stretch before it allows, plus the margin, above sqrt(mu g R).
 */
export function turnZones(
  marks: TrackMarks,
  line: LayoutAnalysis["line"],
  classes: readonly ZoneClass[],
  settings: MarshalSettings,
): ZoneGeometry[] {
  const L = marks.lapLength;
  const g = STANDARD_GRAVITY;
  const out: ZoneGeometry[] = [];
  marks.corners.forEach((corner, k) => {
    const before = marks.corners[(k - 1 + marks.corners.length) % marks.corners.length];
    const reaches: ZoneClassReach[] = [];
    for (const cls of classes) {
      const limit = cornerSpeed(cls.car, corner.radius, g);
      const speed =
        peakSpeed(line, cls.analysis.lineSpeed, before.exitS, corner.entryS, L) * (1 + settings.speedMargin);
      if (!(speed > limit)) continue;
      const r = escapeReach(speed, cls.car.brakeDecel * settings.rollOutBraking);
      reaches.push({
        classId: cls.id,
        label: cls.car.label,
        speed,
        limitSpeed: limit,
        flightDistance: 0,
        airtime: 0,
        rollOutSpeed: speed,
        stoppingDistance: r.reach,
        reach: r.reach,
        equivalentFallHeight: null,
      });
    }
    const zone = zoneOf(
      {
        id: corner.id,
        kind: "run-off",
        title: corner.title,
        sectionId: corner.sectionIds[0],
        s: corner.entryS,
      },
      {
        x: corner.entry.x,
        y: corner.entry.y,
        heading: corner.entry.heading,
        near: 0,
        halfWidth: marks.trackWidth / 2,
        spread: settings.spreadDeg * DEG,
      },
      reaches,
    );
    if (zone) out.push(zone);
  });
  return out;
}
