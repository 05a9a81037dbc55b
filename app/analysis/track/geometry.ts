/**
 * Layout geometry: sections chained from the start pose into a sampled centre line, track edges,
 * lap length and closure error (engine.md section 1).
 *
 * Plan frame: X right, Y up, headings anticlockwise from +X in radians. Lengths are plan (top-down)
 * lengths; a jump is a straight whose ground rises and falls along it.
 */
import type { LayoutDocument, LayoutSection } from "../format/layout-document";
import { jumpProfile, profileHeightAt, type JumpProfile } from "./jump-profile";

/** Position (m) and heading (rad, anticlockwise from +X). */
export interface Pose {
  x: number;
  y: number;
  heading: number;
}

export interface ResolvedSection {
  index: number;
  id: string;
  kind: LayoutSection["kind"];
  /** Plan length along the centre line, m. */
  length: number;
  /** Signed curvature, 1/m (positive turns left; 0 on straights and jumps). */
  curvature: number;
  /** Signed angle turned, rad. */
  turnAngle: number;
  /** Lap distance at the section's start, m. */
  startS: number;
  start: Pose;
  end: Pose;
  /** Ground profile of a jump section, else null. */
  profile: JumpProfile | null;
}

/** A sampled centre line; sample i is at lap distance s[i]. The last sample is the end pose. */
export interface CentreLine {
  count: number;
  /** Plan position, m. */
  x: Float64Array;
  y: Float64Array;
  /** Ground height, m (jump profiles; 0 elsewhere). */
  z: Float64Array;
  /** Heading, rad, unwrapped (continuous along the lap). */
  heading: Float64Array;
  /** Lap distance, m. */
  s: Float64Array;
  /** Signed curvature, 1/m. */
  curvature: Float64Array;
  /** Index of the section each sample belongs to. */
  section: Int32Array;
  /** First sample of each section; entry [sections] is the last sample. */
  sectionStart: Int32Array;
  /** Lap length, m. */
  length: number;
}

export interface Closure {
  /** Distance from the end of the last section to the start, m. */
  gap: number;
  /** End position minus start position, m. */
  dx: number;
  dy: number;
  /** End heading minus start heading, wrapped to (-180, 180], degrees. */
  headingDeg: number;
}

const DEG = Math.PI / 180;

/**
 * Pose after driving a length of constant curvature.
 * @param length m; @param curvature signed 1/m (positive = left).
 */
export function advancePose(
  p: Pose,
  length: number,
  curvature: number,
  out: Pose = { x: 0, y: 0, heading: 0 },
): Pose {
  const h = p.heading;
  if (Math.abs(curvature) < 1e-12) {
    out.x = p.x + length * Math.cos(h);
    out.y = p.y + length * Math.sin(h);
    out.heading = h;
    return out;
  }
  const h2 = h + curvature * length;
  out.x = p.x + (Math.sin(h2) - Math.sin(h)) / curvature;
  out.y = p.y + (Math.cos(h) - Math.cos(h2)) / curvature;
  out.heading = h2;
  return out;
}

/** Plan length (m) and signed curvature (1/m) of a section, with its jump profile. */
export function sectionShape(section: LayoutSection): {
  length: number;
  curvature: number;
  profile: JumpProfile | null;
} {
  if (section.kind === "straight") return { length: section.length, curvature: 0, profile: null };
  if (section.kind === "turn") {
    const sign = section.direction === "left" ? 1 : -1;
    return {
      length: section.radius * section.angleDeg * DEG,
      curvature: sign / section.radius,
      profile: null,
    };
  }
  const profile = jumpProfile(section);
  return { length: profile.length, curvature: 0, profile };
}

/** Start pose of a document in engine units. */
export function startPose(doc: Pick<LayoutDocument, "start">): Pose {
  return { x: doc.start.x, y: doc.start.y, heading: doc.start.headingDeg * DEG };
}

/** Chains the sections from the start pose. */
export function resolveSections(doc: Pick<LayoutDocument, "start" | "sections">): ResolvedSection[] {
  let pose = startPose(doc);
  let s = 0;
  return doc.sections.map((section, index) => {
    const { length, curvature, profile } = sectionShape(section);
    const end = advancePose(pose, length, curvature);
    const r: ResolvedSection = {
      index,
      id: section.id,
      kind: section.kind,
      length,
      curvature,
      turnAngle: curvature * length,
      startS: s,
      start: pose,
      end,
      profile,
    };
    pose = end;
    s += length;
    return r;
  });
}

/**
 * Samples the centre line at most `spacing` apart, with a sample on every section boundary.
 * @param spacing largest distance between samples, m.
 */
export function sampleCentreLine(sections: readonly ResolvedSection[], spacing = 0.1): CentreLine {
  const perSection = new Int32Array(sections.length);
  let count = 1;
  for (let i = 0; i < sections.length; i++) {
    perSection[i] = Math.max(1, Math.ceil(sections[i].length / spacing - 1e-9));
    count += perSection[i];
  }
  const line: CentreLine = {
    count,
    x: new Float64Array(count),
    y: new Float64Array(count),
    z: new Float64Array(count),
    heading: new Float64Array(count),
    s: new Float64Array(count),
    curvature: new Float64Array(count),
    section: new Int32Array(count),
    sectionStart: new Int32Array(sections.length + 1),
    length: 0,
  };
  const pose: Pose = { x: 0, y: 0, heading: 0 };
  let i = 0;
  for (let k = 0; k < sections.length; k++) {
    const sec = sections[k];
    const n = perSection[k];
    line.sectionStart[k] = i;
    for (let j = 0; j < n; j++, i++) {
      const t = (j * sec.length) / n;
      advancePose(sec.start, t, sec.curvature, pose);
      line.x[i] = pose.x;
      line.y[i] = pose.y;
      line.heading[i] = pose.heading;
      line.s[i] = sec.startS + t;
      line.curvature[i] = sec.curvature;
      line.section[i] = k;
      line.z[i] = sec.profile ? profileHeightAt(sec.profile, t) : 0;
    }
  }
  const last = sections[sections.length - 1];
  line.sectionStart[sections.length] = i;
  line.x[i] = last.end.x;
  line.y[i] = last.end.y;
  line.heading[i] = last.end.heading;
  line.length = last.startS + last.length;
  line.s[i] = line.length;
  line.section[i] = sections.length - 1;
  line.curvature[i] = last.curvature;
  return line;
}

/** Wraps an angle to (-pi, pi], rad. */
export function wrapAngle(a: number): number {
  const w = a - 2 * Math.PI * Math.floor((a + Math.PI) / (2 * Math.PI));
  return w <= -Math.PI ? w + 2 * Math.PI : w;
}

/** How far the end of the last section misses the start pose. */
export function closureError(sections: readonly ResolvedSection[], start: Pose): Closure {
  const end = sections.length ? sections[sections.length - 1].end : start;
  const dx = end.x - start.x;
  const dy = end.y - start.y;
  let headingDeg = wrapAngle(end.heading - start.heading) / DEG;
  if (Math.abs(headingDeg) < 1e-9) headingDeg = 0;
  return { gap: Math.hypot(dx, dy), dx, dy, headingDeg };
}

export interface TrackEdges {
  /** Left edge (seen driving the lap), m. */
  leftX: Float64Array;
  leftY: Float64Array;
  rightX: Float64Array;
  rightY: Float64Array;
}

/**
 * Track edges half the width either side of the centre line.
 * @param width track width, m.
 */
export function trackEdges(line: CentreLine, width: number): TrackEdges {
  const half = width / 2;
  const e: TrackEdges = {
    leftX: new Float64Array(line.count),
    leftY: new Float64Array(line.count),
    rightX: new Float64Array(line.count),
    rightY: new Float64Array(line.count),
  };
  for (let i = 0; i < line.count; i++) {
    const nx = -Math.sin(line.heading[i]) * half;
    const ny = Math.cos(line.heading[i]) * half;
    e.leftX[i] = line.x[i] + nx;
    e.leftY[i] = line.y[i] + ny;
    e.rightX[i] = line.x[i] - nx;
    e.rightY[i] = line.y[i] - ny;
  }
  return e;
}

/** The centre-line sample nearest a plan point: its index, lap distance (m) and distance (m). */
export function nearestSample(
  line: CentreLine,
  x: number,
  y: number,
): { index: number; s: number; distance: number } {
  let best = 0;
  let bestD2 = Infinity;
  for (let i = 0; i < line.count; i++) {
    const d2 = (line.x[i] - x) ** 2 + (line.y[i] - y) ** 2;
    if (d2 < bestD2) {
      bestD2 = d2;
      best = i;
    }
  }
  return { index: best, s: line.s[best], distance: Math.sqrt(bestD2) };
}

export interface LayoutGeometry {
  sections: ResolvedSection[];
  line: CentreLine;
  /** Lap length along the centre line in plan, m. */
  lapLength: number;
  closure: Closure;
}

/**
 * Chains, samples and measures a layout.
 * @param spacing largest distance between centre-line samples, m.
 */
export function layoutGeometry(
  doc: Pick<LayoutDocument, "start" | "sections">,
  spacing = 0.1,
): LayoutGeometry {
  const sections = resolveSections(doc);
  const line = sampleCentreLine(sections, spacing);
  return { sections, line, lapLength: line.length, closure: closureError(sections, startPose(doc)) };
}
