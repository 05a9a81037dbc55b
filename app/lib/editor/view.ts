/**
 * The plan view's camera: plan metres (Y up) to screen pixels (y down), zoom about the cursor and
 * fitting the layout into the canvas.
 */
import type { CentreLine, LayoutDocument } from "~/analysis";
import { clamp } from "./snap";
import type { Point } from "./drag-maths";
import type { Bounds } from "./site-ops";

export interface View {
  /** Zoom, px per m. */
  scale: number;
  /** Screen position of the plan origin, px. */
  ox: number;
  oy: number;
}

/** Zoom limits, px per m: from a whole site on a phone to a lip in detail. */
export const MIN_SCALE = 0.5;
export const MAX_SCALE = 400;

export function worldToScreen(v: View, p: Point): Point {
  return { x: v.ox + p.x * v.scale, y: v.oy - p.y * v.scale };
}

export function screenToWorld(v: View, p: Point): Point {
  return { x: (p.x - v.ox) / v.scale, y: (v.oy - p.y) / v.scale };
}

/** Zooms by `factor` keeping the plan point under the screen point `at` where it is. */
export function zoomAt(v: View, at: Point, factor: number): View {
  const scale = clamp(v.scale * factor, MIN_SCALE, MAX_SCALE);
  const world = screenToWorld(v, at);
  return { scale, ox: at.x - world.x * scale, oy: at.y + world.y * scale };
}

export function panBy(v: View, dx: number, dy: number): View {
  return { ...v, ox: v.ox + dx, oy: v.oy + dy };
}

/** The view that shows the bounds whole, centred, with `padding` px around. */
export function fitView(b: Bounds, width: number, height: number, padding = 24): View {
  const w = Math.max(b.maxX - b.minX, 1);
  const h = Math.max(b.maxY - b.minY, 1);
  const scale = clamp(Math.min((width - 2 * padding) / w, (height - 2 * padding) / h), MIN_SCALE, MAX_SCALE);
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  return { scale, ox: width / 2 - cx * scale, oy: height / 2 + cy * scale };
}

/**
 * Everything worth showing: the track (centre line plus half the width), the site boundary, the
 * driver stand and the marshal points, m.
 */
export function layoutBounds(
  doc: Pick<LayoutDocument, "trackWidth" | "siteBoundary" | "driverStand" | "marshalPoints">,
  line: CentreLine | null,
): Bounds {
  const b: Bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };
  const add = (x: number, y: number, pad = 0) => {
    b.minX = Math.min(b.minX, x - pad);
    b.maxX = Math.max(b.maxX, x + pad);
    b.minY = Math.min(b.minY, y - pad);
    b.maxY = Math.max(b.maxY, y + pad);
  };
  if (line) for (let i = 0; i < line.count; i++) add(line.x[i], line.y[i], doc.trackWidth / 2);
  for (const [x, y] of doc.siteBoundary ?? []) add(x, y);
  if (doc.driverStand) add(doc.driverStand.x, doc.driverStand.y, 1);
  for (const m of doc.marshalPoints) add(m.x, m.y, 1);
  if (!Number.isFinite(b.minX)) return { minX: -10, minY: -10, maxX: 10, maxY: 10 };
  return b;
}
