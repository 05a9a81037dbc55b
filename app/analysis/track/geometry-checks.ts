/**
 * Checks on a layout's plan: lanes that pass too close, track outside the site boundary, the
 * farthest point from the driver stand, the start straight and how evenly marshal points are
 * spread (engine.md sections 1 and 7). Plan coordinates in metres.
 */
import type { LayoutDocument } from "../format/layout-document";
import { nearestSample, type CentreLine, type ResolvedSection, type TrackEdges } from "./geometry";

/** Default extra room between neighbouring lanes, m (an estimate: a divider plus some run-off). */
export const DEFAULT_LANE_MARGIN = 1;

/** A stretch of the lap that passes within track width + margin of another part of the lap. */
export interface LaneConflict {
  /** Lap distance where the close stretch starts and ends, m (fromS > toS: it crosses the start line). */
  fromS: number;
  toS: number;
  /** Lap distance of the nearest point on the other lane, m. */
  otherS: number;
  /** Smallest centre-line distance between the lanes, m. */
  centreDistance: number;
  /** Smallest gap between the two lanes' edges, m (negative: the lanes overlap). */
  edgeGap: number;
  /** Plan position of the closest point on this stretch, m. */
  x: number;
  y: number;
}

/**
 * Runs of consecutive flagged entries in a cyclic list, as [first, last] positions (inclusive).
 * A run that crosses the end of the list continues at its start, so last < first for it.
 */
export function cyclicRuns(flagged: ArrayLike<boolean | number>): [number, number][] {
  const n = flagged.length;
  let start = 0;
  while (start < n && flagged[start]) start++;
  if (start === n) return n === 0 ? [] : [[0, n - 1]];
  const runs: [number, number][] = [];
  let open = -1;
  for (let k = 1; k <= n; k++) {
    const i = (start + k) % n;
    if (flagged[i] && open < 0) open = i;
    if (!flagged[i] && open >= 0) {
      runs.push([open, (i - 1 + n) % n]);
      open = -1;
    }
  }
  return runs.sort((a, b) => a[0] - b[0]);
}

/** Number of samples that make up about `stride` metres. */
function strideStep(line: CentreLine, stride: number): number {
  return Math.max(1, Math.round(stride / Math.max(1e-9, line.length / (line.count - 1))));
}

/** Sample indices about `stride` metres apart, without the closing sample. */
export function stridedIndices(line: CentreLine, stride: number): number[] {
  const step = strideStep(line, stride);
  const out: number[] = [];
  for (let i = 0; i < line.count - 1; i += step) out.push(i);
  return out;
}

/**
 * Lanes closer than track width + margin (centre to centre). Points nearer each other along the
 * lap than (width + margin) * pi / 2 are the same stretch of track and are not compared.
 * @param width track width, m; @param margin extra room, m; @param stride check spacing, m.
 */
export function findLaneConflicts(
  line: CentreLine,
  width: number,
  margin = DEFAULT_LANE_MARGIN,
  stride = 0.5,
): LaneConflict[] {
  const D = width + margin;
  const ignore = (D * Math.PI) / 2;
  const L = line.length;
  const idx = stridedIndices(line, stride);
  const step = strideStep(line, stride);
  const grid = new Map<number, number[]>();
  const key = (cx: number, cy: number) => cx * 1_000_003 + cy;
  for (const i of idx) {
    const k = key(Math.floor(line.x[i] / D), Math.floor(line.y[i] / D));
    const cell = grid.get(k);
    if (cell) cell.push(i);
    else grid.set(k, [i]);
  }
  const minDist = new Float64Array(idx.length).fill(Infinity);
  const partner = new Int32Array(idx.length).fill(-1);
  idx.forEach((i, n) => {
    const cx = Math.floor(line.x[i] / D);
    const cy = Math.floor(line.y[i] / D);
    for (let ox = -1; ox <= 1; ox++)
      for (let oy = -1; oy <= 1; oy++) {
        const cell = grid.get(key(cx + ox, cy + oy));
        if (!cell) continue;
        for (const j of cell) {
          const along = Math.abs(line.s[i] - line.s[j]);
          if (Math.min(along, L - along) <= ignore) continue;
          const d2 = (line.x[i] - line.x[j]) ** 2 + (line.y[i] - line.y[j]) ** 2;
          if (d2 < D * D && d2 < minDist[n] * minDist[n]) {
            minDist[n] = Math.sqrt(d2);
            partner[n] = j;
          }
        }
      }
  });
  const runs = cyclicRuns(Array.from(partner, (p) => p >= 0)).map(([a, b]): LaneConflict => {
    let best = a;
    for (let n = a; ; n = (n + 1) % idx.length) {
      if (minDist[n] < minDist[best]) best = n;
      if (n === b) break;
    }
    // Refine the closest pair at full sample resolution around the strided one.
    let i = idx[best];
    let j = partner[best];
    let d2 = minDist[best] ** 2;
    const i0 = i;
    const j0 = j;
    const last = line.count - 1;
    for (let di = -step; di <= step; di++)
      for (let dj = -step; dj <= step; dj++) {
        const ii = (i0 + di + last) % last;
        const jj = (j0 + dj + last) % last;
        const along = Math.abs(line.s[ii] - line.s[jj]);
        if (Math.min(along, L - along) <= ignore) continue;
        const e2 = (line.x[ii] - line.x[jj]) ** 2 + (line.y[ii] - line.y[jj]) ** 2;
        if (e2 < d2) {
          d2 = e2;
          i = ii;
          j = jj;
        }
      }
    const centreDistance = Math.sqrt(d2);
    return {
      fromS: line.s[idx[a]],
      toS: line.s[idx[b]],
      otherS: line.s[j],
      centreDistance,
      edgeGap: centreDistance - width,
      x: line.x[i],
      y: line.y[i],
    };
  });
  // Each pair of lanes shows up twice (once from each side): keep the one met first on the lap.
  const within = (r: LaneConflict, s: number) =>
    r.fromS <= r.toS
      ? s >= r.fromS - stride && s <= r.toS + stride
      : s >= r.fromS - stride || s <= r.toS + stride;
  return runs.filter(
    (a) => !runs.some((b) => b !== a && b.fromS < a.fromS && within(b, a.otherS) && within(a, b.otherS)),
  );
}

/** A stretch of track edge outside the site boundary. */
export interface OutsideStretch {
  /** Lap distance of the first and last check point outside, m (fromS > toS: crosses the start line). */
  fromS: number;
  toS: number;
  /** Farthest an edge point lies outside the boundary, m. */
  worstDistance: number;
}

/** Ray-casting point-in-polygon test. */
export function insidePolygon(poly: readonly (readonly [number, number])[], x: number, y: number): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [xi, yi] = poly[i];
    const [xj, yj] = poly[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function distanceToPolygon(poly: readonly (readonly [number, number])[], x: number, y: number): number {
  let best = Infinity;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const [ax, ay] = poly[j];
    const [bx, by] = poly[i];
    const vx = bx - ax;
    const vy = by - ay;
    const t = Math.max(0, Math.min(1, ((x - ax) * vx + (y - ay) * vy) / (vx * vx + vy * vy || 1)));
    best = Math.min(best, Math.hypot(ax + t * vx - x, ay + t * vy - y));
  }
  return best;
}

/**
 * Stretches where either track edge lies outside the site boundary polygon.
 * @param stride check spacing, m.
 */
export function findOutsideBoundary(
  line: CentreLine,
  edges: TrackEdges,
  boundary: readonly (readonly [number, number])[],
  stride = 0.25,
): OutsideStretch[] {
  const idx = stridedIndices(line, stride);
  const worst = idx.map((i) => {
    let w = 0;
    for (const [x, y] of [
      [edges.leftX[i], edges.leftY[i]],
      [edges.rightX[i], edges.rightY[i]],
    ]) {
      if (!insidePolygon(boundary, x, y)) w = Math.max(w, distanceToPolygon(boundary, x, y) || 1e-9);
    }
    return w;
  });
  return cyclicRuns(worst.map((w) => w > 0)).map(([a, b]) => {
    let w = 0;
    for (let n = a; ; n = (n + 1) % idx.length) {
      w = Math.max(w, worst[n]);
      if (n === b) break;
    }
    return { fromS: line.s[idx[a]], toS: line.s[idx[b]], worstDistance: w };
  });
}

/** The track edge point farthest from the driver stand (plan distance, m). */
export function farthestFromStand(
  line: CentreLine,
  edges: TrackEdges,
  stand: { x: number; y: number },
): { distance: number; s: number; x: number; y: number } {
  let best2 = -1;
  let bestI = 0;
  let left = true;
  for (let i = 0; i < line.count; i++) {
    const l2 = (edges.leftX[i] - stand.x) ** 2 + (edges.leftY[i] - stand.y) ** 2;
    const r2 = (edges.rightX[i] - stand.x) ** 2 + (edges.rightY[i] - stand.y) ** 2;
    if (l2 > best2 || r2 > best2) {
      best2 = Math.max(l2, r2);
      bestI = i;
      left = l2 >= r2;
    }
  }
  const x = left ? edges.leftX[bestI] : edges.rightX[bestI];
  const y = left ? edges.leftY[bestI] : edges.rightY[bestI];
  return { distance: Math.sqrt(best2), s: line.s[bestI], x, y };
}

/**
 * The start straight: the run of plain straight sections (no jumps, no turns) that contains the
 * start line, i.e. straights at the end of the list followed by straights at its beginning.
 * @returns its length, m, and the ids of its sections.
 */
export function startStraight(sections: readonly ResolvedSection[]): {
  length: number;
  sectionIds: string[];
} {
  const before: ResolvedSection[] = [];
  const after: ResolvedSection[] = [];
  for (const s of sections) {
    if (s.kind !== "straight") break;
    after.push(s);
  }
  if (after.length === sections.length)
    return { length: after.reduce((a, s) => a + s.length, 0), sectionIds: after.map((s) => s.id) };
  for (let i = sections.length - 1; i >= 0 && sections[i].kind === "straight"; i--)
    before.unshift(sections[i]);
  const run = before.concat(after);
  return { length: run.reduce((a, s) => a + s.length, 0), sectionIds: run.map((s) => s.id) };
}

export interface MarshalSpread {
  /** Lap distance of each marshal point's nearest centre-line point, m, in lap order. */
  positions: number[];
  /** Longest stretch of lap between two neighbouring marshal points, m. */
  largestGap: number;
  /** Lap length divided by the number of marshal points, m. */
  evenShare: number;
  /** largestGap / evenShare: 1 is perfectly even; null with no marshal points. */
  ratio: number | null;
}

/** How evenly the marshal points are spread around the lap. */
export function marshalSpread(line: CentreLine, points: LayoutDocument["marshalPoints"]): MarshalSpread {
  if (points.length === 0)
    return { positions: [], largestGap: line.length, evenShare: line.length, ratio: null };
  const positions = points.map((p) => nearestSample(line, p.x, p.y).s).sort((a, b) => a - b);
  let largestGap = positions[0] + line.length - positions[positions.length - 1];
  for (let k = 1; k < positions.length; k++)
    largestGap = Math.max(largestGap, positions[k] - positions[k - 1]);
  const evenShare = line.length / positions.length;
  return { positions, largestGap, evenShare, ratio: largestGap / evenShare };
}
