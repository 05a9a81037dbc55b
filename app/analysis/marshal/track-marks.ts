/**
 * The landmarks the marshal risk talks about, in lap order: jumps J1..Jn (as on the pages: every
 * jump section in order) and corners T1..Tn (turn sections to the same side that follow each
 * other make one corner), with a centre line sampled every 0.5 m and plain words for a place on
 * the lap ("on J2", "in T3", "after T3"). Plan metres, lap distances in metres, angles in radians
 * unless the name ends in Deg.
 */
import type { LayoutDocument } from "../format/layout-document";
import {
  resolveSections,
  sampleCentreLine,
  trackEdges,
  type CentreLine,
  type Pose,
  type ResolvedSection,
  type TrackEdges,
} from "../track/geometry";

/** Spacing of the marshal risk's centre line, m. */
export const MARSHAL_LINE_SPACING = 0.5;

export interface JumpMark {
  /** "J1", "J2", ... in lap order. */
  id: string;
  sectionId: string;
  sectionIndex: number;
  name: string | null;
  /** "J3 Hairpin double" (the name when the jump has one). */
  title: string;
  section: ResolvedSection;
}

export type CornerKind = "hairpin" | "turn" | "sweeper" | "kink";

export interface CornerMark {
  /** "T1", "T2", ... in lap order of their entries. */
  id: string;
  /** The corner's turn sections in driving order. */
  sectionIds: string[];
  sectionIndex: number;
  /** Lap distance of the entry and of the exit, m (exit < entry: the corner crosses the start line). */
  entryS: number;
  exitS: number;
  entry: Pose;
  side: "left" | "right";
  angleDeg: number;
  /** Centre-line radius of the first section, m. */
  radius: number;
  kind: CornerKind;
  /** "T3 (180° left hairpin)". */
  title: string;
}

export interface TrackMarks {
  sections: ResolvedSection[];
  line: CentreLine;
  /** The track's edges at each centre-line sample, m. */
  edges: TrackEdges;
  lapLength: number;
  trackWidth: number;
  jumps: JumpMark[];
  corners: CornerMark[];
}

/** The trade's word for a corner: hairpin from 150 deg, kink under 45 deg, sweeper from a 10 m radius. */
export function cornerKind(angleDeg: number, radius: number): CornerKind {
  if (angleDeg >= 150) return "hairpin";
  if (angleDeg < 45) return "kink";
  return radius >= 10 ? "sweeper" : "turn";
}

function corners(sections: readonly ResolvedSection[], lapLength: number): CornerMark[] {
  const n = sections.length;
  const side = (k: number) => Math.sign(sections[(k + n) % n].curvature);
  // Start at a section that does not continue a corner from before it (the loop may begin mid-corner).
  let first = 0;
  while (first < n && side(first) !== 0 && side(first) === side(first - 1)) first++;
  if (first === n) first = 0;
  const out: Omit<CornerMark, "id" | "title">[] = [];
  for (let step = 0; step < n;) {
    const k = (first + step) % n;
    const sign = side(k);
    if (sign === 0) {
      step++;
      continue;
    }
    const ids: string[] = [];
    let angle = 0;
    let last = k;
    while (step < n && side(first + step) === sign) {
      const sec = sections[(first + step) % n];
      ids.push(sec.id);
      angle += Math.abs(sec.turnAngle);
      last = sec.index;
      step++;
    }
    const sec = sections[k];
    const angleDeg = (angle * 180) / Math.PI;
    const radius = 1 / Math.abs(sec.curvature);
    const end = sections[last];
    out.push({
      sectionIds: ids,
      sectionIndex: k,
      entryS: sec.startS,
      exitS: (end.startS + end.length) % lapLength,
      entry: { ...sec.start },
      side: sign > 0 ? "left" : "right",
      angleDeg,
      radius,
      kind: cornerKind(angleDeg, radius),
    });
  }
  out.sort((a, b) => a.entryS - b.entryS);
  return out.map((c, i) => {
    const id = `T${i + 1}`;
    return { ...c, id, title: `${id} (${Math.round(c.angleDeg)}\u00b0 ${c.side} ${c.kind})` };
  });
}

/** The landmarks of a layout and its centre line at MARSHAL_LINE_SPACING. */
export function trackMarks(doc: Pick<LayoutDocument, "start" | "sections" | "trackWidth">): TrackMarks {
  const sections = resolveSections(doc);
  const line = sampleCentreLine(sections, MARSHAL_LINE_SPACING);
  const jumps: JumpMark[] = [];
  for (const sec of sections) {
    const docSection = doc.sections[sec.index];
    if (docSection.kind !== "jump") continue;
    const id = `J${jumps.length + 1}`;
    const name = docSection.name ?? null;
    jumps.push({
      id,
      sectionId: sec.id,
      sectionIndex: sec.index,
      name,
      title: name ? `${id} ${name}` : id,
      section: sec,
    });
  }
  return {
    sections,
    line,
    edges: trackEdges(line, doc.trackWidth),
    lapLength: line.length,
    trackWidth: doc.trackWidth,
    jumps,
    corners: corners(sections, line.length),
  };
}

/** Forward lap distance from `from` to `to`, m, in [0, lapLength). */
export function lapAhead(from: number, to: number, lapLength: number): number {
  return (((to - from) % lapLength) + lapLength) % lapLength;
}

/** Whether lap distance `s` lies in the stretch from `from` to `to` (going forward, crossing the start when to < from). */
export function inStretch(s: number, from: number, to: number, lapLength: number): boolean {
  return lapAhead(from, s, lapLength) <= lapAhead(from, to, lapLength);
}

/** A place on the lap in plain words: "on J2", "in T3", "after T3" or "after the start line". */
export function placeOnLap(marks: TrackMarks, s: number): string {
  const L = marks.lapLength;
  for (const j of marks.jumps)
    if (inStretch(s, j.section.startS, j.section.startS + j.section.length, L)) return `on ${j.id}`;
  for (const c of marks.corners) if (inStretch(s, c.entryS, c.exitS, L)) return `in ${c.id}`;
  let best: { id: string; ahead: number } | null = null;
  for (const c of marks.corners) {
    const ahead = lapAhead(c.exitS, s, L);
    if (!best || ahead < best.ahead) best = { id: c.id, ahead };
  }
  for (const j of marks.jumps) {
    const ahead = lapAhead(j.section.startS + j.section.length, s, L);
    if (!best || ahead < best.ahead) best = { id: j.id, ahead };
  }
  return best && best.ahead < s ? `after ${best.id}` : "after the start line";
}
