import type { ClassAnalysis, LayoutAnalysis } from "~/analysis";

/** The part of a layout analysis the summary and the rule checks show (no per-sample data). */
export type SummaryData = Pick<
  LayoutAnalysis,
  "lapLength" | "closure" | "trackWidth" | "startStraight" | "note" | "rules"
> & {
  classes: Pick<ClassAnalysis, "classId" | "label" | "lapTime" | "speed" | "cannotClear" | "tightTurns">[];
};
