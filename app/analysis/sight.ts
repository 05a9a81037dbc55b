/**
 * Areas of track hidden from the driver stand by jumps: a straight line of sight from the
 * drivers' eyes to the top of a car on the centre line, over the ground.
 *
 * The ground is flat (height 0) except on jump sections, whose profile spans the full track width
 * as a mound. Other obstacles (buildings, trees, banners, people) are not modelled.
 */
import type { CentreLine, ResolvedSection } from "./geometry";
import { cyclicRuns, stridedIndices } from "./geometry-checks";

/** Height of the top of a car above the ground, m (a 1/10 buggy's body: estimate from memory). */
export const DEFAULT_CAR_HEIGHT = 0.15;

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
  /** Plan distance around the car that cannot hide it (the car's own length), m. */
  carHalfLength?: number;
}

/**
 * Stretches of the lap where the top of a car cannot be seen from the driver stand.
 * @param width track width, m (the width of each jump mound).
 */
export function findHiddenFromStand(line: CentreLine, sections: readonly ResolvedSection[], width: number, stand: DriverStand, options: SightOptions = {}): HiddenStretch[] {
  const carHeight = options.carHeight ?? DEFAULT_CAR_HEIGHT;
  const stride = options.stride ?? 0.25;
  const carHalf = options.carHalfLength ?? 0.2;
  const jumps = sections.filter((s) => s.profile !== null);
  const idx = stridedIndices(line, stride);
  const perPoint = line.length / idx.length;
  const blocker = idx.map((i) => {
    const px = line.x[i];
    const py = line.y[i];
    const pz = line.z[i] + carHeight;
    const plan = Math.hypot(px - stand.x, py - stand.y);
    const tEnd = plan > carHalf ? 1 - carHalf / plan : 0;
    for (const j of jumps) if (blocks(j, width, stand, px, py, pz, tEnd)) return j.id;
    return null;
  });
  return cyclicRuns(blocker.map((b) => b !== null)).map(([a, b]) => {
    const count = ((b - a + idx.length) % idx.length) + 1;
    return { fromS: line.s[idx[a]], toS: line.s[idx[b]], length: count * perPoint, blockedBy: blocker[a]! };
  });
}

/** Whether the jump's mound rises above the sight line from the eye to (px, py, pz) for t in [0, tEnd]. */
function blocks(j: ResolvedSection, width: number, stand: DriverStand, px: number, py: number, pz: number, tEnd: number): boolean {
  const profile = j.profile!;
  const c = Math.cos(j.start.heading);
  const s = Math.sin(j.start.heading);
  // Local frame of the jump: u along the section from its start, v to its left.
  const ue = (stand.x - j.start.x) * c + (stand.y - j.start.y) * s;
  const ve = -(stand.x - j.start.x) * s + (stand.y - j.start.y) * c;
  const up = (px - j.start.x) * c + (py - j.start.y) * s;
  const vp = -(px - j.start.x) * s + (py - j.start.y) * c;
  const du = up - ue;
  const dv = vp - ve;
  let t0 = 0;
  let t1 = tEnd;
  // Clip the sight segment to the rectangle 0 <= u <= length, |v| <= width / 2 (Liang-Barsky).
  const clip = (p: number, q: number): boolean => {
    if (Math.abs(p) < 1e-12) return q >= 0;
    const r = q / p;
    if (p < 0) t0 = Math.max(t0, r);
    else t1 = Math.min(t1, r);
    return t0 <= t1;
  };
  const half = width / 2;
  if (!clip(-du, ue) || !clip(du, j.length - ue) || !clip(-dv, ve + half) || !clip(dv, half - ve)) return false;
  const dz = pz - stand.eyeHeight;
  const clear = (t: number) => stand.eyeHeight + t * dz - groundAt(profile.d, profile.h, ue + t * du) >= -1e-9;
  if (!clear(t0) || !clear(t1)) return true;
  if (Math.abs(du) < 1e-12) return false;
  // Ground and sight line are both linear between profile points: test every point in between.
  for (let k = 0; k < profile.d.length; k++) {
    const t = (profile.d[k] - ue) / du;
    if (t > t0 && t < t1 && !clear(t)) return true;
  }
  return false;
}

function groundAt(d: number[], h: number[], u: number): number {
  if (u <= d[0] || u >= d[d.length - 1]) return 0;
  let k = 1;
  while (d[k] < u) k++;
  const t = (u - d[k - 1]) / (d[k] - d[k - 1]);
  return h[k - 1] + t * (h[k] - h[k - 1]);
}
