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
 *   are data; the sentences drivers read, with their numbers, are written by `describeVerdicts`
 *   (jump-verdicts.ts, verdict-text.ts) from the words below). `DEFAULT_VERDICT_THRESHOLDS`:
 *   smallest turn 20 deg, airtime 0.3 s, worthwhile gain 0.05 s a pass, nose turn 10 deg, failure 3 s.
 *
 * The product's words (words.ts): `SKILL_LEVELS` / `SKILL_LABELS` / `skillPhrase`, `JUMP_PRESETS` /
 * `JUMP_PRESET_LABELS`, `SURFACES` / `SURFACE_LABELS`, `GUIDANCE_SET_IDS` / `GUIDANCE_SET_LABELS`,
 * `VERDICT_KINDS` / `VERDICT_WORDS` / `verdictKind`, `REASON_TEXT`, `ERROR_SOURCES` / `ERROR_WORDS`,
 * `WHOOPS_TECHNIQUES` / `WHOOPS_WORDS`, `quotedList`. Defined once; every screen, message and
 * command imports them from here.
 *
 * Car classes (cars.ts)
 * - `CAR_PRESETS` by id ("buggy-2wd-10", "buggy-4wd-10", "sct-10", "buggy-8"), `CAR_PRESET_IDS`,
 *   `carPreset(id)`, `CarParams` (every value an estimate, with notes on the inertias).
 *
 * New jumps (jump-presets.ts)
 * - `defaultJump(preset, id)` -> the preset's starting shape; `DEFAULT_JUMP_PRESET`.
 *
 * Field limits (field-limits.ts)
 * - `FIELD_LIMITS` (min, max, unit of every typed value: trackWidth, straightLength, ...),
 *   `CAR_CLASS_COUNT`, `limitProblem(value, limit)`, `limitRange(limit)`: forms and editor use them.
 *
 * Closing the loop (close-loop.ts)
 * - `closeLoop(doc, { lengthStep?, angleStep? })` -> the proposed document and its changes (never a
 *   jump, a run-out or a locked section; snapped to the steps given) or the reason it cannot;
 *   `isLoopClosed(closure)` within `CLOSURE_TOLERANCE` (5 cm, 0.5 deg); `sectionRoles(sections)`.
 */
export * from "./words";
export * from "./format";
export * from "./flight";
export * from "./air";
export * from "./verdict";
export * from "./track";
export { rad, deg, DEG_PER_RAD, RAD_PER_DEG } from "./math/vec";

/*
 * Layout analysis (layout-analysis.ts, jump-analysis.ts, overlay.ts, analysis-cache.ts)
 * - `analyseLayout(doc, { classIds?, skill?, guidance?, overrides?, cache?, cars?, skillSigmas?,
 *   speedSigmas?, thresholds?, lookaheadS?, failCost?, seed?, marshal? })` -> `LayoutAnalysis`
 *   (plain JSON data: lap length, closure, plan checks, rule report with the jump rules, per class:
 *   lap time, speed along the downsampled line, jumps with flight, window, EFH, landing turn,
 *   set-up plan, whoops ways and a verdict per skill level; angles in deg; `risk`: the marshal
 *   plan when `marshal` settings are given).
 * - `analyseJump(context, options)` -> `JumpAnalysis` for one jump and one car class.
 * - `buildOverlay(analysis, classId, skill?)` -> `AnalysisOverlay` (app/lib/analysis-overlay.ts).
 * - `createAnalysisCache(maxEntries?)` -> an LRU memo (`memo`, `stats`, `clear`); `cacheKey`,
 *   `canonicalJson`, `fnv1a64`.
 */
export * from "./layout";

/*
 * Build pack (build/): marking out and earthworks. Bearings there are surveyors' bearings:
 * radians clockwise from the plan's +Y ("grid north", up the page), not the engine's headings.
 * - `baseline(a, b)`, `measureFromDatum(line, x, y)` -> `{ distance, bearing, along, offset }`
 *   (offset positive to the right of A to B), `pointFromBearing`, `pointFromOffsets`,
 *   `planBearing(dx, dy)`, `trueBearing(planBearing, line, { gridTrueBearing } | { abTrueBearing })`.
 * - `markingOut(doc, a, b, spacing)` -> centre-line stations with both edges, turn centres and
 *   radii, jump points with heights, every stake measured from the datums.
 * - `profileEarth(d, h, width, sideSlope?)`, `earthworks(doc, truckLoad)` -> fill and cut per jump
 *   and in total, m³, and truck loads.
 */
export * from "./build";

/*
 * Marshal risk (marshal/; docs/engine.md "Marshal risk")
 * - `marshalPlan(doc, analysis, { classIds?, cars?, settings?, suggest? })` -> `MarshalPlan`: overshoot
 *   zones beyond jumps (J1..) and run-off zones past corners (T1..) as wedges and polygons in plan m,
 *   hotspots (H1.., score 1 to 5, reason), the layout's marshal points
 *   (M1..) with stretch, watch list, jumps, turns and warnings, and `suggested` points when asked.
 * - `MARSHAL_SETTINGS` (defaults, ranges, sources), `marshalSettings(overrides)`, the words
 *   (`HOTSPOT_KIND_WORDS`, `scoreWords`, `MARSHAL_NOTE`), and the hand-checkable reaches
 *   `overshootReach(profile, speed, decel)` and `escapeReach(speed, decel)` (m, m/s, m/s^2);
 *   `keepOutArea(zones)` merges the zones into one area (polygons of rings, m) for drawing.
 */
export * from "./marshal";

/*
 * Calibration from measured laps (calibration/; docs/decisions/0120-0122)
 * - `calibrationTrack(doc)` samples a layout once; `modelTimes(track, car, sectors = 1)` ->
 *   `{ lapTime, sectorTimes }` s, sectors being equal parts of the lap by distance from the start.
 * - `dropSlowLaps(laps, ratio = SLOW_LAP_RATIO)` -> `{ kept, dropped, limit }`: laps slower than
 *   1.3 × the median (crashes, stops) are left out; `median(values)`.
 * - `fitPace(track, car, measuredMean s)` -> `{ paceFactor, atBound, modelled s, fittedLap s, scale,
 *   fitted }`: lap times on one layout give one factor (bounded 0.5 to 1.5); `fitted` scales the
 *   car's speeds evenly (`scaleCar`) so the model matches the measured mean.
 * - `fitSpeedGrip([{ track, measured: [s...] }], car)` -> `{ separable, cos, topSpeed m/s, mu,
 *   atBound, rms, fitted, before, after }`: top speed and grip by bounded least squares on sector
 *   times or on laps of two layouts; `separable` false when the data cannot tell them apart.
 */
export * from "./calibration";
