/**
 * Result types of the marshal risk (`marshalPlan`, marshal-plan.ts): zones, hotspots and marshal
 * points with their stretch, what to watch and warnings. Plain JSON-serialisable data; plan
 * positions and lengths in metres, lap distances in metres from the start line, speeds in m/s,
 * angles in degrees (every angle field ends in Deg). Every number is a model estimate.
 */
import type { MarshalSettings } from "./settings";

/** A plan point [x, y], m. */
export type PlanXY = [number, number];

/** How one car class gets into a zone. */
export interface ZoneClassReach {
  classId: string;
  label: string;
  /** Takeoff speed (jump) or turn-entry speed (turn) of the zone: the approach's most plus the margin, m/s. */
  speed: number;
  /** The most the track allows there: the top of the jump's drag-free speed window, or sqrt(mu g R) of the turn, m/s. */
  limitSpeed: number;
  /** Plan distance from the lip to first ground contact, m (0 for a turn). */
  flightDistance: number;
  /** Time in the air, s (0 for a turn). */
  airtime: number;
  /** Speed along the ground when the roll-out starts, m/s. */
  rollOutSpeed: number;
  /** Roll-out until stopped, rollOutSpeed^2 / (2 x braking), m. */
  stoppingDistance: number;
  /** From the lip or the turn's entry to where the car stops, m. */
  reach: number;
  /** Equivalent fall height of the overshoot landing, m (null for a turn). */
  equivalentFallHeight: number | null;
}

/** What a zone holds. */
export interface ZoneContents {
  /** Other track inside the zone (not the track the car left): lap stretch m, where in words, distance from the zone's origin along it, m. */
  crosses: { fromS: number; toS: number; place: string; distance: number }[];
  /** The layout's marshal points inside the zone ("M4"). */
  marshalPoints: string[];
  /** The layout's marshal points outside it but within 3 m of it. */
  besidePoints: string[];
  /** True when part of the zone lies outside the site boundary (false without one). */
  leavesSite: boolean;
  /** Room from the origin before the first other track or the site boundary, m (the zone's far end when neither). */
  freeRunOff: number;
}

export interface MarshalZone {
  /** "J3" (overshoot beyond a jump) or "T2" (run-off past a corner), as in the result's marks. */
  id: string;
  kind: "overshoot" | "run-off";
  /** "J3 Hairpin double" or "T2 (180° left hairpin)". */
  title: string;
  /** The jump's section, or the corner's first section. */
  sectionId: string;
  /** Lap distance of the lip or of the corner's entry, m. */
  s: number;
  /**
   * The wedge: origin (centre of the lip or of the entry) m, heading deg anticlockwise from +X, from
   * `near` to `far` m along the heading, `halfWidth` m either side at the origin, widening by
   * `spreadDeg` either side.
   */
  wedge: {
    x: number;
    y: number;
    headingDeg: number;
    near: number;
    far: number;
    halfWidth: number;
    spreadDeg: number;
  };
  /** The wedge as an anticlockwise polygon. */
  polygon: PlanXY[];
  /** The class that reaches farthest. */
  classId: string;
  /** Every class that can get into the zone. */
  byClass: ZoneClassReach[];
  contents: ZoneContents;
}

export type HotspotKind =
  | "hard-landing"
  | "narrow-window"
  | "landing-into-turn"
  | "overshoot"
  | "fast-turn"
  | "close-lanes"
  | "hidden";

export interface Hotspot {
  /** "H1", "H2", ... in lap order. */
  id: string;
  kind: HotspotKind;
  /** 1 (keep an eye on it) to 5 (the most dangerous); docs/decisions/0701. */
  score: number;
  /** Plain words, e.g. "Cars that overshoot J5 Hairpin double land on the flat beside M4, up to 31 m past the lip." */
  reason: string;
  /** The jump ("J5") or corner ("T3") it is about, else null. */
  subject: string | null;
  /** Lap distance it belongs to (which marshal's stretch), m; the stretch it spans, m. */
  s: number;
  fromS: number;
  toS: number;
  /** The spot to watch, m. */
  x: number;
  y: number;
  /** The class it is worst for, or null when it does not depend on the class. */
  classId: string | null;
  /** The zone behind it, or null. */
  zoneId: string | null;
}

/** A hotspot before it is numbered. */
export type HotspotDraft = Omit<Hotspot, "id">;

export interface MarshalWarning {
  kind: "in-zone" | "on-track" | "too-far";
  /** The zone it stands in, else null. */
  zoneId: string | null;
  /** What is wrong, in plain words. */
  text: string;
  /** What to do, in plain words. */
  action: string;
  /** A nearby spot outside every zone, off the track, within reach and on site, m; null when none was found. */
  moveTo: PlanXY | null;
}

/** A hotspot a point watches (its kind and reason are in `MarshalPlan.hotspots`, by id). */
export interface WatchItem {
  hotspotId: string;
  score: number;
  /** Plan distance from the point to the hotspot's spot, m. */
  distance: number;
  /** True when that distance is within the cover distance. */
  covered: boolean;
}

export interface MarshalPointReport {
  /** "M1", "M2", ...: the layout's points in their order; suggested points in lap order. */
  id: string;
  x: number;
  y: number;
  /** Lap distance of the nearest centre-line point, m. */
  s: number;
  side: "left" | "right";
  /** Distance from the nearest track edge, m (negative: on the track). */
  edgeDistance: number;
  /** The part of the lap this point watches: half way to each neighbour, m (toS < fromS: crosses the start line). */
  stretch: { fromS: number; toS: number; length: number };
  /** Hotspots in the stretch, most dangerous first. */
  watch: WatchItem[];
  /** Jumps ("J2") landing in the stretch and corners ("T3") entered in it, in lap order. */
  jumps: string[];
  turns: string[];
  warnings: MarshalWarning[];
}

export interface SuggestedPlan {
  /** Points asked for (the heat size) and placed (fewer when the ground leaves no more room). */
  asked: number;
  points: MarshalPointReport[];
  /** Hotspots no point covers. */
  uncovered: string[];
  /** Longest stretch between neighbouring points divided by an even share of the lap (1 = even). */
  gapRatio: number;
}

/** Jumps and corners by id, as the reasons and the points name them. */
export interface MarkSummary {
  id: string;
  title: string;
  sectionId: string;
  /** Lap distance of the lip or of the corner's entry, m. */
  s: number;
}

export interface MarshalPlan {
  /** Classes the zones and hotspots cover (the worst of them counts). */
  classIds: string[];
  settings: MarshalSettings;
  jumps: MarkSummary[];
  corners: MarkSummary[];
  /** The zones; `keepOutArea(zones)` merges them into one area for drawing. */
  zones: MarshalZone[];
  hotspots: Hotspot[];
  /** The layout's own marshal points with their stretch, watch list and warnings. */
  points: MarshalPointReport[];
  /** A suggested set of points, when asked for; null otherwise. */
  suggested: SuggestedPlan | null;
  /** Plain-words caveat shown with the plan. */
  note: string;
}
