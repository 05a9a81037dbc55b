import { describe, expect, it } from "vitest";
import { CAR_PRESETS } from "~/analysis/format/cars";
import { SUMMER_LAYOUT, WET_WEATHER_LAYOUT } from "~/db/demo-layouts";
import { analyseLayout, LINE_SPACING } from "~/analysis/layout/layout-analysis";
import { SKILL_LEVELS } from "~/analysis/words";
import { BIG_DOUBLE, ovalWithJump, ruleOval } from "./analysis-fixtures";

const G = 9.81;

describe("analyseLayout: geometry and speed (issue 4 correctness)", () => {
  it("a closed oval's lap length is 2L + 2 pi R and its closure is zero (plane geometry)", () => {
    const a = analyseLayout(ruleOval(3));
    expect(a.lapLength).toBeCloseTo(2 * 40 + 2 * Math.PI * 8, 9);
    expect(a.closure.gap).toBeLessThan(1e-9);
    expect(a.closure.headingDeg).toBe(0);
  });

  it("removing a section gives the expected gap: without the last half circle the end is 2R from the start, turned 180 deg", () => {
    const doc = ruleOval(3);
    doc.sections.pop();
    const a = analyseLayout(doc);
    expect(a.lapLength).toBeCloseTo(2 * 40 + Math.PI * 8, 9);
    expect(a.closure.gap).toBeCloseTo(2 * 8, 9);
    expect(Math.abs(a.closure.headingDeg)).toBeCloseTo(180, 9);
  });

  it("the speed in a flat turn is sqrt(mu g R) where grip limits it (OpenStax University Physics Vol. 1, section 6.3, flat curve: estimate from memory of the section)", () => {
    const a = analyseLayout(ruleOval(3));
    const car = CAR_PRESETS["buggy-2wd-10"];
    const expected = Math.sqrt(car.mu * G * 8);
    const cls = a.classes[0];
    expect(cls.speed.min).toBeCloseTo(expected, 9);
    // At the middle of the east turn (lap distance 40 + 4 pi) the car runs at exactly that speed.
    const k = a.line.s.findIndex((s) => s >= 40 + 4 * Math.PI);
    expect(cls.lineSpeed[k]).toBeCloseTo(expected, 9);
    // On the straights it goes faster, never above top speed.
    expect(cls.speed.max).toBeGreaterThan(expected);
    expect(cls.speed.max).toBeLessThanOrEqual(car.topSpeed);
    expect(cls.speed.mean).toBeCloseTo(a.lapLength / cls.lapTime, 9);
  });
});

describe("analyseLayout: rule checks (issue 4 correctness)", () => {
  it("fail on a 2 m wide track and pass on 3 m", () => {
    const narrow = analyseLayout(ruleOval(2)).rules;
    const wide = analyseLayout(ruleOval(3)).rules;
    const width = (r: typeof narrow) => r.checks.find((c) => c.id === "minTrackWidth")!;
    expect(width(narrow).status).toBe("fail");
    expect(width(narrow).measured).toBe(2);
    expect(narrow.failed).toBe(1);
    expect(width(wide).status).toBe("pass");
    expect(wide.failed).toBe(0);
    // An oval without jumps: the three jump rules have nothing to measure.
    expect(wide.passed).toBe(wide.checks.length - 3);
    expect(wide.checks.filter((c) => c.status === "not checked").map((c) => c.id)).toEqual([
      "minLandingRunOut",
      "maxLandingFallHeight",
      "minSpeedWindow",
    ]);
    // Always with the note that the sanctioning body's rulebook decides.
    expect(wide.note).toMatch(/sanctioning body's current rulebook decides/);
  });

  it("takes the guidance set and a club's overrides from the options", () => {
    const national = analyseLayout(ruleOval(2.8), { guidance: "national" }).rules;
    expect(national.guidance).toBe("national");
    expect(national.checks.find((c) => c.id === "minTrackWidth")!.status).toBe("fail");
    const relaxed = analyseLayout(ruleOval(2), { overrides: { minTrackWidth: 1.8 } }).rules;
    expect(relaxed.checks.find((c) => c.id === "minTrackWidth")!.status).toBe("pass");
    expect(() => analyseLayout(ruleOval(2), { overrides: { minTrackWidth: -1 } })).toThrow(
      /overrides\.minTrackWidth/,
    );
  });
});

describe("analyseLayout: the result", () => {
  it("is plain JSON data: a JSON round trip gives it back unchanged", () => {
    const a = analyseLayout(ovalWithJump(BIG_DOUBLE, { carClasses: ["buggy-2wd-10", "sct-10"] }));
    expect(JSON.parse(JSON.stringify(a))).toEqual(a);
  });

  it("downsamples the centre line to about every 0.5 m with one speed per point per class", () => {
    const a = analyseLayout(ruleOval(3));
    const n = a.line.x.length;
    expect(a.line.y).toHaveLength(n);
    expect(a.line.s).toHaveLength(n);
    expect(a.line.sectionIndex).toHaveLength(n);
    expect(a.classes[0].lineSpeed).toHaveLength(n);
    for (let i = 1; i < n - 1; i++) {
      const ds = a.line.s[i] - a.line.s[i - 1];
      expect(ds).toBeGreaterThanOrEqual(LINE_SPACING - 1e-9);
      expect(ds).toBeLessThan(LINE_SPACING + 0.1);
    }
    expect(a.line.s[n - 1]).toBeCloseTo(a.lapLength, 9);
  });

  it("names the field for an unknown class or skill level", () => {
    expect(() => analyseLayout(ruleOval(3), { classIds: ["buggy-2wd-10", "hovercraft"] })).toThrow(
      /^classIds\[1\]: unknown car class "hovercraft"/,
    );
    expect(() => analyseLayout({ ...ruleOval(3), carClasses: ["club-special"] })).toThrow(/^carClasses\[0\]/);
    expect(() => analyseLayout(ruleOval(3), { skill: "pro" as never })).toThrow(/^skill:/);
  });

  it("uses a club's own car class when given", () => {
    const own = { ...CAR_PRESETS["buggy-2wd-10"], id: "club-special", label: "Club special", mu: 0.5 };
    const a = analyseLayout(
      { ...ruleOval(3), carClasses: ["club-special"] },
      { cars: { "club-special": own } },
    );
    expect(a.classes[0].label).toBe("Club special");
    expect(a.classes[0].speed.min).toBeCloseTo(Math.sqrt(0.5 * G * 8), 9);
  });
});

describe("analyseLayout on the demo layouts", () => {
  it("analyses the summer layout: at least 40 sections, 8 jumps, three classes, every skill level", () => {
    expect(SUMMER_LAYOUT.sections.length).toBeGreaterThanOrEqual(40);
    const a = analyseLayout(SUMMER_LAYOUT);
    expect(a.classes).toHaveLength(3);
    for (const c of a.classes) {
      expect(c.jumps.length).toBeGreaterThanOrEqual(8);
      expect(c.lapTime).toBeGreaterThan(a.lapLength / CAR_PRESETS[c.classId].topSpeed);
      for (const j of c.jumps) for (const s of SKILL_LEVELS) expect(j.verdicts[s].skill).toBe(s);
      // Some jumps land into turns and some do not (the layout's description says three hairpins).
      expect(c.jumps.filter((j) => j.turn !== null).length).toBeGreaterThanOrEqual(2);
      expect(c.jumps.filter((j) => j.turn === null).length).toBeGreaterThanOrEqual(5);
    }
    expect(a.closure.gap).toBeLessThan(0.01);
  });

  it("analyses the wet-weather layout for a chosen class and skill", () => {
    const a = analyseLayout(WET_WEATHER_LAYOUT, { classIds: ["buggy-8"], skill: "expert" });
    expect(a.classes.map((c) => c.classId)).toEqual(["buggy-8"]);
    expect(a.skill).toBe("expert");
    for (const j of a.classes[0].jumps) expect(j.verdict).toEqual(j.verdicts.expert);
  });
});
