/**
 * The verdict per skill level for an analysed jump (engine.md section 6), in plain words: the
 * verdict's word (words.ts) with what to do or why, and one sentence for drivers with the
 * numbers. These are the verdict's only sentences; the decision and the numbers come from
 * verdict.ts (track length saved, time saved, expected gain, jumpVerdict).
 */
import type { JumpAnalysis, SkillVerdict } from "../layout/layout-analysis-types";
import { REASON_TEXT, SKILL_LEVELS, VERDICT_WORDS, type JumpReason, type SkillLevel } from "../words";
import { expectedGain, jumpVerdict, timeSaved, trackLengthSaved } from "./verdict";

export interface VerdictInputs {
  /** Skill level copied into `result.verdict`. */
  skill: SkillLevel;
  /** Time lost to a failed landing, s. */
  failCost: number;
  /** The jump with its flight, turn and plan filled in; its verdicts are written here. */
  result: JumpAnalysis;
}

const RAD = Math.PI / 180;
const f1 = (x: number) => x.toFixed(1);
const f2 = (x: number) => x.toFixed(2);
const signed = (x: number) => `${x >= 0 ? "+" : "\u2212"}${Math.abs(x).toFixed(2)} s`;

/** "steer right, then left": the sides of the plan's steering phases in order. */
function steeringWords(steering: [number, number][]): string {
  const sides: string[] = [];
  for (const [, deg] of steering) {
    if (Math.abs(deg) < 0.5) continue;
    const side = deg > 0 ? "left" : "right";
    if (sides[sides.length - 1] !== side) sides.push(side);
  }
  return sides.length === 0 ? "keep the wheels straight" : `steer ${sides.join(", then ")}`;
}

/** "Take it straight: no turn at the landing": the verdict's word and the reason. */
const says = (reason: Exclude<JumpReason, "flown-over">) =>
  `${VERDICT_WORDS[reason === "cannot-clear" ? "cannot-clear" : "straight"]}: ${REASON_TEXT[reason]}`;

function straightText(
  reason: JumpReason,
  r: JumpAnalysis,
  gain: number,
  rate: number,
  saved: number,
): string {
  switch (reason) {
    case "flown-over":
      return `Nothing to do here: the car flies over this jump from ${r.flownOverBy}.`;
    case "cannot-clear":
      return `${says(reason)} (at most ${f1(r.approachMaxSpeed)} m/s; the landing needs ${f1(r.window?.min ?? NaN)} m/s).`;
    case "no-turn":
      return r.nextTurnDistance === null
        ? `${says(reason)}.`
        : `${says(reason)} (the next turn starts ${f1(r.nextTurnDistance)} m after touchdown).`;
    case "turn-too-gentle":
      return `${says(reason)} (${f1(r.turn?.angleDeg ?? 0)}\u00b0 after the landing gains too little).`;
    case "not-enough-airtime":
      return `${says(reason)} (${f2(r.airtime)} s in the air, too short to turn the car and land flat).`;
    case "too-risky":
      return `${says(reason)} (expected ${signed(gain)} a pass: ${Math.round(rate * 100)}% clean landings, ${f2(saved)} s saved by each).`;
  }
}

/** Fills `result.verdicts` (every skill level) and `result.verdict` (the chosen one); returns `result`. */
export function describeVerdicts({ skill, failCost, result: r }: VerdictInputs): JumpAnalysis {
  const verdicts = {} as Record<SkillLevel, SkillVerdict>;
  const plan = r.plan?.feasible ? r.plan : null;
  const turn = r.turn;
  const psi = plan ? Math.abs(plan.yawDeg) * RAD : 0;
  const angle = turn ? turn.angleDeg * RAD : 0;
  const lengthSaved = plan && turn ? trackLengthSaved(turn.radius, psi, angle) : 0;
  const saved = plan && turn ? timeSaved(turn.radius, psi, angle, turn.entrySpeed) : 0;
  // Where a set-up leaves the nose at touchdown, e.g. "25° left" (only read for a set-up).
  const nose = plan && turn ? `${Math.round(Math.abs(plan.yawDeg))}\u00b0 ${turn.side}` : "";
  for (const level of SKILL_LEVELS) {
    const rate = plan ? plan.successRate[level] : 0;
    const gain = plan ? expectedGain(rate, saved, failCost) : 0;
    const numbers = {
      successRate: rate,
      trackLengthSaved: lengthSaved,
      timeSaved: saved,
      expectedGain: gain,
    };
    const straight = (reason: JumpReason): SkillVerdict => ({
      skill: level,
      verdict: "straight",
      reason,
      reasonText:
        reason === "flown-over" ? `${REASON_TEXT[reason]} from ${r.flownOverBy}` : REASON_TEXT[reason],
      text: straightText(reason, r, gain, rate, saved),
      ...numbers,
    });
    if (r.flownOverBy !== null) verdicts[level] = straight("flown-over");
    else if (r.cannotClear) verdicts[level] = straight("cannot-clear");
    else {
      const v = jumpVerdict({
        landsIntoTurn: turn !== null,
        turnAngle: angle,
        airtime: r.airtime,
        expectedGain: gain,
        planFeasible: r.plan ? r.plan.feasible : undefined,
      });
      verdicts[level] =
        v.verdict === "straight"
          ? straight(v.reason!)
          : {
              skill: level,
              verdict: "set-up",
              reason: null,
              reasonText: `land with the nose ${nose}`,
              text:
                `${VERDICT_WORDS["set-up"]}: ${steeringWords(plan!.steering)}, to land with the nose turned ` +
                `${nose} (expected ${signed(gain)} a pass, ${Math.round(rate * 100)}% clean landings).`,
              ...numbers,
            };
    }
  }
  r.verdicts = verdicts;
  r.verdict = verdicts[skill];
  return r;
}
