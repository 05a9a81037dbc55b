// Marshal risk: overshoot and run-off zones, hotspots, marshal point warnings and a suggested plan.
export { marshalPlan, type MarshalOptions } from "./marshal-plan";
export type * from "./marshal-types";
export * from "./settings";
export * from "./words";
export {
  overshootReach,
  escapeReach,
  stoppingDistance,
  type OvershootReach,
  type EscapeReach,
} from "./reach";
export { ratioScore } from "./hotspots";
export { speedScore } from "./turn-hotspots";
export { zoneScore } from "./zone-words";
export { cornerKind, type CornerKind } from "./track-marks";
export { keepOutArea } from "./polygons";
