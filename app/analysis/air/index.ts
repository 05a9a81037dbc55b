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
export {
  DEFAULT_SKILL_SIGMAS,
  timingErrorsPhrase,
  type SkillSigmas,
  type SwitchWindow,
} from "./air-plan-robustness";
export {
  pitchPulse,
  drivenSpinInertia,
  type PitchPulse,
  type PulseKind,
  type PulseLimits,
} from "./air-plan-pulse";
