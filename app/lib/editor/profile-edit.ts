/**
 * Editing a jump in its side view: the handles of each preset (where they sit, m along the
 * section and m high) and the new jump when a handle is dragged to (d, h). Values are snapped
 * (0.1 m along, 0.05 m up, 5 deg; switchable), clamped to the format's ranges, and a move that
 * would break a rule spanning fields (a step-up lower than its takeoff, a gap too short for the
 * heights) is refused: the jump stays as it was.
 */
import { FIELD_LIMITS as F, type CustomJumpSection, type FieldLimit, type JumpSection } from "~/analysis";
import { clamp, snapAngle, snapHeight, snapLength, type SnapSettings } from "./snap";
import { sectionIssues } from "./field-check";

export interface ProfileHandle {
  id: string;
  /** Distance along the section, m, and height, m. */
  d: number;
  h: number;
  /** What dragging it changes, in plain words (tooltip and screen readers). */
  label: string;
}

const DEG = Math.PI / 180;
const within = (v: number, l: FieldLimit) => clamp(v, l.min, l.max);
const run = (height: number, angleDeg: number) => height / Math.tan(angleDeg * DEG);

/** The draggable points of a jump's side view. */
export function profileHandles(s: JumpSection): ProfileHandle[] {
  if (s.preset === "custom") {
    return s.profile
      .slice(1)
      .map(([d, h], k) => ({ id: `p${k + 1}`, d, h, label: `Profile point ${k + 2}: distance and height` }));
  }
  if (s.preset === "whoops")
    return [{ id: "crest", d: s.spacing / 2, h: s.bumpHeight, label: "First bump: spacing and height" }];
  const lipD = run(s.faceHeight, s.faceAngleDeg);
  const lip: ProfileHandle = { id: "lip", d: lipD, h: s.faceHeight, label: "Lip: face height and angle" };
  if (s.preset === "tabletop") {
    const topEnd = lipD + s.tableLength;
    return [
      lip,
      { id: "table", d: topEnd, h: s.faceHeight, label: "End of the table: table length" },
      {
        id: "foot",
        d: topEnd + run(s.faceHeight, s.landingAngleDeg),
        h: 0,
        label: "Foot of the landing: landing angle",
      },
    ];
  }
  const crestD = lipD + s.gap;
  const crest: ProfileHandle = {
    id: "crest",
    d: crestD,
    h: s.landingHeight,
    label: "Landing crest: gap and landing height",
  };
  if (s.preset === "step-up") {
    const deckEnd = crestD + s.deckLength;
    return [
      lip,
      crest,
      { id: "deck", d: deckEnd, h: s.landingHeight, label: "End of the deck: deck length" },
      {
        id: "foot",
        d: deckEnd + run(s.landingHeight, s.landingAngleDeg),
        h: 0,
        label: "Foot of the landing: landing angle",
      },
    ];
  }
  return [
    lip,
    crest,
    {
      id: "foot",
      d: crestD + run(s.landingHeight, s.landingAngleDeg),
      h: 0,
      label: "Foot of the landing: landing angle",
    },
  ];
}

const angleOf = (height: number, along: number) => Math.atan2(height, Math.max(along, 1e-6)) / DEG;

/**
 * The jump with one side-view handle dragged to (d, h).
 * @param d distance along the section, m; @param h height, m.
 * @returns the changed jump, or the same object when the move is refused.
 */
export function dragProfileHandle(
  s: JumpSection,
  handleId: string,
  d: number,
  h: number,
  snap: SnapSettings,
): JumpSection {
  const next = moved(s, handleId, d, h, snap);
  if (!next || next === s) return s;
  return sectionIssues(next).length === 0 ? next : s;
}

function moved(s: JumpSection, id: string, d: number, h: number, snap: SnapSettings): JumpSection | null {
  const L = (v: number) => snapLength(v, snap);
  const H = (v: number) => snapHeight(v, snap);
  const A = (v: number) => snapAngle(v, snap);
  if (s.preset === "custom") return movedCustom(s, id, L(d), H(h));
  if (s.preset === "whoops") {
    if (id !== "crest") return null;
    return { ...s, spacing: within(L(2 * d), F.spacing), bumpHeight: within(H(h), F.bumpHeight) };
  }
  if (id === "lip") {
    const faceHeight = within(H(h), F.jumpHeight);
    return { ...s, faceHeight, faceAngleDeg: within(A(angleOf(faceHeight, d)), F.jumpAngle) };
  }
  const lipD = run(s.faceHeight, s.faceAngleDeg);
  if (s.preset === "tabletop") {
    const topEnd = lipD + s.tableLength;
    if (id === "table") return { ...s, tableLength: within(L(d - lipD), F.tableLength) };
    if (id === "foot")
      return { ...s, landingAngleDeg: within(A(angleOf(s.faceHeight, d - topEnd)), F.jumpAngle) };
    return null;
  }
  if (id === "crest")
    return { ...s, gap: within(L(d - lipD), F.gap), landingHeight: within(H(h), F.jumpHeight) };
  const crestD = lipD + s.gap;
  if (s.preset === "step-up") {
    if (id === "deck") return { ...s, deckLength: within(L(d - crestD), F.deckLength) };
    if (id === "foot")
      return {
        ...s,
        landingAngleDeg: within(A(angleOf(s.landingHeight, d - crestD - s.deckLength)), F.jumpAngle),
      };
    return null;
  }
  if (id === "foot")
    return { ...s, landingAngleDeg: within(A(angleOf(s.landingHeight, d - crestD)), F.jumpAngle) };
  return null;
}

/** Custom profile: a point moves between its neighbours; the last point stays on the ground. */
function movedCustom(s: CustomJumpSection, id: string, d: number, h: number): CustomJumpSection | null {
  const k = Number(id.slice(1));
  const p = s.profile;
  if (!Number.isInteger(k) || k < 1 || k >= p.length) return null;
  const gap = 0.05;
  const lo = p[k - 1][0] + gap;
  const hi = k + 1 < p.length ? p[k + 1][0] - gap : 100;
  if (hi < lo) return null;
  const profile = p.map((pt) => [pt[0], pt[1]] as [number, number]);
  profile[k] = [
    Number(clamp(d, lo, hi).toFixed(3)),
    k === p.length - 1 ? 0 : Number(within(h, F.profileHeight).toFixed(3)),
  ];
  return { ...s, profile };
}

/**
 * Adds a point to a free profile after point k (half way to the next), or removes point k.
 * The takeoff and landing indices follow the points they named.
 */
export function addProfilePoint(s: CustomJumpSection, k: number): CustomJumpSection {
  const p = s.profile;
  if (k < 0 || k >= p.length - 1 || p.length >= 500) return s;
  const mid: [number, number] = [
    Number(((p[k][0] + p[k + 1][0]) / 2).toFixed(3)),
    Number(((p[k][1] + p[k + 1][1]) / 2).toFixed(3)),
  ];
  const profile = [...p.slice(0, k + 1), mid, ...p.slice(k + 1)] as [number, number][];
  const shift = (i: number) => (i > k ? i + 1 : i);
  return {
    ...s,
    profile,
    lipIndex: shift(s.lipIndex),
    landingStartIndex: shift(s.landingStartIndex),
    landingEndIndex: shift(s.landingEndIndex),
  };
}

export function removeProfilePoint(s: CustomJumpSection, k: number): CustomJumpSection {
  const p = s.profile;
  if (
    k <= 0 ||
    k >= p.length - 1 ||
    p.length <= 3 ||
    k === s.lipIndex ||
    k === s.landingStartIndex ||
    k === s.landingEndIndex
  )
    return s;
  const shift = (i: number) => (i > k ? i - 1 : i);
  const next = {
    ...s,
    profile: p.filter((_, i) => i !== k),
    lipIndex: shift(s.lipIndex),
    landingStartIndex: shift(s.landingStartIndex),
    landingEndIndex: shift(s.landingEndIndex),
  };
  return sectionIssues(next).length === 0 ? next : s;
}
