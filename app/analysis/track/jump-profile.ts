/**
 * Jump presets to ground profiles: a polyline of (distance along the section, height) points with
 * the index of the takeoff lip and the extent of the landing ramp.
 *
 * Every profile starts at distance 0 and height 0 and ends at height 0; its last distance is the
 * plan length of the jump section. Mound back sides are MOUND_BACK_SLOPE_DEG steep.
 */
import type { JumpSection } from "../format/layout-document";
import { MOUND_BACK_SLOPE_DEG } from "../format/layout-document-checks";

/** Fraction of the way down the landing ramp where a planned landing touches down (engine.md 2). */
export const SWEET_SPOT_FRACTION = 1 / 3;

/** A jump's ground profile. Shared between callers (see jumpProfile): treat as read-only. */
export interface JumpProfile {
  /** Distance along the section of each point, m (increasing, d[0] = 0). */
  readonly d: readonly number[];
  /** Ground height of each point, m. */
  readonly h: readonly number[];
  lipIndex: number;
  landingStartIndex: number;
  landingEndIndex: number;
  /** Plan length of the jump section, m (= last d). */
  length: number;
  /** Slope of the face just before the lip, rad (the launch angle). */
  faceAngle: number;
  /** Distance along the section of the planned touchdown point, m. */
  sweetSpot: number;
}

const DEG = Math.PI / 180;
const BACK = Math.tan(MOUND_BACK_SLOPE_DEG * DEG);

type Pts = [number, number][];

const profileCache = new WeakMap<JumpSection, JumpProfile>();

/**
 * Ground profile of a jump section. With the default sweet spot the result is remembered per
 * section object, so an unchanged section of an edited layout costs nothing and keeps the same
 * profile object (whose speed window is remembered too, lap-jumps.ts).
 * @param sweetSpotFraction where down the landing ramp a planned landing touches down (0..1).
 */
export function jumpProfile(section: JumpSection, sweetSpotFraction = SWEET_SPOT_FRACTION): JumpProfile {
  if (sweetSpotFraction !== SWEET_SPOT_FRACTION) return buildProfile(section, sweetSpotFraction);
  let p = profileCache.get(section);
  if (!p) {
    p = buildProfile(section, SWEET_SPOT_FRACTION);
    profileCache.set(section, p);
  }
  return p;
}

function buildProfile(section: JumpSection, sweetSpotFraction: number): JumpProfile {
  switch (section.preset) {
    case "tabletop": {
      const face = section.faceHeight / Math.tan(section.faceAngleDeg * DEG);
      const top = face + section.tableLength;
      const pts: Pts = [
        [0, 0],
        [face, section.faceHeight],
        [top, section.faceHeight],
        [top + section.faceHeight / Math.tan(section.landingAngleDeg * DEG), 0],
      ];
      return finish(pts, 1, 2, 3, sweetSpotFraction);
    }
    case "double":
    case "triple":
    case "step-down":
    case "step-up":
      return gapJump(section, sweetSpotFraction);
    case "whoops": {
      const pts: Pts = [];
      const per = 8;
      for (let k = 0; k <= section.count * per; k++) {
        const x = (k * section.spacing) / per;
        pts.push([x, (section.bumpHeight * (1 - Math.cos((2 * Math.PI * k) / per))) / 2]);
      }
      // Hopping crest to crest: leave the first crest, land on the back of the second bump.
      return finish(pts, per / 2, per + per / 2, 2 * per, sweetSpotFraction);
    }
    case "custom":
      return finish(
        section.profile.map(([d, h]) => [d, h]),
        section.lipIndex,
        section.landingStartIndex,
        section.landingEndIndex,
        sweetSpotFraction,
      );
  }
}

type GapJump = Extract<JumpSection, { preset: "double" | "triple" | "step-up" | "step-down" }>;

/** Takeoff mound, optional middle hump (triple), landing mound (deck for a step-up). */
function gapJump(s: GapJump, fraction: number): JumpProfile {
  const h1 = s.faceHeight;
  const h2 = s.landingHeight;
  const lip = h1 / Math.tan(s.faceAngleDeg * DEG);
  const crest = lip + s.gap;
  const down = h2 / Math.tan(s.landingAngleDeg * DEG);
  const mounds: Pts[] = [
    [
      [0, 0],
      [lip, h1],
      [lip + h1 / BACK, 0],
    ],
  ];
  if (s.preset === "triple") {
    const mid = lip + s.gap / 2;
    const hm = Math.min(h1, h2);
    mounds.push([
      [mid - hm / BACK, 0],
      [mid, hm],
      [mid + hm / BACK, 0],
    ]);
  }
  const deck = s.preset === "step-up" ? s.deckLength : 0;
  const landing: Pts = [
    [crest - h2 / BACK, 0],
    [crest, h2],
  ];
  if (deck > 0) landing.push([crest + deck, h2]);
  landing.push([crest + deck + down, 0]);
  mounds.push(landing);
  const pts = joinMounds(mounds);
  const lipIndex = pts.findIndex((p) => p[0] === lip);
  const start = pts.findIndex((p) => p[0] === crest);
  // The landing ramp is the down slope after the crest, or the deck of a step-up.
  return finish(pts, lipIndex, start, start + 1, fraction);
}

/**
 * Joins mounds (each a polyline from ground to ground) left to right; where two overlap, the
 * back side of one and the front side of the next meet in a valley above the ground.
 */
function joinMounds(mounds: Pts[]): Pts {
  let out: Pts = mounds[0].slice();
  for (let m = 1; m < mounds.length; m++) {
    const next = mounds[m];
    const [ax, ay] = out[out.length - 2];
    const [bx] = out[out.length - 1];
    const [cx] = next[0];
    const [dx, dy] = next[1];
    if (bx <= cx) {
      out = bx === cx ? out.concat(next.slice(1)) : out.concat(next);
      continue;
    }
    // Back side z = ay - (x - ax) * BACK meets front side z = dy - (dx - x) * BACK.
    const x = (ay - dy) / (2 * BACK) + (ax + dx) / 2;
    out.pop();
    out.push([x, ay - (x - ax) * BACK]);
    out = out.concat(next.slice(1));
  }
  return out;
}

function finish(
  pts: Pts,
  lipIndex: number,
  landingStartIndex: number,
  landingEndIndex: number,
  fraction: number,
): JumpProfile {
  const d = pts.map((p) => p[0]);
  const h = pts.map((p) => p[1]);
  const faceAngle = Math.atan2(h[lipIndex] - h[lipIndex - 1], d[lipIndex] - d[lipIndex - 1]);
  const sweetSpot = d[landingStartIndex] + fraction * (d[landingEndIndex] - d[landingStartIndex]);
  return {
    d,
    h,
    lipIndex,
    landingStartIndex,
    landingEndIndex,
    length: d[d.length - 1],
    faceAngle,
    sweetSpot,
  };
}

/**
 * Ground height at a distance along a profile, m (linear between points; 0 outside the profile).
 * @param d distance along the section, m.
 */
export function profileHeightAt(profile: JumpProfile, d: number): number {
  const { d: ds, h } = profile;
  if (d <= 0 || d >= ds[ds.length - 1]) return 0;
  let lo = 0;
  let hi = ds.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (ds[mid] <= d) lo = mid;
    else hi = mid;
  }
  const t = (d - ds[lo]) / (ds[hi] - ds[lo]);
  return h[lo] + t * (h[hi] - h[lo]);
}
