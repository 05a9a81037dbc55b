/**
 * The analysis engine's front door: everything outside app/analysis imports from here only
 * (an ESLint rule enforces it). Pure TypeScript: no React, database or Node imports; SI
 * units and radians everywhere (degrees only at the edges: JSON files, forms, screens).
 *
 * Flight of a jump (flight.ts, flight-window.ts)
 * - `flyJump({ speed, faceAngleRad, lip: {x, z}, surface: [{x, z}], g?, drag?, landingRamp? })`
 *   -> `{ airtime, apex: {x, z, t}, landing: { x, z, t, speed, flightPathRad, surfaceSlopeRad,
 *   normalSpeed, equivalentFallHeight }, segmentIndex, beyondProfile, landedOn }`; `landedOn` is
 *   "short" | "ramp" | "overshoot" when `landingRamp: { start, end }` (x positions, m) is given.
 * - `speedWindow({ faceAngleRad, lip, surface, landingRamp, g?, drag?, minSpeed?, maxSpeed? })`
 *   -> `{ min, max, maxIsSearchLimit }` m/s, or null when the ramp is out of reach.
 * - `sweetSpotSpeed(sameInput, fraction = 1/3)` -> m/s landing `fraction` down the ramp.
 * - `speedToLandAt(input, targetX)` -> m/s touching down at x = targetX.
 * - `equivalentFallHeight(speed, flightPathRad, surfaceSlopeRad, g?)` -> m.
 *
 * Attitude in the air (attitude.ts)
 * - `simulateAttitude(car, { speed, duration, steering?: [t, rad][], rearWheelAccel?: [t, rad/s^2][],
 *   initialRates?, initialPitchRad?, dt? }, { seriesEvery? })` -> `{ yawRad, pitchRad, rollRad,
 *   angularMomentumDrift, finalRates, finalQuaternion, series? }`.
 *
 * Mid-air set-up plan (air-plan.ts)
 * - `planAirSetup({ car, speed, airtime, turn: "left" | "right", rollToleranceRad?,
 *   pitchToleranceRad?, maxYawRad?, turnAngleRad?, pitchChangeRad?, takeoffPitchRad?,
 *   airtimePerSpeed? (s per m/s), value?: { secondsPerRad, failCost, minYawRad? }, rankFor?, seed?,
 *   skillSigmas? (s), speedSigmas? (m/s) })` -> `{ feasible, reason, steering: [t, rad][],
 *   rearWheelAccel: [t, rad/s^2][], yawRad, pitchRad, rollRad, targetYawRad, pitchAimRad,
 *   pitchPulse: { kind, start, duration, wheelAccel, strength, limited, stopsWheels }, switches,
 *   pulseSwitches: [{ t, earlyMs, lateMs }], timingWindowMs, successRate, successAlone: { steering,
 *   pulse, speed }, mainError, withoutLevelling, tradeOff }`: pulse and steering searched together,
 *   the driver's timing and takeoff-speed errors sampled. Steering is in radians here; the command
 *   line prints degrees. `nutationPeriod(car, speed)` s: the plan starts away from the turn on
 *   flights shorter than about 0.6 of it.
 * - `analyseWhoops(section, faceAngleRad, approachSpeed m/s, drag?, g?)` -> the ways through a
 *   whoops row (skim, doubles, triples, roll) with the speed each needs (m/s).
 *
 * Track length saved and the verdict (verdict.ts)
 * - `landsIntoTurn(distanceToTurn, landingSpeed, lookaheadS = 0.5)`,
 *   `trackLengthSaved(radius, psi, turnAngle)` m, `timeSaved(radius, psi, turnAngle, entrySpeed)` s,
 *   `expectedGain(successRate, timeSaved, failCost = 3)` s,
 *   `jumpVerdict({ landsIntoTurn, turnAngle, airtime, expectedGain, planReason?, noseTurn?,
 *   noseTurnUnlevelled?, thresholds? })` -> `{ verdict: "set-up" | "straight", reason }` (reasons
 *   are data; sentences with their numbers in verdict-text.ts). `DEFAULT_VERDICT_THRESHOLDS`:
 *   smallest turn 20 deg, airtime 0.3 s, worthwhile gain 0.05 s a pass, nose turn 10 deg, failure 3 s.
 *
 * Car classes (cars.ts)
 * - `CAR_PRESETS` by id ("buggy-2wd-10", "buggy-4wd-10", "sct-10", "buggy-8"), `CAR_PRESET_IDS`,
 *   `carPreset(id)`, `CarParams` (every value an estimate, with notes on the inertias).
 */
export * from "./format";
export * from "./flight";
export * from "./air";
export * from "./verdict";
export * from "./track";
export { rad, deg, DEG_PER_RAD, RAD_PER_DEG } from "./math/vec";

/*
 * Layout analysis (layout-analysis.ts, jump-analysis.ts, overlay.ts, analysis-cache.ts)
 * - `analyseLayout(doc, { classIds?, skill?, guidance?, overrides?, cache?, cars?, skillSigmas?,
 *   speedSigmas?, thresholds?, lookaheadS?, failCost?, seed? })` -> `LayoutAnalysis` (plain JSON data: lap length, closure,
 *   plan checks, rule report, per class: lap time, speed along the downsampled line, jumps with
 *   flight, window, EFH, landing turn, set-up plan and a verdict per skill level; angles in deg).
 * - `analyseJump(context, options)` -> `JumpAnalysis` for one jump and one car class.
 * - `buildOverlay(analysis, classId, skill?)` -> `AnalysisOverlay` (app/lib/analysis-overlay.ts).
 * - `createAnalysisCache(maxEntries?)` -> an LRU memo (`memo`, `stats`, `clear`); `cacheKey`,
 *   `canonicalJson`, `fnv1a64`.
 */
export * from "./layout";
