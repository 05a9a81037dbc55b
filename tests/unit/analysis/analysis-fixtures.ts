/**
 * Test layouts for the layout analysis: closed ovals with one jump on the near straight, the
 * jump landing straight into a hairpin or onto a long straight.
 */
import { jumpProfile } from "~/analysis/track/jump-profile";
import type { JumpSection, LayoutDocument, LayoutSection } from "~/analysis/format/layout-document";

/** A big double: about 0.97 s in the air at its sweet-spot speed (about 9.3 m/s). */
export const BIG_DOUBLE: JumpSection = {
  id: "big-double",
  kind: "jump",
  preset: "double",
  faceHeight: 0.5,
  faceAngleDeg: 30,
  gap: 7,
  landingHeight: 0.5,
  landingAngleDeg: 20,
};

/** A tiny table: under 0.3 s in the air. */
export const KICKER: JumpSection = {
  id: "kicker",
  kind: "jump",
  preset: "tabletop",
  faceHeight: 0.1,
  faceAngleDeg: 15,
  tableLength: 0.5,
  landingAngleDeg: 15,
};

export interface OvalOptions {
  /** Straight before the jump, m. */
  approach?: number;
  /** Straight between the jump and the first turn, m. */
  after?: number;
  radius?: number;
  width?: number;
  carClasses?: string[];
  guidance?: LayoutDocument["guidance"];
}

/**
 * A closed oval driven anticlockwise: approach straight, the jump, a straight, a 180 deg left
 * turn, the back straight (as long as the three near sections), another 180 deg left turn.
 */
export function ovalWithJump(jump: JumpSection | null, o: OvalOptions = {}): LayoutDocument {
  const approach = o.approach ?? 25;
  const after = o.after ?? 0.5;
  const radius = o.radius ?? 3;
  const jumpLength = jump ? jumpProfile(jump).length : 0;
  const near: LayoutSection[] = [{ id: "approach", kind: "straight", length: approach }];
  if (jump) near.push(jump);
  near.push({ id: "after", kind: "straight", length: after });
  return {
    format: "loftline-layout",
    formatVersion: 1,
    units: "metres-degrees",
    name: "Test oval",
    surface: "clay",
    trackWidth: o.width ?? 3,
    start: { x: 0, y: 0, headingDeg: 0 },
    marshalPoints: [],
    carClasses: o.carClasses ?? ["buggy-4wd-10"],
    guidance: o.guidance ?? "club",
    sections: [
      ...near,
      { id: "hairpin", kind: "turn", radius, angleDeg: 180, direction: "left" },
      { id: "back", kind: "straight", length: approach + jumpLength + after },
      { id: "far-turn", kind: "turn", radius, angleDeg: 180, direction: "left" },
    ],
  };
}

/**
 * A plain oval that meets every club rule at 3 m wide: 40 m straights, 8 m turns (lap about
 * 130 m), the driver stand in the middle, four marshal points spread evenly.
 */
export function ruleOval(width: number): LayoutDocument {
  const L = 40;
  const R = 8;
  return {
    format: "loftline-layout",
    formatVersion: 1,
    units: "metres-degrees",
    name: "Rule oval",
    surface: "dirt",
    trackWidth: width,
    start: { x: 0, y: 0, headingDeg: 0 },
    driverStand: { x: L / 2, y: R, eyeHeight: 3 },
    marshalPoints: [
      { x: L / 2, y: 0 },
      { x: L + R, y: R },
      { x: L / 2, y: 2 * R },
      { x: -R, y: R },
    ],
    carClasses: ["buggy-2wd-10"],
    guidance: "club",
    sections: [
      { id: "start-straight", kind: "straight", length: L },
      { id: "east-turn", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
      { id: "back-straight", kind: "straight", length: L },
      { id: "west-turn", kind: "turn", radius: R, angleDeg: 180, direction: "left" },
    ],
  };
}
