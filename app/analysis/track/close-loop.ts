/**
 * "Close the loop": adjusts the last sections of a layout so that its end pose meets its start
 * pose (gap 0 m, heading difference 0 deg). See docs/decisions/0202-close-the-loop.md.
 *
 * Method: among the last few sections, the adjustable values are straight lengths, turn angles and
 * turn radii (jump shapes are never changed). For every choice of three of them, Newton's method
 * solves the three closure equations (x, y, heading); of the solutions that keep every value in
 * its allowed range, the one with the smallest change wins (1 m of length or radius counts as
 * much as 10 degrees of angle).
 */
import type { LayoutDocument, LayoutSection } from "../format/layout-document";
import {
  advancePose,
  closureError,
  resolveSections,
  sectionShape,
  startPose,
  wrapAngle,
  type Closure,
  type Pose,
} from "./geometry";

export type AdjustableField = "length" | "angleDeg" | "radius";

export interface SectionChange {
  index: number;
  sectionId: string;
  field: AdjustableField;
  /** Old and new value: m for length and radius, degrees for angleDeg. */
  from: number;
  to: number;
}

export type CloseLoopResult<T> =
  | { ok: true; document: T; changes: SectionChange[]; closure: Closure }
  | { ok: false; reason: string; closure: Closure };

interface Param {
  index: number;
  field: AdjustableField;
  value: number;
  min: number;
  max: number;
  /** Size of a change that counts as 1 in the score. */
  unit: number;
}

const DEG = Math.PI / 180;
/** Weight of heading against position in the residual, m/rad. */
const HEADING_WEIGHT = 10;
const LIMITS: Record<AdjustableField, [number, number, number]> = {
  length: [0.5, 300, 1],
  angleDeg: [1, 360, 10],
  radius: [1, 300, 1],
};

/**
 * Adjusts values among the last `tailSections` sections to close the loop.
 * @returns a new document and the changes, or the reason it cannot be closed that way.
 */
export function closeLoop<T extends Pick<LayoutDocument, "start" | "sections">>(
  doc: T,
  tailSections = 6,
): CloseLoopResult<T> {
  const sections = resolveSections(doc);
  const start = startPose(doc);
  const closure = closureError(sections, start);
  if (closure.gap < 1e-6 && Math.abs(closure.headingDeg) < 1e-6)
    return { ok: true, document: doc, changes: [], closure };
  const first = Math.max(0, doc.sections.length - tailSections);
  const params: Param[] = [];
  for (let i = first; i < doc.sections.length; i++) params.push(...adjustable(doc.sections[i], i));
  const tailStart = sections[first].start;
  const tail = doc.sections.slice(first).map((s) => sectionShape(s));
  let best: { values: number[]; picked: Param[]; score: number } | null = null;
  for (let a = 0; a < params.length; a++)
    for (let b = a + 1; b < params.length; b++)
      for (let c = b + 1; c < params.length; c++) {
        const picked = [params[a], params[b], params[c]];
        const values = solve(picked, tail, first, tailStart, start);
        if (!values) continue;
        const score = picked.reduce((sum, p, k) => sum + Math.abs(values[k] - p.value) / p.unit, 0);
        if (!best || score < best.score) best = { values, picked, score };
      }
  if (!best) {
    const reason =
      "no choice of lengths, angles and radii in the last sections closes the loop within their allowed ranges; reshape the layout by hand";
    return { ok: false, reason, closure };
  }
  const newSections = doc.sections.slice() as LayoutSection[];
  const changes: SectionChange[] = [];
  best.picked.forEach((p, k) => {
    const to = Math.round(best.values[k] * 1e4) / 1e4;
    if (to === p.value) return;
    newSections[p.index] = { ...newSections[p.index], [p.field]: to } as LayoutSection;
    changes.push({ index: p.index, sectionId: doc.sections[p.index].id, field: p.field, from: p.value, to });
  });
  const document = { ...doc, sections: newSections };
  return { ok: true, document, changes, closure: closureError(resolveSections(document), start) };
}

function adjustable(s: LayoutSection, index: number): Param[] {
  const make = (field: AdjustableField, value: number): Param => {
    const [min, max, unit] = LIMITS[field];
    return { index, field, value, min, max, unit };
  };
  if (s.kind === "straight") return [make("length", s.length)];
  if (s.kind === "turn") return [make("angleDeg", s.angleDeg), make("radius", s.radius)];
  return [];
}

type Shape = { length: number; curvature: number };

/** Weighted closure residual of the tail with the picked values. */
function residual(
  picked: Param[],
  values: number[],
  tail: Shape[],
  first: number,
  tailStart: Pose,
  start: Pose,
  out: number[],
): void {
  const pose: Pose = { ...tailStart };
  for (let k = 0; k < tail.length; k++) {
    let { length, curvature } = tail[k];
    const index = first + k;
    const sign = Math.sign(curvature);
    let radius = sign === 0 ? 0 : 1 / Math.abs(curvature);
    let angle = sign === 0 ? 0 : length / radius;
    for (let p = 0; p < picked.length; p++) {
      if (picked[p].index !== index) continue;
      if (picked[p].field === "length") length = values[p];
      else if (picked[p].field === "radius") radius = values[p];
      else angle = values[p] * DEG;
    }
    if (sign !== 0) {
      curvature = sign / radius;
      length = angle * radius;
    }
    advancePose(pose, length, curvature, pose);
  }
  out[0] = pose.x - start.x;
  out[1] = pose.y - start.y;
  out[2] = HEADING_WEIGHT * wrapAngle(pose.heading - start.heading);
}

/** Newton's method on the three picked values; null when it fails or leaves the allowed ranges. */
function solve(picked: Param[], tail: Shape[], first: number, tailStart: Pose, start: Pose): number[] | null {
  const v = picked.map((p) => p.value);
  const r = [0, 0, 0];
  const rp = [0, 0, 0];
  const J = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let iter = 0; iter < 40; iter++) {
    residual(picked, v, tail, first, tailStart, start, r);
    if (Math.hypot(r[0], r[1], r[2]) < 1e-9)
      return v.every((x, k) => x >= picked[k].min && x <= picked[k].max) ? v : null;
    for (let k = 0; k < 3; k++) {
      const h = 1e-6 * Math.max(1, Math.abs(v[k]));
      const keep = v[k];
      v[k] = keep + h;
      residual(picked, v, tail, first, tailStart, start, rp);
      v[k] = keep;
      for (let row = 0; row < 3; row++) J[row][k] = (rp[row] - r[row]) / h;
    }
    const step = solve3(J, r);
    if (!step) return null;
    // Damp big steps so a value does not jump far outside its range in one go.
    let scale = 1;
    for (let k = 0; k < 3; k++)
      scale = Math.min(scale, (20 * picked[k].unit) / Math.max(1e-12, Math.abs(step[k])));
    for (let k = 0; k < 3; k++) v[k] -= scale * step[k];
    if (v.some((x) => !Number.isFinite(x) || x <= 0)) return null;
  }
  return null;
}

/** Solves J x = r for 3x3 J by Cramer's rule; null when J is (nearly) singular. */
function solve3(J: number[][], r: number[]): number[] | null {
  const det = (m: number[][]) =>
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
  const d = det(J);
  if (!Number.isFinite(d) || Math.abs(d) < 1e-10) return null;
  const out = [0, 0, 0];
  for (let k = 0; k < 3; k++) {
    const m = J.map((row, i) => row.map((x, j) => (j === k ? r[i] : x)));
    out[k] = det(m) / d;
  }
  return out;
}
