/**
 * The jump rules' measurements (track/rules.ts): over every jump and every car class, the shortest
 * run-out from touchdown to the next turn, the hardest landing (equivalent fall height at the
 * planned takeoff speed) and the narrowest speed window, each with where it was found and every
 * jump that fails the rule.
 *
 * Measured only on landings that happen: a jump the class cannot clear or never touches (flown
 * over) has no landing of its own, and a row of whoops is skimmed or hopped, not landed
 * (docs/decisions/0703).
 */
import type { ClassAnalysis, JumpAnalysis } from "./layout-analysis-types";
import type { GuidanceValues, RuleId, RuleMeasurements } from "../track/rules";

type JumpRuleMeasurements = Pick<
  RuleMeasurements,
  "landingRunOut" | "landingFallHeight" | "speedWindow" | "where" | "failing"
>;

/** "J7 Hairpin table": the jump's number in lap order (as on the pages) and its name. */
export function jumpTitle(j: Pick<JumpAnalysis, "name">, index: number): string {
  return `J${index + 1}${j.name ? ` ${j.name}` : ""}`;
}

interface Rule {
  id: RuleId;
  value: (j: JumpAnalysis) => number | null;
  worse: (a: number, b: number) => boolean;
  fails: (x: number, limit: number) => boolean;
}

const RULES: Rule[] = [
  {
    id: "minLandingRunOut",
    value: (j) => j.nextTurnDistance,
    worse: (a, b) => a < b,
    fails: (x, limit) => x < limit,
  },
  {
    id: "maxLandingFallHeight",
    value: (j) => j.equivalentFallHeight,
    worse: (a, b) => a > b,
    fails: (x, limit) => x > limit,
  },
  {
    id: "minSpeedWindow",
    value: (j) => (j.window ? j.window.max - j.window.min : null),
    worse: (a, b) => a < b,
    fails: (x, limit) => x < limit,
  },
];

/** Whether the jump has a landing of its own for this class. */
export function landsForRules(j: JumpAnalysis): boolean {
  return j.preset !== "whoops" && !j.cannotClear && j.flownOverBy === null && j.landing !== null;
}

/**
 * The jump rules measured on analysed classes.
 * @param limits the guidance values in force (for the list of failing jumps).
 * @returns run-out m, fall height m, window m/s (null where no jump qualifies), with places in words.
 */
export function jumpRuleMeasurements(
  classes: readonly ClassAnalysis[],
  limits: Pick<GuidanceValues, "minLandingRunOut" | "maxLandingFallHeight" | "minSpeedWindow">,
): JumpRuleMeasurements {
  const out: JumpRuleMeasurements = { where: {}, failing: {} };
  const several = classes.length > 1;
  for (const rule of RULES) {
    let worst: number | null = null;
    let where = "";
    const failing = new Set<string>();
    for (const cls of classes)
      cls.jumps.forEach((j, k) => {
        const x = landsForRules(j) ? rule.value(j) : null;
        if (x === null || !Number.isFinite(x)) return;
        const place = jumpTitle(j, k);
        if (rule.fails(Math.round(x * 1000) / 1000, limits[rule.id as keyof typeof limits]))
          failing.add(place);
        if (worst === null || rule.worse(x, worst)) {
          worst = x;
          where = several ? `${place} (${cls.label})` : place;
        }
      });
    if (rule.id === "minLandingRunOut") out.landingRunOut = worst;
    if (rule.id === "maxLandingFallHeight") out.landingFallHeight = worst;
    if (rule.id === "minSpeedWindow") out.speedWindow = worst;
    if (worst !== null) out.where![rule.id] = where;
    out.failing![rule.id] = [...failing];
  }
  return out;
}
