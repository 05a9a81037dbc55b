// Track length saved, the verdict per skill level and its words.
export * from "./verdict";
export * from "./jump-verdicts";
export { ERROR_WORDS, WHOOPS_WORDS, steeringWords } from "./verdict-text";
export { findLandingTurn, type TurnAfter } from "./jump-turn";
