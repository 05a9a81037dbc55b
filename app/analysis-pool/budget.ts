/**
 * The work budget of one layout analysis, known before it starts: how many jump analyses it holds
 * (jump sections x car classes; each flies the jump, finds its speed window and, where it lands
 * into a turn, searches a set-up plan) and how long a centre line it samples. An analysis over
 * either limit is refused before it reaches a worker (docs/decisions/0460-analysis-work-budget.md).
 * Pure: usable wherever a document is checked.
 */
import { jumpProfile, type LayoutDocument, type LayoutIssue } from "~/analysis";

/** Most jump analyses (jump sections x car classes) in one analysis. */
export const MAX_JUMP_ANALYSES = 160;
/** Longest centre line one analysis samples, m. */
export const MAX_LINE_LENGTH_M = 2000;

export interface AnalysisWork {
  jumps: number;
  classes: number;
  /** jumps x classes */
  jumpAnalyses: number;
  /** Length of the centre line from its sections (jumps by their ground profile), m. */
  lineLength: number;
}

/** The work an analysis of `doc` for `classIds` (default: the document's own classes) holds. */
export function analysisWork(
  doc: Pick<LayoutDocument, "sections" | "carClasses">,
  classIds: readonly string[] = doc.carClasses,
): AnalysisWork {
  let jumps = 0;
  let lineLength = 0;
  for (const s of doc.sections) {
    if (s.kind === "straight") lineLength += s.length;
    else if (s.kind === "turn") lineLength += (s.radius * s.angleDeg * Math.PI) / 180;
    else {
      jumps += 1;
      lineLength += jumpProfile(s).length;
    }
  }
  return { jumps, classes: classIds.length, jumpAnalyses: jumps * classIds.length, lineLength };
}

const km = (m: number) => (m >= 10_000 ? `${(m / 1000).toFixed(0)} km` : `${Math.round(m)} m`);

/**
 * What is over the budget, each issue naming the document's field ("sections" or "carClasses")
 * and the limit; empty when the analysis fits.
 */
export function budgetIssues(
  doc: Pick<LayoutDocument, "sections" | "carClasses">,
  classIds?: readonly string[],
): LayoutIssue[] {
  const work = analysisWork(doc, classIds);
  const issues: LayoutIssue[] = [];
  if (work.jumpAnalyses > MAX_JUMP_ANALYSES) {
    const total = `${work.jumpAnalyses} jump analyses, over the limit of ${MAX_JUMP_ANALYSES} (jumps x car classes) in one analysis`;
    issues.push(
      work.jumps > MAX_JUMP_ANALYSES
        ? {
            path: "sections",
            message: `hold ${work.jumps} jumps; for ${work.classes} car class${work.classes === 1 ? "" : "es"} that is ${total}: remove jumps`,
          }
        : {
            path: "carClasses",
            message: `name ${work.classes} car classes; with ${work.jumps} jumps that is ${total}: analyse fewer car classes or remove jumps`,
          },
    );
  }
  if (work.lineLength > MAX_LINE_LENGTH_M)
    issues.push({
      path: "sections",
      message: `make a centre line ${km(work.lineLength)} long, over the limit of ${km(MAX_LINE_LENGTH_M)} in one analysis: shorten straights and turns`,
    });
  return issues;
}
