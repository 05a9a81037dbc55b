/**
 * The verdict per skill level for an analysed jump (engine.md section 6), in plain words:
 * "set up in the air" with what to do, or "take it straight" with the reason. The numbers come
 * from verdict.ts (track length saved, time saved, expected gain, jumpVerdict).
 */
import type { JumpAnalysis, JumpReason, SkillLevel, SkillVerdict } from "../layout/layout-analysis-types";
import { SKILL_LEVELS } from "../layout/layout-analysis-types";
import { expectedGain, jumpVerdict, timeSaved, trackLengthSaved } from "./verdict";

/** Short reasons in plain words (flown-over names the other jump). */
export const REASON_TEXT: Record<Exclude<JumpReason, "flown-over">, string> = {
  "no-turn": "no turn at the landing",
  "turn-too-gentle": "turn too gentle",
  "not-enough-airtime": "not enough airtime",
  "too-risky": "too risky at this skill",
  "cannot-clear": "cannot clear: the approach is too short",
};
export const SET_UP_TEXT = "set up in the air";

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
      return `Cannot clear: the approach is too short (at most ${f1(r.approachMaxSpeed)} m/s; the landing needs ${f1(r.window?.min ?? NaN)} m/s).`;
    case "no-turn":
      return r.nextTurnDistance === null
        ? "Take it straight: no turn at the landing."
        : `Take it straight: no turn at the landing (the next turn starts ${f1(r.nextTurnDistance)} m after touchdown).`;
    case "turn-too-gentle":
      return `Take it straight: turn too gentle (${f1(r.turn?.angleDeg ?? 0)}\u00b0 after the landing gains too little).`;
    case "not-enough-airtime":
      return `Take it straight: not enough airtime (${f2(r.airtime)} s in the air, too short to turn the car and land flat).`;
    case "too-risky":
      return `Take it straight: too risky at this skill (expected ${signed(gain)} a pass: ${Math.round(rate * 100)}% clean landings, ${f2(saved)} s saved by each).`;
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
      reasonText: reason === "flown-over" ? `flown over from ${r.flownOverBy}` : REASON_TEXT[reason],
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
              reasonText: SET_UP_TEXT,
              text:
                `Set up in the air: ${steeringWords(plan!.steering)}, to land with the nose turned ` +
                `${Math.round(Math.abs(plan!.yawDeg))}\u00b0 ${turn!.side} (expected ${signed(gain)} a pass, ` +
                `${Math.round(rate * 100)}% clean landings).`,
              ...numbers,
            };
    }
  }
  r.verdicts = verdicts;
  r.verdict = verdicts[skill];
  return r;
}
