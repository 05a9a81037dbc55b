/**
 * The suggested marshal plan (issue 11, part 3; docs/decisions/0702): as many points as the
 * club's largest heat, spread evenly along the lap, each on a spot (spots.ts: never inside a
 * zone, clear of the track, within reach of its edge) chosen to cover the hotspots of its
 * stretch. Points are placed around evenly spaced targets; each may move along the lap by at
 * most what keeps the largest gap within the guidance's marshal spread (maxMarshalGapRatio);
 * a dozen phases of the targets are tried and the plan covering the most hotspot score wins.
 */
import type { Hotspot } from "./marshal-types";
import { inStretchOf, stretches } from "./points";
import type { Spot } from "./spots";
import { lapAhead } from "./track-marks";

/** Phases of the evenly spaced targets tried, per even share of the lap. */
const PHASES = 12;

export interface PlacementInput {
  spots: readonly Spot[];
  hotspots: readonly Hotspot[];
  lapLength: number;
  /** Points to place. */
  count: number;
  /** Largest gap between neighbouring points as a multiple of an even share (>= 1). */
  maxGapRatio: number;
  /** Farthest a point covers a hotspot from, m. */
  coverDistance: number;
}

/** Signed lap distance from a to b, m, in [-L/2, L/2). */
function lapDelta(a: number, b: number, L: number): number {
  const d = lapAhead(a, b, L);
  return d >= L / 2 ? d - L : d;
}

const covers = (spot: Spot, h: Hotspot, reach: number) => Math.hypot(spot.x - h.x, spot.y - h.y) <= reach;

/**
 * The best spot for the target lap distance `t`, m, not already `taken`, or null when none lies
 * within `shift` of it.
 */
function bestSpot(
  input: PlacementInput,
  t: number,
  share: number,
  shift: number,
  taken: ReadonlySet<Spot>,
  coverWeight: number,
): Spot | null {
  const L = input.lapLength;
  const slot = input.hotspots.filter((h) => Math.abs(lapDelta(t, h.s, L)) <= share / 2);
  let best: Spot | null = null;
  let bestValue = -Infinity;
  for (const spot of input.spots) {
    const moved = Math.abs(lapDelta(t, spot.s, L));
    if (moved > shift || taken.has(spot)) continue;
    let value = -moved - 0.1 * spot.edgeDistance;
    for (const h of slot) if (covers(spot, h, input.coverDistance)) value += coverWeight * h.score;
    if (value > bestValue) {
      bestValue = value;
      best = spot;
    }
  }
  return best;
}

/** Total score of the hotspots a plan covers (each by the point whose stretch holds it), and the points' total move, m. */
function planValue(input: PlacementInput, chosen: readonly { spot: Spot; moved: number }[]): number {
  const L = input.lapLength;
  const st = stretches(
    chosen.map((c) => c.spot.s),
    L,
  );
  let value = 0;
  for (const h of input.hotspots) {
    const k = st.findIndex((x) => inStretchOf(x, h.s, L));
    if (k >= 0 && covers(chosen[k].spot, h, input.coverDistance)) value += 100 * h.score;
  }
  return value - chosen.reduce((a, c) => a + c.moved, 0);
}

/**
 * The suggested points: spots in lap order, at most `count` (fewer where no spot lies near a
 * target).
 */
export function placeMarshals(input: PlacementInput): Spot[] {
  const L = input.lapLength;
  const n = input.count;
  if (n < 1 || input.spots.length === 0) return [];
  const share = L / n;
  // Each point within `shift` of its target keeps every gap within maxGapRatio x share; never past a third of a share.
  const shift = Math.min(share / 3, (share * Math.max(0, input.maxGapRatio - 1)) / 2);
  let best: { spot: Spot; moved: number }[] = [];
  let bestValue = -Infinity;
  for (let p = 0; p < PHASES; p++) {
    const chosen: { spot: Spot; moved: number }[] = [];
    const taken = new Set<Spot>();
    for (let k = 0; k < n; k++) {
      const t = ((p / PHASES) * share + k * share) % L;
      // Where zones cover every spot near the target, a point may move up to half a share: then
      // as little as it can (evenness first, hotspots only to break ties).
      const spot =
        bestSpot(input, t, share, shift, taken, 100) ?? bestSpot(input, t, share, share / 2, taken, 0.01);
      if (!spot) continue;
      taken.add(spot);
      chosen.push({ spot, moved: Math.abs(lapDelta(t, spot.s, L)) });
    }
    // A plan with more points always wins; among equals, the one covering more.
    const value = chosen.length * 1e9 + planValue(input, chosen);
    if (value > bestValue) {
      bestValue = value;
      best = chosen;
    }
  }
  return best.map((c) => c.spot).sort((a, b) => a.s - b.s);
}
