import { describe, expect, it } from "vitest";
import {
  DEFAULT_MIN_GAIN_PER_PASS_S,
  DEFAULT_MIN_NOSE_TURN,
  DEFAULT_VERDICT_THRESHOLDS,
  expectedGain,
  jumpVerdict,
  landsIntoTurn,
  timeSaved,
  trackLengthSaved,
} from "~/analysis/verdict/verdict";

const rad = (d: number) => (d * Math.PI) / 180;

describe("track length and time saved", () => {
  it("is the arc R * psi, capped at the turn's angle", () => {
    // Arc length s = R * theta (engine.md section 6)
    expect(trackLengthSaved(4, rad(30), rad(90))).toBeCloseTo(4 * rad(30), 12);
    expect(trackLengthSaved(4, rad(-30), rad(90))).toBeCloseTo(4 * rad(30), 12);
    expect(trackLengthSaved(4, rad(60), rad(45))).toBeCloseTo(4 * rad(45), 12);
    expect(timeSaved(4, rad(30), rad(90), 8)).toBeCloseTo((4 * rad(30)) / 8, 12);
    expect(timeSaved(4, rad(30), rad(90), 0)).toBe(0);
  });

  it("expected gain weighs the time saved against a failed landing", () => {
    expect(expectedGain(1, 0.2)).toBeCloseTo(0.2, 12);
    expect(expectedGain(0.9, 0.2)).toBeCloseTo(0.9 * 0.2 - 0.1 * 3, 12);
    expect(expectedGain(0.99, 0.2, 1)).toBeCloseTo(0.99 * 0.2 - 0.01, 12);
  });

  it("a turn within half a second of travel counts as landing into it", () => {
    expect(landsIntoTurn(4, 10)).toBe(true);
    expect(landsIntoTurn(6, 10)).toBe(false);
    expect(landsIntoTurn(Infinity, 10)).toBe(false);
  });
});

describe("jump verdict", () => {
  const good = {
    landsIntoTurn: true,
    turnAngle: rad(90),
    airtime: 0.8,
    expectedGain: 0.1,
    noseTurn: rad(20),
  };
  it("sets up when the nose turns far enough and a worthwhile gain is expected", () => {
    expect(jumpVerdict(good)).toEqual({ verdict: "set-up", reason: null });
  });

  it("gives the first reason that applies for taking it straight", () => {
    expect(jumpVerdict({ ...good, landsIntoTurn: false }).reason).toBe("no-turn");
    expect(jumpVerdict({ ...good, turnAngle: rad(10) }).reason).toBe("turn-too-gentle");
    expect(jumpVerdict({ ...good, airtime: 0.2 }).reason).toBe("not-enough-airtime");
    const risky = jumpVerdict({ ...good, expectedGain: -0.4 });
    expect(risky).toEqual({ verdict: "straight", reason: "too-risky" });
    expect(jumpVerdict({ ...good, expectedGain: 0.03 }).reason).toBe("gain-too-small");
  });

  it("names the plan's own outcome, not the airtime, when no plan fits", () => {
    for (const reason of [
      "no-wheel-spin",
      "no-useful-yaw",
      "cannot-land-flat",
      "levelling-costs-turn",
    ] as const)
      expect(jumpVerdict({ ...good, planReason: reason }).reason).toBe(reason);
    expect(jumpVerdict({ ...good, planReason: "not-enough-airtime" }).reason).toBe("not-enough-airtime");
  });

  it("a turn of the nose too small to be worth it is named, and blamed on levelling when turning alone would do", () => {
    expect(jumpVerdict({ ...good, noseTurn: rad(2.5) }).reason).toBe("nose-turn-too-small");
    expect(jumpVerdict({ ...good, noseTurn: rad(2.5), noseTurnUnlevelled: rad(6) }).reason).toBe(
      "nose-turn-too-small",
    );
    expect(jumpVerdict({ ...good, noseTurn: rad(2.5), noseTurnUnlevelled: rad(17) }).reason).toBe(
      "levelling-costs-turn",
    );
  });

  it("the smallest worthwhile gain and turn of the nose are the club's to set", () => {
    // Defaults (estimates, docs/decisions/0108): 0.05 s a pass, 10 deg of nose.
    expect(DEFAULT_MIN_GAIN_PER_PASS_S).toBe(0.05);
    expect(DEFAULT_MIN_NOSE_TURN).toBeCloseTo(rad(10), 12);
    expect(DEFAULT_VERDICT_THRESHOLDS.minGainPerPass).toBe(DEFAULT_MIN_GAIN_PER_PASS_S);
    const small = { ...good, expectedGain: 0.03, noseTurn: rad(8) };
    expect(jumpVerdict(small).reason).toBe("nose-turn-too-small");
    expect(jumpVerdict({ ...small, thresholds: { minNoseTurn: rad(5) } }).reason).toBe("gain-too-small");
    expect(jumpVerdict({ ...small, thresholds: { minNoseTurn: rad(5), minGainPerPass: 0.02 } }).verdict).toBe(
      "set-up",
    );
  });
});
