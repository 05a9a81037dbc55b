/**
 * The verdicts' sentences, in one place: the short reason shown after the verdict's word and the
 * sentence for drivers with the numbers that decided it. Both are built on the product's words
 * (../words.ts: VERDICT_WORDS, REASON_TEXT, WHOOPS_WORDS); the decisions themselves are data
 * (verdict.ts, jump-verdicts.ts).
 */
import type { JumpAnalysis, SkillVerdict } from "../layout/layout-analysis-types";
import { JUMP_PRESET_LABELS, REASON_TEXT, VERDICT_WORDS, WHOOPS_WORDS, type JumpReason } from "../words";

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

/** "Take it straight: no turn at the landing": the verdict's word and the reason's words. */
const says = (reason: JumpReason) =>
  `${VERDICT_WORDS[reason === "cannot-clear" ? "cannot-clear" : "straight"]}: ${REASON_TEXT[reason]}`;

/** The short reason shown after the verdict's word ("flown over from J3", "whoops row: skim over the tops"). */
export function straightReason(reason: JumpReason, r: JumpAnalysis): string {
  if (reason === "flown-over") return `${REASON_TEXT[reason]} from ${r.flownOverBy}`;
  if (reason === "whoops") return `${REASON_TEXT[reason]}: ${WHOOPS_WORDS[r.whoops!.technique]}`;
  return REASON_TEXT[reason];
}

/** Where a set-up leaves the nose at touchdown, e.g. "25° left". */
const noseAt = (r: JumpAnalysis) => `${Math.round(Math.abs(r.plan!.yawDeg))}\u00b0 ${r.turn!.side}`;

/** What a set-up asks, shown after the verdict's word: "land with the nose 25° left". */
export function setUpReason(r: JumpAnalysis): string {
  return `land with the nose ${noseAt(r)}`;
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
  return `${JUMP_PRESET_LABELS.whoops}: ${way}${at}; ${parts.join(", ")}.`;
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
      return `${says(reason)} (at most ${f1(r.approachMaxSpeed)} m/s; the landing needs ${f1(r.window?.min ?? NaN)} m/s).`;
    case "no-turn":
      return r.nextTurnDistance === null
        ? `${says(reason)}.`
        : `${says(reason)} (the next turn starts ${f1(r.nextTurnDistance)} m after touchdown).`;
    case "turn-too-gentle":
      return `${says(reason)} (${f1(r.turn?.angleDeg ?? 0)}\u00b0 after the landing; a set-up is worth it from ${Math.round(k.minTurnDeg)}\u00b0).`;
    case "not-enough-airtime":
      return r.airtime < k.minAirtime
        ? `${says(reason)} (${f2(r.airtime)} s in the air; steering needs ${f2(k.minAirtime)} s or more).`
        : `${says(reason)} (${f2(r.airtime)} s in the air leaves no time to steer before the wheels must be straight for the landing).`;
    case "no-wheel-spin":
      return `${says(reason)} (the front wheels are not spinning, so steering cannot turn the car).`;
    case "no-useful-yaw":
      return `${says(reason)} toward the turn in ${f2(r.airtime)} s in the air.`;
    case "cannot-land-flat":
      return `${says(reason)} (within ${Math.round(plan?.rollToleranceDeg ?? 5)}\u00b0 of roll) with the nose turned.`;
    case "levelling-costs-turn": {
      const levelled = plan?.feasible
        ? `levelled, the nose turns ${degs(v.noseTurnDeg)}`
        : "levelled, it does not turn";
      const tail = alone
        ? `; turning alone gives ${degs(alone.yawDeg)} but lands ${degs(alone.pitchDeg - (plan!.takeoffPitchDeg + plan!.pitchChangeDeg))} nose-${alone.pitchDeg - (plan!.takeoffPitchDeg + plan!.pitchChangeDeg) >= 0 ? "high" : "low"}`
        : "";
      return `${VERDICT_WORDS.straight}: ${levellingCause(r, k.fourWd)} (${levelled}${tail}).`;
    }
    case "nose-turn-too-small":
      return `${says(reason)}: only ${degs(v.noseTurnDeg)} (a set-up is worth it from ${degs(v.minNoseTurnDeg)}; it would save ${f2(v.timeSaved)} s).`;
    case "too-risky":
      return `${says(reason)}: ${pct(v.successRate)} clean, ${f2(v.timeSaved)} s saved, ${f1(v.failCost)} s lost on a failed landing (expected ${signed(v.expectedGain)} a pass).`;
    case "gain-too-small":
      return `${says(reason)}: ${signed(v.expectedGain)} a pass (${pct(v.successRate)} clean, ${f2(v.timeSaved)} s saved; worth it from ${f2(v.minGainPerPass)} s).`;
  }
}

/** The sentence for a set-up. */
export function setUpText(k: TextInputs): string {
  const { r, v } = k;
  const plan = r.plan!;
  return (
    `${VERDICT_WORDS["set-up"]}: ${steeringWords(plan.steering)}, to land with the nose turned ` +
    `${noseAt(r)} (expected ${signed(v.expectedGain)} a pass, ` +
    `${pct(v.successRate)} clean landings).`
  );
}
