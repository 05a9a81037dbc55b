import { describe, expect, it } from "vitest";
import { analyseLayout, parseLayoutDocument, type LayoutDocument } from "~/analysis";
import { analysisWork, budgetIssues, MAX_JUMP_ANALYSES, MAX_LINE_LENGTH_M } from "~/analysis-pool/budget";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { heaviestAccepted, overBudget } from "../../../scripts/lib/worst-case-layout";

function parsed(input: unknown): LayoutDocument {
  const result = parseLayoutDocument(input);
  if (!result.ok) throw new Error(JSON.stringify(result.issues.slice(0, 3)));
  return result.document;
}

describe("the analysis work budget", () => {
  it("counts jumps x classes, and the centre line as the engine measures it", () => {
    const doc = parsed(SUMMER_LAYOUT);
    const work = analysisWork(doc);
    // The engine's own lap length is the reference: the budget sums the same section lengths.
    expect(work.lineLength).toBeCloseTo(analyseLayout(doc, { classIds: ["sct-10"] }).lapLength, 6);
    expect(work.jumps).toBe(doc.sections.filter((s) => s.kind === "jump").length);
    expect(work.jumpAnalyses).toBe(work.jumps * doc.carClasses.length);
    expect(analysisWork(doc, ["sct-10"]).jumpAnalyses).toBe(work.jumps);
    expect(budgetIssues(doc)).toEqual([]);
  });

  it("lets the heaviest accepted layout through, and names the field and the limit of what is over", () => {
    const heaviest = parsed(heaviestAccepted(0));
    expect(analysisWork(heaviest).jumpAnalyses).toBe(MAX_JUMP_ANALYSES);
    expect(analysisWork(heaviest).lineLength).toBeLessThan(MAX_LINE_LENGTH_M);
    expect(budgetIssues(heaviest)).toEqual([]);

    const over = parsed(overBudget(0));
    expect(budgetIssues(over)).toEqual([
      {
        path: "sections",
        message: expect.stringMatching(
          /^hold 500 jumps; for 4 car classes that is 2000 jump analyses, over the limit of 160 \(jumps x car classes\)/,
        ),
      },
      {
        path: "sections",
        message: expect.stringMatching(/^make a centre line 275\d m long, over the limit of 2000 m/),
      },
    ]);
    expect(budgetIssues(over, ["sct-10"])[0].message).toMatch(
      /^hold 500 jumps; for 1 car class that is 500 jump/,
    );

    const oneJumpMore = {
      ...heaviest,
      sections: [...heaviest.sections, { ...heaviest.sections[1], id: "extra" }],
    };
    expect(budgetIssues(oneJumpMore)).toEqual([
      {
        path: "carClasses",
        message: expect.stringMatching(
          /^name 4 car classes; with 41 jumps that is 164 jump analyses, over the limit/,
        ),
      },
    ]);
    expect(budgetIssues(oneJumpMore, ["sct-10", "buggy-8"])).toEqual([]);
  });
});
