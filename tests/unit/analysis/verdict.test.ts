import { describe, expect, it } from "vitest";
import {
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
  const good = { landsIntoTurn: true, turnAngle: rad(90), airtime: 0.8, expectedGain: 0.1 };
  it("sets up when a worthwhile gain is expected", () => {
    const v = jumpVerdict(good);
    expect(v.verdict).toBe("set-up");
    expect(v.reason).toBeNull();
  });

  it("gives the first reason that applies for taking it straight", () => {
    expect(jumpVerdict({ ...good, landsIntoTurn: false }).reason).toBe("no-turn");
    expect(jumpVerdict({ ...good, turnAngle: rad(10) }).reason).toBe("turn-too-gentle");
    expect(jumpVerdict({ ...good, airtime: 0.2 }).reason).toBe("not-enough-airtime");
    expect(jumpVerdict({ ...good, planFeasible: false }).reason).toBe("not-enough-airtime");
    const risky = jumpVerdict({ ...good, expectedGain: -0.4 });
    expect(risky.reason).toBe("too-risky");
    expect(risky.verdict).toBe("straight");
    expect(jumpVerdict({ ...good, expectedGain: 0.01 }).reason).toBe("too-risky");
  });
});
