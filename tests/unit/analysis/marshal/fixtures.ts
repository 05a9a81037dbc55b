/**
 * Test layouts for the marshal risk: a closed rectangle driven anticlockwise with a jump on its
 * first side that lands just before a 90 degree left turn.
 */
import { jumpProfile } from "~/analysis/track/jump-profile";
import type { JumpSection, LayoutDocument } from "~/analysis/format/layout-document";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import { marshalPlan, type MarshalOptions } from "~/analysis/marshal/marshal-plan";

/** Rectangle: 25 m, the jump, `after` m, then four 90 deg left turns (radius 3) around 20 m sides. */
export function rectangleWithJump(jump: JumpSection, after = 0.5): LayoutDocument {
  const side = 25 + jumpProfile(jump).length + after;
  const turn = (id: string) => ({
    id,
    kind: "turn" as const,
    radius: 3,
    angleDeg: 90,
    direction: "left" as const,
  });
  return {
    format: "loftline-layout",
    formatVersion: 1,
    units: "metres-degrees",
    name: "Test rectangle",
    surface: "clay",
    trackWidth: 3,
    start: { x: 0, y: 0, headingDeg: 0 },
    marshalPoints: [],
    carClasses: ["buggy-2wd-10"],
    guidance: "club",
    sections: [
      { id: "approach", kind: "straight", length: 25 },
      jump,
      { id: "after", kind: "straight", length: after },
      turn("turn-1"),
      { id: "side-2", kind: "straight", length: 20 },
      turn("turn-2"),
      { id: "side-3", kind: "straight", length: side },
      turn("turn-3"),
      { id: "side-4", kind: "straight", length: 20 },
      turn("turn-4"),
    ],
  };
}

/** Analyses a document and makes its marshal plan. */
export function riskOf(
  doc: LayoutDocument,
  options: MarshalOptions & Parameters<typeof analyseLayout>[1] = {},
) {
  const { classIds, cars, settings, suggest, ...analysis } = options;
  const a = analyseLayout(doc, { ...analysis, classIds, cars });
  return { analysis: a, plan: marshalPlan(doc, a, { classIds, cars, settings, suggest }) };
}
