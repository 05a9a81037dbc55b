// The car in the air: attitude (a gyrostat) and the mid-air set-up plan.
export * from "./attitude";
export {
  checkTimeline,
  compileServo,
  compileWheel,
  evaluate,
  type PiecewiseLinear,
  type TimedValue,
} from "./attitude-inputs";
export * from "./air-plan";
export { nutationPeriod } from "./air-plan-linear";
export type { TradeOffPoint } from "./air-plan-joint";
export {
  DEFAULT_SKILL_SIGMAS,
  DEFAULT_SPEED_SIGMAS,
  speedSpreadPhrase,
  timingErrorsPhrase,
  type SkillSigmas,
  type SwitchWindow,
} from "./air-plan-robustness";
export {
  pitchPulse,
  drivenSpinInertia,
  PULSE_STRENGTHS,
  type PitchPulse,
  type PulseKind,
  type PulseLimits,
} from "./air-plan-pulse";
