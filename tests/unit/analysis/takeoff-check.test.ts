import { describe, expect, it } from "vitest";
import { analyseLayout, parseLayoutDocument, takeoffIssues } from "~/analysis";

/** A small deterministic generator (a linear congruential one), so every run checks the same profiles. */
function generator(seed: number) {
  let s = seed;
  return () => (s = (s * 1103515245 + 12345) % 2147483648) / 2147483648;
}

describe("custom jumps the flight model cannot fly", () => {
  it("are exactly the ones analyseLayout refuses, over many random profiles", () => {
    const random = generator(7);
    let flagged = 0;
    let checked = 0;
    for (let k = 0; k < 200; k++) {
      const n = 3 + Math.floor(random() * 5);
      const profile: [number, number][] = [[0, 0]];
      let d = 0;
      for (let i = 1; i < n; i++) {
        d += 0.2 + random() * 3;
        profile.push([Number(d.toFixed(2)), i === n - 1 ? 0 : Number((random() * 2.5 - 0.5).toFixed(2))]);
      }
      const lipIndex = 1 + Math.floor(random() * (n - 2));
      const landingStartIndex = Math.min(n - 2, lipIndex + 1);
      const parsed = parseLayoutDocument({
        format: "loftline-layout",
        formatVersion: 1,
        name: "Kicker test",
        surface: "clay",
        trackWidth: 3,
        start: { x: 0, y: 0, headingDeg: 0 },
        carClasses: ["buggy-2wd-10"],
        sections: [
          { id: "s", kind: "straight", length: 10 },
          {
            id: "j",
            kind: "jump",
            preset: "custom",
            profile,
            lipIndex,
            landingStartIndex,
            landingEndIndex: n - 1,
          },
          { id: "t", kind: "turn", radius: 5, angleDeg: 180, direction: "left" },
        ],
      });
      if (!parsed.ok) continue;
      checked += 1;
      const issues = takeoffIssues(parsed.document);
      let refused: string | null = null;
      try {
        analyseLayout(parsed.document);
      } catch (error) {
        refused = (error as Error).message;
      }
      expect(issues.length > 0, JSON.stringify(profile)).toBe(refused !== null);
      if (issues.length) {
        flagged += 1;
        expect(issues[0].path).toBe("sections[1].lipIndex");
        expect(refused).toMatch(/surface rises above the takeoff path/);
      }
    }
    // Both kinds occur among the generated profiles, so the comparison means something.
    expect(flagged).toBeGreaterThan(10);
    expect(checked - flagged).toBeGreaterThan(10);
  });
});
