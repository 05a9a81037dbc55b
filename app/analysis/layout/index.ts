// The whole-layout analysis: per class and skill, its per-jump memo, and the overlay it draws.
export * from "./layout-analysis-types";
export * from "./analysis-cache";
export { analyseJump, TAKEOFF_SPEED_STEP, type JumpContext, type JumpAnalysisOptions } from "./jump-analysis";
export * from "./layout-analysis";
export { buildOverlay, jumpLabel, linePolyline } from "./overlay";
export type * from "./overlay-types";
export * from "./compare";
