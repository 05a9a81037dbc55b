/**
 * The maths behind the canvas handles: where each handle sits and what value a handle dragged to a
 * plan point gives. Plan frame as in engine.md: X right, Y up, headings anticlockwise from +X (rad).
 * Results are snapped (switchable) and kept inside the document's allowed ranges.
 */
import {
  FIELD_LIMITS,
  type Pose,
  type ResolvedSection,
  type LayoutDocument,
  type TurnSection,
} from "~/analysis";
import { clamp, snapAngle, snapLength, type SnapSettings } from "./snap";

export type Point = { x: number; y: number };

const DEG = Math.PI / 180;
/** Allowed ranges of the document format (FIELD_LIMITS, app/analysis/format/field-limits.ts). */
export const LIMITS = {
  length: [FIELD_LIMITS.straightLength.min, FIELD_LIMITS.straightLength.max],
  radius: [FIELD_LIMITS.turnRadius.min, FIELD_LIMITS.turnRadius.max],
  angleDeg: [FIELD_LIMITS.turnAngle.min, FIELD_LIMITS.turnAngle.max],
} as const;

/** Unit vector of a heading. */
function dir(heading: number): Point {
  return { x: Math.cos(heading), y: Math.sin(heading) };
}

/**
 * Length of a straight whose end handle is dragged to `p`: the distance from the start along the
 * start heading (the handle slides on the straight's line), snapped and clamped to 0.5..300 m.
 */
export function straightLengthFromPoint(start: Pose, p: Point, snap: SnapSettings): number {
  const d = dir(start.heading);
  const along = (p.x - start.x) * d.x + (p.y - start.y) * d.y;
  return clamp(snapLength(along, snap), LIMITS.length[0], LIMITS.length[1]);
}

/** +1 for a left turn, -1 for a right turn. */
function turnSign(direction: TurnSection["direction"]): number {
  return direction === "left" ? 1 : -1;
}

/** Centre of a turn's circle, m: `radius` to the inside of the start pose. */
export function turnCentre(start: Pose, radius: number, direction: TurnSection["direction"]): Point {
  const s = turnSign(direction);
  return {
    x: start.x - s * radius * Math.sin(start.heading),
    y: start.y + s * radius * Math.cos(start.heading),
  };
}

/**
 * Radius of a turn whose centre handle is dragged to `p`: the centre slides on the line through the
 * start square to the start heading, so the radius is the distance along that line to the inside,
 * snapped and clamped to 1..300 m.
 */
export function turnRadiusFromPoint(
  start: Pose,
  direction: TurnSection["direction"],
  p: Point,
  snap: SnapSettings,
): number {
  const s = turnSign(direction);
  const nx = -s * Math.sin(start.heading);
  const ny = s * Math.cos(start.heading);
  const inward = (p.x - start.x) * nx + (p.y - start.y) * ny;
  return clamp(snapLength(inward, snap), LIMITS.radius[0], LIMITS.radius[1]);
}

/**
 * Angle of a turn whose end handle is dragged to `p`: the angle swept around the centre from the
 * start to the pointer in the turn's direction, deg. Of the equivalent angles (±360 deg) the one
 * nearest the previous angle wins, so dragging past a full circle does not jump back to 0.
 * @param previousDeg the turn's angle before this move, deg.
 */
export function turnAngleFromPoint(
  start: Pose,
  radius: number,
  direction: TurnSection["direction"],
  p: Point,
  previousDeg: number,
  snap: SnapSettings,
): number {
  const c = turnCentre(start, radius, direction);
  const s = turnSign(direction);
  const a0 = Math.atan2(start.y - c.y, start.x - c.x);
  const a1 = Math.atan2(p.y - c.y, p.x - c.x);
  let sweep = (s * (a1 - a0)) / DEG;
  sweep = ((sweep % 360) + 360) % 360;
  let best = sweep;
  for (const candidate of [sweep - 360, sweep + 360])
    if (Math.abs(candidate - previousDeg) < Math.abs(best - previousDeg)) best = candidate;
  return clamp(snapAngle(best, snap), LIMITS.angleDeg[0], LIMITS.angleDeg[1]);
}

export interface SectionHandles {
  /** Straight or jump: the end of a straight (drag to change its length). */
  end?: Point;
  /** Turn: the centre (drag to change the radius) and the end of the arc (drag to change the angle). */
  centre?: Point;
  angle?: Point;
  /** Jump: its middle (drag along the track to move it, trading length with the straights either side). */
  move?: Point;
}

/** Where the handles of a section are drawn, m. */
export function sectionHandles(
  r: ResolvedSection,
  section: LayoutDocument["sections"][number],
  movable: boolean,
): SectionHandles {
  if (section.kind === "straight") return { end: { x: r.end.x, y: r.end.y } };
  if (section.kind === "turn")
    return {
      centre: turnCentre(r.start, section.radius, section.direction),
      angle: { x: r.end.x, y: r.end.y },
    };
  if (!movable) return {};
  const d = dir(r.start.heading);
  return { move: { x: r.start.x + (d.x * r.length) / 2, y: r.start.y + (d.y * r.length) / 2 } };
}

/** Why a jump cannot be moved along its stretch, or null when it can. */
export function jumpMoveBlocker(doc: Pick<LayoutDocument, "sections">, index: number): string | null {
  const before = doc.sections[index - 1];
  const after = doc.sections[index + 1];
  if (doc.sections[index]?.kind !== "jump") return "Only jumps move along their stretch.";
  if (before?.kind !== "straight" || after?.kind !== "straight")
    return "A jump moves along the track when there is a straight right before it and right after it.";
  if (before.locked || after.locked)
    return "A jump moves along the track by changing the straights either side; one of them is locked.";
  return null;
}

/**
 * Moves a jump along the track by `delta` m (positive = forward) by lengthening the straight before
 * it and shortening the straight after it by the same amount, so nothing after the jump moves. The
 * straight before is snapped to 0.1 m (switchable) and both keep at least 0.5 m.
 * @returns the new document, or null when the jump has no straight on both sides.
 */
export function moveJump<D extends Pick<LayoutDocument, "sections">>(
  doc: D,
  index: number,
  delta: number,
  snap: SnapSettings,
): D | null {
  if (jumpMoveBlocker(doc, index)) return null;
  const before = doc.sections[index - 1] as Extract<D["sections"][number], { kind: "straight" }>;
  const after = doc.sections[index + 1] as Extract<D["sections"][number], { kind: "straight" }>;
  const total = before.length + after.length;
  const newBefore = clamp(
    snapLength(before.length + delta, snap),
    LIMITS.length[0],
    total - LIMITS.length[0],
  );
  if (newBefore < LIMITS.length[0]) return doc;
  const newAfter = Number((total - newBefore).toFixed(6));
  if (newBefore === before.length) return doc;
  const sections = doc.sections.slice();
  sections[index - 1] = { ...before, length: newBefore };
  sections[index + 1] = { ...after, length: newAfter };
  return { ...doc, sections };
}

/**
 * How far along the track (m) a point lies from the jump's move handle: the pointer's offset
 * projected on the jump's heading.
 */
export function alongTrack(r: ResolvedSection, handle: Point, p: Point): number {
  const d = dir(r.start.heading);
  return (p.x - handle.x) * d.x + (p.y - handle.y) * d.y;
}
