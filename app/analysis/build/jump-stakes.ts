/**
 * The points of a jump's ground profile worth a stake: the toe (foot of the face), the lip, the
 * crest (top of the landing), the end of the landing ramp, the foot of the last slope, and the
 * profile's other corners (the foot of a mound's back side, the valley where two mounds meet, a
 * middle hump). For whoops only the bump crests: the rows of eight points per bump that draw the
 * rounded shape are not built from stakes.
 */
import type { JumpProfile } from "../track/jump-profile";

export type JumpPointKind =
  | "jump-toe"
  | "jump-lip"
  | "jump-crest"
  | "jump-landing-end"
  | "jump-foot"
  | "jump-mound-foot"
  | "jump-slope-change"
  | "jump-bump-crest";

/** A named profile point: distance along the section and height above the ground, m. */
export interface JumpPoint {
  kind: JumpPointKind;
  /** Short code for the stake name: TOE, LIP, CREST, LAND, FOOT, P3 (profile point 3), BUMP3 (third bump). */
  code: string;
  d: number;
  h: number;
}

/** Heights below this are on the ground, m. */
const GROUND = 1e-6;

/**
 * Named points of a profile in order along the section.
 * @param whoops true for a whoops row (only the bump crests among the unnamed points).
 */
export function jumpStakePoints(profile: JumpProfile, whoops: boolean): JumpPoint[] {
  const { d, h, lipIndex, landingStartIndex, landingEndIndex } = profile;
  const last = d.length - 1;
  const out: JumpPoint[] = [];
  // Bumps of a whoops row are numbered from the first: the lip is bump 1 and the crest bump 2.
  let bump = 2;
  for (let i = 0; i <= last; i++) {
    const named = nameOf(i, lipIndex, landingStartIndex, landingEndIndex, last);
    if (named) {
      out.push({ kind: named[0], code: named[1], d: d[i], h: h[i] });
      continue;
    }
    if (whoops) {
      if (h[i] > h[i - 1] && h[i] >= h[i + 1] && h[i] > GROUND)
        out.push({ kind: "jump-bump-crest", code: `BUMP${++bump}`, d: d[i], h: h[i] });
      continue;
    }
    const kind = Math.abs(h[i]) < GROUND ? "jump-mound-foot" : "jump-slope-change";
    out.push({ kind, code: `P${i}`, d: d[i], h: h[i] });
  }
  return out;
}

function nameOf(
  i: number,
  lip: number,
  crest: number,
  landingEnd: number,
  last: number,
): [JumpPointKind, string] | null {
  if (i === 0) return ["jump-toe", "TOE"];
  if (i === lip) return ["jump-lip", "LIP"];
  if (i === crest) return ["jump-crest", "CREST"];
  if (i === landingEnd) return ["jump-landing-end", "LAND"];
  if (i === last) return ["jump-foot", "FOOT"];
  return null;
}
