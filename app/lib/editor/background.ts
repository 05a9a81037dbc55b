/**
 * Placement of the site photo under the plan: pixel (u right, v down from the photo's top-left
 * corner) to plan metres and back, a first placement that covers the layout, and the scale
 * calibration from two clicked points and the distance between them on the ground.
 */
import type { LayoutDocument } from "~/analysis";
import type { Point } from "./drag-maths";
import type { Bounds } from "./site-ops";

export type Background = NonNullable<LayoutDocument["background"]>;
const DEG = Math.PI / 180;

/** Plan axes of the photo's pixel axes, each one pixel long, m. */
function axes(bg: Background) {
  const r = bg.rotationDeg * DEG;
  const m = bg.metresPerPixel;
  // u runs along the rotated +X; v (down the image) along the rotated -Y.
  return { ux: m * Math.cos(r), uy: m * Math.sin(r), vx: m * Math.sin(r), vy: -m * Math.cos(r) };
}

/** Plan position (m) of a photo pixel. */
export function pixelToPlan(bg: Background, u: number, v: number): Point {
  const a = axes(bg);
  return { x: bg.x + u * a.ux + v * a.vx, y: bg.y + u * a.uy + v * a.vy };
}

/** Photo pixel under a plan point (m). */
export function planToPixel(bg: Background, p: Point): { u: number; v: number } {
  const a = axes(bg);
  const dx = p.x - bg.x;
  const dy = p.y - bg.y;
  const m2 = bg.metresPerPixel * bg.metresPerPixel;
  return { u: (dx * a.ux + dy * a.uy) / m2, v: (dx * a.vx + dy * a.vy) / m2 };
}

/**
 * A first placement for a new photo: centred on the layout and 20 % larger than it, unrotated,
 * half transparent. Calibration then sets the true scale.
 * @param width photo width, px; @param height photo height, px.
 */
export function initialPlacement(fileId: string, width: number, height: number, bounds: Bounds): Background {
  const w = Math.max(bounds.maxX - bounds.minX, 10) * 1.2;
  const h = Math.max(bounds.maxY - bounds.minY, 10) * 1.2;
  const metresPerPixel = Number(Math.max(w / Math.max(width, 1), h / Math.max(height, 1)).toPrecision(6));
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  return {
    fileId,
    x: round3(cx - (width * metresPerPixel) / 2),
    y: round3(cy + (height * metresPerPixel) / 2),
    metresPerPixel,
    rotationDeg: 0,
    opacity: 0.6,
    hidden: false,
  };
}

export type CalibrationResult =
  { ok: true; background: Background } | { ok: false; field: "distance" | "points"; message: string };

/**
 * Sets the photo's scale so that the two clicked points lie `distance` m apart, keeping the first
 * point where it is on the plan (the photo grows or shrinks around it).
 * @param a first clicked point, plan m (under the current placement).
 * @param b second clicked point, plan m.
 * @param distance the real distance between them on the ground, m.
 */
export function calibrate(bg: Background, a: Point, b: Point, distance: number): CalibrationResult {
  if (!Number.isFinite(distance) || distance <= 0)
    return { ok: false, field: "distance", message: "Distance must be a number greater than 0 m." };
  if (distance > 10000) return { ok: false, field: "distance", message: "Distance must be at most 10000 m." };
  const pa = planToPixel(bg, a);
  const pb = planToPixel(bg, b);
  const pixels = Math.hypot(pb.u - pa.u, pb.v - pa.v);
  if (pixels < 2)
    return {
      ok: false,
      field: "points",
      message: "The two points are too close together on the photo: click two points farther apart.",
    };
  const metresPerPixel = Number((distance / pixels).toPrecision(8));
  if (metresPerPixel < 0.0001 || metresPerPixel > 10) {
    return {
      ok: false,
      field: "distance",
      message:
        "That distance gives a scale outside 0.0001 to 10 m per pixel: check the distance and the points.",
    };
  }
  const scaled = { ...bg, metresPerPixel };
  const moved = pixelToPlan(scaled, pa.u, pa.v);
  return {
    ok: true,
    background: { ...scaled, x: round3(scaled.x + (a.x - moved.x)), y: round3(scaled.y + (a.y - moved.y)) },
  };
}

/** Moves the photo by (dx, dy) m. */
export function moveBackground(bg: Background, dx: number, dy: number): Background {
  return { ...bg, x: round3(bg.x + dx), y: round3(bg.y + dy) };
}

function round3(v: number): number {
  return Math.round(v * 1000) / 1000;
}
