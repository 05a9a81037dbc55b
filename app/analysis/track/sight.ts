/**
 * Areas of track hidden from the driver stand by jumps: a straight line of sight from the
 * drivers' eyes to the top of a car on the centre line, over the ground. A car counts as hidden
 * where it is hidden along its whole length (part of a car in view is a car in view).
 *
 * The ground is flat (height 0) except on jump sections, whose profile spans the full track width
 * as a mound. Other obstacles (buildings, trees, banners, people) are not modelled.
 */
import type { CentreLine, ResolvedSection } from "./geometry";
import { cyclicRuns, stridedIndices } from "./geometry-checks";

/** Height of the top of a car above the ground, m (a 1/10 buggy's body: estimate from memory). */
export const DEFAULT_CAR_HEIGHT = 0.15;
/** Length of a car, m (a 1/10 buggy is about 0.4 to 0.45 m: estimate from memory). */
export const DEFAULT_CAR_LENGTH = 0.45;

export interface HiddenStretch {
  /** Lap distance of the first and last hidden check point, m (fromS > toS: crosses the start line). */
  fromS: number;
  toS: number;
  /** Length of track the stretch stands for, m. */
  length: number;
  /** Id of a jump section that blocks the view at the stretch's first point. */
  blockedBy: string;
}

export interface DriverStand {
  x: number;
  y: number;
  /** Eye height above the ground, m. */
  eyeHeight: number;
}

export interface SightOptions {
  /** Height of the car's top above the ground, m. */
  carHeight?: number;
  /** Spacing of the check points along the lap, m. */
  stride?: number;
  /**
   * Length of a car, m. A car counts as hidden only where its top is hidden along its whole
   * length, and the ground within half a car length of a point cannot hide that point.
   */
  carLength?: number;
}

/**
 * Stretches of the lap where the top of a car cannot be seen from the driver stand.
 * @param width track width, m (the width of each jump mound).
 */
export function findHiddenFromStand(
  line: CentreLine,
  sections: readonly ResolvedSection[],
  width: number,
  stand: DriverStand,
  options: SightOptions = {},
): HiddenStretch[] {
  const carHeight = options.carHeight ?? DEFAULT_CAR_HEIGHT;
  const stride = options.stride ?? 0.25;
  const carHalf = (options.carLength ?? DEFAULT_CAR_LENGTH) / 2;
  const jumps: Mound[] = sections
    .filter((s) => s.profile !== null)
    .map((s) => ({
      id: s.id,
      x0: s.start.x,
      y0: s.start.y,
      c: Math.cos(s.start.heading),
      s: Math.sin(s.start.heading),
      length: s.length,
      d: s.profile!.d,
      h: s.profile!.h,
    }));
  const half = width / 2;
  const idx = stridedIndices(line, stride);
  const perPoint = line.length / idx.length;
  const blocker = idx.map((i) => {
    const px = line.x[i];
    const py = line.y[i];
    const pz = line.z[i] + carHeight;
    const plan = Math.sqrt((px - stand.x) ** 2 + (py - stand.y) ** 2);
    const tEnd = plan > carHalf ? 1 - carHalf / plan : 0;
    for (const j of jumps) if (blocks(j, half, stand, px, py, pz, tEnd)) return j.id;
    return null;
  });
  // A car centred on point k is hidden only if every point within half a car length is.
  const reach = Math.round(carHalf / perPoint);
  const n = idx.length;
  const hidden = blocker.map((_, k) => {
    for (let o = -reach; o <= reach; o++) if (blocker[(k + o + n) % n] === null) return false;
    return true;
  });
  return cyclicRuns(hidden).map(([a, b]) => {
    const count = ((b - a + n) % n) + 1;
    return { fromS: line.s[idx[a]], toS: line.s[idx[b]], length: count * perPoint, blockedBy: blocker[a]! };
  });
}

/** A jump mound in its own frame: u along the section from its start, v to its left. */
interface Mound {
  id: string;
  x0: number;
  y0: number;
  c: number;
  s: number;
  length: number;
  d: readonly number[];
  h: readonly number[];
}

/** Whether the mound rises above the sight line from the eye to (px, py, pz) for t in [0, tEnd]. */
function blocks(
  j: Mound,
  half: number,
  stand: DriverStand,
  px: number,
  py: number,
  pz: number,
  tEnd: number,
): boolean {
  const ex = stand.x - j.x0;
  const ey = stand.y - j.y0;
  const ue = ex * j.c + ey * j.s;
  const ve = -ex * j.s + ey * j.c;
  const du = (px - j.x0) * j.c + (py - j.y0) * j.s - ue;
  const dv = -(px - j.x0) * j.s + (py - j.y0) * j.c - ve;
  // Clip the sight segment to the rectangle 0 <= u <= length, |v| <= half (Liang-Barsky).
  span[0] = 0;
  span[1] = tEnd;
  if (!clip(-du, ue) || !clip(du, j.length - ue) || !clip(-dv, ve + half) || !clip(dv, half - ve))
    return false;
  const t0 = span[0];
  const t1 = span[1];
  const dz = pz - stand.eyeHeight;
  if (!clearAt(j, stand.eyeHeight, dz, ue, du, t0) || !clearAt(j, stand.eyeHeight, dz, ue, du, t1))
    return true;
  if (Math.abs(du) < 1e-12) return false;
  // Ground and sight line are both linear between profile points: test every point in between.
  for (let k = 0; k < j.d.length; k++) {
    const t = (j.d[k] - ue) / du;
    if (t > t0 && t < t1 && stand.eyeHeight + t * dz < j.h[k] - 1e-9) return true;
  }
  return false;
}

/** The part [t0, t1] of the sight segment still inside the rectangle (scratch, no allocation). */
const span = new Float64Array(2);

/** Narrows `span` by the half-plane p t <= q; false when nothing is left. */
function clip(p: number, q: number): boolean {
  if (Math.abs(p) < 1e-12) return q >= 0;
  if (p < 0) span[0] = Math.max(span[0], q / p);
  else span[1] = Math.min(span[1], q / p);
  return span[0] <= span[1];
}

function clearAt(j: Mound, eye: number, dz: number, ue: number, du: number, t: number): boolean {
  return eye + t * dz - groundAt(j.d, j.h, ue + t * du) >= -1e-9;
}

function groundAt(d: readonly number[], h: readonly number[], u: number): number {
  if (u <= d[0] || u >= d[d.length - 1]) return 0;
  let k = 1;
  while (d[k] < u) k++;
  const t = (u - d[k - 1]) / (d[k] - d[k - 1]);
  return h[k - 1] + t * (h[k] - h[k - 1]);
}
