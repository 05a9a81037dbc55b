/**
 * Whose plan the jump page shows: the set-up plan is one per jump and car class (ranked for an
 * expert, decision 0110); each skill level has its own verdict on it. The page shows it as the
 * chosen level's plan only when that level is told to set up; otherwise as the expert's plan (when
 * the expert is told to), or as the model's best plan that nobody is told to fly.
 */
import { SKILL_LEVELS, type JumpAnalysis, type SkillLevel } from "~/analysis";

export type PlanOwner =
  | { kind: "none" }
  | { kind: "infeasible" }
  | { kind: "own"; skill: SkillLevel }
  | { kind: "other"; skill: SkillLevel; owner: SkillLevel }
  | { kind: "nobody"; skill: SkillLevel };

/** Whose plan it is for the page's chosen skill level. */
export function planOwner(j: Pick<JumpAnalysis, "plan" | "verdicts">, skill: SkillLevel): PlanOwner {
  if (!j.plan) return { kind: "none" };
  if (!j.plan.feasible) return { kind: "infeasible" };
  if (j.verdicts[skill].verdict === "set-up") return { kind: "own", skill };
  // The most skilled level that is told to set up (the list runs novice, club, expert).
  const owner = [...SKILL_LEVELS].reverse().find((l) => j.verdicts[l].verdict === "set-up");
  return owner ? { kind: "other", skill, owner } : { kind: "nobody", skill };
}
