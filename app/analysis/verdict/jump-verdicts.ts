/**
 * The verdict per skill level for an analysed jump (engine.md section 6): "set up in the air" or
 * "take it straight" with the reason that decided it, from the plan's own outcome, and the
 * numbers behind it. The decisions are data (verdict.ts); the reasons' words are in ../words.ts
 * and the sentences built on them in verdict-text.ts.
 */
import type { JumpAnalysis, SkillVerdict } from "../layout/layout-analysis-types";
import { SKILL_LEVELS, type JumpReason, type SkillLevel } from "../words";
import {
  DEFAULT_VERDICT_THRESHOLDS,
  expectedGain,
  jumpVerdict,
  timeSaved,
  trackLengthSaved,
  type StraightReason,
  type VerdictThresholds,
} from "./verdict";
import { setUpReason, setUpText, straightReason, straightText } from "./verdict-text";

export interface VerdictInputs {
  /** Skill level copied into `result.verdict`. */
  skill: SkillLevel;
  /** The values that decide the verdicts (defaults: DEFAULT_VERDICT_THRESHOLDS). */
  thresholds?: Partial<VerdictThresholds>;
  /** True for a car whose brake and throttle act on all four wheels. */
  fourWd?: boolean;
  /** The jump with its flight, turn and plan filled in; its verdicts are written here. */
  result: JumpAnalysis;
}

const RAD = Math.PI / 180;

/** Fills `result.verdicts` (every skill level) and `result.verdict` (the chosen one); returns `result`. */
export function describeVerdicts({
  skill,
  thresholds,
  fourWd = false,
  result: r,
}: VerdictInputs): JumpAnalysis {
  const t = { ...DEFAULT_VERDICT_THRESHOLDS, ...thresholds };
  const verdicts = {} as Record<SkillLevel, SkillVerdict>;
  const plan = r.plan?.feasible ? r.plan : null;
  const turn = r.turn;
  const psi = plan ? Math.abs(plan.yawDeg) * RAD : 0;
  const angle = turn ? turn.angleDeg * RAD : 0;
  const lengthSaved = plan && turn ? trackLengthSaved(turn.radius, psi, angle) : 0;
  const saved = plan && turn ? timeSaved(turn.radius, psi, angle, turn.entrySpeed) : 0;
  for (const level of SKILL_LEVELS) {
    const rate = plan ? plan.successRate[level] : 0;
    const gain = plan ? expectedGain(rate, saved, t.failCost) : 0;
    const numbers = {
      skill: level,
      successRate: rate,
      trackLengthSaved: lengthSaved,
      timeSaved: saved,
      expectedGain: gain,
      noseTurnDeg: plan ? Math.abs(plan.yawDeg) : 0,
      failCost: t.failCost,
      minGainPerPass: t.minGainPerPass,
      minNoseTurnDeg: t.minNoseTurn / RAD,
      mainError: plan ? plan.mainError[level] : null,
    };
    const words = { r, v: numbers, minTurnDeg: t.minTurnAngle / RAD, minAirtime: t.minAirtime, fourWd };
    const straight = (reason: JumpReason): SkillVerdict => ({
      ...numbers,
      verdict: "straight",
      reason,
      reasonText: straightReason(reason, r),
      text: straightText(reason, words),
    });
    if (r.flownOverBy !== null) verdicts[level] = straight("flown-over");
    else if (r.whoops) verdicts[level] = straight("whoops");
    else if (r.cannotClear) verdicts[level] = straight("cannot-clear");
    else {
      const v = jumpVerdict({
        landsIntoTurn: turn !== null,
        turnAngle: angle,
        airtime: r.airtime,
        expectedGain: gain,
        planReason: r.plan && !r.plan.feasible ? (r.plan.reason as StraightReason) : null,
        noseTurn: plan ? psi : undefined,
        noseTurnUnlevelled: r.plan?.withoutLevelling ? Math.abs(r.plan.withoutLevelling.yawDeg) * RAD : null,
        thresholds: t,
      });
      verdicts[level] =
        v.verdict === "straight"
          ? straight(v.reason!)
          : {
              ...numbers,
              verdict: "set-up",
              reason: null,
              reasonText: setUpReason(r),
              text: setUpText(words),
            };
    }
  }
  r.verdicts = verdicts;
  r.verdict = verdicts[skill];
  return r;
}
