// Calibration from measured laps: model lap and sector times, slow laps, the fits.
export * from "./model-times";
export * from "./laps";
export * from "./fit";
export * from "./pace";
