import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { analyseLayout } from "~/analysis";
import { JumpFacts } from "~/components/analysis/jump-facts";
import { JumpPlanSection } from "~/components/analysis/jump-plan-section";
import { JumpVerdictsTable } from "~/components/analysis/jump-verdicts-table";
import { planOwner } from "~/components/analysis/plan-owner";
import { BIG_DOUBLE, ovalWithJump } from "../analysis/analysis-fixtures";

/** The big double into a hairpin, for an expert who reaches it at a steady speed. */
const jump = analyseLayout(ovalWithJump(BIG_DOUBLE, { after: 0.5 }), {
  speedSigmas: { novice: 0.5, club: 0.3, expert: 0.02 },
}).classes[0].jumps[0];
const text = (html: string) => html.replace(/<[^>]+>/g, " ").replace(/\s+/g, " ");

describe("whose plan the jump page shows", () => {
  it("the expert, told to set up, sees the plan as theirs", () => {
    expect(jump.verdicts.expert.verdict).toBe("set-up");
    expect(planOwner(jump, "expert")).toEqual({ kind: "own", skill: "expert" });
    const page = text(renderToStaticMarkup(<JumpPlanSection jump={jump} steering={null} skill="expert" />));
    expect(page).toContain("The plan for an expert: set up in the air as below.");
    expect(page).toMatch(/For an expert: \d+% clean landings/);
  });

  it("a club racer told to take it straight sees why, and the expert's plan only as such", () => {
    expect(jump.verdicts.club.verdict).toBe("straight");
    expect(planOwner(jump, "club")).toEqual({ kind: "other", skill: "club", owner: "expert" });
    const page = text(renderToStaticMarkup(<JumpPlanSection jump={jump} steering={null} skill="club" />));
    expect(page).toContain(
      `A club racer should take it straight (${jump.verdicts.club.reasonText}). The plan below is the plan for an expert, shown only as such: not for a club racer to fly.`,
    );
    // The error that matters most for the club racer on this jump is named.
    expect(page).toMatch(/The error that matters most on this jump: the (timing|takeoff speed)/);
  });

  it("when nobody is told to set up, the plan is the model's best, for reference only", () => {
    const usual = analyseLayout(ovalWithJump(BIG_DOUBLE, { after: 0.5 })).classes[0].jumps[0];
    expect(planOwner(usual, "novice").kind).toBe("nobody");
    const page = text(renderToStaticMarkup(<JumpPlanSection jump={usual} steering={null} skill="novice" />));
    expect(page).toContain("No skill level is told to fly this plan");
  });

  it("the verdict table shows the values that decided it", () => {
    const page = text(renderToStaticMarkup(<JumpVerdictsTable jump={jump} />));
    expect(page).toContain(
      "at least 10° and the expected gain is at least 0.05 s a pass; a failed landing costs 3.0 s",
    );
    expect(page).toContain("Error that matters most");
  });

  it("a whoops row's numbers are the ways through it", () => {
    const row = analyseLayout(
      ovalWithJump(
        { id: "w", kind: "jump", preset: "whoops", count: 6, bumpHeight: 0.15, spacing: 1 },
        { after: 30 },
      ),
    ).classes[0].jumps[0];
    const page = text(renderToStaticMarkup(<JumpFacts jump={row} />));
    expect(page).toMatch(/Skimming over the tops needs \d+\.\d m\/s/);
    expect(page).toMatch(/Jumping through in doubles \d+\.\d to \d+\.\d m\/s, 3 jumps a pass/);
    expect(page).not.toContain("Speed window");
  });
});
