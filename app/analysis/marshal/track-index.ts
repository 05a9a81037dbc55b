/**
 * Nearest-track queries for marshal points: the closest point of the centre line (every lane of
 * the lap) to a plan point, through a grid of the line's segments. Plan metres.
 */
import type { CentreLine } from "../track/geometry";

/** Grid cell size, m. */
const CELL = 4;

export interface TrackIndex {
  line: CentreLine;
  cells: Map<number, number[]>;
}

export interface NearestTrack {
  /** Distance to the centre line, m. */
  distance: number;
  /** Lap distance of the nearest centre-line point, m. */
  s: number;
  /** Which side of the track the point lies on (driving the lap). */
  side: "left" | "right";
  /** Nearest centre-line point, m. */
  x: number;
  y: number;
}

const key = (cx: number, cy: number) => cx * 1_000_003 + cy;

/** Indexes the segments of a centre line (segment i runs from sample i to sample i + 1). */
export function indexTrack(line: CentreLine): TrackIndex {
  const cells = new Map<number, number[]>();
  for (let i = 0; i < line.count - 1; i++) {
    const x0 = Math.floor(Math.min(line.x[i], line.x[i + 1]) / CELL);
    const x1 = Math.floor(Math.max(line.x[i], line.x[i + 1]) / CELL);
    const y0 = Math.floor(Math.min(line.y[i], line.y[i + 1]) / CELL);
    const y1 = Math.floor(Math.max(line.y[i], line.y[i + 1]) / CELL);
    for (let cx = x0; cx <= x1; cx++)
      for (let cy = y0; cy <= y1; cy++) {
        const k = key(cx, cy);
        const cell = cells.get(k);
        if (cell) cell.push(i);
        else cells.set(k, [i]);
      }
  }
  return { line, cells };
}

/** Nearest segment found so far: index, squared distance, fraction along it (scratch, no allocation). */
const found = { i: -1, d2: Infinity, t: 0 };

function testSegments(line: CentreLine, segments: readonly number[], x: number, y: number): void {
  for (let k = 0; k < segments.length; k++) {
    const i = segments[k];
    const ax = line.x[i];
    const ay = line.y[i];
    const vx = line.x[i + 1] - ax;
    const vy = line.y[i + 1] - ay;
    const len2 = vx * vx + vy * vy;
    let t = len2 > 0 ? ((x - ax) * vx + (y - ay) * vy) / len2 : 0;
    t = t < 0 ? 0 : t > 1 ? 1 : t;
    const ex = ax + t * vx - x;
    const ey = ay + t * vy - y;
    const d2 = ex * ex + ey * ey;
    if (d2 < found.d2) {
      found.d2 = d2;
      found.i = i;
      found.t = t;
    }
  }
}

/** Largest ring of cells searched before falling back to every segment. */
const MAX_RING = 8;

/** The nearest point of the centre line to (x, y), m. */
export function nearestTrack(index: TrackIndex, x: number, y: number): NearestTrack {
  const { line } = index;
  found.i = -1;
  found.d2 = Infinity;
  const cx = Math.floor(x / CELL);
  const cy = Math.floor(y / CELL);
  // Rings of cells outwards until the ring is farther than the best distance found.
  for (let r = 0; r <= MAX_RING; r++) {
    for (let ox = -r; ox <= r; ox++) {
      const edge = ox === -r || ox === r;
      for (let oy = -r; oy <= r; oy += edge ? 1 : 2 * r) {
        const cell = index.cells.get(key(cx + ox, cy + oy));
        if (cell) testSegments(line, cell, x, y);
      }
    }
    if (found.i >= 0 && found.d2 <= r * CELL * r * CELL) break;
  }
  if (found.i < 0 || found.d2 > (MAX_RING * CELL) ** 2) {
    const all = Array.from({ length: line.count - 1 }, (_, i) => i);
    testSegments(line, all, x, y);
  }
  const { i, t } = found;
  const s = line.s[i] + t * (line.s[i + 1] - line.s[i]);
  const px = line.x[i] + t * (line.x[i + 1] - line.x[i]);
  const py = line.y[i] + t * (line.y[i + 1] - line.y[i]);
  const h = line.heading[i];
  const left = -Math.sin(h) * (x - px) + Math.cos(h) * (y - py) >= 0;
  return { distance: Math.sqrt(found.d2), s: s % line.length, side: left ? "left" : "right", x: px, y: py };
}
