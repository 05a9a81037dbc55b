import { describe, expect, it } from "vitest";
import { SUMMER_LAYOUT } from "~/db/demo-layouts";
import { jumpProfile } from "~/analysis/track/jump-profile";
import { analyseLayout } from "~/analysis/layout/layout-analysis";
import { buildOverlay, linePolyline } from "~/analysis/layout/overlay";
import type { JumpSection } from "~/analysis/format/layout-document";
import { BIG_DOUBLE, ovalWithJump, ruleOval } from "./analysis-fixtures";

describe("buildOverlay", () => {
  const analysis = analyseLayout(SUMMER_LAYOUT);

  it("carries the line with one speed per point and the speed range of the class", () => {
    for (const cls of analysis.classes) {
      const o = buildOverlay(analysis, cls.classId, "club");
      const n = o.line.x.length;
      expect(o.classId).toBe(cls.classId);
      expect(o.line.y).toHaveLength(n);
      expect(o.line.speed).toHaveLength(n);
      expect(o.line.sectionIndex).toHaveLength(n);
      expect(o.speedRange.min).toBe(Math.min(...o.line.speed));
      expect(o.speedRange.max).toBe(Math.max(...o.line.speed));
      expect(o.lapTime).toBe(cls.lapTime);
      expect(o.lapLength).toBe(analysis.lapLength);
      expect(o.jumps).toHaveLength(cls.jumps.length);
    }
  });

  it("labels each jump with the verdict at the chosen skill level", () => {
    const cls = analysis.classes[0];
    for (const skill of ["novice", "expert"] as const) {
      const o = buildOverlay(analysis, cls.classId, skill);
      o.jumps.forEach((oj, k) => {
        const j = cls.jumps[k];
        const v = j.verdicts[skill];
        expect(oj.sectionId).toBe(j.sectionId);
        expect(oj.lip).toEqual([j.lip.x, j.lip.y]);
        expect(oj.takeoffSpeed).toBe(j.takeoffSpeed);
        if (v.reason === "cannot-clear") expect(oj.verdict).toBe("cannot-clear");
        else expect(oj.verdict).toBe(v.verdict);
        if (v.verdict === "straight" && v.reason !== "cannot-clear")
          expect(oj.label).toBe(`Take it straight: ${v.reasonText}`);
        if (v.verdict === "set-up")
          expect(oj.label).toMatch(/^Set up in the air: land with the nose \d+° (left|right)$/);
      });
    }
  });

  it("marks a jump the approach cannot clear, and a set-up for a steady expert", () => {
    const short = analyseLayout(ovalWithJump(BIG_DOUBLE, { approach: 1 }));
    const o = buildOverlay(short, "buggy-4wd-10");
    expect(o.jumps[0].verdict).toBe("cannot-clear");
    expect(o.jumps[0].label).toBe("Cannot clear: the approach is too short");
    // An expert who reaches the jump at the same speed every lap (takeoff speed spread 0.02 m/s).
    const hairpin = analyseLayout(ovalWithJump(BIG_DOUBLE, { after: 0.5 }), {
      speedSigmas: { novice: 0.5, club: 0.3, expert: 0.02 },
    });
    const e = buildOverlay(hairpin, "buggy-4wd-10", "expert").jumps[0];
    expect(e.verdict).toBe("set-up");
    expect(e.label).toMatch(/^Set up in the air: land with the nose \d+° left$/);
    expect(e.landing).not.toBeNull();
  });

  it("lists failed rules in words", () => {
    const o = buildOverlay(analyseLayout(ruleOval(2)), "buggy-2wd-10");
    expect(o.ruleFailures).toEqual([
      { id: "minTrackWidth", label: "Track width", measured: "2 m", required: "at least 2.4 m" },
    ]);
    expect(buildOverlay(analyseLayout(ruleOval(3)), "buggy-2wd-10").ruleFailures).toEqual([]);
  });

  it("draws stretches hidden from the driver stand as polylines on the centre line", () => {
    // A tall table on the near straight, the stand low down in front of it.
    const wall: JumpSection = {
      id: "wall",
      kind: "jump",
      preset: "tabletop",
      faceHeight: 2,
      faceAngleDeg: 30,
      tableLength: 10,
      landingAngleDeg: 30,
    };
    const doc = ruleOval(3);
    doc.sections.splice(0, 1, { id: "s1", kind: "straight", length: 10 }, wall, {
      id: "s2",
      kind: "straight",
      length: 30 - jumpProfile(wall).length,
    });
    doc.driverStand = { x: 20, y: -6, eyeHeight: 1 };
    const a = analyseLayout(doc);
    const o = buildOverlay(a, "buggy-2wd-10");
    expect(a.hiddenFromStand!.length).toBeGreaterThan(0);
    expect(o.hidden).toHaveLength(a.hiddenFromStand!.length);
    o.hidden.forEach((h, k) => {
      expect(h.length).toBe(a.hiddenFromStand![k].length);
      expect(h.points.length).toBeGreaterThan(2);
    });
    expect(o.ruleFailures.map((f) => f.id)).toContain("maxHiddenLength");
  });

  it("refuses a class the analysis does not have, naming the field", () => {
    expect(() => buildOverlay(analysis, "buggy-8")).toThrow(/^classId:/);
  });
});

describe("linePolyline", () => {
  // A square lap of 40 m: corners at s = 0, 10, 20, 30 (and 40 back at the start).
  const line = {
    x: [0, 10, 10, 0, 0],
    y: [0, 0, 10, 10, 0],
    s: [0, 10, 20, 30, 40],
    sectionIndex: [0, 1, 2, 3, 3],
  };

  it("runs from the exact start to the exact end through the points between", () => {
    expect(linePolyline(line, 5, 25)).toEqual([
      [5, 0],
      [10, 0],
      [10, 10],
      [5, 10],
    ]);
  });

  it("crosses the start line when the end comes before the start", () => {
    expect(linePolyline(line, 35, 5)).toEqual([
      [0, 5],
      [0, 0],
      [5, 0],
    ]);
  });
});
