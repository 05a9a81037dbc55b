/**
 * Engine benchmark: `npm run bench:engine`. Prints medians over repeated runs:
 * - one second of attitude simulation at 1 ms steps (target: under 0.2 ms),
 * - allocation inside the integrator's loop (target: none; measured as heap bytes per step),
 * - a complete mid-air set-up plan with timing windows and three success rates (target: under
 *   15 ms; aim about 4 ms),
 * - a complete joint plan as the layout analysis asks for it: the brake pulse searched with the
 *   steering, world-frame angles from the face angle, what a turn is worth, the driver's steering,
 *   pulse and takeoff-speed errors, and what turning alone would give (target: under 15 ms),
 * - for information: one jump flight and one speed window,
 * - calibration on the summer layout: the pace factor and the top speed and grip fit from three
 *   sector times (target: under 250 ms each, as they run on the request thread; decision 0122).
 */
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import {
  planAirSetup,
  simulateAttitude,
  type AttitudeInput,
  CAR_PRESETS,
  CAR_PRESET_IDS,
  flyJump,
  speedWindow,
  calibrationTrack,
  fitPace,
  fitSpeedGrip,
  modelTimes,
} from "~/analysis";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
};

/** Median time per call (ms) over `rounds` rounds of `perRound` calls, after a warm-up. */
function time(fn: () => void, rounds: number, perRound: number, warmup = perRound * 5): number {
  for (let i = 0; i < warmup; i++) fn();
  const per: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    for (let i = 0; i < perRound; i++) fn();
    per.push((performance.now() - t0) / perRound);
  }
  return median(per);
}

const rad = (d: number) => (d * Math.PI) / 180;
const car = CAR_PRESETS["buggy-2wd-10"];
const aggressive: AttitudeInput = {
  speed: 12,
  duration: 1,
  steering: [
    [0.03, rad(32)],
    [0.3, rad(-32)],
    [0.6, rad(10)],
    [0.8, 0],
  ],
  rearWheelAccel: [
    [0.03, -3000],
    [0.06, 0],
  ],
  initialRates: [0.5, -1, 0.3],
};

if (process.argv.includes("--alloc-probe")) {
  // Child mode: print heap bytes per step and stop.
  const gc = (globalThis as { gc?: () => void }).gc!;
  for (let i = 0; i < 2000; i++) simulateAttitude(car, aggressive);
  const perRun = (duration: number) => {
    const xs: number[] = [];
    for (let k = 0; k < 5; k++) {
      gc();
      const before = process.memoryUsage().heapUsed;
      for (let i = 0; i < 100; i++) simulateAttitude(car, { ...aggressive, duration });
      xs.push((process.memoryUsage().heapUsed - before) / 100);
    }
    return median(xs);
  };
  // Both runs see every input change (all before 1 s), so only the number of steps differs.
  perRun(6);
  perRun(1.5);
  console.log(String((perRun(6) - perRun(1.5)) / 4500));
  process.exit(0);
}

const lines: string[] = [];
const report = (label: string, value: string, target = "") =>
  lines.push(`${label.padEnd(58)} ${value.padStart(12)}  ${target}`);

// 1. One second of attitude at 1 ms steps.
const attitudeMs = time(() => simulateAttitude(car, aggressive), 31, 200);
report(
  "attitude, 1 s at 1 ms steps (median per run)",
  `${attitudeMs.toFixed(4)} ms`,
  attitudeMs < 0.2 ? "target < 0.2 ms: met" : "target < 0.2 ms: MISSED",
);
const quietMs = time(() => simulateAttitude(car, { speed: 12, duration: 1 }), 31, 200);
report("attitude, 1 s at 1 ms steps, no inputs", `${quietMs.toFixed(4)} ms`);

// 2. Allocation in the inner loop, measured in a child process whose young generation is large
// enough that no collection runs during the probe: heap growth per run, long runs minus short.
const probe = spawnSync(
  process.execPath,
  [
    ...process.execArgv,
    "--expose-gc",
    "--min-semi-space-size=64",
    "--max-semi-space-size=64",
    fileURLToPath(import.meta.url),
    "--alloc-probe",
  ],
  { encoding: "utf8" },
);
const perStep = Number(probe.stdout.trim());
if (probe.status !== 0 || !Number.isFinite(perStep))
  throw new Error(`allocation probe failed: ${probe.stderr}`);
report(
  "heap bytes per integrator step (6 s run minus 1.5 s run)",
  perStep.toFixed(3),
  perStep < 0.5 ? "target: no allocation: met" : "target: no allocation: MISSED",
);

// 3. Complete set-up plans.
const planCases = CAR_PRESET_IDS.flatMap((id) =>
  [0.5, 0.8, 1.1].map((airtime) => ({
    car: CAR_PRESETS[id],
    speed: 11,
    airtime,
    turn: "right" as const,
    pitchChangeRad: rad(-25),
  })),
);
const planTimes = planCases.map((c) => time(() => planAirSetup(c), 9, 3, 3));
const planMedian = median(planTimes);
report(
  "set-up plan incl. windows and 3 success rates (median)",
  `${planMedian.toFixed(2)} ms`,
  planMedian < 15 ? "target < 15 ms: met" : "target < 15 ms: MISSED",
);
report(
  "set-up plan, slowest of the 12 cases (its median)",
  `${Math.max(...planTimes).toFixed(2)} ms`,
  "(4 classes x airtimes 0.5, 0.8, 1.1 s)",
);

// 3b. Joint plans as the layout analysis asks for them (pulse and steering together, every error).
const jointCases = CAR_PRESET_IDS.flatMap((id) =>
  [
    { speed: 6.5, airtime: 0.69, pitchDeg: -50, faceDeg: 30, turn: "left" as const },
    { speed: 8.9, airtime: 1.06, pitchDeg: -57, faceDeg: 35, turn: "left" as const },
    { speed: 5.6, airtime: 0.56, pitchDeg: -52, faceDeg: 27, turn: "right" as const },
  ].map((j) => ({
    car: CAR_PRESETS[id],
    speed: j.speed,
    airtime: j.airtime,
    turn: j.turn,
    turnAngleRad: rad(45),
    pitchChangeRad: rad(j.pitchDeg),
    takeoffPitchRad: rad(j.faceDeg),
    airtimePerSpeed: 0.2,
    value: { secondsPerRad: 3 / 5.5, failCost: 3, minYawRad: rad(10) },
  })),
);
const jointTimes = jointCases.map((c) => time(() => planAirSetup(c), 9, 3, 3));
const jointMedian = median(jointTimes);
report(
  "joint plan: pulse with steering, every error, turn alone (median)",
  `${jointMedian.toFixed(2)} ms`,
  jointMedian < 15 ? "target < 15 ms: met" : "target < 15 ms: MISSED",
);
report(
  "joint plan, slowest of the 12 cases (its median)",
  `${Math.max(...jointTimes).toFixed(2)} ms`,
  "(4 classes x the summer layout's 3 jumps into hairpins)",
);

// 4. Flight, for information.
const jump = {
  faceAngleRad: Math.atan(0.4),
  lip: { x: 0, z: 0.6 },
  surface: [
    { x: -1.5, z: 0 },
    { x: 0, z: 0.6 },
    { x: 4, z: 0.6 },
    { x: 6, z: 0 },
    { x: 12, z: 0 },
  ],
  landingRamp: { start: 4, end: 6 },
};
report(
  "flight, exact parabola",
  `${(time(() => flyJump({ ...jump, speed: 9 }), 31, 2000) * 1000).toFixed(2)} us`,
);
report(
  "flight with drag",
  `${(time(() => flyJump({ ...jump, speed: 9, drag: { massKg: 1.6, cdA: 0.03 } }), 31, 200) * 1000).toFixed(2)} us`,
);
report(
  "speed window with drag",
  `${time(() => speedWindow({ ...jump, drag: { massKg: 1.6, cdA: 0.03 } }), 15, 3).toFixed(3)} ms`,
);

// 5. Calibration from measured laps, as the calibration page runs it.
const summerTrack = calibrationTrack(SUMMER_LAYOUT);
const measuredCar = { ...car, topSpeed: 13.5, mu: 1.25 };
const measuredLap = modelTimes(summerTrack, measuredCar).lapTime;
const measuredSectors = modelTimes(summerTrack, measuredCar, 3).sectorTimes;
const paceMs = time(() => fitPace(summerTrack, car, measuredLap), 9, 1, 2);
const gripMs = time(() => fitSpeedGrip([{ track: summerTrack, measured: measuredSectors }], car), 9, 1, 2);
const under250 = (ms: number) => `target < 250 ms: ${ms < 250 ? "met" : "MISSED"}`;
report("calibration: pace factor (summer layout)", `${paceMs.toFixed(1)} ms`, under250(paceMs));
report("calibration: top speed and grip from 3 sectors", `${gripMs.toFixed(1)} ms`, under250(gripMs));

console.log(`Loftline engine benchmark (Node ${process.version}, medians)\n${lines.join("\n")}`);
