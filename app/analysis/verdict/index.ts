// Track length saved, the verdict per skill level and its sentences (the words: ../words.ts).
export * from "./verdict";
export * from "./jump-verdicts";
export { steeringWords } from "./verdict-text";
export { findLandingTurn, type TurnAfter } from "./jump-turn";
