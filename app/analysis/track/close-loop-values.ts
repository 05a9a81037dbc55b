/**
 * What "Close the loop" may change and what each change costs (docs/decisions/0509-close-the-loop-keeps-the-design.md).
 *
 * Never changed: jumps, the run-out from a jump to the next turn (every straight between them,
 * going round the lap), and sections the director locked. Straights change their length, turns
 * their radius and angle. The cost of a change is its size relative to the value, weighted so that
 * long straights away from jumps are preferred, then radii, then angles; the approach to a jump and
 * the turn a jump lands into cost more.
 */
import type { LayoutSection } from "../format/layout-document";
import { FIELD_LIMITS, type FieldLimit } from "../format/field-limits";

export type AdjustableField = "length" | "angleDeg" | "radius";

/** Why a section is left alone, in plain words (null when it may change). */
export type Protection = "jump" | "run-out" | "locked" | null;

export interface AdjustableValue {
  index: number;
  field: AdjustableField;
  /** Current value: m for length and radius, degrees for angleDeg. */
  value: number;
  limit: FieldLimit;
  /** Cost of a change of one unit (m or degree). */
  unitCost: number;
}

/** Weights of the cost of a relative change (dimensionless). */
const WEIGHT = {
  straight: 1,
  /** A straight leading straight into a jump: its length sets the takeoff speed. */
  approach: 3,
  radius: 2,
  angle: 4,
  /** The turn a jump lands into is part of the jump's design. */
  landingTurn: 4,
} as const;

/** For each section: whether it is protected, whether it is a jump's approach or landing turn. */
export function sectionRoles(sections: readonly LayoutSection[]): {
  protection: Protection[];
  approach: boolean[];
  landingTurn: boolean[];
} {
  const n = sections.length;
  const protection: Protection[] = sections.map((s) =>
    s.kind === "jump" ? "jump" : s.locked ? "locked" : null,
  );
  const approach = sections.map(() => false);
  const landingTurn = sections.map(() => false);
  sections.forEach((s, j) => {
    if (s.kind !== "jump") return;
    // Run-out: every straight after the jump until the next turn, round the lap.
    for (let step = 1; step < n; step++) {
      const k = (j + step) % n;
      const next = sections[k];
      if (next.kind === "turn") {
        landingTurn[k] = true;
        break;
      }
      if (next.kind === "straight" && protection[k] === null) protection[k] = "run-out";
    }
    const before = sections[(j - 1 + n) % n];
    if (before.kind === "straight") approach[(j - 1 + n) % n] = true;
  });
  return { protection, approach, landingTurn };
}

/** Every value "Close the loop" may change, with its cost per unit of change. */
export function adjustableValues(sections: readonly LayoutSection[]): AdjustableValue[] {
  const { protection, approach, landingTurn } = sectionRoles(sections);
  const out: AdjustableValue[] = [];
  sections.forEach((s, index) => {
    if (protection[index] !== null) return;
    if (s.kind === "straight") {
      const w = approach[index] ? WEIGHT.approach : WEIGHT.straight;
      out.push({
        index,
        field: "length",
        value: s.length,
        limit: FIELD_LIMITS.straightLength,
        unitCost: w / Math.max(s.length, 1),
      });
    } else if (s.kind === "turn") {
      const extra = landingTurn[index] ? WEIGHT.landingTurn : 1;
      out.push({
        index,
        field: "radius",
        value: s.radius,
        limit: FIELD_LIMITS.turnRadius,
        unitCost: (WEIGHT.radius * extra) / s.radius,
      });
      out.push({
        index,
        field: "angleDeg",
        value: s.angleDeg,
        limit: FIELD_LIMITS.turnAngle,
        unitCost: (WEIGHT.angle * extra) / Math.max(s.angleDeg, 10),
      });
    }
  });
  return out;
}
