/**
 * Pure operations on the rest of the site: track width, driver stand, marshal points and the site
 * boundary polygon. Positions are plan metres; each returns a new document.
 */
import type { LayoutDocument } from "~/analysis";
import { clamp } from "./snap";
import type { Point } from "./drag-maths";

type Doc = LayoutDocument;
/** Default drivers' eye height on a raised stand, m (common practice, no source). */
export const DEFAULT_EYE_HEIGHT = 2.5;
export const MAX_MARSHAL_POINTS = 50;
export const MAX_BOUNDARY_POINTS = 200;

const round = (v: number) => Math.round(v * 1000) / 1000;

/** Track width, kept inside the format's 1..10 m. */
export function setTrackWidth(doc: Doc, width: number): Doc {
  return { ...doc, trackWidth: clamp(width, 1, 10) };
}

export function addMarshalPoint(doc: Doc, p: Point): { doc: Doc; index: number } | null {
  if (doc.marshalPoints.length >= MAX_MARSHAL_POINTS) return null;
  const marshalPoints = [...doc.marshalPoints, { x: round(p.x), y: round(p.y) }];
  return { doc: { ...doc, marshalPoints }, index: marshalPoints.length - 1 };
}

export function moveMarshalPoint(doc: Doc, index: number, p: Point): Doc {
  if (!doc.marshalPoints[index]) return doc;
  const marshalPoints = doc.marshalPoints.slice();
  marshalPoints[index] = { x: round(p.x), y: round(p.y) };
  return { ...doc, marshalPoints };
}

/** Removes a marshal point; the points after it are numbered one lower. */
export function deleteMarshalPoint(doc: Doc, index: number): Doc {
  return { ...doc, marshalPoints: doc.marshalPoints.filter((_, i) => i !== index) };
}

/** Places (or moves) the driver stand, keeping its eye height (2.5 m for a new stand). */
export function placeDriverStand(doc: Doc, p: Point, eyeHeight?: number): Doc {
  const eye = clamp(eyeHeight ?? doc.driverStand?.eyeHeight ?? DEFAULT_EYE_HEIGHT, 0.5, 15);
  return { ...doc, driverStand: { x: round(p.x), y: round(p.y), eyeHeight: eye } };
}

export function removeDriverStand(doc: Doc): Doc {
  const { driverStand: _removed, ...rest } = doc;
  return rest;
}

export type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

/** A rectangular boundary `margin` m outside the given bounds, to reshape from. */
export function rectangleBoundary(doc: Doc, b: Bounds, margin = 5): Doc {
  const x0 = round(b.minX - margin);
  const y0 = round(b.minY - margin);
  const x1 = round(b.maxX + margin);
  const y1 = round(b.maxY + margin);
  return {
    ...doc,
    siteBoundary: [
      [x0, y0],
      [x1, y0],
      [x1, y1],
      [x0, y1],
    ],
  };
}

export function moveBoundaryPoint(doc: Doc, index: number, p: Point): Doc {
  if (!doc.siteBoundary?.[index]) return doc;
  const siteBoundary = doc.siteBoundary.slice();
  siteBoundary[index] = [round(p.x), round(p.y)];
  return { ...doc, siteBoundary };
}

/**
 * Adds a corner to the boundary on the edge nearest the point (so clicking beside an edge bends
 * that edge).
 * @returns the new document and the new corner's index, or null without a boundary or when full.
 */
export function addBoundaryPoint(doc: Doc, p: Point): { doc: Doc; index: number } | null {
  const poly = doc.siteBoundary;
  if (!poly || poly.length >= MAX_BOUNDARY_POINTS) return null;
  let bestEdge = 0;
  let bestD = Infinity;
  for (let i = 0; i < poly.length; i++) {
    const a = poly[i];
    const b = poly[(i + 1) % poly.length];
    const d = distanceToSegment(p, { x: a[0], y: a[1] }, { x: b[0], y: b[1] });
    if (d < bestD) {
      bestD = d;
      bestEdge = i;
    }
  }
  const siteBoundary = poly.slice();
  siteBoundary.splice(bestEdge + 1, 0, [round(p.x), round(p.y)]);
  return { doc: { ...doc, siteBoundary }, index: bestEdge + 1 };
}

/** Removes a corner; a boundary keeps at least three corners (null when it would have fewer). */
export function deleteBoundaryPoint(doc: Doc, index: number): Doc | null {
  const poly = doc.siteBoundary;
  if (!poly || poly.length <= 3 || !poly[index]) return null;
  return { ...doc, siteBoundary: poly.filter((_, i) => i !== index) };
}

export function removeBoundary(doc: Doc): Doc {
  const { siteBoundary: _removed, ...rest } = doc;
  return rest;
}

/** Distance from a point to a segment, m. */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const abx = b.x - a.x;
  const aby = b.y - a.y;
  const len2 = abx * abx + aby * aby;
  const t = len2 === 0 ? 0 : clamp(((p.x - a.x) * abx + (p.y - a.y) * aby) / len2, 0, 1);
  return Math.hypot(p.x - (a.x + t * abx), p.y - (a.y + t * aby));
}
