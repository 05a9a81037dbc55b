import { describe, expect, it } from "vitest";
import { compileServo, compileWheel, evaluate, kinkTimes } from "~/analysis/air/attitude-inputs";

describe("rate-limited servo", () => {
  const rate = Math.PI / 3 / 0.1; // 0.1 s per 60 deg
  it("moves at its rate, holds the target and clips to the lock", () => {
    const s = compileServo(
      [
        [0.1, 0.5],
        [0.4, -1],
      ],
      rate,
      0.6,
    );
    expect(evaluate(s, 0.05)).toBe(0);
    expect(evaluate(s, 0.1 + 0.25 / rate)).toBeCloseTo(0.25, 12);
    expect(evaluate(s, 0.3)).toBeCloseTo(0.5, 12);
    // heads for -1 but stops at the lock, -0.6, after 1.1 rad of travel
    expect(evaluate(s, 0.4 + 1.1 / rate + 0.01)).toBeCloseTo(-0.6, 12);
    expect(evaluate(s, 0.4 + 0.5 / rate)).toBeCloseTo(0, 12);
  });

  it("a new target before the old one is reached turns the servo around where it is", () => {
    const s = compileServo(
      [
        [0, 1],
        [0.05, 0],
      ],
      rate,
      1,
    );
    const peak = 0.05 * rate;
    expect(evaluate(s, 0.05)).toBeCloseTo(peak, 12);
    expect(evaluate(s, 0.05 + peak / rate + 0.001)).toBeCloseTo(0, 12);
    expect(Array.from(kinkTimes(1, s))).toEqual([0.05, 0.05 + peak / rate].map((x) => expect.closeTo(x, 12)));
  });
});

describe("driven-wheel spin", () => {
  it("brake stops the wheel at 0 and throttle stops at the top speed", () => {
    const w = compileWheel(
      [
        [0.1, -1000],
        [0.5, 2000],
      ],
      200,
      300,
    );
    expect(evaluate(w, 0.2)).toBeCloseTo(100, 9);
    expect(evaluate(w, 0.45)).toBe(0);
    expect(evaluate(w, 0.55)).toBeCloseTo(100, 9);
    expect(evaluate(w, 0.9)).toBe(300);
  });
});
