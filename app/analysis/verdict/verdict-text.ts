/**
 * The verdicts' words, in one place: a short reason per reason code and the sentence for drivers
 * with the numbers that decided it. The decisions themselves are data (verdict.ts,
 * jump-verdicts.ts); only this file turns them into sentences.
 */
import type { ErrorSource } from "../air/air-plan-robustness";
import type { WhoopsTechnique } from "../flight/whoops";
import type { JumpAnalysis, JumpReason, SkillVerdict } from "../layout/layout-analysis-types";

/** Short reasons in plain words (flown-over names the other jump; whoops names the way through). */
export const REASON_TEXT: Record<Exclude<JumpReason, "flown-over" | "whoops">, string> = {
  "no-turn": "no turn at the landing",
  "turn-too-gentle": "turn too gentle",
  "not-enough-airtime": "not enough airtime",
  "no-wheel-spin": "no wheel spin to steer with",
  "no-useful-yaw": "no steering turns the nose",
  "cannot-land-flat": "no steering lands it flat",
  "levelling-costs-turn": "levelling the car costs the turn",
  "nose-turn-too-small": "the nose turns too little",
  "too-risky": "the gain is smaller than the risk",
  "gain-too-small": "the gain is too small",
  "cannot-clear": "cannot clear: the approach is too short",
};
export const SET_UP_TEXT = "set up in the air";

/** The driver's errors, as the jump page names them. */
export const ERROR_WORDS: Record<ErrorSource, string> = {
  steering: "the timing of the steering",
  pulse: "the timing of the brake or throttle",
  speed: "the takeoff speed (it sets the airtime)",
};

/** Ways through a whoops row. */
export const WHOOPS_WORDS: Record<WhoopsTechnique, string> = {
  skim: "skim over the tops",
  triples: "jump through in triples",
  doubles: "jump through in doubles",
  roll: "roll through bump by bump",
};

const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);
const pct = (x: number) => `${Math.round(x * 100)}%`;
const signed = (x: number) => `${x >= 0 ? "+" : "\u2212"}${Math.abs(x).toFixed(2)} s`;
const degs = (x: number) => `${Math.abs(x) < 9.95 ? Math.abs(x).toFixed(1) : Math.round(Math.abs(x))}\u00b0`;

/** "steer right, then left": the sides of the plan's steering phases in order. */
export function steeringWords(steering: [number, number][]): string {
  const sides: string[] = [];
  for (const [, deg] of steering) {
    if (Math.abs(deg) < 0.5) continue;
    const side = deg > 0 ? "left" : "right";
    if (sides[sides.length - 1] !== side) sides.push(side);
  }
  return sides.length === 0 ? "keep the wheels straight" : `steer ${sides.join(", then ")}`;
}

/** Why levelling costs the turn, in the words of the pulse that does it. */
function levellingCause(r: JumpAnalysis, fourWd: boolean): string {
  const kind = r.plan?.pitchPulse.kind;
  if (kind === "brake" && fourWd) return "the brake that levels the car stops the wheels that turn it";
  if (kind === "throttle") return "levelling the car with the throttle leaves too little turn";
  return "levelling the car with the brake leaves too little turn";
}

/** The way through a whoops row and the speeds, in one sentence. */
export function whoopsText(r: JumpAnalysis): string {
  const w = r.whoops!;
  const way = WHOOPS_WORDS[w.technique];
  const range = (x: { window: { min: number; max: number } | null }) =>
    x.window ? `${f1(x.window.min)} to ${f1(x.window.max)} m/s` : "more than the car can reach";
  const parts = [`skimming needs ${f1(w.skimSpeed)} m/s`, `doubles ${range(w.doubles)}`];
  if (w.triples) parts.push(`triples ${range(w.triples)}`);
  const at =
    w.technique === "roll"
      ? ` (the approach allows ${f1(r.approachMaxSpeed)} m/s)`
      : ` at ${f1(w.speed)} m/s${w.technique === "skim" ? "" : `, ${w.technique === "doubles" ? w.doubles.jumps : w.triples!.jumps} jumps a pass`}`;
  return `Whoops: ${way}${at}; ${parts.join(", ")}.`;
}

/** Everything a sentence may need. */
export interface TextInputs {
  r: JumpAnalysis;
  v: Omit<SkillVerdict, "text" | "reasonText" | "verdict" | "reason">;
  /** Smallest turn worth a set-up, deg; shortest airtime, s. */
  minTurnDeg: number;
  minAirtime: number;
  fourWd: boolean;
}

/** The sentence for a jump taken straight, with the numbers that decided it. */
export function straightText(reason: JumpReason, k: TextInputs): string {
  const { r, v } = k;
  const plan = r.plan;
  const alone = plan?.withoutLevelling;
  switch (reason) {
    case "flown-over":
      return `Nothing to do here: the car flies over this jump from ${r.flownOverBy}.`;
    case "whoops":
      return whoopsText(r);
    case "cannot-clear":
      return `Cannot clear: the approach is too short (at most ${f1(r.approachMaxSpeed)} m/s; the landing needs ${f1(r.window?.min ?? NaN)} m/s).`;
    case "no-turn":
      return r.nextTurnDistance === null
        ? "Take it straight: no turn at the landing."
        : `Take it straight: no turn at the landing (the next turn starts ${f1(r.nextTurnDistance)} m after touchdown).`;
    case "turn-too-gentle":
      return `Take it straight: turn too gentle (${f1(r.turn?.angleDeg ?? 0)}\u00b0 after the landing; a set-up is worth it from ${Math.round(k.minTurnDeg)}\u00b0).`;
    case "not-enough-airtime":
      return r.airtime < k.minAirtime
        ? `Take it straight: not enough airtime (${f2(r.airtime)} s in the air; steering needs ${f2(k.minAirtime)} s or more).`
        : `Take it straight: not enough airtime (${f2(r.airtime)} s in the air leaves no time to steer before the wheels must be straight for the landing).`;
    case "no-wheel-spin":
      return "Take it straight: the front wheels are not spinning, so steering cannot turn the car.";
    case "no-useful-yaw":
      return `Take it straight: no steering turns the nose toward the turn in ${f2(r.airtime)} s in the air.`;
    case "cannot-land-flat":
      return `Take it straight: no steering lands it flat (within ${Math.round(plan?.rollToleranceDeg ?? 5)}\u00b0 of roll) with the nose turned.`;
    case "levelling-costs-turn": {
      const levelled = plan?.feasible
        ? `levelled, the nose turns ${degs(v.noseTurnDeg)}`
        : "levelled, it does not turn";
      const tail = alone
        ? `; turning alone gives ${degs(alone.yawDeg)} but lands ${degs(alone.pitchDeg - (plan!.takeoffPitchDeg + plan!.pitchChangeDeg))} nose-${alone.pitchDeg - (plan!.takeoffPitchDeg + plan!.pitchChangeDeg) >= 0 ? "high" : "low"}`
        : "";
      return `Take it straight: ${levellingCause(r, k.fourWd)} (${levelled}${tail}).`;
    }
    case "nose-turn-too-small":
      return `Take it straight: the nose turns only ${degs(v.noseTurnDeg)} (a set-up is worth it from ${degs(v.minNoseTurnDeg)}; it would save ${f2(v.timeSaved)} s).`;
    case "too-risky":
      return `Take it straight: the gain is smaller than the risk: ${pct(v.successRate)} clean, ${f2(v.timeSaved)} s saved, ${f1(v.failCost)} s lost on a failed landing (expected ${signed(v.expectedGain)} a pass).`;
    case "gain-too-small":
      return `Take it straight: it gains only ${signed(v.expectedGain)} a pass (${pct(v.successRate)} clean, ${f2(v.timeSaved)} s saved; worth it from ${f2(v.minGainPerPass)} s).`;
  }
}

/** The sentence for a set-up. */
export function setUpText(k: TextInputs): string {
  const { r, v } = k;
  const plan = r.plan!;
  return (
    `Set up in the air: ${steeringWords(plan.steering)}, to land with the nose turned ` +
    `${Math.round(Math.abs(plan.yawDeg))}\u00b0 ${r.turn!.side} (expected ${signed(v.expectedGain)} a pass, ` +
    `${pct(v.successRate)} clean landings).`
  );
}
