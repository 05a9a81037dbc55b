import { describe, expect, it } from "vitest";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import { BIG_DOUBLE, KICKER, ovalWithJump } from "./analysis-fixtures";

const rule = (a: ReturnType<typeof analyseLayout>, id: string) => a.rules.checks.find((c) => c.id === id)!;

describe("the jump rules in the analysis's rule checks", () => {
  it("measure the run-out from touchdown to the next turn: 0.5 m before a hairpin fails, 12 m passes", () => {
    const tight = analyseLayout(ovalWithJump(BIG_DOUBLE, { after: 0.5 }));
    const jump = tight.classes[0].jumps[0];
    const runOut = rule(tight, "minLandingRunOut");
    expect(runOut.measured).toBeCloseTo(jump.nextTurnDistance!, 3);
    expect(runOut.status).toBe("fail");
    expect(runOut.where).toBe("J1");
    const roomy = analyseLayout(ovalWithJump(BIG_DOUBLE, { after: 12 }));
    expect(rule(roomy, "minLandingRunOut").status).toBe("pass");
    // Touchdown moves with the straight after the jump, metre for metre (plane geometry).
    expect(rule(roomy, "minLandingRunOut").measured! - runOut.measured!).toBeCloseTo(11.5, 2);
  });

  it("take the hardest landing and the narrowest window over every class, naming the class", () => {
    const a = analyseLayout(ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10", "sct-10"] }));
    const jumps = a.classes.map((c) => c.jumps[0]);
    const efh = rule(a, "maxLandingFallHeight");
    expect(efh.measured).toBeCloseTo(Math.max(...jumps.map((j) => j.equivalentFallHeight)), 3);
    const window = rule(a, "minSpeedWindow");
    expect(window.measured).toBeCloseTo(Math.min(...jumps.map((j) => j.window!.max - j.window!.min)), 3);
    expect(window.where).toMatch(/^J1 \(1\/10 (two-wheel-drive buggy|short-course truck)\)$/);
  });

  it("follow a club's values, and leave out jumps a class cannot clear", () => {
    const a = analyseLayout(ovalWithJump(KICKER, { after: 0.5 }), { overrides: { minLandingRunOut: 0.2 } });
    expect(rule(a, "minLandingRunOut").status).toBe("pass");
    const short = analyseLayout(ovalWithJump(BIG_DOUBLE, { approach: 2 }));
    expect(short.classes[0].jumps[0].cannotClear).toBe(true);
    expect(rule(short, "maxLandingFallHeight").status).toBe("not checked");
  });
});
