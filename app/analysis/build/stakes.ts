/**
 * Stake positions for marking a layout out on the ground (product item 10, the marking-out sheet):
 * centre-line stations every `spacing` metres and on every section boundary, both track edges at
 * each station, the centre and radii of every turn, and the named points of every jump (toe, lip,
 * crest, landing end, ...) with their heights, each measured from two datum stakes (datum.ts).
 *
 * Positions come straight from the section chain (`resolveSections` + `advancePose`), so they are
 * exact on the engine's centre line; heights are above the surrounding ground, m.
 */
import type { LayoutDocument } from "../format/layout-document";
import { advancePose, closureError, resolveSections, startPose, type ResolvedSection } from "../track/geometry";
import { profileHeightAt } from "../track/jump-profile";
import { baseline, measureFromDatum, type Baseline, type DatumMeasure, type PlanPoint } from "./datum";
import { jumpStakePoints, type JumpPointKind } from "./jump-stakes";

export type StakeKind = "datum" | "centre" | "left-edge" | "right-edge" | "turn-centre" | JumpPointKind;

/** One stake: where it goes and how to find it from the datums. */
export interface Stake {
  /** Point name for the sheet and the instrument: "A", "C12", "L12", "R12", "T3", "J2-LIP". */
  id: string;
  kind: StakeKind;
  /** Plan position, m. */
  x: number;
  y: number;
  /** Height above the surrounding ground, m. */
  height: number;
  /** Lap distance along the centre line, m (null for datums and turn centres). */
  s: number | null;
  /** Index of the section in the layout (null for datums). */
  sectionIndex: number | null;
  measure: DatumMeasure;
}

/** A turn, set out from its centre. */
export interface TurnStakes {
  /** T1, T2, ... in track order. */
  number: number;
  sectionIndex: number;
  sectionId: string;
  direction: "left" | "right";
  /** Angle turned, rad (positive). */
  angle: number;
  /** Radius of the centre line, of the inner and the outer track edge, m. */
  radius: number;
  innerRadius: number;
  outerRadius: number;
  /** Lap distance where the turn begins and ends, m. */
  startS: number;
  endS: number;
  centre: Stake;
}

/** A jump's named points, in order along the track. */
export interface JumpStakes {
  /** J1, J2, ... in track order (as on the layout page). */
  number: number;
  sectionIndex: number;
  sectionId: string;
  points: Stake[];
}

export interface MarkingOut {
  baseline: Baseline;
  /** Largest distance between centre-line stations, m. */
  spacing: number;
  /** Track width, m. */
  width: number;
  lapLength: number;
  /** How far the loop's end misses its start, m (stations stop at the lap's end either way). */
  closureGap: number;
  datums: [Stake, Stake];
  /** Stations in lap order: each a centre, a left-edge and a right-edge stake. */
  stations: { number: number; centre: Stake; left: Stake; right: Stake }[];
  turns: TurnStakes[];
  jumps: JumpStakes[];
}

/** Smallest and largest station spacing accepted, m. */
export const STATION_SPACING_RANGE = { min: 0.5, max: 50 } as const;

/**
 * Everything the marking-out sheet lists.
 * @param a, b datum stakes on the plan, m (at least MIN_BASELINE apart).
 * @param spacing largest distance between centre-line stations, m (STATION_SPACING_RANGE).
 * @throws RangeError for a short baseline, a spacing out of range or more than MAX_STATIONS.
 */
export function markingOut(
  doc: Pick<LayoutDocument, "start" | "sections" | "trackWidth">,
  a: PlanPoint,
  b: PlanPoint,
  spacing: number,
): MarkingOut {
  if (!(spacing >= STATION_SPACING_RANGE.min && spacing <= STATION_SPACING_RANGE.max)) {
    throw new RangeError(
      `spacing must be between ${STATION_SPACING_RANGE.min} and ${STATION_SPACING_RANGE.max} m`,
    );
  }
  const line = baseline(a, b);
  if (stationCount(doc, spacing) > MAX_STATIONS) {
    throw new RangeError(`more than ${MAX_STATIONS} stations at a spacing of ${spacing} m`);
  }
  const sections = resolveSections(doc);
  const last = sections[sections.length - 1];
  const lapLength = last.startS + last.length;
  const stake = (id: string, kind: StakeKind, x: number, y: number, extra: Partial<Stake> = {}): Stake => ({
    id,
    kind,
    x,
    y,
    height: 0,
    s: null,
    sectionIndex: null,
    ...extra,
    measure: measureFromDatum(line, x, y),
  });
  const half = doc.trackWidth / 2;
  const closureGap = closureError(sections, startPose(doc)).gap;
  // An open loop gets a station at its end too (a closed one ends on its first station).
  const stations = stationDistances(sections, spacing, closureGap > 0.01).map((st, i) => {
    const sec = sections[st.sectionIndex];
    const t = st.s - sec.startS;
    const p = advancePose(sec.start, t, sec.curvature);
    const height = sec.profile ? profileHeightAt(sec.profile, t) : 0;
    const nx = -Math.sin(p.heading) * half;
    const ny = Math.cos(p.heading) * half;
    const at = { s: st.s, sectionIndex: st.sectionIndex, height };
    const n = i + 1;
    return {
      number: n,
      centre: stake(`C${n}`, "centre", p.x, p.y, at),
      left: stake(`L${n}`, "left-edge", p.x + nx, p.y + ny, at),
      right: stake(`R${n}`, "right-edge", p.x - nx, p.y - ny, at),
    };
  });
  const turns: TurnStakes[] = [];
  const jumps: JumpStakes[] = [];
  for (const sec of sections) {
    if (sec.kind === "turn") {
      const radius = 1 / Math.abs(sec.curvature);
      const cx = sec.start.x - Math.sin(sec.start.heading) / sec.curvature;
      const cy = sec.start.y + Math.cos(sec.start.heading) / sec.curvature;
      const number = turns.length + 1;
      turns.push({
        number,
        sectionIndex: sec.index,
        sectionId: sec.id,
        direction: sec.curvature > 0 ? "left" : "right",
        angle: Math.abs(sec.turnAngle),
        radius,
        innerRadius: radius - half,
        outerRadius: radius + half,
        startS: sec.startS,
        endS: sec.startS + sec.length,
        centre: stake(`T${number}`, "turn-centre", cx, cy, { sectionIndex: sec.index }),
      });
    } else if (sec.kind === "jump" && sec.profile) {
      const number = jumps.length + 1;
      const section = doc.sections[sec.index];
      const points = jumpStakePoints(sec.profile, section.kind === "jump" && section.preset === "whoops");
      jumps.push({
        number,
        sectionIndex: sec.index,
        sectionId: sec.id,
        points: points.map((p) => {
          const pose = advancePose(sec.start, p.d, 0);
          return stake(`J${number}-${p.code}`, p.kind, pose.x, pose.y, {
            s: sec.startS + p.d,
            sectionIndex: sec.index,
            height: p.h,
          });
        }),
      });
    }
  }
  return {
    baseline: line,
    spacing,
    width: doc.trackWidth,
    lapLength,
    closureGap,
    datums: [stake("A", "datum", a.x, a.y), stake("B", "datum", b.x, b.y)],
    stations,
    turns,
    jumps,
  };
}

/**
 * Lap distances of the stations: every section's start and every multiple of `spacing`, in order.
 * A multiple closer than a quarter spacing (at most 0.25 m) to a section boundary is dropped: the
 * boundary stake (a tangent point or a jump's toe) does its job.
 */
export function stationDistances(
  sections: readonly ResolvedSection[],
  spacing: number,
  withEnd = false,
): { s: number; sectionIndex: number }[] {
  const near = Math.min(0.25, spacing / 4);
  const out: { s: number; sectionIndex: number }[] = [];
  for (const sec of sections) {
    const end = sec.startS + sec.length;
    out.push({ s: sec.startS, sectionIndex: sec.index });
    for (let k = Math.ceil((sec.startS + near) / spacing); k * spacing < end - near; k++) {
      out.push({ s: k * spacing, sectionIndex: sec.index });
    }
  }
  const last = sections[sections.length - 1];
  if (withEnd) out.push({ s: last.startS + last.length, sectionIndex: last.index });
  return out;
}

/** Most centre-line stations a sheet lists (each has three stakes). */
export const MAX_STATIONS = 3000;

/** The smallest station spacing that keeps a layout within MAX_STATIONS, m. */
export function smallestSpacing(doc: Pick<LayoutDocument, "start" | "sections">): number {
  const sections = resolveSections(doc);
  const last = sections[sections.length - 1];
  return (last.startS + last.length) / (MAX_STATIONS - sections.length - 2);
}

/**
 * How many stations a layout gets at a spacing (an upper bound, counted without placing them).
 * @param spacing m.
 */
export function stationCount(doc: Pick<LayoutDocument, "start" | "sections">, spacing: number): number {
  const sections = resolveSections(doc);
  const last = sections[sections.length - 1];
  return Math.ceil((last.startS + last.length) / spacing) + sections.length + 1;
}
