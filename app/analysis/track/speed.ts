/**
 * Speed around the lap: the quasi-steady-state lap model (engine.md section 2).
 *
 * Caps in turns at v = sqrt(mu g R) (R no tighter than the car's geometric minimum radius
 * L / tan(lock)), a forward pass with a(v) = a0 (1 - v / vTop), a backward pass with constant
 * braking, the minimum of both. On a jump the car flies from the lip to touchdown with no
 * acceleration or braking (drag-free parabola, lap-jumps.ts); it leaves the lip at the planned
 * takeoff speed: the sweet-spot speed, or the highest the approach allows if that is lower.
 * Speeds are along the ground; while airborne the stored speed is the horizontal speed, so that
 * lap time = sum of ds / v over the plan distance holds in the air too. Slopes on the ground are
 * not modelled (plan distances). A flight meets the ground of its own jump or the flat beyond it
 * (a next jump's ground is not seen from the air).
 */
import type { CarParams } from "../format/cars";
import type { CentreLine, ResolvedSection } from "./geometry";
import type { JumpProfile } from "./jump-profile";
import { assertFinite } from "../math/vec";
import { ballisticJumpWindow, ballisticTouchdown, STANDARD_GRAVITY, type JumpWindow } from "./lap-jumps";

/**
 * What the lap model needs of a car: a subset of CarParams (cars.ts), so a class preset or a
 * user's car profile can be passed as it is.
 */
export type LapCar = Pick<
  CarParams,
  "topSpeed" | "accel0" | "brakeDecel" | "mu" | "wheelbase" | "steeringLockRad"
>;

export interface JumpLap {
  sectionIndex: number;
  sectionId: string;
  /** Lap distance of the lip and of touchdown, m. */
  lipS: number;
  touchdownS: number;
  /** Centre-line sample of the lip and the first sample on the ground after touchdown. */
  lipIndex: number;
  touchdownIndex: number;
  /** Distance along the jump section of touchdown, m (may pass the section end). */
  touchdownD: number;
  /** Highest takeoff speed the approach allows (acceleration from the corner before), m/s. */
  approachMaxSpeed: number;
  windowMin: number | null;
  sweetSpotSpeed: number | null;
  windowMax: number | null;
  /** min(sweet-spot speed, approach maximum), m/s. */
  plannedTakeoffSpeed: number;
  /** Time in the air at the planned speed, s. */
  airtime: number;
  /** Speed along the ground just after touchdown, m/s. */
  landingSpeed: number;
  /** How much faster the car lands than braking allows for what follows, m/s (0 when fine). */
  landingOverspeed: number;
  /** True when the approach is too short to reach the landing (approach maximum < window minimum). */
  cannotClear: boolean;
  /**
   * Id of the jump whose flight passes over this jump's lip (the car never touches this one;
   * its speeds are then the speed in the air there), else null.
   */
  flownOverBy: string | null;
}

export interface LapSpeed {
  /** Speed at each centre-line sample, m/s (horizontal speed while airborne). */
  speed: Float64Array;
  /** 1 where the car is in the air. */
  airborne: Uint8Array;
  /** Lap time, s. */
  lapTime: number;
  jumps: JumpLap[];
  /** Turns tighter than the car can steer: radius and the car's minimum radius, m. */
  tightTurns: { sectionId: string; radius: number; minRadius: number }[];
  minSpeed: number;
  maxSpeed: number;
}

export interface LapOptions {
  /** Gravity, m/s^2. */
  g?: number;
  /** Speed window of a jump; default: drag-free closed form (ballisticJumpWindow). */
  jumpWindow?: (section: ResolvedSection, profile: JumpProfile) => JumpWindow;
}

function profileLip(p: JumpProfile): number {
  return p.d[p.lipIndex];
}

/** Geometric minimum turning radius of the kinematic bicycle model, R = L / tan(lock), m. */
export function minimumTurnRadius(car: Pick<LapCar, "wheelbase" | "steeringLockRad">): number {
  return car.wheelbase / Math.tan(car.steeringLockRad);
}

/**
 * Highest steady speed in a flat turn, v = sqrt(mu g R), capped at top speed, m/s.
 * @param radius centre-line radius, m (Infinity for a straight).
 */
export function cornerSpeed(car: LapCar, radius: number, g = STANDARD_GRAVITY): number {
  const r = Math.max(radius, minimumTurnRadius(car));
  return Math.min(car.topSpeed, Math.sqrt(car.mu * g * r));
}

/** Checks the car's numbers at the module boundary; throws a RangeError naming the field. */
function checkCar(car: LapCar): void {
  for (const key of ["topSpeed", "accel0", "brakeDecel", "mu", "wheelbase", "steeringLockRad"] as const) {
    assertFinite(car[key], `car.${key}`);
    if (car[key] <= 0) throw new RangeError(`car.${key} must be greater than 0 (got ${car[key]})`);
  }
  if (car.steeringLockRad >= Math.PI / 2) throw new RangeError("car.steeringLockRad must be less than pi/2");
}

/** Speed around the lap for one car; the layout is treated as a closed loop. */
export function lapSpeed(
  geo: { sections: readonly ResolvedSection[]; line: CentreLine },
  car: LapCar,
  options: LapOptions = {},
): LapSpeed {
  const g = options.g ?? STANDARD_GRAVITY;
  checkCar(car);
  const { line, sections } = geo;
  const N = line.count - 1;
  const cap = new Float64Array(N);
  let i0 = 0;
  for (let i = 0; i < N; i++) {
    const k = Math.abs(line.curvature[i]);
    cap[i] = k > 1e-12 ? cornerSpeed(car, 1 / k, g) : car.topSpeed;
    if (cap[i] < cap[i0] && sections[line.section[i]].profile === null) i0 = i;
  }
  const lipOf = new Int32Array(N).fill(-1);
  const jumpInfo = sections
    .filter((s) => s.profile !== null)
    .map((s) => {
      const p = s.profile!;
      const first = line.sectionStart[s.index];
      const n = line.sectionStart[s.index + 1] - first;
      const lip = first + Math.round((p.d[p.lipIndex] / s.length) * n);
      lipOf[lip % N] = s.index;
      const window = options.jumpWindow ? options.jumpWindow(s, p) : ballisticJumpWindow(p, g);
      return {
        section: s,
        profile: p,
        lip: lip % N,
        window,
        record: null as JumpLap | null,
        td: -1,
        steps: 0,
      };
    });
  const bySection = new Map(jumpInfo.map((j) => [j.section.index, j]));
  const ds = (i: number) => line.s[i + 1] - line.s[i];
  const fwd = new Float64Array(N);
  const airborne = new Uint8Array(N);
  let v = 0;
  for (let step = 0; step < 2 * N;) {
    const i = (i0 + step) % N;
    const jump = lipOf[i] >= 0 ? bySection.get(lipOf[i])! : null;
    if (jump) {
      step += takeOff(jump, Math.min(v, cap[i]));
      v = fwd[jump.td];
      continue;
    }
    v = Math.min(v, cap[i]);
    fwd[i] = v;
    const a = Math.max(0, car.accel0 * (1 - v / car.topSpeed));
    v = Math.sqrt(v * v + 2 * a * ds(i));
    step++;
  }
  // Backward pass: braking limits; the air is skipped (no braking in flight).
  const speed = new Float64Array(line.count);
  const tdOf = new Int32Array(N).fill(-1);
  for (const j of jumpInfo) if (j.td >= 0) tdOf[j.td] = j.section.index;
  let vb = fwd[i0];
  for (let step = 0; step < 2 * N; step++) {
    const i = (((i0 - step) % N) + N) % N;
    if (airborne[i]) continue;
    const jump = lipOf[i] >= 0 ? bySection.get(lipOf[i])! : null;
    if (jump) vb = fwd[i];
    else vb = Math.min(fwd[i], Math.sqrt(vb * vb + 2 * car.brakeDecel * ds(i)));
    speed[i] = vb;
    const landed = tdOf[i] >= 0 ? bySection.get(tdOf[i])! : null;
    if (landed?.record) landed.record.landingOverspeed = Math.max(0, landed.record.landingSpeed - vb);
  }
  for (let i = 0; i < N; i++) if (airborne[i]) speed[i] = fwd[i];
  speed[N] = speed[0];

  let lapTime = 0;
  let minSpeed = Infinity;
  let maxSpeed = 0;
  for (let i = 0; i < N; i++) {
    const mean = Math.max(1e-3, 0.5 * (speed[i] + speed[i + 1]));
    lapTime += ds(i) / mean;
    minSpeed = Math.min(minSpeed, speed[i]);
    maxSpeed = Math.max(maxSpeed, speed[i]);
  }
  const minRadius = minimumTurnRadius(car);
  const tightTurns = sections
    .filter((s) => s.curvature !== 0 && 1 / Math.abs(s.curvature) < minRadius - 1e-9)
    .map((s) => ({ sectionId: s.id, radius: 1 / Math.abs(s.curvature), minRadius }));
  const jumps = jumpInfo.map((j) => j.record ?? flownOver(j));
  return { speed, airborne, lapTime, jumps, tightTurns, minSpeed, maxSpeed };

  /** A jump whose lip lies under another jump's flight: the car never touches it. */
  function flownOver(jump: (typeof jumpInfo)[number]): JumpLap {
    const { section, window, lip } = jump;
    const under = (o: (typeof jumpInfo)[number]) => {
      if (o === jump || !o.record) return false;
      const from = o.record.lipIndex;
      const to = o.record.touchdownIndex;
      return from <= to ? lip > from && lip < to : lip > from || lip < to;
    };
    const by = jumpInfo.find(under);
    const v = speed[lip];
    return {
      sectionIndex: section.index,
      sectionId: section.id,
      lipS: line.s[lip],
      touchdownS: line.s[lip],
      lipIndex: lip,
      touchdownIndex: lip,
      touchdownD: profileLip(jump.profile),
      approachMaxSpeed: v,
      windowMin: window.windowMin,
      sweetSpotSpeed: window.sweetSpotSpeed,
      windowMax: window.windowMax,
      plannedTakeoffSpeed: v,
      airtime: 0,
      landingSpeed: v,
      landingOverspeed: 0,
      cannotClear: false,
      flownOverBy: by ? by.section.id : null,
    };
  }

  /** Flies a jump from its lip; fills the airborne samples; returns the steps taken. */
  function takeOff(jump: (typeof jumpInfo)[number], approach: number): number {
    const { section, profile, window, lip } = jump;
    const planned = window.sweetSpotSpeed === null ? approach : Math.min(window.sweetSpotSpeed, approach);
    const td = ballisticTouchdown(profile, planned, g);
    const lipS = line.s[lip];
    const tdS = section.startS + td.d;
    for (let k = 1; k < jump.steps; k++) airborne[(lip + k) % N] = 0;
    let steps = 1;
    fwd[lip] = planned;
    airborne[lip] = 0;
    while (steps < N && sDistance(lip, steps) < tdS - lipS - 1e-9) {
      const k = (lip + steps) % N;
      airborne[k] = 1;
      fwd[k] = td.horizontalSpeed;
      steps++;
    }
    const tdIndex = (lip + steps) % N;
    airborne[tdIndex] = 0;
    fwd[tdIndex] = Math.min(cap[tdIndex], td.rollOutSpeed);
    jump.td = tdIndex;
    jump.steps = steps;
    jump.record = {
      sectionIndex: section.index,
      sectionId: section.id,
      lipS,
      touchdownS: tdS % line.length,
      lipIndex: lip,
      touchdownIndex: tdIndex,
      touchdownD: td.d,
      approachMaxSpeed: approach,
      windowMin: window.windowMin,
      sweetSpotSpeed: window.sweetSpotSpeed,
      windowMax: window.windowMax,
      plannedTakeoffSpeed: planned,
      airtime: td.airtime,
      landingSpeed: td.rollOutSpeed,
      landingOverspeed: 0,
      cannotClear: window.windowMin === null || approach < window.windowMin,
      flownOverBy: null,
    };
    return steps;
  }

  /** Lap distance from sample a to the sample `steps` further on, m (wrapping round the lap). */
  function sDistance(a: number, steps: number): number {
    const b = a + steps;
    return b < N ? line.s[b] - line.s[a] : line.length - line.s[a] + line.s[b - N];
  }
}
